import { BreakpointObserver } from '@angular/cdk/layout';
import { ChangeDetectionStrategy, Component, computed, effect, inject, input, linkedSignal, signal } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatButtonToggleModule } from '@angular/material/button-toggle';
import { MatDialog } from '@angular/material/dialog';
import { toSignal } from '@angular/core/rxjs-interop';
import { RouterLink } from '@angular/router';
import { Observable, catchError, concatMap, filter, forkJoin, from, last, map, of } from 'rxjs';

import { AuthService } from '../core/auth';
import { CatalogueApi } from '../shared/catalogue/catalogue-api';
import { ConfirmDialog, ConfirmDialogData } from '../shared/confirm-dialog/confirm-dialog';
import { EmptyState } from '../shared/empty-state/empty-state';
import { CommentThread } from '../shared/proposals/comment-thread';
import { ItemCard } from '../shared/proposals/item-card';
import { describeItem } from '../shared/proposals/item-description';
import { Proposal, ProposalComment, ProposalItem } from '../shared/proposals/proposal';
import { offeredActions } from '../shared/proposals/proposal-actions';
import { ProposalHeader } from '../shared/proposals/proposal-header';
import { ProposalsApi } from '../shared/proposals/proposals-api';
import { ReviewHistory } from '../shared/proposals/review-history';
import { EvidenceUpload } from './evidence-upload';
import { FitItemForm } from './fit-item-form';
import { ItemDraft } from './item-draft';
import { PhaseItemForm } from './phase-item-form';
import { RetireItemForm } from './retire-item-form';
import { SpeciesItemForm } from './species-item-form';
import { SpeciesChoice, proposedPhases, proposedSpecies } from './subject';
import { ValueItemForm } from './value-item-form';

export type NewItemKind = 'value' | 'fit' | 'species' | 'phase' | 'retire';

/**
 * A steward's proposal: its items with their checks, evidence and comments; adding and editing
 * items while it is a draft or sent back; submitting, withdrawing, answering the reviewers and
 * resubmitting. Only the buttons the workflow allows now are shown.
 */
