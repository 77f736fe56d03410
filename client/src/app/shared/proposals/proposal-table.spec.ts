import { Component, signal } from '@angular/core';
import { ComponentFixture, TestBed } from '@angular/core/testing';
import { MatTableModule } from '@angular/material/table';
import { provideRouter } from '@angular/router';

import { ProposalSummary } from './proposal';
import { ProposalTable } from './proposal-table';

function summary(id: string, title: string, change: Partial<ProposalSummary> = {}): ProposalSummary {
  return {
    id, title, summary: '', state: 'submitted', version: 1,
    author: { id: 'u1', name: 'Tomasz Okafor' }, release: null,
    submittedAt: '2026-11-20T10:00:00Z', decidedAt: null, createdAt: '2026-11-19T10:00:00Z', updatedAt: '2026-11-20T10:00:00Z',
    itemCount: 3, failedChecks: 1,
    ...change,
  };
}

@Component({
  imports: [MatTableModule, ProposalTable],
  template: `
    <kx-proposal-table [rows]="rows()" [columns]="columns()" link="/reviews">
      <ng-container matColumnDef="author">
        <th mat-header-cell *matHeaderCellDef>Author</th>
        <td mat-cell *matCellDef="let p">{{ p.author.name }}</td>
      </ng-container>
    </kx-proposal-table>
  `,
})
class TableHost {
  readonly rows = signal([summary('p1', 'Ethyl acetate: ΔvapH'), summary('p2', 'Propan-1-ol: ΔfH°', { state: 'in_review', itemCount: 12 })]);
  readonly columns = signal(['title', 'author', 'state', 'items']);
}

describe('ProposalTable', () => {
  let fixture: ComponentFixture<TableHost>;
  const element = () => fixture.nativeElement as HTMLElement;
  const headers = () => Array.from(element().querySelectorAll('th')).map((th) => th.textContent!.trim());
  const cells = (row: number) => Array.from(element().querySelectorAll('tbody tr')[row].querySelectorAll('td')).map((td) => td.textContent!.trim());

  beforeEach(async () => {
    TestBed.configureTestingModule({ providers: [provideRouter([])] });
    fixture = TestBed.createComponent(TableHost);
    await fixture.whenStable();
  });

  it('shows its own columns and the page’s in the order given', () => {
    expect(headers()).toEqual(['Title', 'Author', 'State', 'Items']);
    expect(cells(0)).toEqual(['Ethyl acetate: ΔvapH', 'Tomasz Okafor', 'Submitted', '3']);
    expect(cells(1)).toEqual(['Propan-1-ol: ΔfH°', 'Tomasz Okafor', 'In review', '12']);
    expect(element().querySelector('caption')!.textContent).toBe('2 proposals');
  });

  it('links each title under the page’s address', () => {
    const links = Array.from(element().querySelectorAll('tbody a')).map((a) => a.getAttribute('href'));
    expect(links).toEqual(['/reviews/p1', '/reviews/p2']);
  });

  it('follows a change of columns and rows', async () => {
    fixture.componentInstance.columns.set(['state', 'title']);
    fixture.componentInstance.rows.set([summary('p3', 'Water: S°', { state: 'approved' })]);
    await fixture.whenStable();
    expect(headers()).toEqual(['State', 'Title']);
    expect(cells(0)).toEqual(['Approved', 'Water: S°']);
  });

  it('keeps a readable width and scrolls sideways in its own box on a narrow screen', () => {
    const table = element().querySelector<HTMLElement>('kx-proposal-table > .kx-table-scroll > table')!;
    expect(getComputedStyle(table).minWidth).toBe('640px');
    expect(getComputedStyle(table.parentElement!).overflowX).toBe('auto');
  });
});
