import { PhaseCode, QuantityCode } from '../vocabulary/thermo-vocabulary';

/**
 * A proposal as `GET /api/v1/proposals/{id}` describes it (api/src/proposals/proposals.service.ts).
 * The workflow: draft → submitted → in review → changes requested → resubmitted → approved →
 * released; or rejected, or withdrawn by its author.
 */
export type ProposalState =
  | 'draft'
  | 'submitted'
  | 'in_review'
  | 'changes_requested'
  | 'resubmitted'
  | 'approved'
  | 'released'
  | 'rejected'
  | 'withdrawn';

export const PROPOSAL_STATES: readonly ProposalState[] = [
  'draft',
  'submitted',
  'in_review',
  'changes_requested',
  'resubmitted',
  'approved',
  'released',
  'rejected',
  'withdrawn',
];

/** States a reviewer can decide in: the review queue. */
export const AWAITING_REVIEW: readonly ProposalState[] = ['submitted', 'in_review', 'resubmitted'];

export const STATE_LABELS: Readonly<Record<ProposalState, string>> = {
  draft: 'Draft',
  submitted: 'Submitted',
  in_review: 'In review',
  changes_requested: 'Changes requested',
  resubmitted: 'Resubmitted',
  approved: 'Approved',
  released: 'Released',
  rejected: 'Rejected',
  withdrawn: 'Withdrawn',
};

export type ProposalItemKind =
  | 'add_species'
  | 'add_phase'
  | 'add_value'
  | 'revise_value'
  | 'retire_value'
  | 'add_fit'
  | 'replace_fit'
  | 'recommend';

export const ITEM_KIND_LABELS: Readonly<Record<ProposalItemKind, string>> = {
  add_species: 'New species',
  add_phase: 'New phase',
  add_value: 'New value',
  revise_value: 'Revised value',
  retire_value: 'Retired value',
  add_fit: 'New heat-capacity fit',
  replace_fit: 'Replaced heat-capacity fit',
  recommend: 'Recommendation',
};

/** Kinds that create data and so need a source: no value without a source. */
export const KINDS_NEEDING_SOURCE: readonly ProposalItemKind[] = ['add_value', 'revise_value', 'add_fit', 'replace_fit'];

/** What the API lets the signed-in person do with a proposal now (`allowedActions`). */
export type ProposalAction =
  | 'submit'
  | 'resubmit'
  | 'withdraw'
  | 'request_changes'
  | 'approve'
  | 'reject'
  | 'edit_items'
  | 'add_to_release';

export type ReviewDecision = 'approve' | 'request_changes' | 'reject';

export const DECISION_LABELS: Readonly<Record<ReviewDecision, string>> = {
  approve: 'Approved',
  request_changes: 'Asked for changes',
  reject: 'Rejected',
};

export type CheckStatus = 'pass' | 'warn' | 'fail';

/** One automatic consistency check's outcome; `details` holds the numbers it compared. */
export interface CheckResult {
  readonly code: string;
  readonly status: CheckStatus;
  readonly message: string;
  readonly details?: Readonly<Record<string, unknown>>;
}

export interface CheckSummary {
  readonly pass: number;
  readonly warn: number;
  readonly fail: number;
}

export interface PersonRef {
  readonly id: string;
  readonly name: string;
}

/** A proposal as the list (`GET /api/v1/proposals`) shows it. */
export interface ProposalSummary {
  readonly id: string;
  readonly title: string;
  readonly summary: string;
  readonly state: ProposalState;
  /** Optimistic lock: sent back with every transition. */
  readonly version: number;
  readonly author: PersonRef;
  readonly release: { readonly id: string; readonly label: string } | null;
  readonly submittedAt: string | null;
  readonly decidedAt: string | null;
  readonly createdAt: string;
  readonly updatedAt: string;
  readonly itemCount: number;
  /** Failed automatic checks over all items (the list's checks summary). */
  readonly failedChecks?: number;
}

