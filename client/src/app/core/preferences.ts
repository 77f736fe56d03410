import { HttpClient } from '@angular/common/http';
import { Injectable, inject, signal } from '@angular/core';
import { takeUntilDestroyed, toObservable } from '@angular/core/rxjs-interop';
import { EMPTY, Observable, catchError, map, switchMap, tap } from 'rxjs';

import { MolarEnergyUnit } from '../shared/unit-selector/molar-energy-unit';
import { API_BASE_URL } from './api-base-url';
import { AuthService } from './auth';

/** How the API names the energy unit: kJ (kJ/mol, J/(mol·K)) or kcal (kcal/mol, cal/(mol·K)). */
export type EnergyUnitPreference = 'kJ' | 'kcal';

export interface Preferences {
  readonly energyUnit: EnergyUnitPreference;
}

export function molarEnergyUnitOf(preference: EnergyUnitPreference): MolarEnergyUnit {
  return preference === 'kcal' ? 'kcal/mol' : 'kJ/mol';
}

export function preferenceOf(unit: MolarEnergyUnit): EnergyUnitPreference {
  return unit === 'kcal/mol' ? 'kcal' : 'kJ';
}

/**
 * The signed-in reader's display preferences, loaded when they sign in; anonymous readers get
 * the SI-friendly default (kJ/mol). Pages start from these and may change units for one view.
 */
@Injectable({ providedIn: 'root' })
export class PreferencesService {
  private readonly http = inject(HttpClient);
  private readonly auth = inject(AuthService);
  private readonly url = `${inject(API_BASE_URL)}/me/preferences`;
  private readonly unit = signal<MolarEnergyUnit>('kJ/mol');

  /** The preferred unit of molar energies, as the unit selector names it. */
  readonly energyUnit = this.unit.asReadonly();

  constructor() {
    toObservable(this.auth.user)
      .pipe(
        switchMap((user) => {
          if (user === null) {
            this.unit.set('kJ/mol');
            return EMPTY;
          }
          return this.http.get<Preferences>(this.url).pipe(catchError(() => EMPTY));
        }),
        takeUntilDestroyed(),
      )
      .subscribe((preferences) => this.unit.set(molarEnergyUnitOf(preferences.energyUnit)));
  }

  /** Stores the preferred unit in the account (signed in only). */
  saveEnergyUnit(unit: MolarEnergyUnit): Observable<void> {
    const body: Preferences = { energyUnit: preferenceOf(unit) };
    return this.http.put<unknown>(this.url, body).pipe(
      tap(() => this.unit.set(unit)),
      map(() => undefined),
    );
  }
}
