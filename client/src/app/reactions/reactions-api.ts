import { HttpClient, HttpContext, HttpErrorResponse } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import { Observable } from 'rxjs';

import { isApiErrorBody } from '../core/api-error';
import { REPORT_HTTP_ERRORS } from '../core/api-error-interceptor';
import { API_BASE_URL } from '../core/api-base-url';

export interface ReactionTerm {
  readonly formula: string;
  readonly phase: string;
  /** Negative for reactants, positive for products. */
  readonly coefficient: number;
}

export interface BalancedEquation {
  /** The equation as the API writes it. */
  readonly equation: string;
  readonly coefficients: readonly number[];
  readonly species: readonly ReactionTerm[];
  readonly balanced: true;
}

export interface ReactionQuantity {
  readonly value: number;
  readonly uncertainty: number | null;
  readonly unit?: string;
}

export interface ReactionResult {
  /** K. */
  readonly T: number;
  readonly deltaH: ReactionQuantity;
  readonly deltaS: ReactionQuantity;
  readonly deltaG: ReactionQuantity;
  readonly deltaCp: ReactionQuantity;
  readonly log10K: ReactionQuantity;
  readonly K: number;
  readonly favouredBy: 'enthalpy' | 'entropy' | 'both' | 'neither';
}

export interface ReactionEvaluation {
  readonly equation: string;
  readonly balanced: boolean;
  readonly release: string;
  readonly species: readonly (ReactionTerm & { readonly speciesId: string | number; readonly name: string })[];
  readonly results: readonly ReactionResult[];
  /** K where ΔrG° changes sign, or null when it does not in the range. */
  readonly crossoverT: number | null;
}

/** What a 422 from evaluate says: the species it could not use, and names that might be meant. */
export interface SpeciesProblems {
  readonly message: string;
  readonly missing: readonly string[];
  readonly suggestions: readonly { readonly formula: string; readonly names: readonly string[] }[];
}

export interface AdiabaticRise {
  /** K. */
  readonly deltaT: number;
  readonly caution: string;
}

/**
 * Reaction calls; every one answers failures to the page, which explains them beside the
 * equation, so the interceptor stays quiet.
 */
@Injectable({ providedIn: 'root' })
export class ReactionsApi {
  private readonly http = inject(HttpClient);
  private readonly url = `${inject(API_BASE_URL)}/reactions`;
  private readonly quiet = { context: new HttpContext().set(REPORT_HTTP_ERRORS, false) };

  balance(equation: string): Observable<BalancedEquation> {
    return this.http.post<BalancedEquation>(`${this.url}/balance`, { equation }, this.quiet);
  }

  evaluate(equation: string, temperatures: readonly number[], release: string): Observable<ReactionEvaluation> {
    const body = release ? { equation, temperatures, release } : { equation, temperatures };
    return this.http.post<ReactionEvaluation>(`${this.url}/evaluate`, body, this.quiet);
  }

  /**
   * @param deltaH reaction enthalpy, J/mol
   * @param amount extent of reaction, mol
   * @param mass mass that takes up the heat, kg
   * @param specificHeat its specific heat capacity, J/(kg·K)
   */
  adiabaticRise(deltaH: number, amount: number, mass: number, specificHeat: number): Observable<AdiabaticRise> {
    return this.http.post<AdiabaticRise>(`${this.url}/adiabatic-rise`, { deltaH, amount, mass, specificHeat }, this.quiet);
  }
}

/** Reads the missing species and suggestions out of a 422 from evaluate; null for other failures. */
export function speciesProblems(error: unknown): SpeciesProblems | null {
  if (!(error instanceof HttpErrorResponse) || error.status !== 422 || !isApiErrorBody(error.error)) {
    return null;
  }
  const details = (error.error.details ?? {}) as { missing?: unknown; suggestions?: unknown };
  const missing = Array.isArray(details.missing) ? details.missing.filter((item): item is string => typeof item === 'string') : [];
  const suggestions =
    details.suggestions && typeof details.suggestions === 'object'
      ? Object.entries(details.suggestions as Record<string, unknown>).map(([formula, names]) => ({
          formula,
          names: Array.isArray(names) ? names.filter((name): name is string => typeof name === 'string') : [],
        }))
      : [];
  return { message: error.error.message, missing, suggestions };
}