export interface ProposalPage {
  readonly items: readonly ProposalSummary[];
  readonly total: number;
  readonly limit: number;
  readonly offset: number;
}

export interface EvidenceFile {
  readonly id: string;
  readonly fileName: string;
  readonly mediaType: string;
  readonly sizeBytes: number;
  /** Hex SHA-256 of the bytes as uploaded. */
  readonly sha256: string;
  readonly description: string | null;
  readonly createdAt: string;
}

export type ItemPayload = Readonly<Record<string, unknown>>;

export interface ProposalItem {
  readonly id: string;
  readonly position: number;
  readonly kind: ProposalItemKind;
  readonly payload: ItemPayload;
  readonly sourceId: string | null;
  readonly source: { readonly id: string; readonly shortKey: string; readonly title: string } | null;
  /** References resolved when the proposal was submitted (null before). */
  readonly speciesId: string | null;
  readonly speciesPhaseId: string | null;
  readonly targetValueId: string | null;
  readonly targetFitId: string | null;
  readonly resultValueId?: string | null;
  readonly resultFitId?: string | null;
  /** Null until the checks ran (at submission); emptied again when the item changes. */
  readonly checks: readonly CheckResult[] | null;
  readonly checksRanAt: string | null;
  readonly checkSummary: CheckSummary;
  readonly evidence: readonly EvidenceFile[];
}

export interface Review {
  readonly id: string;
  readonly reviewer: PersonRef;
  readonly decision: ReviewDecision;
  readonly comment: string;
  readonly justification: string | null;
  readonly proposalVersion: number;
  readonly createdAt: string;
}

export interface Proposal extends ProposalSummary {
  readonly checkSummary: CheckSummary;
  readonly allowedActions: readonly ProposalAction[];
  readonly items: readonly ProposalItem[];
  readonly reviews: readonly Review[];
}

export interface ProposalComment {
  readonly id: string;
  /** Null for a comment on the whole proposal. */
  readonly itemId: string | null;
  readonly author: PersonRef;
  readonly body: string;
  readonly createdAt: string;
  readonly editedAt: string | null;
}

/** Answer to a new comment: a reviewer's first comment puts a waiting proposal in review. */
export interface PostedComment extends ProposalComment {
  readonly proposalState: ProposalState;
  readonly proposalVersion: number;
}

/** A change of ΔrH° or ΔrG° at 298.15 K, J/mol; null where a value is missing. */
export interface ReactionChange {
  readonly old: number | null;
  readonly new: number | null;
  readonly change: number | null;
}

/** What a revision or retirement changes for the people using the data (`GET …/impact`). */
export interface ProposalImpact {
  readonly proposalId: string;
  readonly release: string | null;
  readonly temperatureK: number;
  readonly items: readonly {
    readonly itemId: string;
    readonly position: number;
    readonly kind: ProposalItemKind;
    readonly species: { readonly id: string; readonly name: string; readonly hillFormula: string };
    readonly phase: PhaseCode;
    readonly polymorph: string | null;
    readonly quantity: QuantityCode;
    readonly old: { readonly valueSi: number; readonly uncertaintySi: number | null; readonly enteredValue: string; readonly enteredUnit: string };
    readonly new: { readonly valueSi: number; readonly uncertaintySi: number | null; readonly enteredValue: string; readonly enteredUnit: string } | null;
    readonly recommendedInRelease: boolean;
    readonly watcherCount: number;
    readonly savedReactions: readonly {
      readonly id: string;
      readonly name: string;
      readonly equation: string;
      readonly owner: string;
      readonly pinnedRelease: string | null;
      readonly deltaH: ReactionChange;
      readonly deltaG: ReactionChange;
      readonly note: string | null;
    }[];
  }[];
}

/** Whether an item holds a failed automatic check. */
export function hasFailedCheck(proposal: Pick<Proposal, 'items'>): boolean {
  return proposal.items.some((item) => (item.checks ?? []).some((check) => check.status === 'fail'));
}
