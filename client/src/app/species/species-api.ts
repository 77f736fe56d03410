import { HttpClient, HttpContext, HttpParams } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import { Observable } from 'rxjs';

import { REPORT_HTTP_ERRORS } from '../core/api-error-interceptor';
import { API_BASE_URL } from '../core/api-base-url';
import { EnergyUnitPreference } from '../core/preferences';
import { PhaseKey, PropertyTable, SpeciesDetail } from './species-record';

export interface PropertyRequest {
  readonly phase: PhaseKey;
  /** Explicit temperatures (K), or a range with a step. */
  readonly temperatures: readonly number[] | { readonly tMin: number; readonly tMax: number; readonly tStep: number };
  readonly units: EnergyUnitPreference;
  readonly extrapolate: boolean;
  readonly release: string;
}

/** One species' record and its properties against temperature. */
@Injectable({ providedIn: 'root' })
export class SpeciesApi {
  private readonly http = inject(HttpClient);
  private readonly url = `${inject(API_BASE_URL)}/species`;

  /** The page shows a 404 as its own not-found state, so the interceptor stays quiet. */
  detail(id: string, release: string): Observable<SpeciesDetail> {
    const params = release ? new HttpParams().set('release', release) : new HttpParams();
    const context = new HttpContext().set(REPORT_HTTP_ERRORS, false);
    return this.http.get<SpeciesDetail>(`${this.url}/${encodeURIComponent(id)}`, { params, context });
  }

  /** Out-of-range temperatures answer 422, which the page explains beside the table itself. */
  properties(id: string | number, request: PropertyRequest): Observable<PropertyTable> {
    let params = new HttpParams().set('phase', request.phase.phase).set('units', request.units);
    if (request.phase.polymorph) {
      params = params.set('polymorph', request.phase.polymorph);
    }
    const temperatures = request.temperatures;
    if ('tMin' in temperatures) {
      params = params.set('Tmin', temperatures.tMin).set('Tmax', temperatures.tMax).set('Tstep', temperatures.tStep);
    } else {
      params = params.set('T', temperatures.join(','));
    }
    if (request.extrapolate) {
      params = params.set('extrapolate', 'true');
    }
    if (request.release) {
      params = params.set('release', request.release);
    }
    const context = new HttpContext().set(REPORT_HTTP_ERRORS, false);
    return this.http.get<PropertyTable>(`${this.url}/${encodeURIComponent(id)}/properties`, { params, context });
  }
}
