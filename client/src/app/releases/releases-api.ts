import { HttpClient, HttpContext } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import { Observable, map } from 'rxjs';

import { REPORT_HTTP_ERRORS } from '../core/api-error-interceptor';
import { API_BASE_URL } from '../core/api-base-url';
import { ProposalState } from '../shared/proposals/proposal';
import { PhaseCode, QuantityCode, TransitionKind } from '../shared/vocabulary/thermo-vocabulary';

export type ReleaseStatus = 'published' | 'preparing';

export interface ReleaseSummary {
  readonly label: string;
  readonly status: ReleaseStatus;
  readonly notes: string;
  readonly publishedAt: string | null;
  readonly publishedBy: string | null;
  readonly latest: boolean;
}

/** A value or fit version as a change log shows it; values in SI. */
export type MemberSnapshot =
  | { readonly kind: 'value'; readonly id: string; readonly versionNo: number; readonly value: number; readonly uncertainty: number | null; readonly unit: string; readonly source: string; readonly recommended: boolean }
  | { readonly kind: 'fit'; readonly id: string; readonly versionNo: number; readonly form: string; readonly tMin: number; readonly tMax: number; readonly source: string; readonly recommended: boolean };

/** One lineage that differs between two releases (api/src/releases/releases.service.ts). */
export interface ChangeEntry {
  readonly speciesId: string;
  readonly formula: string;
  readonly hillFormula: string;
  readonly name: string;
  readonly phase: PhaseCode;
  readonly polymorph: string | null;
  readonly kind: 'value' | 'fit';
  readonly quantity: QuantityCode;
  readonly transitionKind: TransitionKind | null;
  readonly change: 'added' | 'revised' | 'retired';
  readonly reason: 'new version' | 'now recommended' | 'no longer recommended' | 'retired' | 'left out' | 'new lineage';
  readonly before: MemberSnapshot | null;
  readonly after: MemberSnapshot | null;
}

export interface ChangeSummary {
  readonly added: number;
  readonly revised: number;
  readonly retired: number;
}

export interface ReleaseDetail extends ReleaseSummary {
  readonly counts: { readonly species: number; readonly speciesPhases: number; readonly values: number; readonly recommendedValues: number; readonly fits: number; readonly sources: number };
  readonly comparedWith: string | null;
  readonly summary: ChangeSummary;
  readonly changeLog: readonly ChangeEntry[];
}

export interface ReleaseDiff {
  readonly from: string;
  readonly to: string;
  readonly summary: ChangeSummary;
  readonly changeLog: readonly ChangeEntry[];
}

/** A species phase and quantity without exactly one recommended member. */
export interface RecommendationGap {
  readonly speciesPhaseId: string;
  readonly memberKind: 'value' | 'fit';
  readonly quantity: QuantityCode;
  readonly transitionKind: TransitionKind | null;
  readonly speciesName: string;
  readonly hillFormula: string;
  readonly phase: PhaseCode;
  readonly polymorph: string | null;
  readonly members: number;
  readonly recommended: number;
}

/** A version as the editor's change log shows it: entered text and source key. */
export interface WorkspaceVersion {
  readonly id: string;
  readonly valueSi: number | null;
  readonly uncertaintySi: number | null;
  readonly entered: string;
  readonly sourceKey: string;
  readonly recommended: boolean | null;
}

export interface WorkspaceEntry {
  readonly change: 'added' | 'revised' | 'retired' | 'removed' | 'recommendation';
  readonly memberKind: 'value' | 'fit';
  readonly lineageId: string;
  readonly speciesPhaseId: string;
  readonly phase: PhaseCode;
  readonly polymorph: string | null;
  readonly quantity: QuantityCode;
  readonly transitionKind: TransitionKind | null;
  /** e.g. "ΔfH°(l)". */
  readonly label: string;
  readonly from: WorkspaceVersion | null;
  readonly to: WorkspaceVersion | null;
}

export interface WorkspaceSpecies {
  readonly speciesId: string;
  readonly hillFormula: string;
  readonly name: string;
  readonly added: readonly WorkspaceEntry[];
  readonly revised: readonly WorkspaceEntry[];
  readonly retired: readonly WorkspaceEntry[];
  readonly removed: readonly WorkspaceEntry[];
  readonly recommendation: readonly WorkspaceEntry[];
}

/** The release as the editor assembles it (`GET /releases/{label}/workspace`). */
export interface ReleaseWorkspace {
  readonly id: string;
  readonly label: string;
  readonly status: ReleaseStatus;
  readonly notes: string;
  readonly createdAt: string;
  readonly publishedAt: string | null;
  readonly publishedBy: string | null;
  /** Optimistic lock for publishing. */
  readonly version: number;
  readonly memberCount: number;
  readonly proposals: readonly { readonly id: string; readonly title: string; readonly state: ProposalState }[];
  readonly needsRecommendation: readonly RecommendationGap[];
  readonly changeLog: {
    readonly release: string;
    readonly comparedWith: string | null;
    readonly summary: Readonly<Record<WorkspaceEntry['change'], number>>;
    readonly species: readonly WorkspaceSpecies[];
  };
}

/** Releases: the list, a release with its change log, diffs, and the editor's work on the one in preparation. */
@Injectable({ providedIn: 'root' })
export class ReleasesApi {
  private readonly http = inject(HttpClient);
  private readonly url = `${inject(API_BASE_URL)}/releases`;

  /** Every release the reader may see, newest first (editors also see the one in preparation). */
  list(): Observable<readonly ReleaseSummary[]> {
    return this.http.get<{ items: ReleaseSummary[] }>(this.url).pipe(map((answer) => answer.items));
  }

  /** A release with its change log; the page shows a 404 as its own not-found state. */
  detail(label: string): Observable<ReleaseDetail> {
    return this.http.get<ReleaseDetail>(`${this.url}/${encodeURIComponent(label)}`, { context: new HttpContext().set(REPORT_HTTP_ERRORS, false) });
  }

  diff(from: string, to: string): Observable<ReleaseDiff> {
    return this.http.get<ReleaseDiff>(`${this.url}/${encodeURIComponent(from)}/diff/${encodeURIComponent(to)}`);
  }

  workspace(label: string): Observable<ReleaseWorkspace> {
    return this.http.get<ReleaseWorkspace>(`${this.url}/${encodeURIComponent(label)}/workspace`);
  }

  open(label: string, notes: string): Observable<ReleaseWorkspace> {
    return this.http.post<ReleaseWorkspace>(this.url, { label, notes });
  }

  addProposal(label: string, proposalId: string): Observable<ReleaseWorkspace> {
    return this.http.post<ReleaseWorkspace>(`${this.url}/${encodeURIComponent(label)}/proposals`, { proposalId });
  }

  recommend(label: string, choice: { speciesPhaseId: string; quantity: QuantityCode; valueId?: string; fitId?: string }): Observable<unknown> {
    return this.http.put(`${this.url}/${encodeURIComponent(label)}/recommended`, choice);
  }

  updateNotes(label: string, notes: string): Observable<ReleaseWorkspace> {
    return this.http.patch<ReleaseWorkspace>(`${this.url}/${encodeURIComponent(label)}`, { notes });
  }

  publish(label: string, version: number): Observable<ReleaseWorkspace> {
    return this.http.post<ReleaseWorkspace>(`${this.url}/${encodeURIComponent(label)}/publish`, { confirm: true, version });
  }
}
