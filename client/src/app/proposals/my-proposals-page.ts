import { DatePipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, computed, inject, input, signal } from '@angular/core';
import { toObservable, toSignal } from '@angular/core/rxjs-interop';
import { FormControl, FormGroup, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MatSelectModule } from '@angular/material/select';
import { MatTableModule } from '@angular/material/table';
import { Router, RouterLink } from '@angular/router';
import { switchMap } from 'rxjs';

import { EmptyState } from '../shared/empty-state/empty-state';
import { ErrorState } from '../shared/error-state/error-state';
import { Loadable, loadable } from '../shared/loadable/loadable';
import { LoadingIndicator } from '../shared/loading-indicator/loading-indicator';
import { ageText } from '../shared/proposals/age';
import { PROPOSAL_STATES, ProposalPage, ProposalState, STATE_LABELS } from '../shared/proposals/proposal';
import { ProposalTable } from '../shared/proposals/proposal-table';
import { ProposalsApi } from '../shared/proposals/proposals-api';

/** States still on their way; the rest have ended. */
const OPEN_STATES: readonly ProposalState[] = ['draft', 'submitted', 'in_review', 'changes_requested', 'resubmitted', 'approved'];

/**
 * The steward's own proposals with their state, last activity and checks summary; starting a new
 * one. The state filter lives in the URL (`?state=draft`), so a list can be shared.
 */
@Component({
  selector: 'kx-my-proposals-page',
  imports: [
    DatePipe,
    EmptyState,
    ErrorState,
    LoadingIndicator,
    MatButtonModule,
    MatFormFieldModule,
    MatInputModule,
    MatSelectModule,
    MatTableModule,
    ProposalTable,
    ReactiveFormsModule,
    RouterLink,
  ],
  templateUrl: './my-proposals-page.html',
  styleUrl: './my-proposals-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class MyProposalsPage {
  private readonly proposals = inject(ProposalsApi);
  private readonly router = inject(Router);
  private readonly reloads = signal(0);

  /** `open` (default), `all`, or one state; from the URL. */
  readonly state = input<string>();

  protected readonly stateLabels = STATE_LABELS;
  protected readonly states = PROPOSAL_STATES;
  protected readonly columns = ['title', 'state', 'items', 'checks', 'activity'];
  protected readonly filter = computed(() => this.state() ?? 'open');
  protected readonly list = toSignal(
    toObservable(computed(() => ({ filter: this.filter(), reload: this.reloads() }))).pipe(
      switchMap(({ filter }) =>
        loadable(
          this.proposals.list({
            mine: true,
            states: filter === 'all' ? undefined : filter === 'open' ? OPEN_STATES : [filter as ProposalState],
            sort: '-updatedAt',
            limit: 200,
          }),
        ),
      ),
    ),
    { initialValue: { state: 'loading' } as Loadable<ProposalPage> },
  );
  protected readonly rows = computed(() => {
    const list = this.list();
    const now = new Date();
    return list.state === 'ok' ? list.value.items.map((p) => ({ ...p, age: ageText(p.updatedAt, now) })) : [];
  });

  protected readonly creating = signal(false);
  protected readonly form = new FormGroup({
    title: new FormControl('', { nonNullable: true, validators: [Validators.required, Validators.maxLength(300)] }),
    summary: new FormControl('', { nonNullable: true, validators: Validators.maxLength(20000) }),
  });

  protected chooseFilter(filter: string): void {
    void this.router.navigate([], { queryParams: { state: filter === 'open' ? null : filter }, replaceUrl: true });
  }

  protected retry(): void {
    this.reloads.update((n) => n + 1);
  }

  protected startProposal(): void {
    if (this.form.invalid) {
      this.form.markAllAsTouched();
      return;
    }
    const { title, summary } = this.form.getRawValue();
    this.creating.set(true);
    this.proposals.create(title.trim(), summary.trim()).subscribe({
      next: (proposal) => void this.router.navigate(['/proposals', proposal.id]),
      error: () => this.creating.set(false),
    });
  }
}