@Component({
  selector: 'kx-proposal-editor',
  imports: [
    CommentThread,
    EmptyState,
    EvidenceUpload,
    FitItemForm,
    ItemCard,
    MatButtonModule,
    MatButtonToggleModule,
    PhaseItemForm,
    ProposalHeader,
    RetireItemForm,
    ReviewHistory,
    RouterLink,
    SpeciesItemForm,
    ValueItemForm,
  ],
  templateUrl: './proposal-editor.html',
  styleUrl: './proposal-editor.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ProposalEditor {
  private readonly proposals = inject(ProposalsApi);
  private readonly catalogue = inject(CatalogueApi);
  private readonly auth = inject(AuthService);
  private readonly dialog = inject(MatDialog);

  /** The proposal as the route's resolver loaded it. */
  readonly proposal = input.required<Proposal>();

  protected readonly current = linkedSignal(() => this.proposal());
  protected readonly comments = signal<readonly ProposalComment[]>([]);
  protected readonly adding = signal<NewItemKind | null>(null);
  protected readonly editing = signal<string | null>(null);
  protected readonly busy = signal(false);
  protected readonly announcement = signal('');
  /** Catalogue species the items name by id: their names, and what the edit forms need. */
  private readonly catalogueSpecies = signal<ReadonlyMap<string, SpeciesChoice>>(new Map());

  /** On a phone the kinds of item stack, so that none is cut off. */
  protected readonly narrow = toSignal(inject(BreakpointObserver).observe('(max-width: 599.98px)').pipe(map((state) => state.matches)), {
    initialValue: false,
  });
  protected readonly viewer = computed(() => ({
    isAuthor: this.current().author.id === String(this.auth.user()?.id ?? ''),
    roles: this.auth.user()?.roles ?? [],
  }));
  protected readonly actions = computed(() => offeredActions(this.current(), this.viewer()));
  protected readonly editable = computed(() => this.actions().includes('edit_items'));
  protected readonly proposed = computed(() => proposedSpecies(this.current().items));
  protected readonly addedPhases = computed(() => proposedPhases(this.current().items));
  protected readonly items = computed(() => {
    const names = new Map([...this.catalogueSpecies()].map(([id, species]) => [id, species.name]));
    return this.current().items.map((item) => ({ item, description: describeItem(item, names), editForm: editFormFor(item) }));
  });
  protected readonly lastReview = computed(() => this.current().reviews.at(-1) ?? null);
  protected readonly sentBack = computed(() => this.current().state === 'changes_requested' ? this.lastReview() : null);

  constructor() {
    effect(() => this.loadComments(this.current().id));
    effect(() => this.loadSpeciesNames(this.current().items));
  }

  protected speciesFor(item: ProposalItem): SpeciesChoice | null {
    const id = item.payload['speciesId'];
    return typeof id === 'string' ? this.catalogueSpecies().get(id) ?? null : null;
  }

  protected startAdding(kind: NewItemKind | null): void {
    this.editing.set(null);
    this.adding.set(kind);
  }

  protected startEditing(item: ProposalItem): void {
    this.adding.set(null);
    this.editing.set(item.id);
  }

  /** Adds the item's prerequisites (a new species, a new phase) and then the item, in order. */
  protected addItem(draft: ItemDraft): void {
    const proposalId = this.current().id;
    const items = [...draft.prerequisites, { kind: draft.kind, payload: draft.payload, sourceId: draft.sourceId }];
    this.busy.set(true);
    from(items)
      .pipe(
        concatMap((item) => this.proposals.addItem(proposalId, item)),
        last(),
      )
      .subscribe({
        next: () => {
          this.adding.set(null);
          this.reload(`Added the item${items.length > 1 ? ` and ${items.length - 1} it needs` : ''}.`);
        },
        error: () => this.reload(),
      });
  }

  protected addSpecies(payload: Record<string, unknown>): void {
    this.addItem({ kind: 'add_species', payload, sourceId: null, prerequisites: [] });
  }

  protected updateSpecies(item: ProposalItem, payload: Record<string, unknown>): void {
    this.updateItem(item, { kind: 'add_species', payload, sourceId: null, prerequisites: [] });
  }

  protected updateItem(item: ProposalItem, draft: ItemDraft): void {
    this.busy.set(true);
    this.proposals.updateItem(this.current().id, item.id, { payload: draft.payload, sourceId: draft.sourceId }).subscribe({
      next: () => {
        this.editing.set(null);
        this.reload('Saved the changes to the item.');
      },
      error: () => this.busy.set(false),
    });
  }

  protected deleteItem(item: ProposalItem): void {
    this.confirm({ title: 'Delete this item?', message: `${describeItem(item).subject} and its evidence files leave the proposal.`, confirmLabel: 'Delete item' })
      .pipe(concatMap(() => this.proposals.deleteItem(this.current().id, item.id)))
      .subscribe(() => this.reload('Deleted the item.'));
  }

  protected submitProposal(): void {
    this.transition(this.proposals.submit(this.current()), 'Submitted. The automatic checks ran; reviewers have been told.');
  }

  protected resubmitProposal(): void {
    this.transition(this.proposals.resubmit(this.current()), 'Resubmitted. The checks ran again; the reviewers have been told.');
  }

  protected withdrawProposal(): void {
    this.confirm({
      title: 'Withdraw this proposal?',
      message: 'A withdrawn proposal leaves the workflow for good; its items stay readable. Start a new proposal to try again.',
      confirmLabel: 'Withdraw',
    }).subscribe(() => this.transition(this.proposals.withdraw(this.current()), 'Withdrawn.'));
  }

  protected evidenceAdded(): void {
    this.reload('Uploaded the evidence file.');
  }

  protected commentPosted(): void {
    this.loadComments(this.current().id);
    this.announcement.set('Comment added.');
  }

  private transition(request: Observable<Proposal>, done: string): void {
    this.busy.set(true);
    request.subscribe({
      next: (proposal) => {
        this.current.set(proposal);
        this.busy.set(false);
        this.announcement.set(done);
      },
      // A refusal (a problem in an item, a newer version) is shown by the error interceptor.
      error: () => this.reload(),
    });
  }

  private reload(done = ''): void {
    this.proposals.get(this.current().id).subscribe({
      next: (proposal) => {
        this.current.set(proposal);
        this.busy.set(false);
        this.announcement.set(done);
      },
      error: () => this.busy.set(false),
    });
  }

  private loadComments(id: string): void {
    this.proposals.comments(id).subscribe((answer) => this.comments.set(answer.items));
  }

  private loadSpeciesNames(items: readonly ProposalItem[]): void {
    const known = this.catalogueSpecies();
    const ids = [...new Set(items.map((item) => item.payload['speciesId']).filter((id): id is string => typeof id === 'string' && !known.has(id)))];
    if (ids.length === 0) {
      return;
    }
    forkJoin(ids.map((id) => this.catalogue.species(id).pipe(catchError(() => of(null))))).subscribe((records) => {
      const next = new Map(this.catalogueSpecies());
      for (const record of records) {
        if (record) {
          next.set(record.id, { id: record.id, name: record.name, formula: record.formula, phases: record.phases.map((p) => ({ phase: p.phase, polymorph: p.polymorph })) });
        }
      }
      this.catalogueSpecies.set(next);
    });
  }

  private confirm(data: ConfirmDialogData): Observable<true> {
    return this.dialog
      .open<ConfirmDialog, ConfirmDialogData, boolean>(ConfirmDialog, { data })
      .afterClosed()
      .pipe(
        filter((confirmed): confirmed is true => confirmed === true),
        map(() => true as const),
      );
  }
}

/** Which form edits an item of this kind (add_species and add_phase are deleted and added again). */
function editFormFor(item: ProposalItem): 'value' | 'fit' | 'species' | null {
  switch (item.kind) {
    case 'add_value':
    case 'revise_value':
      return 'value';
    case 'add_fit':
    case 'replace_fit':
      return 'fit';
    case 'add_species':
      return 'species';
    default:
      return null;
  }
}
