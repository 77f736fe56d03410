import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';

import { CheckList } from './check-list';
import { EvidenceList } from './evidence-list';
import { ItemDescription } from './item-description';
import { ProposalItem } from './proposal';

/**
 * An item of a proposal as its author and its reviewers see it: its kind and subject as the
 * card's heading, what the page shows of the item (the content), its automatic checks and evidence
 * side by side, and its comments. Content marked `kxItemActions` goes beside the heading,
 * `kxItemEvidence` under the evidence, `kxItemComments` (the comment thread) last.
 */
@Component({
  selector: 'kx-item-card',
  imports: [CheckList, EvidenceList],
  template: `
    <article [attr.aria-labelledby]="headingId()">
      <header class="kx-item-header">
        <div>
          <span class="kx-item-kind">{{ item().position }}. {{ description().kind }}</span>
          <h3 [id]="headingId()">{{ description().subject }}</h3>
        </div>
        <ng-content select="[kxItemActions]" />
      </header>
      <ng-content />
      <div class="kx-item-columns">
        <section [attr.aria-label]="'Checks of item ' + item().position">
          <h4>Automatic checks</h4>
          <kx-check-list [checks]="item().checks" />
        </section>
        <section [attr.aria-label]="'Evidence of item ' + item().position">
          <h4>Evidence</h4>
          <kx-evidence-list [files]="item().evidence" />
          <ng-content select="[kxItemEvidence]" />
        </section>
      </div>
      <section [attr.aria-label]="'Comments on item ' + item().position" class="kx-item-comments">
        <h4>Comments</h4>
        <ng-content select="[kxItemComments]" />
      </section>
    </article>
  `,
  styles: `
    :host {
      display: block;
      margin-bottom: 1rem;
    }
    article {
      padding: 0.75rem 1rem 0.5rem;
      border: 1px solid var(--mat-sys-outline-variant);
      border-radius: var(--mat-sys-corner-medium);
      background: var(--mat-sys-surface-container-lowest);
    }
    .kx-item-header {
      display: flex;
      flex-wrap: wrap;
      justify-content: space-between;
      gap: 0.25rem 1rem;
      margin-bottom: 0.25rem;
      h3 {
        margin: 0;
      }
    }
    .kx-item-kind {
      font: var(--mat-sys-label-medium);
      color: var(--mat-sys-on-surface-variant);
    }
    .kx-item-columns {
      display: grid;
      grid-template-columns: repeat(auto-fit, minmax(18rem, 1fr));
      gap: 0.5rem 2rem;
      margin-top: 0.5rem;
    }
    h4 {
      margin: 0.5rem 0 0.25rem;
    }
    .kx-item-comments h4 {
      margin-top: 0.75rem;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ItemCard {
  readonly item = input.required<ProposalItem>();
  readonly description = input.required<Pick<ItemDescription, 'kind' | 'subject'>>();

  protected readonly headingId = computed(() => `item-${this.item().id}`);
}
