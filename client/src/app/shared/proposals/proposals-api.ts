import { HttpClient, HttpContext, HttpEvent, HttpParams } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import { Observable } from 'rxjs';

import { REPORT_HTTP_ERRORS } from '../../core/api-error-interceptor';
import { API_BASE_URL } from '../../core/api-base-url';
import {
  EvidenceFile,
  ItemPayload,
  PostedComment,
  Proposal,
  ProposalComment,
  ProposalImpact,
  ProposalItem,
  ProposalItemKind,
  ProposalPage,
  ProposalState,
  ReviewDecision,
} from './proposal';

/** Sort keys the list accepts; a leading minus sorts newest (or Z) first. */
export type ProposalSort = 'updatedAt' | '-updatedAt' | 'createdAt' | '-createdAt' | 'submittedAt' | '-submittedAt' | 'title' | '-title';

export interface ProposalQuery {
  readonly states?: readonly ProposalState[];
  readonly mine?: boolean;
  /** A reviewer's queue, an author's proposals sent back, an editor's approved work. */
  readonly assignedToMe?: boolean;
  readonly sort?: ProposalSort;
  readonly limit?: number;
  readonly offset?: number;
}

export interface NewItem {
  readonly kind: ProposalItemKind;
  readonly payload: ItemPayload;
  readonly sourceId?: string | null;
}

export interface ReviewRequest {
  readonly decision: ReviewDecision;
  readonly comment?: string;
  /** Why a failed automatic check does not block the approval. */
  readonly justification?: string;
  /** The proposal version the reviewer saw. */
  readonly version: number;
}

/**
 * The editorial workflow's proposals (`/api/v1/proposals`): drafting items, evidence, the
 * transitions, reviews, comments and impact. Failures reach the reader through the error
 * interceptor unless a method says otherwise.
 */
@Injectable({ providedIn: 'root' })
export class ProposalsApi {
  private readonly http = inject(HttpClient);
  private readonly baseUrl = inject(API_BASE_URL);
  private readonly url = `${this.baseUrl}/proposals`;

  list(query: ProposalQuery = {}): Observable<ProposalPage> {
    let params = new HttpParams();
    if (query.states?.length) {
      params = params.set('state', query.states.join(','));
    }
    if (query.mine) {
      params = params.set('mine', 'true');
    }
    if (query.assignedToMe) {
      params = params.set('assignedToMe', 'true');
    }
    params = params.set('sort', query.sort ?? '-updatedAt').set('limit', query.limit ?? 100);
    if (query.offset) {
      params = params.set('offset', query.offset);
    }
    return this.http.get<ProposalPage>(this.url, { params });
  }

  /** A missing proposal answers 404, which the caller shows as its own not-found state. */
  get(id: string): Observable<Proposal> {
    return this.http.get<Proposal>(`${this.url}/${encodeURIComponent(id)}`, { context: quiet() });
  }

  create(title: string, summary: string): Observable<Proposal> {
    return this.http.post<Proposal>(this.url, { title, summary });
  }

  addItem(proposalId: string, item: NewItem): Observable<ProposalItem> {
    return this.http.post<ProposalItem>(`${this.itemsUrl(proposalId)}`, item);
  }

  updateItem(proposalId: string, itemId: string, change: { payload?: ItemPayload; sourceId?: string | null }): Observable<ProposalItem> {
    return this.http.patch<ProposalItem>(`${this.itemsUrl(proposalId)}/${encodeURIComponent(itemId)}`, change);
  }

  deleteItem(proposalId: string, itemId: string): Observable<void> {
    return this.http.delete<void>(`${this.itemsUrl(proposalId)}/${encodeURIComponent(itemId)}`);
  }

  /** Uploads one evidence file as multipart/form-data, reporting upload progress events; the caller shows a failure. */
  uploadEvidence(proposalId: string, itemId: string, file: File, description: string): Observable<HttpEvent<EvidenceFile>> {
    const body = new FormData();
    body.append('file', file, file.name);
    if (description.trim()) {
      body.append('description', description.trim());
    }
    // The upload form shows a refusal (type, size) beside the file itself.
    return this.http.post<EvidenceFile>(`${this.itemsUrl(proposalId)}/${encodeURIComponent(itemId)}/evidence`, body, {
      reportProgress: true,
      observe: 'events',
      context: quiet(),
    });
  }

  /** The file's bytes; the caller offers them as a download (a link cannot carry the token). */
  downloadEvidence(id: string): Observable<Blob> {
    return this.http.get(`${this.baseUrl}/evidence/${encodeURIComponent(id)}`, { responseType: 'blob' });
  }

  submit(proposal: { id: string; version: number }): Observable<Proposal> {
    return this.transition(proposal, 'submit');
  }

  resubmit(proposal: { id: string; version: number }): Observable<Proposal> {
    return this.transition(proposal, 'resubmit');
  }

  withdraw(proposal: { id: string; version: number }): Observable<Proposal> {
    return this.transition(proposal, 'withdraw');
  }

  review(proposalId: string, review: ReviewRequest): Observable<Proposal> {
    return this.http.post<Proposal>(`${this.url}/${encodeURIComponent(proposalId)}/reviews`, review);
  }

  comments(proposalId: string): Observable<{ items: ProposalComment[] }> {
    return this.http.get<{ items: ProposalComment[] }>(`${this.url}/${encodeURIComponent(proposalId)}/comments`);
  }

  addComment(proposalId: string, body: string, itemId: string | null): Observable<PostedComment> {
    return this.http.post<PostedComment>(`${this.url}/${encodeURIComponent(proposalId)}/comments`, itemId ? { body, itemId } : { body });
  }

  impact(proposalId: string): Observable<ProposalImpact> {
    return this.http.get<ProposalImpact>(`${this.url}/${encodeURIComponent(proposalId)}/impact`);
  }

  private transition(proposal: { id: string; version: number }, event: 'submit' | 'resubmit' | 'withdraw'): Observable<Proposal> {
    return this.http.post<Proposal>(`${this.url}/${encodeURIComponent(proposal.id)}/${event}`, { version: proposal.version });
  }

  private itemsUrl(proposalId: string): string {
    return `${this.url}/${encodeURIComponent(proposalId)}/items`;
  }
}

function quiet(): HttpContext {
  return new HttpContext().set(REPORT_HTTP_ERRORS, false);
}
