import { HttpErrorResponse } from '@angular/common/http';
import { ChangeDetectionStrategy, Component, computed, effect, inject, input, linkedSignal, untracked } from '@angular/core';
import { toObservable, toSignal } from '@angular/core/rxjs-interop';
import { FormControl, FormGroup, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatCheckboxModule } from '@angular/material/checkbox';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MatSelectModule } from '@angular/material/select';
import { MatTableModule } from '@angular/material/table';
import { catchError, map, of, startWith, switchMap } from 'rxjs';

import { describeHttpError } from '../core/api-error';
import { preferenceOf } from '../core/preferences';
import { LoadingIndicator } from '../shared/loading-indicator/loading-indicator';
import { describePhase } from '../shared/phase-badge/phase';
import { Quantity } from '../shared/quantity/quantity';
import { MAX_TEMPERATURES, REFERENCE_TEMPERATURE, temperatureList, temperatureRangeRules } from '../shared/temperatures/temperature-list';
import { MolarEnergyUnit } from '../shared/unit-selector/molar-energy-unit';
import { SpeciesApi } from './species-api';
import { PropertyKey, PropertyTable, SpeciesDetail, SpeciesPhase, fitRange } from './species-record';
import { ExportColumn, ExportContext, exportFileName, propertyRowsToCsv, propertyRowsToJson, saveTextFile } from './table-export';

export interface PropertyColumn {
  readonly key: PropertyKey;
  readonly header: string;
  readonly description: string;
}

/**
 * Kelvindex's own column order: the formation quantities an engineer feeds into reactions
 * first, then the caloric functions of the phase itself.
 */
export const PROPERTY_COLUMNS: readonly PropertyColumn[] = [
  { key: 'deltaFH', header: 'ΔfH°', description: 'enthalpy of formation' },
  { key: 'deltaFG', header: 'ΔfG°', description: 'Gibbs energy of formation' },
  { key: 'log10Kf', header: 'log₁₀ Kf', description: 'equilibrium constant of formation' },
  { key: 'Cp', header: 'Cp°', description: 'heat capacity' },
  { key: 'S', header: 'S°', description: 'entropy' },
  { key: 'HminusH298', header: 'H° − H°(298.15 K)', description: 'enthalpy increment' },
  { key: 'gibbsEnergyFunction', header: '−(G° − H°(298.15 K))/T', description: 'Gibbs energy function' },
];

export const DEFAULT_COLUMNS: readonly PropertyKey[] = ['deltaFH', 'deltaFG', 'log10Kf', 'Cp', 'S', 'HminusH298'];

/** Highest temperature the table opens with, K; readers can go to the end of the fit. */
const DEFAULT_T_MAX = 1500;
const DEFAULT_STEP = 100;

interface TableSettings {
  readonly tMin: number;
  readonly tMax: number;
  readonly tStep: number;
  readonly extrapolate: boolean;
}

type TableData =
  | { readonly state: 'loading' }
  | { readonly state: 'ready'; readonly table: PropertyTable }
  | { readonly state: 'failed'; readonly message: string };

/**
 * Properties of one phase at temperatures the reader chooses (range, step, units, columns),
 * exported as CSV or JSON exactly as shown.
 */
