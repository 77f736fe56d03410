import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';
import { RouterLink } from '@angular/router';

import { Formula } from '../shared/formula/formula';
import { changeRows } from './change-log';
import { ChangeEntry } from './releases-api';

/**
 * A change log or diff as a dense table: species (linking to its page as of `release`), what
 * changed, how, and the versions before and after with their sources.
 */
@Component({
  selector: 'kx-change-log-table',
  imports: [Formula, RouterLink],
  template: `
    @if (rows().length === 0) {
      <p class="kx-muted">{{ emptyText() }}</p>
    } @else {
      <div class="kx-table-scroll">
        <table class="kx-change-table">
          <caption class="kx-visually-hidden">{{ caption() }}</caption>
          <thead>
            <tr>
              <th scope="col">Species</th>
              <th scope="col">What</th>
              <th scope="col">Change</th>
              <th scope="col">{{ beforeLabel() }}</th>
              <th scope="col">{{ afterLabel() }}</th>
            </tr>
          </thead>
          <tbody>
            @for (row of rows(); track $index) {
              <tr [class]="'kx-change-' + row.change">
                <td>
                  <a [routerLink]="['/species', row.speciesId]" [queryParams]="release() ? { release: release() } : {}">{{ row.species }}</a>
                  <kx-formula [formula]="row.formula" />
                </td>
                <td>{{ row.what }}</td>
                <td>{{ row.change }} <span class="kx-muted">({{ row.reason }})</span></td>
                <td class="kx-version">{{ row.before }}</td>
                <td class="kx-version">{{ row.after }}</td>
              </tr>
            }
          </tbody>
        </table>
      </div>
    }
  `,
  styles: `
    .kx-muted {
      color: var(--mat-sys-on-surface-variant);
    }
    .kx-change-table {
      border-collapse: collapse;
      width: 100%;
      min-width: 44rem;
      th,
      td {
        padding: 0.3rem 0.6rem;
        border-bottom: 1px solid var(--mat-sys-outline-variant);
        text-align: start;
        vertical-align: top;
      }
      kx-formula {
        margin-inline-start: 0.4rem;
        color: var(--mat-sys-on-surface-variant);
      }
    }
    .kx-version {
      font-variant-numeric: tabular-nums;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ChangeLogTable {
  readonly entries = input.required<readonly ChangeEntry[]>();
  /** The release species links open in. */
  readonly release = input<string | null>(null);
  readonly caption = input('Changes');
  readonly beforeLabel = input('Before');
  readonly afterLabel = input('After');
  readonly emptyText = input('Nothing changed.');

  protected readonly rows = computed(() => changeRows(this.entries()));
}
