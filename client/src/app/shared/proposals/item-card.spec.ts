import { provideHttpClient } from '@angular/common/http';
import { provideHttpClientTesting } from '@angular/common/http/testing';
import { Component, signal } from '@angular/core';
import { ComponentFixture, TestBed } from '@angular/core/testing';
import { MatIconTestingModule } from '@angular/material/icon/testing';

import { ItemCard } from './item-card';
import { ProposalItem } from './proposal';

const item: ProposalItem = {
  id: 'i7', position: 2, kind: 'add_value',
  payload: { species: 'propan-1-ol', phase: 'l', quantity: 'dfH', value: '-302.6', unit: 'kJ/mol' },
  sourceId: 's1', source: { id: 's1', shortKey: 'okafor-2027', title: 'TC-04' },
  speciesId: null, speciesPhaseId: null, targetValueId: null, targetFitId: null,
  checks: [{ code: 'source-agreement', status: 'fail', message: 'differs from codata-1989' }],
  checksRanAt: '2026-11-20T10:00:00Z', checkSummary: { pass: 0, warn: 0, fail: 1 },
  evidence: [{ id: 'e1', fileName: 'runs.csv', mediaType: 'text/csv', sizeBytes: 2048, sha256: 'ab'.repeat(32), description: null, createdAt: '2026-11-20T10:00:00Z' }],
};

@Component({
  imports: [ItemCard],
  template: `
    <kx-item-card [item]="item()" [description]="{ kind: 'New value', subject: 'ΔfH°(l) of propan-1-ol' }">
      <button kxItemActions type="button" class="kx-edit">Edit</button>
      <p class="kx-body">-302.6 kJ/mol</p>
      <button kxItemEvidence type="button" class="kx-upload">Upload</button>
      <p kxItemComments class="kx-thread">No comments on this item.</p>
    </kx-item-card>
  `,
})
class ItemCardHost {
  readonly item = signal(item);
}

describe('ItemCard', () => {
  let fixture: ComponentFixture<ItemCardHost>;
  const element = () => fixture.nativeElement as HTMLElement;
  const section = (label: string) => element().querySelector(`section[aria-label="${label}"]`)!;

  beforeEach(async () => {
    TestBed.configureTestingModule({ imports: [MatIconTestingModule], providers: [provideHttpClient(), provideHttpClientTesting()] });
    fixture = TestBed.createComponent(ItemCardHost);
    await fixture.whenStable();
  });

  it('is an article named by its heading, with the item’s position and kind above it', () => {
    const article = element().querySelector('article')!;
    const heading = article.querySelector('h3')!;
    expect(heading.textContent).toBe('ΔfH°(l) of propan-1-ol');
    expect(heading.id).toBe('item-i7');
    expect(article.getAttribute('aria-labelledby')).toBe('item-i7');
    expect(article.querySelector('.kx-item-kind')!.textContent).toBe('2. New value');
  });

  it('puts each piece of content in its place', () => {
    expect(element().querySelector('header .kx-edit')).not.toBeNull();
    expect(element().querySelector('article > .kx-body')).not.toBeNull();
    expect(section('Evidence of item 2').querySelector('.kx-upload')).not.toBeNull();
    expect(section('Comments on item 2').querySelector('.kx-thread')).not.toBeNull();
    expect(element().querySelector('header .kx-body, header .kx-upload, header .kx-thread')).toBeNull();
  });

  it('shows the item’s checks and evidence', async () => {
    expect(section('Checks of item 2').textContent).toContain('source-agreement');
    expect(section('Evidence of item 2').textContent).toContain('runs.csv');

    fixture.componentInstance.item.set({ ...item, position: 3, checks: null, evidence: [] });
    await fixture.whenStable();
    expect(section('Checks of item 3').textContent).toContain('The automatic checks run when the proposal is submitted.');
    expect(section('Evidence of item 3').textContent).not.toContain('runs.csv');
  });
});