@Component({
  selector: 'kx-temperature-table',
  imports: [
    LoadingIndicator,
    MatButtonModule,
    MatCheckboxModule,
    MatFormFieldModule,
    MatInputModule,
    MatSelectModule,
    MatTableModule,
    Quantity,
    ReactiveFormsModule,
  ],
  templateUrl: './temperature-table.html',
  styleUrl: './temperature-table.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class TemperatureTable {
  private readonly api = inject(SpeciesApi);

  readonly species = input.required<SpeciesDetail>();
  readonly phase = input.required<SpeciesPhase>();
  readonly release = input('');
  readonly unit = input<MolarEnergyUnit>('kJ/mol');

  protected readonly columnChoices = PROPERTY_COLUMNS;
  protected readonly maxTemperatures = MAX_TEMPERATURES;
  protected readonly form = new FormGroup(
    {
      tMin: new FormControl(REFERENCE_TEMPERATURE, { nonNullable: true, validators: [Validators.required, Validators.min(0.01)] }),
      tMax: new FormControl(DEFAULT_T_MAX, { nonNullable: true, validators: [Validators.required, Validators.min(0.01)] }),
      tStep: new FormControl(DEFAULT_STEP, { nonNullable: true, validators: [Validators.required, Validators.min(0.01)] }),
      extrapolate: new FormControl(false, { nonNullable: true }),
    },
    { validators: temperatureRangeRules },
  );
  protected readonly columnsControl = new FormControl<PropertyKey[]>([...DEFAULT_COLUMNS], { nonNullable: true });

  /** The settings last applied; back to the defaults for each new phase. */
  private readonly settings = linkedSignal<TableSettings>(() => defaultSettings(this.phase()));
  private readonly chosenColumns = toSignal(this.columnsControl.valueChanges, { initialValue: [...DEFAULT_COLUMNS] });

  protected readonly data = toSignal(
    toObservable(
      computed(() => ({ id: this.species().id, phase: this.phase(), release: this.release(), unit: this.unit(), settings: this.settings() })),
    ).pipe(
      switchMap(({ id, phase, release, unit, settings }) =>
        this.api
          .properties(id, {
            phase,
            temperatures: temperatureList(settings.tMin, settings.tMax, settings.tStep),
            units: preferenceOf(unit),
            extrapolate: settings.extrapolate,
            release,
          })
          .pipe(
            map((table): TableData => ({ state: 'ready', table })),
            catchError((error: unknown) =>
              of<TableData>({ state: 'failed', message: error instanceof HttpErrorResponse ? describeHttpError(error) : 'unexpected error' }),
            ),
            startWith<TableData>({ state: 'loading' }),
          ),
      ),
    ),
    { initialValue: { state: 'loading' } as TableData },
  );

  protected readonly table = computed(() => {
    const data = this.data();
    return data.state === 'ready' ? data.table : null;
  });
  protected readonly failure = computed(() => {
    const data = this.data();
    return data.state === 'failed' ? data.message : '';
  });
  /** The chosen columns in Kelvindex's order, each with the unit the API answered in. */
  protected readonly shownColumns = computed<(PropertyColumn & { unit: string })[]>(() => {
    const chosen = new Set(this.chosenColumns());
    const rows = this.table()?.rows ?? [];
    return PROPERTY_COLUMNS.filter((column) => chosen.has(column.key)).map((column) => ({
      ...column,
      unit: rows.find((row) => row[column.key])?.[column.key]?.unit ?? '',
    }));
  });
  protected readonly displayedColumns = computed(() => ['T', ...this.shownColumns().map((column) => column.key)]);
  protected readonly hasExtrapolated = computed(() => this.table()?.rows.some((row) => row.extrapolated) ?? false);
  protected readonly summary = computed(() => {
    const table = this.table();
    if (table === null) {
      return this.data().state === 'loading' ? 'Calculating the table…' : '';
    }
    const rows = table.rows;
    if (rows.length === 0) {
      return 'No temperatures in this range.';
    }
    return `${rows.length} temperatures from ${rows[0].T} K to ${rows[rows.length - 1].T} K, in ${this.unit()}.`;
  });

  constructor() {
    effect(() => {
      const settings = this.settings();
      untracked(() => this.form.setValue(settings, { emitEvent: false }));
    });
  }

  protected applySettings(): void {
    if (this.form.invalid) {
      this.form.markAllAsTouched();
      return;
    }
    this.settings.set(this.form.getRawValue());
  }

  protected downloadCsv(): void {
    const table = this.table();
    if (table) {
      saveTextFile(exportFileName(this.exportContext(table), 'csv'), 'text/csv;charset=utf-8', propertyRowsToCsv(this.exportContext(table), this.exportColumns(), table.rows));
    }
  }

  protected downloadJson(): void {
    const table = this.table();
    if (table) {
      saveTextFile(exportFileName(this.exportContext(table), 'json'), 'application/json', propertyRowsToJson(this.exportContext(table), this.exportColumns(), table.rows));
    }
  }

  private exportContext(table: PropertyTable): ExportContext {
    return {
      formula: this.species().formula,
      name: this.species().name,
      phase: describePhase(this.phase().phase, this.phase().polymorph).abbreviation,
      release: table.release,
    };
  }

  private exportColumns(): ExportColumn[] {
    return this.shownColumns().map((column) => ({ key: column.key, header: column.header, unit: column.unit }));
  }
}

/** 298.15 K (or the fit's start) up to 1500 K (or the fit's end) every 100 K. */
function defaultSettings(phase: SpeciesPhase): TableSettings {
  const range = fitRange(phase);
  if (range === null) {
    return { tMin: REFERENCE_TEMPERATURE, tMax: REFERENCE_TEMPERATURE, tStep: DEFAULT_STEP, extrapolate: false };
  }
  const tMin = range.tMin <= REFERENCE_TEMPERATURE && REFERENCE_TEMPERATURE <= range.tMax ? REFERENCE_TEMPERATURE : range.tMin;
  return { tMin, tMax: Math.min(range.tMax, Math.max(DEFAULT_T_MAX, tMin)), tStep: DEFAULT_STEP, extrapolate: false };
}
