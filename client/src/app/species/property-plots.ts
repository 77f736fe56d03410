import { HttpErrorResponse } from '@angular/common/http';
import { ChangeDetectionStrategy, Component, computed, inject, input } from '@angular/core';
import { toObservable, toSignal } from '@angular/core/rxjs-interop';
import { catchError, map, of, startWith, switchMap } from 'rxjs';

import { describeHttpError } from '../core/api-error';
import { preferenceOf } from '../core/preferences';
import { EmptyState } from '../shared/empty-state/empty-state';
import { LineChart } from '../shared/line-chart/line-chart';
import { ChartRange, ChartSeries } from '../shared/line-chart/line-chart-data';
import { LoadingIndicator } from '../shared/loading-indicator/loading-indicator';
import { describePhase } from '../shared/phase-badge/phase';
import { niceStep, temperatureList } from '../shared/temperatures/temperature-list';
import { MolarEnergyUnit } from '../shared/unit-selector/molar-energy-unit';
import { SpeciesApi } from './species-api';
import { FitForm, PropertyKey, PropertyTable, SpeciesPhase, fitRange } from './species-record';

/** About this many points make a smooth curve over a fit's range. */
const PLOT_POINTS = 80;

const FIT_FORM_NAMES: Record<FitForm, string> = {
  constant: 'constant-Cp',
  shomate: 'Shomate',
  nasa7: 'NASA 7-coefficient',
  nasa9: 'NASA 9-coefficient',
  tabulated: 'tabulated',
};

interface PlotSpec {
  readonly key: PropertyKey;
  readonly title: string;
  readonly symbol: string;
}

const PLOTS: readonly PlotSpec[] = [
  { key: 'Cp', title: 'Heat capacity', symbol: 'Cp°' },
  { key: 'S', title: 'Entropy', symbol: 'S°' },
  { key: 'HminusH298', title: 'Enthalpy above 298.15 K', symbol: 'H° − H°(298.15 K)' },
  { key: 'deltaFG', title: 'Gibbs energy of formation', symbol: 'ΔfG°' },
];

type PlotData =
  | { readonly state: 'no-fit' }
  | { readonly state: 'loading' }
  | { readonly state: 'ready'; readonly table: PropertyTable }
  | { readonly state: 'failed'; readonly message: string };

/** Cp°, S°, H° − H°(298.15 K) and ΔfG° against T over the phase's heat-capacity fit, its range shaded. */
@Component({
  selector: 'kx-property-plots',
  imports: [EmptyState, LineChart, LoadingIndicator],
  template: `
    @switch (data().state) {
      @case ('no-fit') {
        <kx-empty-state
          heading="Nothing to plot against temperature"
          message="This phase has no heat-capacity fit in this release, so its values are known at the reference temperature only."
        />
      }
      @case ('loading') {
        <kx-loading-indicator label="Calculating the curves" />
      }
      @case ('failed') {
        <p class="kx-plot-failed" role="alert">The curves could not be calculated: {{ failure() }}</p>
      }
    }
    @if (charts(); as charts) {
      <p class="kx-plot-note">{{ rangeNote() }}</p>
      <div class="kx-plot-grid">
        @for (chart of charts; track chart.key) {
          <figure class="kx-plot">
            <figcaption>{{ chart.title }}, {{ chart.symbol }}</figcaption>
            <kx-line-chart
              [series]="chart.series"
              [yLabel]="chart.yLabel"
              [validRange]="validRange()"
              [description]="chart.description"
            />
          </figure>
        }
      </div>
    }
  `,
  styles: `
    .kx-plot-grid {
      display: grid;
      grid-template-columns: repeat(auto-fill, minmax(min(100%, 30rem), 1fr));
      gap: 1rem;
    }
    .kx-plot {
      min-width: 0;
      margin: 0;
      padding: 0.5rem 0.75rem;
      border: 1px solid var(--mat-sys-outline-variant);
      border-radius: var(--mat-sys-corner-medium);
    }
    figcaption {
      font: var(--mat-sys-title-small);
      margin-bottom: 0.25rem;
    }
    .kx-plot-note {
      color: var(--mat-sys-on-surface-variant);
    }
    .kx-plot-failed {
      color: var(--mat-sys-error);
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class PropertyPlots {
  private readonly api = inject(SpeciesApi);

  readonly speciesId = input.required<string | number>();
  readonly speciesName = input.required<string>();
  readonly phase = input.required<SpeciesPhase>();
  readonly release = input('');
  readonly unit = input<MolarEnergyUnit>('kJ/mol');

  private readonly request = computed(() => ({
    id: this.speciesId(),
    phase: this.phase(),
    range: fitRange(this.phase()),
    release: this.release(),
    unit: this.unit(),
  }));

  protected readonly data = toSignal(
    toObservable(this.request).pipe(
      switchMap(({ id, phase, range, release, unit }) => {
        if (range === null) {
          return of<PlotData>({ state: 'no-fit' });
        }
        const temperatures = temperatureList(range.tMin, range.tMax, niceStep(range.tMax - range.tMin, PLOT_POINTS));
        return this.api
          .properties(id, { phase, temperatures, units: preferenceOf(unit), extrapolate: false, release })
          .pipe(
            map((table): PlotData => ({ state: 'ready', table })),
            catchError((error: unknown) =>
              of<PlotData>({ state: 'failed', message: error instanceof HttpErrorResponse ? describeHttpError(error) : 'unexpected error' }),
            ),
            startWith<PlotData>({ state: 'loading' }),
          );
      }),
    ),
    { initialValue: { state: 'loading' } as PlotData },
  );

  protected readonly failure = computed(() => {
    const data = this.data();
    return data.state === 'failed' ? data.message : '';
  });

  private readonly table = computed(() => {
    const data = this.data();
    return data.state === 'ready' ? data.table : null;
  });

  protected readonly validRange = computed<ChartRange | null>(() => {
    const fit = this.table()?.fit;
    return fit ? { min: fit.tMin, max: fit.tMax, label: `fit valid ${fit.tMin}–${fit.tMax} K` } : null;
  });

  protected readonly rangeNote = computed(() => {
    const fit = this.table()?.fit;
    if (!fit) {
      return '';
    }
    return (
      `Calculated from the ${FIT_FORM_NAMES[fit.form] ?? fit.form} heat-capacity fit, valid from ${fit.tMin} K to ${fit.tMax} K; ` +
      'the shaded bands lie outside that range. The temperature table below lists the same quantities.'
    );
  });

  protected readonly charts = computed(() => {
    const table = this.table();
    if (table === null) {
      return null;
    }
    const phaseLabel = describePhase(this.phase().phase, this.phase().polymorph).abbreviation;
    return PLOTS.map((plot) => {
      const unit = table.rows.find((row) => row[plot.key])?.[plot.key]?.unit ?? '';
      const series: ChartSeries[] = [
        {
          label: plot.symbol,
          points: table.rows.map((row) => ({ x: row.T, y: row[plot.key]?.value ?? null })),
        },
      ];
      return {
        ...plot,
        series,
        yLabel: unit ? `${plot.symbol} / (${unit})` : plot.symbol,
        description: `Line plot of ${plot.symbol} of ${this.speciesName()} (${phaseLabel}) against temperature from ${table.fit.tMin} K to ${table.fit.tMax} K.`,
      };
    });
  });
}
