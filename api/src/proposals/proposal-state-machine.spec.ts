import { PROPOSAL_STATES, type ProposalState } from './proposal-vocabulary';
import { PROPOSAL_EVENTS, actorRefusal, awaitingReview, decisionEvent, itemsEditable, transition, type ProposalEvent } from './proposal-state-machine';

// Every legal move of the workflow (issue 6); every pair not listed here must be refused.
const LEGAL: [ProposalState, ProposalEvent, ProposalState][] = [
  ['draft', 'submit', 'submitted'],
  ['draft', 'withdraw', 'withdrawn'],
  ['submitted', 'start_review', 'in_review'],
  ['submitted', 'request_changes', 'changes_requested'],
  ['submitted', 'approve', 'approved'],
  ['submitted', 'reject', 'rejected'],
  ['submitted', 'withdraw', 'withdrawn'],
  ['in_review', 'request_changes', 'changes_requested'],
  ['in_review', 'approve', 'approved'],
  ['in_review', 'reject', 'rejected'],
  ['in_review', 'withdraw', 'withdrawn'],
  ['changes_requested', 'resubmit', 'resubmitted'],
  ['changes_requested', 'withdraw', 'withdrawn'],
  ['resubmitted', 'start_review', 'in_review'],
  ['resubmitted', 'request_changes', 'changes_requested'],
  ['resubmitted', 'approve', 'approved'],
  ['resubmitted', 'reject', 'rejected'],
  ['resubmitted', 'withdraw', 'withdrawn'],
  ['approved', 'release', 'released'],
];

describe('proposal state machine', () => {
  for (const [from, event, to] of LEGAL) {
    it(`${from} --${event}--> ${to}`, () => {
      expect(transition(from, event)).toEqual({ ok: true, from, to });
    });
  }

  it('refuses every other state × event pair with a reason naming the state', () => {
    let refused = 0;
    for (const state of PROPOSAL_STATES) {
      for (const event of PROPOSAL_EVENTS) {
        if (LEGAL.some(([s, e]) => s === state && e === event)) continue;
        const result = transition(state, event);
        expect(result.ok).withContext(`${state} × ${event}`).toBeFalse();
        if (!result.ok) expect(result.reason).toMatch(/^A proposal that is .+ cannot /);
        refused++;
      }
    }
    expect(refused).toBe(PROPOSAL_STATES.length * PROPOSAL_EVENTS.length - LEGAL.length);
  });

  const reasons: [ProposalState, ProposalEvent, RegExp][] = [
    ['changes_requested', 'submit', /resubmit it after making the requested changes/],
    ['draft', 'approve', /has not been submitted yet/],
    ['draft', 'resubmit', /submit it first/],
    ['changes_requested', 'approve', /author has not resubmitted/],
    ['approved', 'approve', /only goes into a release/],
    ['submitted', 'release', /only approved proposals are released/],
    ['withdrawn', 'submit', /workflow has ended/],
    ['rejected', 'withdraw', /workflow has ended/],
  ];
  for (const [state, event, reason] of reasons) {
    it(`explains why ${state} cannot take ${event}`, () => {
      const result = transition(state, event);
      expect(result.ok).toBeFalse();
      if (!result.ok) expect(result.reason).toMatch(reason);
    });
  }

  it('the released, rejected and withdrawn states are terminal', () => {
    for (const state of ['released', 'rejected', 'withdrawn'] as const) {
      expect(PROPOSAL_EVENTS.filter((e) => transition(state, e).ok)).toEqual([]);
    }
  });

  it('lets the author edit items only in draft and after a request for changes', () => {
    expect(PROPOSAL_STATES.filter(itemsEditable)).toEqual(['draft', 'changes_requested']);
    expect(PROPOSAL_STATES.filter(awaitingReview)).toEqual(['submitted', 'in_review', 'resubmitted']);
  });

  it('maps review decisions to events', () => {
    expect(decisionEvent('approve')).toBe('approve');
    expect(decisionEvent('reject')).toBe('reject');
    expect(decisionEvent('request_changes')).toBe('request_changes');
  });

  const actors: [ProposalEvent, { isAuthor: boolean; roles: string[] }, RegExp | undefined][] = [
    ['submit', { isAuthor: true, roles: ['steward'] }, undefined],
    ['submit', { isAuthor: false, roles: ['steward', 'reviewer'] }, /Only the author/],
    ['withdraw', { isAuthor: false, roles: ['admin'] }, /Only the author/],
    ['approve', { isAuthor: false, roles: ['reviewer'] }, undefined],
    ['approve', { isAuthor: true, roles: ['steward', 'reviewer'] }, /four-eyes/],
    ['reject', { isAuthor: true, roles: ['reviewer'] }, /Nobody reviews their own proposal/],
    ['request_changes', { isAuthor: false, roles: ['editor'] }, /reviewer role/],
    ['release', { isAuthor: false, roles: ['editor'] }, undefined],
    ['release', { isAuthor: false, roles: ['reviewer'] }, /editor role/],
  ];
  for (const [event, who, refusal] of actors) {
    it(`${event} by ${who.isAuthor ? 'the author' : 'someone else'} with ${who.roles.join('+')}: ${refusal ? 'refused' : 'allowed'}`, () => {
      const answer = actorRefusal(event, who);
      if (refusal) expect(answer).toMatch(refusal);
      else expect(answer).toBeUndefined();
    });
  }
});
