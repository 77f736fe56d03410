import { DatePipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, booleanAttribute, computed, input } from '@angular/core';
import { RouterLink } from '@angular/router';

import { ageText } from './age';
import { Proposal } from './proposal';
import { ProposalStateBadge } from './proposal-state-badge';

/**
 * The head of a proposal's page: a link back to the list it came from, its title, state,
 * version, dates, release and checks, and its summary. Content (the page's buttons) follows.
 */
@Component({
  selector: 'kx-proposal-header',
  imports: [DatePipe, ProposalStateBadge, RouterLink],
  template: `
    @let p = proposal();
    <header>
      <p class="kx-crumbs"><a [routerLink]="backLink()">{{ backLabel() }}</a></p>
      <h1>{{ p.title }}</h1>
      <div class="kx-meta">
        <kx-proposal-state [state]="p.state" />
        @if (showAuthor()) {
          <span>by {{ p.author.name }}</span>
        }
        <span>version {{ p.version }}</span>
        <span>started {{ p.createdAt | date: 'yyyy-MM-dd' }}</span>
        @if (p.submittedAt) {
          <span>submitted {{ p.submittedAt | date: 'yyyy-MM-dd HH:mm' }} ({{ submittedAgo() }})</span>
        }
        @if (p.release) {
          <span>in release <a [routerLink]="['/releases', p.release.label]">{{ p.release.label }}</a></span>
        }
        @if (checksRan()) {
          <span class="kx-check-summary">
            checks: {{ p.checkSummary.fail }} failed, {{ p.checkSummary.warn }} warnings, {{ p.checkSummary.pass }} passed
          </span>
        }
      </div>
      @if (p.summary) {
        <p class="kx-summary">{{ p.summary }}</p>
      }
      <ng-content />
    </header>
  `,
  styles: `
    :host {
      display: block;
    }
    .kx-crumbs {
      margin: 0 0 0.25rem;
      font: var(--mat-sys-body-medium);
    }
    .kx-meta {
      display: flex;
      flex-wrap: wrap;
      gap: 0.25rem 1rem;
      align-items: center;
      color: var(--mat-sys-on-surface-variant);
      font: var(--mat-sys-body-medium);
    }
    .kx-check-summary {
      font-variant-numeric: tabular-nums;
    }
    .kx-summary {
      margin-top: 0.75rem;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ProposalHeader {
  readonly proposal = input.required<Proposal>();
  /** The list the page belongs to: `/proposals` or `/reviews`. */
  readonly backLink = input.required<string>();
  readonly backLabel = input.required<string>();
  /** Name the author (for reviewers; the author's own page leaves it out). */
  readonly showAuthor = input(false, { transform: booleanAttribute });

  /** How long ago the proposal was (last) submitted: "3 days ago", "just now". */
  protected readonly submittedAgo = computed(() => {
    const submitted = this.proposal().submittedAt;
    const age = submitted ? ageText(submitted) : '';
    return age === 'just now' ? age : `${age} ago`;
  });
  protected readonly checksRan = computed(() => this.proposal().items.some((item) => item.checks !== null));
}
