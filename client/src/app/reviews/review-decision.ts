import { ChangeDetectionStrategy, Component, computed, inject, input, output, signal } from '@angular/core';
import { takeUntilDestroyed, toSignal } from '@angular/core/rxjs-interop';
import { ReactiveFormsModule } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MatRadioModule } from '@angular/material/radio';
import { map, startWith } from 'rxjs';

import { Proposal, hasFailedCheck } from '../shared/proposals/proposal';
import { ProposalsApi } from '../shared/proposals/proposals-api';
import { decisionForm, decisionMessage, revalidateDecision } from './review-decision-rules';

/**
 * Approve, ask for changes or reject, with the comment the author reads and, when an automatic
 * check failed, the justification an approval needs. Sends the version the reviewer saw, so a
 * decision on a proposal that changed meanwhile is refused rather than applied to something else.
 */
@Component({
  selector: 'kx-review-decision',
  imports: [MatButtonModule, MatFormFieldModule, MatInputModule, MatRadioModule, ReactiveFormsModule],
  template: `
    <form [formGroup]="form" (ngSubmit)="recordDecision()" aria-labelledby="decision-heading" class="kx-decision">
      <h2 id="decision-heading">Your decision</h2>
      <mat-radio-group formControlName="decision" aria-label="Decision" class="kx-decisions">
        <mat-radio-button value="approve">Approve</mat-radio-button>
        <mat-radio-button value="request_changes">Ask for changes</mat-radio-button>
        <mat-radio-button value="reject">Reject</mat-radio-button>
      </mat-radio-group>
      @if (form.controls.decision.invalid && form.controls.decision.touched) {
        <p class="kx-problem" role="alert">{{ message('decision') }}</p>
      }
      <mat-form-field appearance="outline" class="kx-wide">
        <mat-label>{{ decision() === 'approve' ? 'Comment for the author (optional)' : 'Comment for the author' }}</mat-label>
        <textarea matInput formControlName="comment" rows="3" class="kx-decision-comment"></textarea>
        <mat-error>{{ message('comment') }}</mat-error>
      </mat-form-field>
      @if (failedCheck()) {
        <p class="kx-failed-note">At least one automatic check failed. Approving anyway needs a justification, kept with your review.</p>
        @if (decision() === 'approve') {
          <mat-form-field appearance="outline" class="kx-wide">
            <mat-label>Justification</mat-label>
            <textarea matInput formControlName="justification" rows="2" class="kx-decision-justification"></textarea>
            <mat-error>{{ message('justification') }}</mat-error>
          </mat-form-field>
        }
      }
      <button mat-flat-button type="submit" class="kx-record-decision" [disabled]="sending()">Record decision</button>
    </form>
  `,
  styles: `
    .kx-decision {
      padding: 1rem;
      border: 1px solid var(--mat-sys-outline-variant);
      border-radius: var(--mat-sys-corner-medium);
      background: var(--mat-sys-surface-container-low);
    }
    .kx-decisions {
      display: flex;
      flex-wrap: wrap;
      gap: 0 1rem;
      margin-bottom: 0.75rem;
    }
    .kx-wide {
      width: 100%;
    }
    .kx-problem,
    .kx-failed-note {
      color: var(--mat-sys-error);
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ReviewDecision {
  private readonly proposals = inject(ProposalsApi);

  readonly proposal = input.required<Proposal>();
  readonly decided = output<Proposal>();
  /** A refused decision (someone else decided first): the page reloads. */
  readonly refused = output<void>();

  protected readonly failedCheck = computed(() => hasFailedCheck(this.proposal()));
  protected readonly form = decisionForm(() => this.failedCheck());
  protected readonly sending = signal(false);
  protected readonly decision = toSignal(this.form.controls.decision.valueChanges.pipe(startWith(null), map(() => this.form.controls.decision.value)), {
    initialValue: null,
  });

  constructor() {
    this.form.valueChanges.pipe(takeUntilDestroyed()).subscribe(() => revalidateDecision(this.form));
  }

  protected message(field: 'decision' | 'comment' | 'justification'): string {
    return decisionMessage(field, this.decision());
  }

  protected recordDecision(): void {
    revalidateDecision(this.form);
    if (this.form.invalid) {
      this.form.markAllAsTouched();
      return;
    }
    const { decision, comment, justification } = this.form.getRawValue();
    this.sending.set(true);
    this.proposals
      .review(this.proposal().id, {
        decision: decision!,
        version: this.proposal().version,
        ...(comment.trim() ? { comment: comment.trim() } : {}),
        ...(decision === 'approve' && justification.trim() ? { justification: justification.trim() } : {}),
      })
      .subscribe({
        next: (proposal) => {
          this.sending.set(false);
          this.form.reset();
          this.decided.emit(proposal);
        },
        error: () => {
          this.sending.set(false);
          this.refused.emit();
        },
      });
  }
}
