import { HttpClient, HttpContext, HttpParams } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import { Observable } from 'rxjs';

import { REPORT_HTTP_ERRORS } from '../../core/api-error-interceptor';
import { API_BASE_URL } from '../../core/api-base-url';

/** A bibliographic source (`/api/v1/sources`): its record is CSL-JSON, with columns beside it. */
export interface Source {
  readonly id: string;
  /** e.g. `codata-1989`; what values cite and imports name. */
  readonly shortKey: string;
  readonly title: string;
  readonly year: number | null;
  readonly doi: string | null;
  readonly csl: Readonly<Record<string, unknown>>;
  readonly notes: string | null;
  /** Set once an editor merged this duplicate into another source. */
  readonly mergedIntoId: string | null;
  readonly createdAt: string;
  readonly updatedAt: string;
  readonly version: number;
  /** Said when a source was created from its DOI alone (no network lookups are made). */
  readonly notice?: string;
}

export type BibliographyFormat = 'bibtex' | 'ris';

export interface MergeResult {
  readonly merged: Source;
  readonly into: Source;
  readonly repointedItems: number;
  readonly repointedEvidence: number;
  readonly valuesStillCitingDuplicate: number;
  readonly doiMoved: boolean;
}

/** A DOI in its bare, `doi:` or `https://doi.org/` form. */
const DOI = /^(?:https?:\/\/(?:dx\.)?doi\.org\/|doi:\s*)?10\.\d{4,9}\/\S+$/i;

export function isDoi(text: string): boolean {
  return DOI.test(text.trim());
}

/** The first author's family name (or literal name) from a CSL record, for lists. */
export function firstAuthor(source: Pick<Source, 'csl'>): string | null {
  const authors = source.csl['author'];
  if (!Array.isArray(authors) || authors.length === 0) {
    return null;
  }
  const first = authors[0] as { family?: unknown; literal?: unknown };
  const name = typeof first.family === 'string' ? first.family : typeof first.literal === 'string' ? first.literal : null;
  return name && authors.length > 1 ? `${name} et al.` : name;
}

/**
 * Sources: search, create from a DOI, import BibTeX or RIS, merge duplicates. Creating and
 * importing report failures to their form (REPORT_HTTP_ERRORS off), which shows them in place.
 */
@Injectable({ providedIn: 'root' })
export class SourcesApi {
  private readonly http = inject(HttpClient);
  private readonly url = `${inject(API_BASE_URL)}/sources`;

  search(q: string, limit = 20, offset = 0): Observable<{ items: Source[]; total: number }> {
    let params = new HttpParams().set('limit', limit).set('offset', offset);
    if (q.trim()) {
      params = params.set('q', q.trim());
    }
    return this.http.get<{ items: Source[]; total: number }>(this.url, { params });
  }

  get(id: string): Observable<Source> {
    return this.http.get<Source>(`${this.url}/${encodeURIComponent(id)}`);
  }

  createFromDoi(doi: string, shortKey?: string): Observable<Source> {
    return this.http.post<Source>(this.url, shortKey ? { doi: doi.trim(), shortKey } : { doi: doi.trim() }, { context: quiet() });
  }

  /** Creates every entry of the BibTeX or RIS text, or none (answers 409 for a DOI already present). */
  importEntries(text: string, format?: BibliographyFormat): Observable<{ format: BibliographyFormat; items: Source[] }> {
    return this.http.post<{ format: BibliographyFormat; items: Source[] }>(`${this.url}/import`, format ? { text, format } : { text }, { context: quiet() });
  }

  merge(duplicateId: string, intoId: string): Observable<MergeResult> {
    return this.http.post<MergeResult>(`${this.url}/${encodeURIComponent(duplicateId)}/merge`, { intoId });
  }

  bibtex(id: string): Observable<string> {
    return this.http.get(`${this.url}/${encodeURIComponent(id)}`, { params: { format: 'bibtex' }, responseType: 'text' });
  }
}

function quiet(): HttpContext {
  return new HttpContext().set(REPORT_HTTP_ERRORS, false);
}
