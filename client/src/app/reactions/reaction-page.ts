import { HttpErrorResponse } from '@angular/common/http';
import { ChangeDetectionStrategy, Component, computed, effect, inject, input, linkedSignal, signal, untracked } from '@angular/core';
import { toObservable, toSignal } from '@angular/core/rxjs-interop';
import { FormControl, FormGroup, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MatTableModule } from '@angular/material/table';
import { ActivatedRoute, Router, RouterLink } from '@angular/router';
import { Observable, Subject, catchError, combineLatest, debounceTime, distinctUntilChanged, map, of, startWith, switchMap } from 'rxjs';

import { describeHttpError } from '../core/api-error';
import { AuthService } from '../core/auth';
import { PreferencesService } from '../core/preferences';
import { CautionNotice } from '../shared/caution-notice/caution-notice';
import { ErrorState } from '../shared/error-state/error-state';
import { Formula } from '../shared/formula/formula';
import { LineChart } from '../shared/line-chart/line-chart';
import { ChartMarker, ChartSeries } from '../shared/line-chart/line-chart-data';
import { LoadingIndicator } from '../shared/loading-indicator/loading-indicator';
import { Quantity } from '../shared/quantity/quantity';
import { SavedReactionsService } from '../shared/saved-reactions/saved-reactions';
import { MAX_TEMPERATURES, REFERENCE_TEMPERATURE, temperatureList, temperatureRangeRules } from '../shared/temperatures/temperature-list';
import { MolarEnergyUnit } from '../shared/unit-selector/molar-energy-unit';
import { UnitSelector } from '../shared/unit-selector/unit-selector';
import { AdiabaticRiseForm } from './adiabatic-rise-form';
import { equilibriumConstantText, showReactionQuantity } from './reaction-display';
import { ReactionEvaluation, ReactionTerm, ReactionsApi, SpeciesProblems, speciesProblems } from './reactions-api';

/** Live checking waits this long after the last key. */
export const EQUATION_CHECK_DEBOUNCE_MS = 400;
const DEFAULT_T_MIN = REFERENCE_TEMPERATURE;
const DEFAULT_T_MAX = 1500;
const DEFAULT_T_STEP = 100;

/** What live checking says about the equation being typed. */
export type EquationCheck =
  | { readonly state: 'idle' }
  | { readonly state: 'checking' }
  | {
      readonly state: 'checked';
      readonly equation: string;
      readonly terms: readonly (ReactionTerm & { readonly name?: string })[];
      readonly problems: SpeciesProblems | null;
    }
  | { readonly state: 'unbalanced'; readonly message: string };

type Evaluation =
  | { readonly state: 'idle' }
  | { readonly state: 'loading' }
  | { readonly state: 'ok'; readonly evaluation: ReactionEvaluation }
  | { readonly state: 'problems'; readonly problems: SpeciesProblems }
  | { readonly state: 'failed'; readonly message: string };

interface ReactionRequest {
  readonly equation: string;
  readonly tMin: number;
  readonly tMax: number;
  readonly tStep: number;
  readonly release: string;
}

/**
 * Reaction thermochemistry over a temperature range: an equation checked as it is typed, then
 * ΔrH°, ΔrS°, ΔrG°, K and log₁₀ K with uncertainties, plots of ΔrG° and log₁₀ K, the adiabatic
 * rise estimate and saving to the account. The evaluated reaction lives in the URL.
 */
