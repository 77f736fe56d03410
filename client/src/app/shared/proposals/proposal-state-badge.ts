import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';

import { ProposalState, STATE_LABELS } from './proposal';

/** A proposal's workflow state as a small coloured label: `<kx-proposal-state [state]="p.state" />`. */
@Component({
  selector: 'kx-proposal-state',
  template: `{{ label() }}`,
  styles: `
    :host {
      display: inline-block;
      padding: 0.05rem 0.55rem;
      border-radius: 999px;
      font: var(--mat-sys-label-medium);
      white-space: nowrap;
      background: var(--mat-sys-surface-container-highest);
      color: var(--mat-sys-on-surface);
    }
    :host(.kx-state-submitted),
    :host(.kx-state-in_review),
    :host(.kx-state-resubmitted) {
      background: var(--mat-sys-secondary-container);
      color: var(--mat-sys-on-secondary-container);
    }
    :host(.kx-state-changes_requested) {
      background: var(--mat-sys-tertiary-container);
      color: var(--mat-sys-on-tertiary-container);
    }
    :host(.kx-state-approved),
    :host(.kx-state-released) {
      background: var(--mat-sys-primary-container);
      color: var(--mat-sys-on-primary-container);
    }
    :host(.kx-state-rejected) {
      background: var(--mat-sys-error-container);
      color: var(--mat-sys-on-error-container);
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
  host: { '[class]': '"kx-state-" + state()' },
})
export class ProposalStateBadge {
  readonly state = input.required<ProposalState>();

  protected readonly label = computed(() => STATE_LABELS[this.state()]);
}
