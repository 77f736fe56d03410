import { Role } from '../../core/auth';
import { AWAITING_REVIEW, ProposalAction, ProposalState } from './proposal';

/** Who is looking at a proposal, as far as the workflow cares. */
export interface ProposalViewer {
  readonly isAuthor: boolean;
  readonly roles: readonly Role[];
}

/** States in which the author may change items and attach evidence. */
export const EDITABLE_STATES: readonly ProposalState[] = ['draft', 'changes_requested'];

const AUTHOR_TRANSITIONS: Readonly<Record<ProposalState, readonly ProposalAction[]>> = {
  draft: ['submit', 'withdraw'],
  submitted: ['withdraw'],
  in_review: ['withdraw'],
  changes_requested: ['resubmit', 'withdraw'],
  resubmitted: ['withdraw'],
  approved: [],
  released: [],
  rejected: [],
  withdrawn: [],
};

const DECISIONS: readonly ProposalAction[] = ['approve', 'request_changes', 'reject'];

/**
 * The buttons a proposal shows this viewer in this state, mirroring the API's state machine
 * (api/src/proposals/proposal-state-machine.ts): the author submits, resubmits, withdraws and
 * edits; a reviewer who is not the author decides (four-eyes rule); an editor takes an approved
 * proposal into a release.
 */
export function proposalActions(state: ProposalState, viewer: ProposalViewer, inRelease = false): ProposalAction[] {
  const actions: ProposalAction[] = [];
  if (viewer.isAuthor && viewer.roles.includes('steward')) {
    actions.push(...AUTHOR_TRANSITIONS[state]);
    if (EDITABLE_STATES.includes(state)) {
      actions.push('edit_items');
    }
  }
  if (!viewer.isAuthor && viewer.roles.includes('reviewer') && AWAITING_REVIEW.includes(state)) {
    actions.push(...DECISIONS);
  }
  if (state === 'approved' && !inRelease && viewer.roles.includes('editor')) {
    actions.push('add_to_release');
  }
  return actions;
}

/**
 * The actions to offer: those the workflow allows this viewer, narrowed to what the API said it
 * allows (`allowedActions`), which stays the authority.
 */
export function offeredActions(
  proposal: { readonly state: ProposalState; readonly allowedActions: readonly ProposalAction[]; readonly release: unknown },
  viewer: ProposalViewer,
): ProposalAction[] {
  return proposalActions(proposal.state, viewer, proposal.release !== null).filter((action) => proposal.allowedActions.includes(action));
}

/**
 * Why this viewer cannot approve, send back or reject the proposal now, as a sentence for the
 * page; null when they can. The author is told about the four-eyes rule first.
 */
export function reviewRefusal(state: ProposalState, viewer: ProposalViewer, releaseLabel?: string | null): string | null {
  if (viewer.isAuthor) {
    return 'You wrote this proposal. Nobody reviews their own work (four-eyes rule): another reviewer decides on it.';
  }
  if (!viewer.roles.includes('reviewer')) {
    return 'Deciding on a proposal takes the reviewer role. You can read it and comment.';
  }
  switch (state) {
    case 'submitted':
    case 'in_review':
    case 'resubmitted':
      return null;
    case 'draft':
      return 'It is still a draft: its author has not submitted it.';
    case 'changes_requested':
      return 'Changes were requested. It comes back to the queue when its author resubmits it.';
    case 'approved':
      return 'It is approved. An editor takes it into a release.';
    case 'released':
      return releaseLabel ? `It was released in ${releaseLabel}.` : 'It was released.';
    case 'rejected':
      return 'It was rejected; its workflow has ended.';
    case 'withdrawn':
      return 'Its author withdrew it; its workflow has ended.';
  }
}
