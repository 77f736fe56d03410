import { ChangeDetectionStrategy, Component, computed, effect, inject, input, signal } from '@angular/core';
import { FormControl, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatDialog } from '@angular/material/dialog';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MatRadioModule } from '@angular/material/radio';
import { Router, RouterLink } from '@angular/router';
import { catchError, filter, forkJoin, map, of, switchMap } from 'rxjs';

import { CatalogueApi, CatalogueSpecies } from '../shared/catalogue/catalogue-api';
import { ConfirmDialog, ConfirmDialogData } from '../shared/confirm-dialog/confirm-dialog';
import { ErrorState } from '../shared/error-state/error-state';
import { Formula } from '../shared/formula/formula';
import { LoadingIndicator } from '../shared/loading-indicator/loading-indicator';
import { ProposalSummary } from '../shared/proposals/proposal';
import { ProposalsApi } from '../shared/proposals/proposals-api';
import { Quantity } from '../shared/quantity/quantity';
import { Candidate, RecommendationGroup, recommendationGroups, speciesPhaseIds } from './recommendation-groups';
import { ReleaseWorkspace, ReleasesApi, WorkspaceEntry } from './releases-api';

const CHANGE_WORDS: Readonly<Record<WorkspaceEntry['change'], string>> = {
  added: 'added',
  revised: 'revised',
  retired: 'retired',
  removed: 'left out',
  recommendation: 'recommendation changed',
};

/**
 * The editor's release in preparation: approved proposals to add, recommended values to choose
 * where sources disagree (values, uncertainties and sources side by side), the notes, the change
 * log as generated so far, and publishing — after a confirmation, since a published release
 * never changes and its watchers are e-mailed.
 */
