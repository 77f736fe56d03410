import { HttpErrorResponse } from '@angular/common/http';
import { ChangeDetectionStrategy, Component, computed, effect, inject, input, untracked } from '@angular/core';
import { takeUntilDestroyed, toObservable, toSignal } from '@angular/core/rxjs-interop';
import { AbstractControl, FormControl, FormGroup, ReactiveFormsModule, ValidationErrors } from '@angular/forms';
import { MatAutocompleteModule } from '@angular/material/autocomplete';
import { MatButtonModule } from '@angular/material/button';
import { MatButtonToggleModule } from '@angular/material/button-toggle';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MatPaginatorModule, PageEvent } from '@angular/material/paginator';
import { MatSelectModule } from '@angular/material/select';
import { MatSortModule, Sort, SortDirection } from '@angular/material/sort';
import { MatTableModule } from '@angular/material/table';
import { ActivatedRoute, Router, RouterLink } from '@angular/router';
import {
  Observable,
  Subject,
  catchError,
  combineLatest,
  debounceTime,
  distinctUntilChanged,
  filter,
  map,
  merge,
  of,
  startWith,
  switchMap,
} from 'rxjs';

import { describeHttpError } from '../core/api-error';
import { ReleasesService } from '../core/releases';
import { EmptyState } from '../shared/empty-state/empty-state';
import { ErrorState } from '../shared/error-state/error-state';
import { Formula } from '../shared/formula/formula';
import { LoadingIndicator } from '../shared/loading-indicator/loading-indicator';
import { PhaseBadge } from '../shared/phase-badge/phase-badge';
import { describePhase } from '../shared/phase-badge/phase';
import { ReleasePicker } from '../shared/release-picker/release-picker';
import { ReleaseSummary } from '../shared/release-picker/release-summary';
import {
  DEFAULT_QUERY,
  ElementsMode,
  SpeciesPage,
  SpeciesQuery,
  SpeciesSearchService,
  SpeciesSort,
  SpeciesSummary,
  normaliseElements,
} from './species-search';

type SearchResult =
  | { readonly state: 'loading' }
  | { readonly state: 'ok'; readonly page: SpeciesPage }
  | { readonly state: 'failed'; readonly message: string };

interface Suggestions {
  readonly text: string;
  readonly items: readonly SpeciesSummary[];
  readonly failed: boolean;
}

const NO_SUGGESTIONS: Suggestions = { text: '', items: [], failed: false };
const SORTS: readonly SpeciesSort[] = ['name', '-name', 'formula', '-formula', 'molarMass', '-molarMass'];
const PAGE_SIZES = [10, 25, 50, 100] as const;
/** Typeahead waits this long after the last key before asking the API. */
export const TYPEAHEAD_DEBOUNCE_MS = 250;

export const PHASE_FILTERS: readonly string[] = ['g', 'l', 'cr', 'am', 'aq', 'aq,inf'];
export const QUANTITY_FILTERS: readonly { readonly value: string; readonly label: string }[] = [
  { value: 'dfH', label: 'ΔfH°, enthalpy of formation' },
  { value: 'S', label: 'S°, standard molar entropy' },
  { value: 'Cp', label: 'Cp°, heat capacity' },
  { value: 'dfG', label: 'ΔfG°, Gibbs energy of formation' },
  { value: 'dtrsH', label: 'ΔtrsH, transition enthalpy' },
];

/**
 * Public species search: one box for formulas, names and identifiers (with typeahead), filters,
 * and a sortable, paged table. The whole search lives in the URL's query parameters, which
 * arrive here as inputs, so every search is a link an engineer can share.
 */
