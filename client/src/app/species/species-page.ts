import { DOCUMENT } from '@angular/common';
import { HttpErrorResponse } from '@angular/common/http';
import { ChangeDetectionStrategy, Component, computed, effect, inject, input, linkedSignal } from '@angular/core';
import { toObservable, toSignal } from '@angular/core/rxjs-interop';
import { MatButtonModule } from '@angular/material/button';
import { MatButtonToggleModule } from '@angular/material/button-toggle';
import { Title } from '@angular/platform-browser';
import { ActivatedRoute, Router, RouterLink } from '@angular/router';
import { Subject, catchError, combineLatest, map, of, startWith, switchMap } from 'rxjs';

import { describeHttpError } from '../core/api-error';
import { PreferencesService } from '../core/preferences';
import { ReleasesService } from '../core/releases';
import { EmptyState } from '../shared/empty-state/empty-state';
import { ErrorState } from '../shared/error-state/error-state';
import { Formula } from '../shared/formula/formula';
import { LoadingIndicator } from '../shared/loading-indicator/loading-indicator';
import { describePhase } from '../shared/phase-badge/phase';
import { ReleasePicker } from '../shared/release-picker/release-picker';
import { ReleaseSummary } from '../shared/release-picker/release-summary';
import { MolarEnergyUnit } from '../shared/unit-selector/molar-energy-unit';
import { UnitSelector } from '../shared/unit-selector/unit-selector';
import { PhaseValues } from './phase-values';
import { PropertyPlots } from './property-plots';
import { SpeciesApi } from './species-api';
import { SpeciesDetail, SpeciesPhase } from './species-record';
import { TemperatureTable } from './temperature-table';
import { WatchButton } from './watch-button';

type SpeciesState =
  | { readonly state: 'loading' }
  | { readonly state: 'ok'; readonly species: SpeciesDetail }
  | { readonly state: 'not-found' }
  | { readonly state: 'failed'; readonly message: string };

/**
 * One species: identity, then per phase its values with provenance, curves against temperature
 * and a configurable temperature table. Release and phase are query parameters, so the page a
 * reader cites is the page others open.
 */
@Component({
  selector: 'kx-species-page',
  imports: [
    EmptyState,
    ErrorState,
    Formula,
    LoadingIndicator,
    MatButtonModule,
    MatButtonToggleModule,
    PhaseValues,
    PropertyPlots,
    ReleasePicker,
    RouterLink,
    TemperatureTable,
    UnitSelector,
    WatchButton,
  ],
  templateUrl: './species-page.html',
  styleUrl: './species-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class SpeciesPage {
  private readonly api = inject(SpeciesApi);
  private readonly router = inject(Router);
  private readonly preferences = inject(PreferencesService);
  private readonly route = inject(ActivatedRoute);
  private readonly title = inject(Title);
  private readonly origin = inject(DOCUMENT).location.origin;
  private readonly retries = new Subject<void>();

  /** Route parameter. */
  readonly id = input.required<string>();
  // Query parameters.
  readonly release = input<string>();
  readonly phase = input<string>();
  readonly polymorph = input<string>();

  protected readonly loaded = toSignal(
    combineLatest([toObservable(computed(() => ({ id: this.id(), release: this.release() ?? '' }))), this.retries.pipe(startWith(undefined))]).pipe(
      switchMap(([{ id, release }]) =>
        this.api.detail(id, release).pipe(
          map((species): SpeciesState => ({ state: 'ok', species })),
          catchError((error: unknown) =>
            of<SpeciesState>(
              error instanceof HttpErrorResponse && error.status === 404
                ? { state: 'not-found' }
                : { state: 'failed', message: error instanceof HttpErrorResponse ? describeHttpError(error) : 'unexpected error' },
            ),
          ),
          startWith<SpeciesState>({ state: 'loading' }),
        ),
      ),
    ),
    { initialValue: { state: 'loading' } as SpeciesState },
  );
  protected readonly species = computed(() => {
    const loaded = this.loaded();
    return loaded.state === 'ok' ? loaded.species : null;
  });
  protected readonly failure = computed(() => {
    const loaded = this.loaded();
    return loaded.state === 'failed' ? loaded.message : '';
  });

  protected readonly phaseChoices = computed(() =>
    (this.species()?.phases ?? []).map((phase, index) => ({
      index,
      phase,
      label: describePhase(phase.phase, phase.polymorph),
    })),
  );
  /** The phase named in the URL, or the first one. */
  protected readonly selectedIndex = computed(() => {
    const phases = this.species()?.phases ?? [];
    const found = phases.findIndex(
      (phase) => phase.phase === this.phase() && (this.polymorph() === undefined || (phase.polymorph ?? '') === this.polymorph()),
    );
    return Math.max(0, found);
  });
  protected readonly selectedPhase = computed<SpeciesPhase | null>(() => this.species()?.phases[this.selectedIndex()] ?? null);
  protected readonly selectedPhaseLabel = computed(() => {
    const phase = this.selectedPhase();
    return phase ? describePhase(phase.phase, phase.polymorph) : null;
  });

  /** Starts from the reader's preference; changing it here changes this view only. */
  protected readonly unit = linkedSignal<MolarEnergyUnit>(() => this.preferences.energyUnit());

  protected readonly releases = toSignal(
    inject(ReleasesService)
      .list()
      .pipe(catchError(() => of<readonly ReleaseSummary[]>([]))),
    { initialValue: [] as readonly ReleaseSummary[] },
  );

  /** This page pinned to the release and phase shown, for citations. */
  protected readonly pinnedUrl = computed(() => {
    const species = this.species();
    const phase = this.selectedPhase();
    if (!species || !phase) {
      return '';
    }
    const tree = this.router.createUrlTree(['/species', species.id], {
      queryParams: { release: species.release, phase: phase.phase, polymorph: phase.polymorph || null },
    });
    return this.origin + this.router.serializeUrl(tree);
  });

  protected readonly identifiers = computed(() => {
    const species = this.species();
    if (!species) {
      return [];
    }
    const ids = species.identifiers;
    return [
      { term: 'Hill formula', value: species.hillFormula, code: false },
      { term: 'Molar mass', value: `${species.molarMass.toFixed(4)} g/mol`, code: false },
      { term: 'Charge', value: species.charge === 0 ? 'neutral' : String(species.charge), code: false },
      { term: 'CAS RN', value: ids.casRn, code: true },
      { term: 'InChIKey', value: ids.inchiKey, code: true },
      { term: 'InChI', value: ids.inchi, code: true },
      { term: 'SMILES', value: ids.smiles, code: true },
      { term: 'Other names', value: species.synonyms.join('; '), code: false },
    ].filter((entry) => !!entry.value);
  });

  constructor() {
    effect(() => {
      const species = this.species();
      if (species) {
        this.title.setTitle(`${species.name} (${species.formula}) · Kelvindex`);
      }
    });
  }

  protected choosePhase(index: number): void {
    const phase = this.species()?.phases[index];
    if (phase) {
      this.navigate({ phase: phase.phase, polymorph: phase.polymorph || null });
    }
  }

  protected chooseRelease(release: string | null): void {
    this.navigate({ release });
  }

  protected retry(): void {
    this.retries.next();
  }

  private navigate(change: Record<string, string | null>): void {
    void this.router.navigate([], { relativeTo: this.route, queryParams: change, queryParamsHandling: 'merge', replaceUrl: true });
  }
}
