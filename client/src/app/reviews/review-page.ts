import { ChangeDetectionStrategy, Component, computed, effect, inject, input, linkedSignal, signal } from '@angular/core';
import { catchError, forkJoin, of } from 'rxjs';

import { AuthService } from '../core/auth';
import { CatalogueApi, CataloguePhase, CatalogueSpecies, findPhase } from '../shared/catalogue/catalogue-api';
import { FitPlot } from '../shared/heat-capacity/fit-plot';
import { FitRangeInput } from '../shared/heat-capacity/heat-capacity';
import { CommentThread } from '../shared/proposals/comment-thread';
import { ItemCard } from '../shared/proposals/item-card';
import { describeItem } from '../shared/proposals/item-description';
import { Proposal, ProposalComment } from '../shared/proposals/proposal';
import { offeredActions, reviewRefusal } from '../shared/proposals/proposal-actions';
import { ProposalHeader } from '../shared/proposals/proposal-header';
import { ProposalsApi } from '../shared/proposals/proposals-api';
import { ReviewHistory } from '../shared/proposals/review-history';
import { Quantity } from '../shared/quantity/quantity';
import { convertFromSi } from '../shared/unit-selector/molar-energy-unit';
import { FitForm, METHODS } from '../shared/vocabulary/thermo-vocabulary';
import { currentValueFor, speciesIdOf } from './current-value';
import { ImpactPanel } from './impact-panel';
import { ReviewDecision } from './review-decision';

/**
 * A proposal as a reviewer sees it: each item's current and proposed value side by side, the
 * automatic checks with their numbers, the evidence, the comments per item, the impact on saved
 * reactions, and the decision. The four-eyes rule is stated where the decision would be: nobody
 * decides on their own proposal.
 */
@Component({
  selector: 'kx-review-page',
  imports: [CommentThread, FitPlot, ImpactPanel, ItemCard, ProposalHeader, Quantity, ReviewDecision, ReviewHistory],
  templateUrl: './review-page.html',
  styleUrl: './review-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ReviewPage {
  private readonly proposals = inject(ProposalsApi);
  private readonly catalogue = inject(CatalogueApi);
  private readonly auth = inject(AuthService);

  /** The proposal as the route's resolver loaded it. */
  readonly proposal = input.required<Proposal>();

  protected readonly current = linkedSignal(() => this.proposal());
  protected readonly comments = signal<readonly ProposalComment[]>([]);
  protected readonly records = signal<ReadonlyMap<string, CatalogueSpecies>>(new Map());
  protected readonly announcement = signal('');

  protected readonly viewer = computed(() => ({
    isAuthor: this.current().author.id === String(this.auth.user()?.id ?? ''),
    roles: this.auth.user()?.roles ?? [],
  }));
  protected readonly canDecide = computed(() => offeredActions(this.current(), this.viewer()).includes('approve'));
  protected readonly refusal = computed(() => reviewRefusal(this.current().state, this.viewer(), this.current().release?.label));
  protected readonly release = computed(() => [...this.records().values()][0]?.release ?? 'the latest release');
  protected readonly items = computed(() => {
    const records = this.records();
    const names = new Map([...records.values()].map((r) => [r.id, r.name]));
    return this.current().items.map((item) => {
      const speciesId = speciesIdOf(item);
      const record = speciesId ? records.get(speciesId) ?? null : null;
      const current = currentValueFor(item, record);
      const description = describeItem(item, names);
      return {
        item,
        description,
        current: current
          ? {
              ...current,
              shown: shown(current.value.value, current.value.uncertainty, current.value.unit),
              method: METHODS.find((m) => m.value === current.value.method)?.label ?? current.value.method,
            }
          : null,
        comparable: item.kind === 'add_value' || item.kind === 'revise_value' || item.kind === 'retire_value',
        proposedMethod: methodText(item.payload),
        proposedUncertainty: uncertaintyText(item.payload),
        proposedConditions: `${text(item.payload['temperatureK']) || '298.15'} K, ${item.payload['pressurePa'] === 101325 ? '1 atm' : '1 bar'}`,
        retireReason: text(item.payload['reason']),
        fit: item.kind === 'add_fit' || item.kind === 'replace_fit' ? fitToPlot(item.payload, record) : null,
      };
    });
  });

  constructor() {
    effect(() => this.loadComments(this.current().id));
    effect(() => this.loadRecords(this.current()));
  }

  protected decided(proposal: Proposal): void {
    this.current.set(proposal);
    this.announcement.set(`Decision recorded: the proposal is now ${proposal.state.replace('_', ' ')}.`);
    this.loadComments(proposal.id);
  }

  /** After a comment (a reviewer's first one puts the proposal in review) or a refused decision. */
  protected reload(): void {
    this.proposals.get(this.current().id).subscribe((proposal) => this.current.set(proposal));
    this.loadComments(this.current().id);
  }

  private loadComments(id: string): void {
    this.proposals.comments(id).subscribe((answer) => this.comments.set(answer.items));
  }

  private loadRecords(proposal: Proposal): void {
    const ids = [...new Set(proposal.items.map(speciesIdOf).filter((id): id is string => id !== null))].filter((id) => !this.records().has(id));
    if (ids.length === 0) {
      return;
    }
    forkJoin(ids.map((id) => this.catalogue.species(id).pipe(catchError(() => of(null))))).subscribe((records) => {
      const next = new Map(this.records());
      for (const record of records) {
        if (record) {
          next.set(record.id, record);
        }
      }
      this.records.set(next);
    });
  }
}

function shown(value: number, uncertainty: number | null, unit: string): { value: number; uncertainty: number | null; unit: string } {
  const main = convertFromSi(value, unit, 'kJ/mol');
  return { value: main.value, uncertainty: uncertainty === null ? null : convertFromSi(uncertainty, unit, 'kJ/mol').value, unit: main.unit };
}

function uncertaintyText(payload: Readonly<Record<string, unknown>>): string {
  if (payload['uncertainty'] === undefined || payload['uncertainty'] === '') {
    return 'none stated';
  }
  return payload['uncertaintyKind'] === 'expanded' ? `expanded, k = ${payload['coverageFactor']}` : 'standard';
}

function methodText(payload: Readonly<Record<string, unknown>>): string {
  const method = METHODS.find((m) => m.value === payload['method'])?.label ?? '';
  const level = text(payload['levelOfTheory']);
  return level ? `${method}, ${level}` : method;
}

function text(value: unknown): string {
  return typeof value === 'string' || typeof value === 'number' ? String(value) : '';
}

/** A proposed fit with the catalogue's data for its species phase, to plot side by side. */
function fitToPlot(payload: Readonly<Record<string, unknown>>, record: CatalogueSpecies | null): { form: FitForm; ranges: FitRangeInput[]; existing: CataloguePhase | null } {
  const ranges = Array.isArray(payload['ranges']) ? (payload['ranges'] as FitRangeInput[]) : [];
  let existing: CataloguePhase | null = null;
  if (record && typeof payload['phase'] === 'string') {
    existing = findPhase(record, payload['phase'], (payload['polymorph'] as string | undefined) ?? null) ?? null;
  } else if (record && typeof payload['fitId'] === 'string') {
    existing = record.phases.find((phase) => phase.fits.some((fit) => fit.id === payload['fitId'])) ?? null;
  }
  return { form: (payload['form'] as FitForm | undefined) ?? 'shomate', ranges, existing };
}