@Component({
  selector: 'kx-release-workspace-page',
  imports: [ErrorState, Formula, LoadingIndicator, MatButtonModule, MatFormFieldModule, MatInputModule, MatRadioModule, Quantity, ReactiveFormsModule, RouterLink],
  templateUrl: './release-workspace-page.html',
  styleUrl: './release-workspace-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ReleaseWorkspacePage {
  private readonly releases = inject(ReleasesApi);
  private readonly proposals = inject(ProposalsApi);
  private readonly catalogue = inject(CatalogueApi);
  private readonly dialog = inject(MatDialog);
  private readonly router = inject(Router);

  readonly label = input.required<string>();

  protected readonly workspace = signal<ReleaseWorkspace | null>(null);
  protected readonly failure = signal('');
  protected readonly approved = signal<readonly ProposalSummary[]>([]);
  protected readonly records = signal<readonly CatalogueSpecies[]>([]);
  protected readonly busy = signal(false);
  protected readonly announcement = signal('');
  protected readonly notes = new FormControl('', { nonNullable: true, validators: Validators.maxLength(50000) });

  protected readonly changeWords = CHANGE_WORDS;
  protected readonly groups = computed(() => {
    const workspace = this.workspace();
    return workspace ? recommendationGroups(this.records(), speciesPhaseIds(workspace), workspace.needsRecommendation) : [];
  });
  protected readonly gaps = computed(() => this.workspace()?.needsRecommendation ?? []);
  protected readonly changes = computed(() =>
    (this.workspace()?.changeLog.species ?? []).map((species) => ({
      ...species,
      entries: [...species.added, ...species.revised, ...species.retired, ...species.removed, ...species.recommendation],
    })),
  );
  protected readonly canPublish = computed(() => this.workspace()?.status === 'preparing' && this.gaps().length === 0);

  constructor() {
    effect(() => this.load(this.label()));
  }

  protected addProposal(proposal: ProposalSummary): void {
    this.busy.set(true);
    this.releases.addProposal(this.label(), proposal.id).subscribe({
      next: (workspace) => this.loaded(workspace, `Added “${proposal.title}” to ${this.label()}.`),
      error: () => this.busy.set(false),
    });
  }

  protected recommend(group: RecommendationGroup, candidate: Candidate): void {
    if (candidate.recommended) {
      return;
    }
    this.busy.set(true);
    const choice = candidate.kind === 'fit' ? { fitId: candidate.id } : { valueId: candidate.id };
    this.releases
      .recommend(this.label(), { speciesPhaseId: group.speciesPhaseId, quantity: group.quantity, ...choice })
      .pipe(switchMap(() => this.releases.workspace(this.label())))
      .subscribe({
        next: (workspace) => this.loaded(workspace, `${candidate.sourceKey} is now the recommended ${group.label} of ${group.speciesName}.`),
        error: () => this.busy.set(false),
      });
  }

  protected saveNotes(): void {
    if (this.notes.invalid) {
      return;
    }
    this.busy.set(true);
    this.releases.updateNotes(this.label(), this.notes.value).subscribe({
      next: (workspace) => this.loaded(workspace, 'Notes saved.'),
      error: () => this.busy.set(false),
    });
  }

  protected publishRelease(): void {
    const workspace = this.workspace();
    if (!workspace) {
      return;
    }
    const summary = workspace.changeLog.summary;
    const data: ConfirmDialogData = {
      title: `Publish release ${workspace.label}?`,
      message:
        `It holds ${summary.added} added, ${summary.revised} revised and ${summary.retired + summary.removed} retired values and fits. ` +
        'A published release never changes again, and everyone watching a changed species is e-mailed.',
      confirmLabel: `Publish ${workspace.label}`,
    };
    this.dialog
      .open<ConfirmDialog, ConfirmDialogData, boolean>(ConfirmDialog, { data })
      .afterClosed()
      .pipe(
        filter((confirmed) => confirmed === true),
        switchMap(() => {
          this.busy.set(true);
          return this.releases.publish(workspace.label, workspace.version);
        }),
      )
      .subscribe({
        next: () => void this.router.navigate(['/releases', workspace.label]),
        error: () => this.load(workspace.label),
      });
  }

  private load(label: string): void {
    this.releases.workspace(label).subscribe({
      next: (workspace) => this.loaded(workspace, ''),
      error: () => this.failure.set(`Release ${label} could not be loaded.`),
    });
  }

  private loaded(workspace: ReleaseWorkspace, announcement: string): void {
    this.workspace.set(workspace);
    if (!this.notes.dirty) {
      this.notes.setValue(workspace.notes);
    }
    this.notes.markAsPristine();
    this.busy.set(false);
    this.announcement.set(announcement);
    this.loadApproved();
    this.loadRecords(workspace);
  }

  private loadApproved(): void {
    this.proposals
      .list({ states: ['approved'], sort: 'updatedAt', limit: 200 })
      .pipe(map((page) => page.items.filter((p) => p.release === null)))
      .subscribe((items) => this.approved.set(items));
  }

  /** The changed species (and those with a gap) as the release in preparation holds them. */
  private loadRecords(workspace: ReleaseWorkspace): void {
    const ids = workspace.changeLog.species.map((s) => s.speciesId);
    const gapLookups = workspace.needsRecommendation
      .filter((gap) => !workspace.changeLog.species.some((s) => s.name === gap.speciesName))
      .map((gap) =>
        this.catalogue.searchSpecies(gap.hillFormula, 20).pipe(
          map((matches) => matches.find((m) => m.name === gap.speciesName)?.id ?? null),
          catchError(() => of(null)),
        ),
      );
    (gapLookups.length > 0 ? forkJoin(gapLookups) : of([] as (string | null)[]))
      .pipe(
        map((found) => [...new Set([...ids, ...found.filter((id): id is string => id !== null)])]),
        switchMap((all) =>
          all.length === 0 ? of([] as (CatalogueSpecies | null)[]) : forkJoin(all.map((id) => this.catalogue.species(id, workspace.label).pipe(catchError(() => of(null))))),
        ),
      )
      .subscribe((records) => this.records.set(records.filter((r): r is CatalogueSpecies => r !== null)));
  }
}
