import { AfterContentInit, ChangeDetectionStrategy, Component, contentChildren, input, viewChild } from '@angular/core';
import { MatColumnDef, MatTable, MatTableModule } from '@angular/material/table';
import { RouterLink } from '@angular/router';

import { ProposalSummary } from './proposal';
import { ProposalStateBadge } from './proposal-state-badge';

/**
 * A list of proposals as a table: the columns every list has (`title`, linking to the proposal
 * under `link`; `state`; `items`), and those given as content (`matColumnDef`s of the page's
 * own). `columns` orders them. The page sets `--kx-proposal-table-min-width` for its columns;
 * narrower screens scroll the table sideways.
 */
@Component({
  selector: 'kx-proposal-table',
  imports: [MatTableModule, ProposalStateBadge, RouterLink],
  template: `
    <div class="kx-table-scroll">
      <table mat-table [dataSource]="rows()">
        <caption class="kx-visually-hidden">{{ rows().length }} proposals</caption>
        <ng-container matColumnDef="title">
          <th mat-header-cell *matHeaderCellDef>Title</th>
          <td mat-cell *matCellDef="let p"><a [routerLink]="[link(), p.id]">{{ p.title }}</a></td>
        </ng-container>
        <ng-container matColumnDef="state">
          <th mat-header-cell *matHeaderCellDef>State</th>
          <td mat-cell *matCellDef="let p"><kx-proposal-state [state]="p.state" /></td>
        </ng-container>
        <ng-container matColumnDef="items">
          <th mat-header-cell *matHeaderCellDef class="kx-numeric">Items</th>
          <td mat-cell *matCellDef="let p" class="kx-numeric">{{ p.itemCount }}</td>
        </ng-container>
        <tr mat-header-row *matHeaderRowDef="columns()"></tr>
        <tr mat-row *matRowDef="let row; columns: columns()"></tr>
      </table>
    </div>
  `,
  styles: `
    :host {
      display: block;
    }
    table {
      min-width: var(--kx-proposal-table-min-width, 40rem);
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ProposalTable implements AfterContentInit {
  private readonly table = viewChild.required(MatTable);
  private readonly pageColumns = contentChildren(MatColumnDef);

  readonly rows = input.required<readonly ProposalSummary[]>();
  /** The columns to show, in order: `title`, `state`, `items` and the names of the page's own. */
  readonly columns = input.required<readonly string[]>();
  /** Where a title leads: `/proposals` (the author's editor) or `/reviews` (the review page). */
  readonly link = input.required<string>();

  ngAfterContentInit(): void {
    for (const column of this.pageColumns()) {
      this.table().addColumnDef(column);
    }
  }
}
