import type { Principal } from '../auth/principal';
import type { ProposalState } from './proposal-vocabulary';

const PRIVILEGED = ['reviewer', 'editor', 'admin'];

/** Reviewers, editors and admins see every proposal past the draft stage. */
export function seesSubmittedProposals(user: Pick<Principal, 'roles'>): boolean {
  return user.roles.some((r) => PRIVILEGED.includes(r));
}

/**
 * Who may see a proposal (and download its evidence files): its author always; reviewers,
 * editors and admins once it has left the draft stage. A draft is its author's own work.
 */
export function canSeeProposal(proposal: { authorId: string; state: ProposalState }, user: Pick<Principal, 'userId' | 'roles'>): boolean {
  if (proposal.authorId === user.userId) return true;
  return proposal.state !== 'draft' && seesSubmittedProposals(user);
}
