import { HttpClient, HttpContext, HttpEvent } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import { Observable } from 'rxjs';

import { REPORT_HTTP_ERRORS } from '../core/api-error-interceptor';
import { API_BASE_URL } from '../core/api-base-url';

/** A problem found in an import file, by the line where its row starts (api/src/imports/FORMAT.md). */
export interface ImportProblem {
  readonly line: number;
  /** The column, absent for a problem with the whole row or file. */
  readonly field?: string;
  readonly message: string;
}

export type ImportStatus = 'queued' | 'running' | 'succeeded' | 'failed' | 'cancelled';

export interface ImportJob {
  readonly id: string;
  readonly fileName: string;
  readonly format: 'csv' | 'xml';
  readonly dryRun: boolean;
  readonly status: ImportStatus;
  readonly totalRows: number | null;
  readonly processedRows: number;
  readonly errorCount: number;
  readonly errors: readonly ImportProblem[];
  /** The draft proposal a real import created. */
  readonly proposalId: string | null;
  /** 0…1. */
  readonly progress: number;
  readonly createdAt: string;
  readonly finishedAt: string | null;
}

/** The answer to an upload: the job, with every problem (a dry run) and what the rows would create. */
export interface ImportReport extends ImportJob {
  readonly rows: number;
  readonly wouldCreate: { readonly species: number; readonly phases: number; readonly values: number };
}

/** Bulk import of values from CSV or XML (`/api/v1/imports`). */
@Injectable({ providedIn: 'root' })
export class ImportsApi {
  private readonly http = inject(HttpClient);
  private readonly url = `${inject(API_BASE_URL)}/imports`;

  /**
   * Uploads the file for a dry run (every problem, nothing written) or a real import (202 with
   * the running job; 422 with every problem when any row is wrong). The page shows refusals.
   */
  upload(file: File, options: { dryRun: boolean; title?: string }): Observable<HttpEvent<ImportReport>> {
    const body = new FormData();
    body.append('file', file, file.name);
    if (options.title?.trim()) {
      body.append('title', options.title.trim());
    }
    return this.http.post<ImportReport>(this.url, body, {
      params: { dryRun: String(options.dryRun) },
      reportProgress: true,
      observe: 'events',
      context: new HttpContext().set(REPORT_HTTP_ERRORS, false),
    });
  }

  job(id: string): Observable<ImportJob> {
    return this.http.get<ImportJob>(`${this.url}/${encodeURIComponent(id)}`);
  }

  list(): Observable<{ items: ImportJob[] }> {
    return this.http.get<{ items: ImportJob[] }>(this.url);
  }
}
