import { Role } from '../../core/auth';
import { PROPOSAL_STATES, ProposalState } from './proposal';
import { offeredActions, proposalActions, reviewRefusal } from './proposal-actions';

const author = { isAuthor: true, roles: ['reader', 'steward'] as Role[] };
const reviewer = { isAuthor: false, roles: ['reader', 'reviewer'] as Role[] };
const editor = { isAuthor: false, roles: ['reader', 'editor'] as Role[] };
const reviewingAuthor = { isAuthor: true, roles: ['reader', 'steward', 'reviewer'] as Role[] };

describe('proposalActions', () => {
  const authorTable: [ProposalState, string[]][] = [
    ['draft', ['submit', 'withdraw', 'edit_items']],
    ['submitted', ['withdraw']],
    ['in_review', ['withdraw']],
    ['changes_requested', ['resubmit', 'withdraw', 'edit_items']],
    ['resubmitted', ['withdraw']],
    ['approved', []],
    ['released', []],
    ['rejected', []],
    ['withdrawn', []],
  ];
  for (const [state, expected] of authorTable) {
    it(`offers the author ${expected.join(', ') || 'nothing'} when the proposal is ${state}`, () => {
      expect(proposalActions(state, author)).toEqual(expected as never);
    });
  }

  it('lets a reviewer decide only while the proposal waits for review', () => {
    const deciding = PROPOSAL_STATES.filter((state) => proposalActions(state, reviewer).includes('approve'));
    expect(deciding).toEqual(['submitted', 'in_review', 'resubmitted']);
    expect(proposalActions('in_review', reviewer)).toEqual(['approve', 'request_changes', 'reject']);
  });

  it('never lets the author review their own proposal, even with the reviewer role (four-eyes rule)', () => {
    for (const state of PROPOSAL_STATES) {
      expect(proposalActions(state, reviewingAuthor)).not.toContain('approve');
      expect(proposalActions(state, reviewingAuthor)).not.toContain('reject');
    }
    expect(proposalActions('submitted', reviewingAuthor)).toEqual(['withdraw']);
  });

  it('gives nobody but the author the author’s buttons', () => {
    for (const state of PROPOSAL_STATES) {
      for (const viewer of [reviewer, editor]) {
        const actions = proposalActions(state, viewer);
        expect(actions).not.toContain('submit');
        expect(actions).not.toContain('withdraw');
        expect(actions).not.toContain('edit_items');
      }
    }
  });

  it('offers an editor to take an approved proposal into a release, once', () => {
    expect(proposalActions('approved', editor)).toEqual(['add_to_release']);
    expect(proposalActions('approved', editor, true)).toEqual([]);
    expect(proposalActions('approved', reviewer)).toEqual([]);
    expect(proposalActions('submitted', editor)).toEqual([]);
  });
});

describe('offeredActions', () => {
  it('shows only what the API allows as well', () => {
    const proposal = { state: 'draft' as const, release: null, allowedActions: ['withdraw', 'edit_items'] as const };
    expect(offeredActions({ ...proposal, allowedActions: [...proposal.allowedActions] }, author)).toEqual(['withdraw', 'edit_items']);
  });

  it('takes nothing from the API that the workflow would not offer this viewer', () => {
    const proposal = { state: 'submitted' as const, release: null, allowedActions: ['approve', 'withdraw'] as ('approve' | 'withdraw')[] };
    expect(offeredActions(proposal, author)).toEqual(['withdraw']);
  });
});

describe('reviewRefusal', () => {
  it('explains the four-eyes rule to the author before anything else', () => {
    expect(reviewRefusal('submitted', reviewingAuthor)).toMatch(/four-eyes rule/);
    expect(reviewRefusal('draft', reviewingAuthor)).toMatch(/four-eyes rule/);
  });

  it('tells a reader without the reviewer role that deciding takes it', () => {
    expect(reviewRefusal('submitted', editor)).toMatch(/reviewer role/);
  });

  it('lets a reviewer decide while the proposal waits, and says why not otherwise', () => {
    expect(reviewRefusal('submitted', reviewer)).toBeNull();
    expect(reviewRefusal('in_review', reviewer)).toBeNull();
    expect(reviewRefusal('resubmitted', reviewer)).toBeNull();
    expect(reviewRefusal('changes_requested', reviewer)).toMatch(/resubmits/);
    expect(reviewRefusal('approved', reviewer)).toMatch(/editor/);
    expect(reviewRefusal('released', reviewer, '2027.1')).toBe('It was released in 2027.1.');
    expect(reviewRefusal('withdrawn', reviewer)).toMatch(/withdrew/);
  });
});
