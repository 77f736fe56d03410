import { HttpClient, HttpContext, HttpParams } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import { Observable, map } from 'rxjs';

import { REPORT_HTTP_ERRORS } from '../core/api-error-interceptor';
import { API_BASE_URL } from '../core/api-base-url';

export type ElementsMode = 'contains' | 'only';
export type SpeciesSort = 'name' | '-name' | 'formula' | '-formula' | 'molarMass' | '-molarMass';

/** A search as the URL and the API both describe it; empty strings mean "no filter". */
export interface SpeciesQuery {
  /** Formula, name, synonym, CAS RN or InChIKey, matched by the API. */
  readonly q: string;
  /** Element symbols, comma-separated: `C,H,O`. */
  readonly elements: string;
  readonly elementsMode: ElementsMode;
  /** IUPAC phase abbreviation: g, l, cr, am, aq, aq,inf. */
  readonly phase: string;
  /** Only species with a value for this quantity: dfH, S, Cp, dfG, dtrsH. */
  readonly quantity: string;
  readonly release: string;
  readonly sort: SpeciesSort;
  /** From 1. */
  readonly page: number;
  readonly pageSize: number;
}

export interface SpeciesSummary {
  readonly id: string | number;
  readonly formula: string;
  readonly hillFormula: string;
  readonly name: string;
  readonly charge: number;
  /** g/mol. */
  readonly molarMass: number;
  readonly phases: readonly { readonly phase: string; readonly polymorph: string | null }[];
}

export interface SpeciesPage {
  readonly items: readonly SpeciesSummary[];
  readonly total: number;
  readonly page: number;
  readonly pageSize: number;
  readonly release: string;
}

export const DEFAULT_QUERY: SpeciesQuery = {
  q: '',
  elements: '',
  elementsMode: 'contains',
  phase: '',
  quantity: '',
  release: '',
  sort: 'name',
  page: 1,
  pageSize: 25,
};

const SUGGESTION_COUNT = 8;

/** Species search (`GET /api/v1/species`) and the export link with the same filters. */
@Injectable({ providedIn: 'root' })
export class SpeciesSearchService {
  private readonly http = inject(HttpClient);
  private readonly apiBaseUrl = inject(API_BASE_URL);

  find(query: SpeciesQuery): Observable<SpeciesPage> {
    return this.http.get<SpeciesPage>(`${this.apiBaseUrl}/species`, { params: searchParams(query) });
  }

  /** A few matches for the typeahead; failures are the caller's to show (in its panel). */
  suggest(text: string, release: string): Observable<readonly SpeciesSummary[]> {
    const params = searchParams({ ...DEFAULT_QUERY, q: text, release, pageSize: SUGGESTION_COUNT });
    const context = new HttpContext().set(REPORT_HTTP_ERRORS, false);
    return this.http
      .get<SpeciesPage>(`${this.apiBaseUrl}/species`, { params, context })
      .pipe(map((page) => page.items));
  }

  /** Address of the API's export of every species matching the query (not only one page). */
  exportUrl(query: SpeciesQuery, format: 'csv' | 'json'): string {
    const params = searchParams(query).delete('page').delete('pageSize').delete('sort').set('format', format);
    return `${this.apiBaseUrl}/export?${params.toString()}`;
  }
}

/** The API's query parameters for a search; unset filters are left out. */
export function searchParams(query: SpeciesQuery): HttpParams {
  let params = new HttpParams();
  const optional: [string, string][] = [
    ['q', query.q.trim()],
    ['elements', query.elements],
    ['phase', query.phase],
    ['quantity', query.quantity],
    ['release', query.release],
  ];
  for (const [name, value] of optional) {
    if (value) {
      params = params.set(name, value);
    }
  }
  if (query.elements) {
    params = params.set('elementsMode', query.elementsMode);
  }
  return params.set('sort', query.sort).set('page', query.page).set('pageSize', query.pageSize);
}

/**
 * Reads element symbols as people type them ("c h o", "C, H,O", "Fe;O") into the API's
 * form `C,H,O`; null when something is not an element symbol.
 */
export function normaliseElements(text: string): string | null {
  const symbols = text
    .split(/[\s,;]+/)
    .filter(Boolean)
    .map((symbol) => symbol.charAt(0).toUpperCase() + symbol.slice(1).toLowerCase());
  if (symbols.some((symbol) => !/^[A-Z][a-z]?$/.test(symbol))) {
    return null;
  }
  return [...new Set(symbols)].join(',');
}