@Component({
  selector: 'kx-reaction-page',
  imports: [
    AdiabaticRiseForm,
    CautionNotice,
    ErrorState,
    Formula,
    LineChart,
    LoadingIndicator,
    MatButtonModule,
    MatFormFieldModule,
    MatInputModule,
    MatTableModule,
    Quantity,
    ReactiveFormsModule,
    RouterLink,
    UnitSelector,
  ],
  templateUrl: './reaction-page.html',
  styleUrl: './reaction-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ReactionPage {
  private readonly api = inject(ReactionsApi);
  private readonly router = inject(Router);
  private readonly preferences = inject(PreferencesService);
  private readonly route = inject(ActivatedRoute);
  private readonly auth = inject(AuthService);
  private readonly savedReactions = inject(SavedReactionsService);
  private readonly reruns = new Subject<void>();

  // Query parameters.
  readonly equation = input<string>();
  readonly tMin = input<string>();
  readonly tMax = input<string>();
  readonly tStep = input<string>();
  readonly release = input<string>();

  protected readonly form = new FormGroup(
    {
      equation: new FormControl('', { nonNullable: true, validators: [Validators.required] }),
      tMin: new FormControl(DEFAULT_T_MIN, { nonNullable: true, validators: [Validators.required, Validators.min(0.01)] }),
      tMax: new FormControl(DEFAULT_T_MAX, { nonNullable: true, validators: [Validators.required, Validators.min(0.01)] }),
      tStep: new FormControl(DEFAULT_T_STEP, { nonNullable: true, validators: [Validators.required, Validators.min(0.01)] }),
    },
    { validators: temperatureRangeRules },
  );
  protected readonly saveForm = new FormGroup({
    name: new FormControl('', { nonNullable: true, validators: [Validators.required, Validators.maxLength(120)] }),
  });
  protected readonly signedIn = this.auth.isSignedIn;
  protected readonly unit = linkedSignal<MolarEnergyUnit>(() => this.preferences.energyUnit());
  protected readonly saveState = signal<{ state: 'idle' | 'saving' | 'saved' } | { state: 'failed'; message: string }>({ state: 'idle' });
  protected readonly columns = ['T', 'deltaH', 'deltaS', 'deltaG', 'K', 'log10K', 'favouredBy'];

  /** The reaction the URL asks for; nothing to evaluate without an equation. */
  protected readonly request = computed<ReactionRequest | null>(() => {
    const equation = (this.equation() ?? '').trim();
    if (!equation) {
      return null;
    }
    return {
      equation,
      tMin: positive(this.tMin(), DEFAULT_T_MIN),
      tMax: positive(this.tMax(), DEFAULT_T_MAX),
      tStep: positive(this.tStep(), DEFAULT_T_STEP),
      release: this.release() ?? '',
    };
  });

  protected readonly check = toSignal(this.liveCheck(), { initialValue: { state: 'idle' } as EquationCheck });

  protected readonly outcome = toSignal(
    combineLatest([toObservable(this.request), this.reruns.pipe(startWith(undefined))]).pipe(
      switchMap(([request]) => (request === null ? of<Evaluation>({ state: 'idle' }) : this.evaluate(request))),
    ),
    { initialValue: { state: 'idle' } as Evaluation },
  );
  protected readonly evaluation = computed(() => {
    const outcome = this.outcome();
    return outcome.state === 'ok' ? outcome.evaluation : null;
  });
  protected readonly problems = computed(() => {
    const outcome = this.outcome();
    return outcome.state === 'problems' ? outcome.problems : null;
  });
  protected readonly failure = computed(() => {
    const outcome = this.outcome();
    return outcome.state === 'failed' ? outcome.message : '';
  });
  protected readonly checked = computed(() => {
    const check = this.check();
    return check.state === 'checked' ? check : null;
  });
  protected readonly unbalancedMessage = computed(() => {
    const check = this.check();
    return check.state === 'unbalanced' ? check.message : '';
  });
  protected readonly saveFailure = computed(() => {
    const state = this.saveState();
    return state.state === 'failed' ? state.message : '';
  });

  protected readonly rows = computed(() => {
    const evaluation = this.evaluation();
    const unit = this.unit();
    return (evaluation?.results ?? []).map((result) => ({
      T: result.T,
      deltaH: showReactionQuantity(result.deltaH, 'kJ/mol', unit),
      deltaS: showReactionQuantity(result.deltaS, 'J/(mol·K)', unit),
      deltaG: showReactionQuantity(result.deltaG, 'kJ/mol', unit),
      K: equilibriumConstantText(result.K),
      log10K: result.log10K,
      favouredBy: result.favouredBy,
    }));
  });
  protected readonly energyUnit = computed(() => this.unit());
  protected readonly entropyUnit = computed(() => this.rows()[0]?.deltaS.unit ?? 'J/(mol·K)');
  protected readonly summary = computed(() => {
    const outcome = this.outcome();
    switch (outcome.state) {
      case 'loading':
        return 'Evaluating the reaction…';
      case 'ok': {
        const results = outcome.evaluation.results;
        const crossover = outcome.evaluation.crossoverT;
        return (
          `Evaluated at ${results.length} temperatures from ${results[0]?.T} K to ${results.at(-1)?.T} K with release ${outcome.evaluation.release}. ` +
          (crossover !== null ? `ΔrG° changes sign at ${crossover.toFixed(1)} K.` : 'ΔrG° keeps its sign over this range.')
        );
      }
      case 'problems':
        return outcome.problems.message;
      case 'failed':
        return outcome.message;
      default:
        return '';
    }
  });
  protected readonly markers = computed<ChartMarker[]>(() => {
    const crossover = this.evaluation()?.crossoverT;
    return crossover == null ? [] : [{ x: crossover, label: `ΔrG° = 0 at ${crossover.toFixed(0)} K` }];
  });
  protected readonly gibbsSeries = computed<ChartSeries[]>(() => [
    { label: 'ΔrG°', points: this.rows().map((row) => ({ x: row.T, y: row.deltaG.value })) },
  ]);
  protected readonly log10KSeries = computed<ChartSeries[]>(() => [
    { label: 'log₁₀ K', points: this.rows().map((row) => ({ x: row.T, y: row.log10K.value })) },
  ]);
  protected readonly returnUrl = computed(() => {
    const request = this.request();
    const tree = this.router.createUrlTree(['/reactions'], { queryParams: request ? queryParamsOf(request) : {} });
    return this.router.serializeUrl(tree);
  });

  constructor() {
    // The URL is the truth: show the reaction it names in the form.
    effect(() => {
      const request = this.request();
      untracked(() => {
        if (request) {
          this.form.setValue({ equation: request.equation, tMin: request.tMin, tMax: request.tMax, tStep: request.tStep });
          this.saveForm.setValue({ name: request.equation.slice(0, 120) });
        }
        this.saveState.set({ state: 'idle' });
      });
    });
  }

  /** Puts the form's reaction in the URL, which evaluates it (again, if unchanged). */
  protected evaluateReaction(): void {
    if (this.form.invalid) {
      this.form.markAllAsTouched();
      return;
    }
    const value = this.form.getRawValue();
    const next: ReactionRequest = { ...value, equation: value.equation.trim(), release: this.release() ?? '' };
    const current = this.request();
    if (current && JSON.stringify(queryParamsOf(current)) === JSON.stringify(queryParamsOf(next))) {
      this.reruns.next();
      return;
    }
    void this.router.navigate([], { relativeTo: this.route, queryParams: queryParamsOf(next), replaceUrl: true });
  }

  protected saveReaction(): void {
    const request = this.request();
    if (!request || this.saveForm.invalid) {
      this.saveForm.markAllAsTouched();
      return;
    }
    this.saveState.set({ state: 'saving' });
    this.savedReactions
      .save({ name: this.saveForm.getRawValue().name.trim(), equation: request.equation, tMin: request.tMin, tMax: request.tMax })
      .subscribe({
        next: () => this.saveState.set({ state: 'saved' }),
        error: (error: unknown) =>
          this.saveState.set({ state: 'failed', message: error instanceof HttpErrorResponse ? describeHttpError(error) : 'Not saved.' }),
      });
  }

  protected retry(): void {
    this.reruns.next();
  }

  private evaluate(request: ReactionRequest): Observable<Evaluation> {
    const temperatures = temperatureList(request.tMin, request.tMax, request.tStep).slice(0, MAX_TEMPERATURES);
    return this.api.evaluate(request.equation, temperatures, request.release).pipe(
      map((evaluation): Evaluation => ({ state: 'ok', evaluation })),
      catchError((error: unknown) => {
        const problems = speciesProblems(error);
        return of<Evaluation>(
          problems
            ? { state: 'problems', problems }
            : { state: 'failed', message: error instanceof HttpErrorResponse ? describeHttpError(error) : 'The evaluation failed.' },
        );
      }),
      startWith<Evaluation>({ state: 'loading' }),
    );
  }

  /**
   * Balances the equation as it is typed, then checks its species exist in the release (a quick
   * evaluation at 298.15 K), cancelling the checks of text typed since.
   */
  private liveCheck(): Observable<EquationCheck> {
    return this.form.controls.equation.valueChanges.pipe(
      debounceTime(EQUATION_CHECK_DEBOUNCE_MS),
      map((text) => text.trim()),
      distinctUntilChanged(),
      switchMap((text) => {
        if (!text) {
          return of<EquationCheck>({ state: 'idle' });
        }
        return this.api.balance(text).pipe(
          switchMap((balanced) =>
            this.api.evaluate(balanced.equation, [REFERENCE_TEMPERATURE], this.release() ?? '').pipe(
              map((evaluation): EquationCheck => ({ state: 'checked', equation: balanced.equation, terms: evaluation.species, problems: null })),
              catchError((error: unknown) =>
                of<EquationCheck>({ state: 'checked', equation: balanced.equation, terms: balanced.species, problems: speciesProblems(error) }),
              ),
            ),
          ),
          catchError((error: unknown) =>
            of<EquationCheck>({
              state: 'unbalanced',
              message: error instanceof HttpErrorResponse ? describeHttpError(error) : 'The equation could not be read.',
            }),
          ),
          startWith<EquationCheck>({ state: 'checking' }),
        );
      }),
    );
  }
}

function queryParamsOf(request: ReactionRequest): Record<string, string | null> {
  return {
    equation: request.equation,
    tMin: String(request.tMin),
    tMax: String(request.tMax),
    tStep: request.tStep !== DEFAULT_T_STEP ? String(request.tStep) : null,
    release: request.release || null,
  };
}

function positive(text: string | undefined, fallback: number): number {
  const value = Number(text);
  return text !== undefined && Number.isFinite(value) && value > 0 ? value : fallback;
}
