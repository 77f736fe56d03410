import { queueFilter, statesFor } from './review-queue-page';

describe('review queue filters', () => {
  it('defaults to proposals waiting for me, longest waiting first', () => {
    expect(queueFilter({})).toEqual({ state: 'waiting', assigned: true, sort: 'submittedAt', text: '' });
    expect(statesFor('waiting')).toEqual(['submitted', 'in_review', 'resubmitted']);
  });

  it('reads the filters from the URL, ignoring an unknown sort', () => {
    expect(queueFilter({ state: 'approved', assigned: 'false', sort: 'title', q: 'ethyl' })).toEqual({
      state: 'approved',
      assigned: false,
      sort: 'title',
      text: 'ethyl',
    });
    expect(queueFilter({ sort: 'drop table' }).sort).toBe('submittedAt');
    expect(statesFor('all')).toBeUndefined();
    expect(statesFor('rejected')).toEqual(['rejected']);
  });
});
