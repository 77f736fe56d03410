import { DatePipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, input } from '@angular/core';

import { DECISION_LABELS, Review } from './proposal';

/** The reviewers' decisions on a proposal, oldest first, each with its comment and the version it was about. */
@Component({
  selector: 'kx-review-history',
  imports: [DatePipe],
  template: `
    <ol>
      @for (review of reviews(); track review.id) {
        <li>
          <strong>{{ decisionLabels[review.decision] }}</strong> by {{ review.reviewer.name }},
          <time [attr.datetime]="review.createdAt">{{ review.createdAt | date: 'yyyy-MM-dd HH:mm' }}</time> (version {{ review.proposalVersion }})
          @if (review.comment) {
            <p>{{ review.comment }}</p>
          }
          @if (review.justification) {
            <p class="kx-justification">Justification for a failed check: {{ review.justification }}</p>
          }
        </li>
      }
    </ol>
  `,
  styles: `
    ol {
      margin: 0;
      padding-inline-start: 1.25rem;
    }
    p {
      margin: 0.15rem 0 0.5rem;
    }
    .kx-justification {
      font: var(--mat-sys-body-small);
      color: var(--mat-sys-on-surface-variant);
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ReviewHistory {
  readonly reviews = input.required<readonly Review[]>();

  protected readonly decisionLabels = DECISION_LABELS;
}
