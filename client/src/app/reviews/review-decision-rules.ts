import { AbstractControl, FormControl, FormGroup, ValidationErrors, Validators } from '@angular/forms';

import { ReviewDecision } from '../shared/proposals/proposal';

export interface DecisionEntry {
  decision: ReviewDecision | null;
  comment: string;
  justification: string;
}

export type DecisionForm = FormGroup<{
  decision: FormControl<ReviewDecision | null>;
  comment: FormControl<string>;
  justification: FormControl<string>;
}>;

const blank = (text: string) => text.trim() === '';

/**
 * The reviewer's decision: approve, ask for changes or reject. Asking for changes and rejecting
 * need a comment saying what and why; approving while an automatic check failed needs a
 * justification (api/src/proposals/proposals.service.ts refuses both otherwise).
 */
export function decisionForm(hasFailedCheck: () => boolean): DecisionForm {
  const decisionOf = (control: AbstractControl) => (control.parent?.value as Partial<DecisionEntry> | undefined)?.decision ?? null;
  return new FormGroup({
    decision: new FormControl<ReviewDecision | null>(null, { validators: Validators.required }),
    comment: new FormControl('', {
      nonNullable: true,
      validators: [
        (control: AbstractControl<string>): ValidationErrors | null => {
          const decision = decisionOf(control);
          return decision && decision !== 'approve' && blank(control.value) ? { required: true } : null;
        },
        Validators.maxLength(20000),
      ],
    }),
    justification: new FormControl('', {
      nonNullable: true,
      validators: [
        (control: AbstractControl<string>): ValidationErrors | null =>
          decisionOf(control) === 'approve' && hasFailedCheck() && blank(control.value) ? { required: true } : null,
        Validators.maxLength(20000),
      ],
    }),
  });
}

/** Re-checks the comment and justification after the decision changes. */
export function revalidateDecision(form: DecisionForm): void {
  form.controls.comment.updateValueAndValidity({ emitEvent: false });
  form.controls.justification.updateValueAndValidity({ emitEvent: false });
}

export function decisionMessage(field: 'decision' | 'comment' | 'justification', decision: ReviewDecision | null): string {
  switch (field) {
    case 'decision':
      return 'Choose a decision.';
    case 'comment':
      return decision === 'reject' ? 'Say why the proposal is rejected.' : 'Say what should change.';
    case 'justification':
      return 'An automatic check failed: say why it does not block the approval.';
  }
}
