import type { ProposalState, ReviewDecision } from './proposal-vocabulary';

/**
 * The editorial workflow as a table: which event moves a proposal from which state to which, and
 * who may cause it. Pure: the service asks it and then does the writing.
 *
 *   draft ─submit→ submitted ─start_review→ in_review ─request_changes→ changes_requested
 *   changes_requested ─resubmit→ resubmitted (reviewed again like a submission)
 *   submitted | in_review | resubmitted ─approve→ approved ─release→ released
 *   submitted | in_review | resubmitted ─reject→ rejected
 *   any open state ─withdraw→ withdrawn (the author's choice)
 */
export const PROPOSAL_EVENTS = ['submit', 'withdraw', 'start_review', 'request_changes', 'resubmit', 'approve', 'reject', 'release'] as const;
export type ProposalEvent = (typeof PROPOSAL_EVENTS)[number];

/** Who causes an event: the proposal's author, a reviewer (never the author), an editor. */
export type ProposalActor = 'author' | 'reviewer' | 'editor';

export const EVENT_ACTOR: Readonly<Record<ProposalEvent, ProposalActor>> = {
  submit: 'author',
  withdraw: 'author',
  resubmit: 'author',
  start_review: 'reviewer',
  request_changes: 'reviewer',
  approve: 'reviewer',
  reject: 'reviewer',
  release: 'editor',
};

const AWAITING_REVIEW: readonly ProposalState[] = ['submitted', 'in_review', 'resubmitted'];

const TRANSITIONS: Readonly<Record<ProposalState, Partial<Record<ProposalEvent, ProposalState>>>> = {
  draft: { submit: 'submitted', withdraw: 'withdrawn' },
  submitted: { start_review: 'in_review', request_changes: 'changes_requested', approve: 'approved', reject: 'rejected', withdraw: 'withdrawn' },
  in_review: { request_changes: 'changes_requested', approve: 'approved', reject: 'rejected', withdraw: 'withdrawn' },
  changes_requested: { resubmit: 'resubmitted', withdraw: 'withdrawn' },
  resubmitted: { start_review: 'in_review', request_changes: 'changes_requested', approve: 'approved', reject: 'rejected', withdraw: 'withdrawn' },
  approved: { release: 'released' },
  released: {},
  rejected: {},
  withdrawn: {},
};

const STATE_WORDS: Readonly<Record<ProposalState, string>> = {
  draft: 'a draft',
  submitted: 'submitted',
  in_review: 'in review',
  changes_requested: 'waiting for the changes a reviewer requested',
  resubmitted: 'resubmitted',
  approved: 'approved',
  released: 'released',
  rejected: 'rejected',
  withdrawn: 'withdrawn',
};

const EVENT_WORDS: Readonly<Record<ProposalEvent, string>> = {
  submit: 'be submitted',
  withdraw: 'be withdrawn',
  start_review: 'go into review',
  request_changes: 'get a request for changes',
  resubmit: 'be resubmitted',
  approve: 'be approved',
  reject: 'be rejected',
  release: 'be released',
};

export type TransitionResult = { ok: true; from: ProposalState; to: ProposalState } | { ok: false; from: ProposalState; reason: string };

/** Where `event` takes a proposal in `state`, or why it cannot. */
export function transition(state: ProposalState, event: ProposalEvent): TransitionResult {
  const to = TRANSITIONS[state]?.[event];
  if (to) return { ok: true, from: state, to };
  return { ok: false, from: state, reason: `A proposal that is ${STATE_WORDS[state] ?? state} cannot ${EVENT_WORDS[event]}${hint(state, event)}` };
}

function hint(state: ProposalState, event: ProposalEvent): string {
  if (state === 'changes_requested' && event === 'submit') return ': resubmit it after making the requested changes';
  if (state === 'draft' && event === 'resubmit') return ': submit it first';
  if (state === 'draft' && EVENT_ACTOR[event] === 'reviewer') return ': it has not been submitted yet';
  if (state === 'changes_requested' && EVENT_ACTOR[event] === 'reviewer') return ': the author has not resubmitted it yet';
  if (AWAITING_REVIEW.includes(state) && (event === 'submit' || event === 'resubmit')) return ': it is already waiting for review';
  if (state === 'in_review' && event === 'start_review') return ': it is already in review';
  if (state === 'approved' && event !== 'release') return ': an approved proposal only goes into a release';
  if (event === 'release') return ': only approved proposals are released';
  if (state === 'released' || state === 'rejected' || state === 'withdrawn') return ': its workflow has ended';
  return '';
}

/** The event a review decision causes. */
export function decisionEvent(decision: ReviewDecision): ProposalEvent {
  return decision === 'approve' ? 'approve' : decision === 'reject' ? 'reject' : 'request_changes';
}

/** States in which the author may change items (add, edit, delete, attach evidence). */
export const EDITABLE_STATES: readonly ProposalState[] = ['draft', 'changes_requested'];

export function itemsEditable(state: ProposalState): boolean {
  return EDITABLE_STATES.includes(state);
}

/** States in which a reviewer can decide. */
export function awaitingReview(state: ProposalState): boolean {
  return AWAITING_REVIEW.includes(state);
}

/**
 * Whether this person may cause the event: author events only by the author; reviewer events
 * only by someone holding the reviewer role who is not the author (four-eyes rule).
 * @returns undefined when allowed, else the reason (for a 403)
 */
export function actorRefusal(event: ProposalEvent, who: { isAuthor: boolean; roles: readonly string[] }): string | undefined {
  const actor = EVENT_ACTOR[event];
  if (actor === 'author') return who.isAuthor ? undefined : 'Only the author of a proposal can do this';
  if (actor === 'reviewer') {
    if (who.isAuthor) return 'Nobody reviews their own proposal (four-eyes rule): another reviewer must decide';
    return who.roles.includes('reviewer') ? undefined : 'This needs the reviewer role';
  }
  return who.roles.includes('editor') ? undefined : 'This needs the editor role';
}
