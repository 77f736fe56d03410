/** Codes stored for the editorial workflow; each list matches a CHECK in migrations/1764800300000-editorial-and-releases.ts. */

/**
 * draft → submitted → in_review → changes_requested → resubmitted → approved → released;
 * or rejected, or withdrawn by the author. The transitions are the workflow service's business.
 */
export const PROPOSAL_STATES = [
  'draft',
  'submitted',
  'in_review',
  'changes_requested',
  'resubmitted',
  'approved',
  'released',
  'rejected',
  'withdrawn',
] as const;
export type ProposalState = (typeof PROPOSAL_STATES)[number];

export const PROPOSAL_ITEM_KINDS = [
  'add_species',
  'add_phase',
  'add_value',
  'revise_value',
  'retire_value',
  'add_fit',
  'replace_fit',
  'recommend',
] as const;
export type ProposalItemKind = (typeof PROPOSAL_ITEM_KINDS)[number];

export const REVIEW_DECISIONS = ['approve', 'request_changes', 'reject'] as const;
export type ReviewDecision = (typeof REVIEW_DECISIONS)[number];

/** One automatic consistency check's outcome, as stored in `proposal_items.checks`. */
export interface StoredCheckResult {
  /** stable code of the check, e.g. "entropy-positive" */
  code: string;
  status: 'pass' | 'warn' | 'fail';
  message: string;
  details?: Record<string, unknown>;
}
