import { DatePipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, computed, inject, input, signal } from '@angular/core';
import { toObservable, toSignal } from '@angular/core/rxjs-interop';
import { FormsModule } from '@angular/forms';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MatSelectModule } from '@angular/material/select';
import { MatSlideToggleModule } from '@angular/material/slide-toggle';
import { MatTableModule } from '@angular/material/table';
import { Router } from '@angular/router';
import { switchMap } from 'rxjs';

import { EmptyState } from '../shared/empty-state/empty-state';
import { ErrorState } from '../shared/error-state/error-state';
import { Loadable, loadable } from '../shared/loadable/loadable';
import { LoadingIndicator } from '../shared/loading-indicator/loading-indicator';
import { ageText } from '../shared/proposals/age';
import { AWAITING_REVIEW, PROPOSAL_STATES, ProposalPage, ProposalState, STATE_LABELS } from '../shared/proposals/proposal';
import { ProposalTable } from '../shared/proposals/proposal-table';
import { ProposalSort, ProposalsApi } from '../shared/proposals/proposals-api';

export const QUEUE_SORTS: readonly { readonly value: ProposalSort; readonly label: string }[] = [
  { value: 'submittedAt', label: 'waiting longest first' },
  { value: '-submittedAt', label: 'newest first' },
  { value: '-updatedAt', label: 'latest activity first' },
  { value: 'title', label: 'title A–Z' },
];

/** The queue's filters as the URL holds them, with their defaults. */
export interface QueueFilter {
  /** `waiting` (submitted, in review, resubmitted), `all`, or one state. */
  readonly state: string;
  /** Only proposals waiting for this reviewer (never their own). */
  readonly assigned: boolean;
  readonly sort: ProposalSort;
  /** Words in the title or the author's name. */
  readonly text: string;
}

export function queueFilter(params: { state?: string; assigned?: string; sort?: string; q?: string }): QueueFilter {
  return {
    state: params.state ?? 'waiting',
    assigned: params.assigned !== 'false',
    sort: QUEUE_SORTS.some((s) => s.value === params.sort) ? (params.sort as ProposalSort) : 'submittedAt',
    text: params.q ?? '',
  };
}

export function statesFor(state: string): readonly ProposalState[] | undefined {
  if (state === 'all') {
    return undefined;
  }
  return state === 'waiting' ? AWAITING_REVIEW : [state as ProposalState];
}

/**
 * The reviewer's queue: proposals waiting for a decision, oldest first, with their author, age
 * and failed checks. Filters (state, assigned to me, sort, text) live in the URL.
 */
@Component({
  selector: 'kx-review-queue-page',
  imports: [
    DatePipe,
    EmptyState,
    ErrorState,
    FormsModule,
    LoadingIndicator,
    MatFormFieldModule,
    MatInputModule,
    MatSelectModule,
    MatSlideToggleModule,
    MatTableModule,
    ProposalTable,
  ],
  templateUrl: './review-queue-page.html',
  styleUrl: './review-queue-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ReviewQueuePage {
  private readonly proposals = inject(ProposalsApi);
  private readonly router = inject(Router);
  private readonly reloads = signal(0);

  readonly state = input<string>();
  readonly assigned = input<string>();
  readonly sort = input<string>();
  readonly q = input<string>();

  protected readonly sorts = QUEUE_SORTS;
  protected readonly states = PROPOSAL_STATES.filter((s) => s !== 'draft');
  protected readonly stateLabels = STATE_LABELS;
  protected readonly columns = ['title', 'author', 'state', 'items', 'checks', 'submitted', 'age'];
  protected readonly filter = computed(() => queueFilter({ state: this.state(), assigned: this.assigned(), sort: this.sort(), q: this.q() }));
  protected readonly list = toSignal(
    toObservable(computed(() => ({ filter: this.filter(), reload: this.reloads() }))).pipe(
      switchMap(({ filter }) =>
        loadable(this.proposals.list({ states: statesFor(filter.state), assignedToMe: filter.assigned, sort: filter.sort, limit: 200 })),
      ),
    ),
    { initialValue: { state: 'loading' } as Loadable<ProposalPage> },
  );
  protected readonly rows = computed(() => {
    const list = this.list();
    if (list.state !== 'ok') {
      return [];
    }
    const words = this.filter().text.toLowerCase().split(/\s+/).filter(Boolean);
    const now = new Date();
    return list.value.items
      .filter((p) => words.every((word) => `${p.title} ${p.author.name}`.toLowerCase().includes(word)))
      .map((p) => ({ ...p, age: p.submittedAt ? ageText(p.submittedAt, now) : '—' }));
  });

  protected changeFilter(change: Partial<{ state: string; assigned: boolean; sort: string; q: string }>): void {
    const next = { ...this.filter(), ...change, text: change.q ?? this.filter().text };
    void this.router.navigate([], {
      queryParams: {
        state: next.state === 'waiting' ? null : next.state,
        assigned: next.assigned ? null : 'false',
        sort: next.sort === 'submittedAt' ? null : next.sort,
        q: next.text.trim() || null,
      },
      replaceUrl: true,
    });
  }

  protected retry(): void {
    this.reloads.update((n) => n + 1);
  }
}
