import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';

import { CataloguePhase } from '../catalogue/catalogue-api';
import { LineChart } from '../line-chart/line-chart';
import { ChartSeries } from '../line-chart/line-chart-data';
import { FitForm } from '../vocabulary/thermo-vocabulary';
import { FitRangeInput, heatCapacityCurve } from './heat-capacity';

/** The series to plot: the fit being entered, the phase's fits in the catalogue and its Cp° values. */
export function fitPlotSeries(form: FitForm, ranges: readonly FitRangeInput[], existing: CataloguePhase | null): ChartSeries[] {
  const series: ChartSeries[] = [];
  const entered = heatCapacityCurve(form, ranges);
  if (entered.length > 0) {
    series.push({ label: 'This fit', points: entered });
  }
  for (const fit of existing?.fits ?? []) {
    const points = heatCapacityCurve(fit.form, fit.ranges as FitRangeInput[]);
    if (points.length > 0) {
      series.push({ label: `${fit.form} fit, ${fit.source.key}${fit.recommended ? ' (recommended)' : ''}`, points });
    }
  }
  const cp = existing?.quantities.find((q) => q.quantity === 'Cp');
  for (const value of [...(cp?.recommended ? [cp.recommended] : []), ...(cp?.alternatives ?? [])]) {
    series.push({ label: `Cp° at ${value.temperature} K, ${value.source.key}`, points: [{ x: value.temperature, y: value.value }] });
  }
  return series;
}

/**
 * A live plot of the heat-capacity fit as it is entered, against what the catalogue holds for
 * the species phase (its fits and its Cp° values), drawn with Chart.js loaded on first use.
 */
@Component({
  selector: 'kx-fit-plot',
  imports: [LineChart],
  template: `
    @if (series().length > 0) {
      <kx-line-chart [series]="series()" [description]="description()" yLabel="Cp° / (J/(mol·K))" [validRange]="validRange()" />
    } @else {
      <p class="kx-plot-empty">The plot appears once a range has its temperatures and coefficients.</p>
    }
  `,
  styles: `
    :host {
      display: block;
    }
    .kx-plot-empty {
      color: var(--mat-sys-on-surface-variant);
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class FitPlot {
  readonly form = input.required<FitForm>();
  readonly ranges = input.required<readonly FitRangeInput[]>();
  readonly existing = input<CataloguePhase | null>(null);

  protected readonly series = computed(() => fitPlotSeries(this.form(), this.ranges(), this.existing()));
  protected readonly validRange = computed(() => {
    const ranges = this.ranges();
    return ranges.length === 0 ? null : { min: ranges[0].tMin, max: ranges[ranges.length - 1].tMax, label: 'fit range' };
  });
  protected readonly description = computed(
    () => `Heat capacity against temperature: ${this.series().map((s) => s.label).join('; ')}.`,
  );
}


