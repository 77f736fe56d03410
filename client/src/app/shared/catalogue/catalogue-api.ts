import { HttpClient, HttpContext, HttpParams } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import { Observable, map } from 'rxjs';

import { REPORT_HTTP_ERRORS } from '../../core/api-error-interceptor';
import { API_BASE_URL } from '../../core/api-base-url';
import { FitForm, QuantityCode, TransitionKind, UncertaintyKind, ValueMethod } from '../vocabulary/thermo-vocabulary';

/** A species as the search lists it, with the phases it holds data for in the release. */
export interface SpeciesMatch {
  readonly id: string;
  readonly formula: string;
  readonly hillFormula: string;
  readonly name: string;
  readonly charge: number;
  readonly phases: readonly { readonly phase: string; readonly polymorph: string | null }[];
}

export interface CatalogueSource {
  readonly id: string;
  readonly key: string;
  readonly citation: string;
  readonly doi: string | null;
}

/** A value as a release holds it, in SI (J/mol or J/(mol·K)). */
export interface CatalogueValue {
  readonly id: string;
  readonly lineageId: string;
  readonly versionNo: number;
  readonly value: number;
  readonly uncertainty: number | null;
  readonly uncertaintyKind: UncertaintyKind | null;
  readonly coverageFactor: number | null;
  readonly unit: string;
  readonly temperature: number;
  readonly pressure: number;
  readonly method: ValueMethod;
  readonly methodDetail: string | null;
  readonly source: CatalogueSource;
}

export interface CatalogueQuantity {
  readonly quantity: QuantityCode;
  readonly symbol: string;
  readonly unit: string;
  readonly transitionKind: TransitionKind | null;
  readonly recommended: CatalogueValue | null;
  readonly alternatives: readonly CatalogueValue[];
}

/** A heat-capacity fit with its ranges as stored (see api/src/values/fit-ranges.ts). */
export interface CatalogueFit {
  readonly id: string;
  readonly form: FitForm;
  readonly tMin: number;
  readonly tMax: number;
  readonly ranges: readonly FitRangeData[];
  readonly source: CatalogueSource;
  readonly recommended: boolean;
}

export type FitRangeData =
  | { readonly tMin: number; readonly tMax: number; readonly coefficients: readonly number[] }
  | { readonly tMin: number; readonly tMax: number; readonly points: readonly (readonly [number, number])[] };

export interface CataloguePhase {
  readonly phase: string;
  readonly polymorph: string | null;
  readonly quantities: readonly CatalogueQuantity[];
  readonly fits: readonly CatalogueFit[];
}

export interface CatalogueSpecies {
  readonly id: string;
  readonly formula: string;
  readonly name: string;
  readonly release: string;
  readonly phases: readonly CataloguePhase[];
}

/** Every value of a phase and quantity in a release, the recommended one first. */
export function valuesOf(quantity: CatalogueQuantity | undefined): CatalogueValue[] {
  if (!quantity) {
    return [];
  }
  return quantity.recommended ? [quantity.recommended, ...quantity.alternatives] : [...quantity.alternatives];
}

/** The phase of a species' record, matched by code and polymorph. */
export function findPhase(species: CatalogueSpecies, phase: string, polymorph: string | null): CataloguePhase | undefined {
  return species.phases.find((p) => p.phase === phase && (p.polymorph ?? null) === (polymorph ?? null));
}

/**
 * What the editorial screens read from the catalogue: species to pick (`GET /species?q=`) and a
 * species' values and fits in a release (`GET /species/{id}`), to compare a proposal with.
 */
@Injectable({ providedIn: 'root' })
export class CatalogueApi {
  private readonly http = inject(HttpClient);
  private readonly url = `${inject(API_BASE_URL)}/species`;

  /** A few matches for a picker; failures are shown by the picker itself. */
  searchSpecies(text: string, limit = 8): Observable<readonly SpeciesMatch[]> {
    const params = new HttpParams().set('q', text).set('pageSize', limit);
    return this.http
      .get<{ items: SpeciesMatch[] }>(this.url, { params, context: new HttpContext().set(REPORT_HTTP_ERRORS, false) })
      .pipe(map((page) => page.items));
  }

  /** A species as `release` holds it (the latest published one when empty); 404 when it holds nothing there. */
  species(id: string, release = ''): Observable<CatalogueSpecies> {
    const params = release ? new HttpParams().set('release', release) : new HttpParams();
    return this.http.get<CatalogueSpecies>(`${this.url}/${encodeURIComponent(id)}`, {
      params,
      context: new HttpContext().set(REPORT_HTTP_ERRORS, false),
    });
  }
}
