import { decisionForm, decisionMessage, revalidateDecision } from './review-decision-rules';
import { ReviewDecision } from '../shared/proposals/proposal';

describe('review decision rules', () => {
  function decide(decision: ReviewDecision | null, comment = '', justification = '', failed = false) {
    const form = decisionForm(() => failed);
    form.setValue({ decision, comment, justification });
    revalidateDecision(form);
    return form;
  }

  it('needs a decision', () => {
    expect(decide(null).controls.decision.hasError('required')).toBeTrue();
  });

  it('approves without a comment when every check passed', () => {
    expect(decide('approve').valid).toBeTrue();
  });

  it('needs a comment to ask for changes or to reject', () => {
    expect(decide('request_changes').controls.comment.hasError('required')).toBeTrue();
    expect(decide('reject', '   ').controls.comment.hasError('required')).toBeTrue();
    expect(decide('request_changes', 'State the calibration.').valid).toBeTrue();
    expect(decisionMessage('comment', 'reject')).toBe('Say why the proposal is rejected.');
  });

  it('needs a justification to approve over a failed check, and only then', () => {
    expect(decide('approve', '', '', true).controls.justification.hasError('required')).toBeTrue();
    expect(decide('approve', '', 'The other source predates the recalibration.', true).valid).toBeTrue();
    expect(decide('reject', 'Wrong standard state.', '', true).controls.justification.valid).toBeTrue();
  });
});
