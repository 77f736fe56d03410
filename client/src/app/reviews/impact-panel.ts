import { ChangeDetectionStrategy, Component, computed, inject, input } from '@angular/core';
import { toObservable, toSignal } from '@angular/core/rxjs-interop';
import { switchMap } from 'rxjs';

import { Loadable, loadable } from '../shared/loadable/loadable';
import { LoadingIndicator } from '../shared/loading-indicator/loading-indicator';
import { ProposalImpact, ReactionChange } from '../shared/proposals/proposal';
import { ProposalsApi } from '../shared/proposals/proposals-api';
import { QUANTITY_SYMBOLS, phaseText } from '../shared/vocabulary/thermo-vocabulary';

/** A reaction energy change in kJ/mol with its sign, or a dash. */
export function kilojoules(joules: number | null, signed = false): string {
  if (joules === null) {
    return '—';
  }
  const text = (joules / 1000).toFixed(2);
  return signed && joules > 0 ? `+${text}` : text;
}

/**
 * What the proposal's revisions and retirements change for the people using the data: per
 * item, the watchers of the species and each saved reaction that uses it, with ΔrH° and ΔrG° at
 * 298.15 K before and after (from the latest release's recommended values).
 */
@Component({
  selector: 'kx-impact-panel',
  imports: [LoadingIndicator],
  template: `
    @let state = impact();
    @if (state.state === 'loading') {
      <kx-loading-indicator label="Working out the impact" />
    } @else if (state.state === 'failed') {
      <p class="kx-muted">The impact could not be worked out: {{ state.message }}</p>
    } @else if (state.value.items.length === 0) {
      <p class="kx-muted">This proposal revises or retires no value in the catalogue, so no saved reaction changes.</p>
    } @else {
      @for (item of rows(); track item.itemId) {
        <section class="kx-impact-item" [attr.aria-label]="'Impact of item ' + item.position">
          <h3>
            {{ item.position }}. {{ item.symbol }}({{ item.phase }}) of {{ item.species.name }}: {{ item.old.enteredValue }} {{ item.old.enteredUnit }}
            → {{ item.new ? item.new.enteredValue + ' ' + item.new.enteredUnit : 'retired' }}
          </h3>
          <p class="kx-muted">
            {{ item.recommendedInRelease ? 'The recommended value in release ' + release() : 'Not the recommended value in release ' + release() }} ·
            {{ item.watcherCount }} watcher{{ item.watcherCount === 1 ? '' : 's' }} of the species
          </p>
          @if (item.savedReactions.length === 0) {
            <p class="kx-muted">No saved reaction uses this species phase.</p>
          } @else {
            <div class="kx-table-scroll" tabindex="0" role="region" [attr.aria-label]="'Saved reactions using ' + item.species.name">
              <table class="kx-impact-table">
                <caption class="kx-visually-hidden">Saved reactions using {{ item.species.name }}, at {{ temperature() }} K, kJ/mol</caption>
                <thead>
                  <tr>
                    <th scope="col">Saved reaction</th>
                    <th scope="col">Owner</th>
                    <th scope="col" class="kx-numeric">ΔrH° before</th>
                    <th scope="col" class="kx-numeric">after</th>
                    <th scope="col" class="kx-numeric">change</th>
                    <th scope="col" class="kx-numeric">ΔrG° before</th>
                    <th scope="col" class="kx-numeric">after</th>
                    <th scope="col" class="kx-numeric">change</th>
                  </tr>
                </thead>
                <tbody>
                  @for (reaction of item.savedReactions; track reaction.id) {
                    <tr>
                      <td>
                        {{ reaction.name }} <code>{{ reaction.equation }}</code>
                        @if (reaction.note) {
                          <br /><small class="kx-muted">{{ reaction.note }}</small>
                        }
                      </td>
                      <td>{{ reaction.owner }}{{ reaction.pinnedRelease ? ' (pinned to ' + reaction.pinnedRelease + ')' : '' }}</td>
                      <td class="kx-numeric">{{ kj(reaction.deltaH.old) }}</td>
                      <td class="kx-numeric">{{ kj(reaction.deltaH.new) }}</td>
                      <td class="kx-numeric">{{ change(reaction.deltaH) }}</td>
                      <td class="kx-numeric">{{ kj(reaction.deltaG.old) }}</td>
                      <td class="kx-numeric">{{ kj(reaction.deltaG.new) }}</td>
                      <td class="kx-numeric">{{ change(reaction.deltaG) }}</td>
                    </tr>
                  }
                </tbody>
              </table>
            </div>
          }
        </section>
      }
    }
  `,
  styles: `
    .kx-muted {
      color: var(--mat-sys-on-surface-variant);
    }
    .kx-impact-item h3 {
      font: var(--mat-sys-title-small);
      margin: 0.75rem 0 0.25rem;
    }
    .kx-impact-table {
      border-collapse: collapse;
      width: 100%;
      th,
      td {
        padding: 0.3rem 0.6rem;
        border-bottom: 1px solid var(--mat-sys-outline-variant);
        text-align: start;
        vertical-align: top;
      }
      th.kx-numeric,
      td.kx-numeric {
        text-align: end;
      }
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ImpactPanel {
  private readonly proposals = inject(ProposalsApi);

  readonly proposalId = input.required<string>();

  protected readonly impact = toSignal(toObservable(this.proposalId).pipe(switchMap((id) => loadable(this.proposals.impact(id)))), {
    initialValue: { state: 'loading' } as Loadable<ProposalImpact>,
  });
  protected readonly release = computed(() => {
    const state = this.impact();
    return state.state === 'ok' ? (state.value.release ?? '—') : '';
  });
  protected readonly temperature = computed(() => {
    const state = this.impact();
    return state.state === 'ok' ? state.value.temperatureK : 298.15;
  });
  protected readonly rows = computed(() => {
    const state = this.impact();
    return state.state === 'ok'
      ? state.value.items.map((item) => ({ ...item, symbol: QUANTITY_SYMBOLS[item.quantity], phase: phaseText(item.phase, item.polymorph) }))
      : [];
  });

  protected kj(joules: number | null): string {
    return kilojoules(joules);
  }

  protected change(change: ReactionChange): string {
    return kilojoules(change.change, true);
  }
}