@Component({
  selector: 'kx-search-page',
  imports: [
    EmptyState,
    ErrorState,
    Formula,
    LoadingIndicator,
    MatAutocompleteModule,
    MatButtonModule,
    MatButtonToggleModule,
    MatFormFieldModule,
    MatInputModule,
    MatPaginatorModule,
    MatSelectModule,
    MatSortModule,
    MatTableModule,
    PhaseBadge,
    ReactiveFormsModule,
    ReleasePicker,
    RouterLink,
  ],
  templateUrl: './search-page.html',
  styleUrl: './search-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class SearchPage {
  private readonly router = inject(Router);
  private readonly route = inject(ActivatedRoute);
  private readonly search = inject(SpeciesSearchService);
  private readonly retries = new Subject<void>();

  // Query parameters, bound by withComponentInputBinding().
  readonly q = input<string>();
  readonly elements = input<string>();
  readonly elementsMode = input<string>();
  readonly phase = input<string>();
  readonly quantity = input<string>();
  readonly release = input<string>();
  readonly sort = input<string>();
  readonly page = input<string>();
  readonly pageSize = input<string>();

  protected readonly phaseFilters = PHASE_FILTERS.map((code) => ({ code, label: describePhase(code).label }));
  protected readonly quantityFilters = QUANTITY_FILTERS;
  protected readonly pageSizes = PAGE_SIZES;
  protected readonly columns = ['name', 'formula', 'phases', 'molarMass'];

  protected readonly form = new FormGroup({
    q: new FormControl<string | SpeciesSummary>('', { nonNullable: true }),
    elements: new FormControl('', { nonNullable: true, validators: [elementSymbols] }),
    elementsMode: new FormControl<ElementsMode>('contains', { nonNullable: true }),
    phase: new FormControl('', { nonNullable: true }),
    quantity: new FormControl('', { nonNullable: true }),
  });

  /** The search the URL describes, with anything unreadable replaced by its default. */
  protected readonly query = computed<SpeciesQuery>(() => {
    const sort = this.sort() as SpeciesSort;
    const pageSize = Number(this.pageSize());
    return {
      q: this.q() ?? '',
      elements: normaliseElements(this.elements() ?? '') ?? '',
      elementsMode: this.elementsMode() === 'only' ? 'only' : 'contains',
      phase: this.phase() ?? '',
      quantity: this.quantity() ?? '',
      release: this.release() ?? '',
      sort: SORTS.includes(sort) ? sort : DEFAULT_QUERY.sort,
      page: Math.max(1, Math.floor(Number(this.page())) || 1),
      pageSize: (PAGE_SIZES as readonly number[]).includes(pageSize) ? pageSize : DEFAULT_QUERY.pageSize,
    };
  });

  protected readonly result = toSignal(
    combineLatest([toObservable(this.query), this.retries.pipe(startWith(undefined))]).pipe(
      switchMap(([query]) =>
        this.search.find(query).pipe(
          map((page): SearchResult => ({ state: 'ok', page })),
          catchError((error: unknown) => of<SearchResult>({ state: 'failed', message: messageOf(error) })),
          startWith<SearchResult>({ state: 'loading' }),
        ),
      ),
    ),
    { initialValue: { state: 'loading' } as SearchResult },
  );
  protected readonly resultPage = computed(() => {
    const result = this.result();
    return result.state === 'ok' ? result.page : null;
  });
  protected readonly failure = computed(() => {
    const result = this.result();
    return result.state === 'failed' ? result.message : '';
  });
  protected readonly summary = computed(() => {
    const page = this.resultPage();
    if (page === null) {
      return this.result().state === 'loading' ? 'Searching…' : '';
    }
    if (page.total === 0) {
      return 'No species match.';
    }
    const first = (page.page - 1) * page.pageSize + 1;
    const last = first + page.items.length - 1;
    const noun = page.total === 1 ? 'species matches' : 'species match';
    return `${page.total} ${noun} in release ${page.release}; showing ${first}–${last}.`;
  });
  protected readonly sortActive = computed(() => this.query().sort.replace(/^-/, ''));
  protected readonly sortDirection = computed<SortDirection>(() => (this.query().sort.startsWith('-') ? 'desc' : 'asc'));
  protected readonly exportCsv = computed(() => this.search.exportUrl(this.query(), 'csv'));
  protected readonly exportJson = computed(() => this.search.exportUrl(this.query(), 'json'));

  protected readonly releases = toSignal(
    inject(ReleasesService)
      .list()
      .pipe(catchError(() => of<readonly ReleaseSummary[]>([]))),
    { initialValue: [] as readonly ReleaseSummary[] },
  );

  protected readonly suggestions = toSignal(this.typeahead(), { initialValue: NO_SUGGESTIONS });

  constructor() {
    // The URL is the truth: show what it says in the form, without echoing it back.
    effect(() => {
      const query = this.query();
      untracked(() =>
        this.form.setValue(
          {
            q: query.q,
            elements: query.elements.split(',').filter(Boolean).join(', '),
            elementsMode: query.elementsMode,
            phase: query.phase,
            quantity: query.quantity,
          },
          { emitEvent: false },
        ),
      );
    });

    const controls = this.form.controls;
    merge(
      controls.elementsMode.valueChanges,
      controls.phase.valueChanges,
      controls.quantity.valueChanges,
      controls.elements.valueChanges.pipe(
        debounceTime(400),
        filter((text) => normaliseElements(text) !== null),
      ),
    )
      .pipe(takeUntilDestroyed())
      .subscribe(() => this.applySearch());
  }

  /** Runs the search in the form: the box text and every filter, from the first page. */
  protected applySearch(): void {
    const value = this.form.getRawValue();
    const elements = normaliseElements(value.elements);
    if (elements === null) {
      this.form.controls.elements.markAsTouched();
      return;
    }
    this.navigate({
      q: typeof value.q === 'string' ? value.q.trim() : value.q.formula,
      elements,
      elementsMode: value.elementsMode,
      phase: value.phase,
      quantity: value.quantity,
      page: 1,
    });
  }

  protected applyRelease(release: string | null): void {
    this.navigate({ release: release ?? '', page: 1 });
  }

  protected applySort(sort: Sort): void {
    const column = sort.active as 'name' | 'formula' | 'molarMass';
    this.navigate({ sort: (sort.direction === 'desc' ? `-${column}` : column) as SpeciesSort, page: 1 });
  }

  protected applyPage(event: PageEvent): void {
    this.navigate({ page: event.pageIndex + 1, pageSize: event.pageSize });
  }

  protected retry(): void {
    this.retries.next();
  }

  protected openSuggestion(species: SpeciesSummary): void {
    void this.router.navigate(['/species', species.id], {
      queryParams: { release: this.query().release || null },
    });
  }

  protected displaySuggestion(value: string | SpeciesSummary | null): string {
    return typeof value === 'string' || value === null ? (value ?? '') : value.formula;
  }

  private navigate(change: Partial<SpeciesQuery>): void {
    const next = { ...this.query(), ...change };
    void this.router.navigate([], {
      relativeTo: this.route,
      replaceUrl: true,
      // Defaults are left out (null removes a parameter), so links stay short.
      queryParams: {
        q: next.q || null,
        elements: next.elements || null,
        elementsMode: next.elements && next.elementsMode !== 'contains' ? next.elementsMode : null,
        phase: next.phase || null,
        quantity: next.quantity || null,
        release: next.release || null,
        sort: next.sort !== DEFAULT_QUERY.sort ? next.sort : null,
        page: next.page > 1 ? next.page : null,
        pageSize: next.pageSize !== DEFAULT_QUERY.pageSize ? next.pageSize : null,
      },
    });
  }

  /** Suggestions for the text being typed: debounced, and each new text cancels the last request. */
  private typeahead(): Observable<Suggestions> {
    return this.form.controls.q.valueChanges.pipe(
      filter((value): value is string => typeof value === 'string'),
      debounceTime(TYPEAHEAD_DEBOUNCE_MS),
      map((text) => text.trim()),
      distinctUntilChanged(),
      switchMap((text) =>
        text.length < 2
          ? of(NO_SUGGESTIONS)
          : this.search.suggest(text, this.query().release).pipe(
              map((items): Suggestions => ({ text, items, failed: false })),
              catchError(() => of<Suggestions>({ text, items: [], failed: true })),
            ),
      ),
    );
  }
}

function messageOf(error: unknown): string {
  return error instanceof HttpErrorResponse ? describeHttpError(error) : 'The search failed unexpectedly.';
}

function elementSymbols(control: AbstractControl<string>): ValidationErrors | null {
  return normaliseElements(control.value) === null ? { elements: true } : null;
}
