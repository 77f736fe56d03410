import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { ComponentFixture, TestBed } from '@angular/core/testing';

import { ProposalItem } from '../shared/proposals/proposal';
import { ItemDraft } from './item-draft';
import { ValueItemForm } from './value-item-form';

const item: ProposalItem = {
  id: 'i1', position: 1, kind: 'add_value',
  payload: { speciesId: 'sp-1', phase: 'l', quantity: 'dfH', value: '-302.6', unit: 'kJ/mol', uncertainty: '0.4', uncertaintyKind: 'standard', temperatureK: 298.15, pressurePa: 100000, method: 'measured' },
  sourceId: 's1', source: { id: 's1', shortKey: 'okafor-2027', title: 'TC-04' },
  speciesId: null, speciesPhaseId: null, targetValueId: null, targetFitId: null,
  checks: null, checksRanAt: null, checkSummary: { pass: 0, warn: 0, fail: 0 }, evidence: [],
};

describe('ValueItemForm', () => {
  let fixture: ComponentFixture<ValueItemForm>;
  let backend: HttpTestingController;
  let saved: ItemDraft[];
  const element = () => fixture.nativeElement as HTMLElement;

  function type(selector: string, value: string): void {
    const input = element().querySelector<HTMLInputElement>(selector)!;
    input.value = value;
    input.dispatchEvent(new Event('input'));
  }

  beforeEach(() => {
    TestBed.configureTestingModule({ providers: [provideHttpClient(), provideHttpClientTesting()] });
    backend = TestBed.inject(HttpTestingController);
    saved = [];
  });

  async function create(edit: ProposalItem | null): Promise<void> {
    fixture = TestBed.createComponent(ValueItemForm);
    fixture.componentRef.setInput('item', edit);
    fixture.componentInstance.save.subscribe((draft) => saved.push(draft));
    await fixture.whenStable();
    // The source picker lists sources as soon as it shows.
    backend.match((r) => r.url === '/api/v1/sources').forEach((r) => r.flush({ items: [], total: 0 }));
  }

  it('keeps the subject of an item being edited while the species record is still loading', async () => {
    await create(item);
    type('input[formcontrolname="uncertainty"]', '0.35');
    element().querySelector<HTMLButtonElement>('.kx-save-item')!.click();
    await fixture.whenStable();
    expect(saved.length).toBe(1);
    expect(saved[0].kind).toBe('add_value');
    expect(saved[0].sourceId).toBe('s1');
    expect(saved[0].payload).toEqual(jasmine.objectContaining({ speciesId: 'sp-1', phase: 'l', quantity: 'dfH', value: '-302.6', uncertainty: '0.35' }));
    expect(saved[0].prerequisites).toEqual([]);
  });

  it('refuses a new value without species, value, method or source, and says so', async () => {
    await create(null);
    element().querySelector<HTMLButtonElement>('.kx-save-item')!.click();
    await fixture.whenStable();
    expect(saved).toEqual([]);
    expect(element().querySelector('[role="alert"]')!.textContent).toContain('Some fields need attention');
    const errors = Array.from(element().querySelectorAll('mat-error')).map((e) => e.textContent!.trim());
    expect(errors).toContain('Enter the value as the source prints it.');
    expect(errors).toContain('Say how the value was obtained.');
    expect(errors.some((e) => e.startsWith('Choose a species from the list'))).toBeTrue();
    expect(errors.some((e) => e.startsWith('Choose a source from the list'))).toBeTrue();
  });

  it('asks for k as soon as the uncertainty is expanded', async () => {
    await create(null);
    type('input[formcontrolname="uncertainty"]', '0.8');
    const expanded = Array.from(element().querySelectorAll('mat-button-toggle')).find((t) => t.textContent!.includes('expanded'))!;
    expanded.querySelector('button')!.click();
    await fixture.whenStable();
    const k = element().querySelector<HTMLInputElement>('input[formcontrolname="coverageFactor"]');
    expect(k).not.toBeNull();
    element().querySelector<HTMLButtonElement>('.kx-save-item')!.click();
    await fixture.whenStable();
    expect(Array.from(element().querySelectorAll('mat-error')).map((e) => e.textContent!.trim())).toContain(
      'An expanded uncertainty needs its coverage factor k (e.g. 2).',
    );
  });
});
