import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { ComponentFixture, TestBed } from '@angular/core/testing';
import { By } from '@angular/platform-browser';

import { CatalogueSpecies } from '../shared/catalogue/catalogue-api';
import { SourcePicker } from '../shared/sources/source-picker';
import { FitItemForm } from './fit-item-form';
import { ItemDraft } from './item-draft';
import { SpeciesChoice } from './subject';
import { SubjectPicker } from './subject-picker';

const water: SpeciesChoice = { id: 'sp-1', name: 'water', formula: 'H2O', phases: [{ phase: 'g', polymorph: null }] };

/** NIST WebBook's Shomate fit for H2O(g), 500–1700 K. */
const waterRecord: CatalogueSpecies = {
  id: 'sp-1',
  formula: 'H2O',
  name: 'water',
  release: '2026.2',
  phases: [
    {
      phase: 'g',
      polymorph: null,
      quantities: [],
      fits: [
        {
          id: 'f0a1b2c3-0000-4000-8000-000000000001',
          form: 'shomate',
          tMin: 500,
          tMax: 1700,
          ranges: [{ tMin: 500, tMax: 1700, coefficients: [30.092, 6.832514, 6.793435, -2.53448, 0.082139, -250.881, 223.3967, -241.8264] }],
          source: { id: 's9', key: 'nist-webbook', citation: 'NIST Chemistry WebBook', doi: null },
          recommended: true,
        },
      ],
    },
  ],
};

describe('FitItemForm', () => {
  let fixture: ComponentFixture<FitItemForm>;
  let backend: HttpTestingController;
  let saved: ItemDraft[];
  const element = () => fixture.nativeElement as HTMLElement;
  const field = (label: string) =>
    Array.from(element().querySelectorAll('mat-form-field')).find((f) => f.querySelector('mat-label')!.textContent!.trim() === label)!;

  beforeEach(async () => {
    TestBed.configureTestingModule({ providers: [provideHttpClient(), provideHttpClientTesting()] });
    backend = TestBed.inject(HttpTestingController);
    saved = [];
    fixture = TestBed.createComponent(FitItemForm);
    fixture.componentInstance.save.subscribe((draft) => saved.push(draft));
    await fixture.whenStable();
    backend.match((r) => r.url === '/api/v1/sources').forEach((r) => r.flush({ items: [], total: 0 }));
  });

  async function chooseWaterGas(): Promise<void> {
    const picker = fixture.debugElement.query(By.directive(SubjectPicker)).componentInstance as SubjectPicker;
    picker.subject.set({ species: water, phase: 'g', polymorph: null, newPhase: false });
    await fixture.whenStable();
    backend.expectOne('/api/v1/species/sp-1').flush(waterRecord);
    await fixture.whenStable();
  }

  async function choose(label: string, option: string): Promise<void> {
    field(label).querySelector<HTMLElement>('.mat-mdc-select-trigger')!.click();
    await fixture.whenStable();
    Array.from(document.querySelectorAll<HTMLElement>('mat-option')).find((o) => o.textContent!.trim() === option)!.click();
    await fixture.whenStable();
  }

  it('names the choice of a new fit, as well as each fit it could be a new version of', async () => {
    await chooseWaterGas();
    const choice = field('This fit is');
    expect(choice.querySelector('.mat-mdc-select-value')!.textContent!.trim()).toBe('a new fit from another source');

    await choose('This fit is', 'a new version of the shomate fit 500–1700 K from nist-webbook');
    expect(choice.querySelector('.mat-mdc-select-value')!.textContent!.trim()).toBe('a new version of the shomate fit 500–1700 K from nist-webbook');
    await choose('This fit is', 'a new fit from another source');
    expect(choice.querySelector('.mat-mdc-select-value')!.textContent!.trim()).toBe('a new fit from another source');
  });

  it('shows the longest form whole', async () => {
    element().style.width = '600px';
    await choose('Form', 'NASA 9-coefficient (a1…a7, b1, b2)');
    // The trigger cuts off what does not fit with an ellipsis.
    const shown = field('Form').querySelector<HTMLElement>('.mat-mdc-select-value')!;
    expect(shown.textContent!.trim()).toBe('NASA 9-coefficient (a1…a7, b1, b2)');
    expect(shown.clientWidth).toBeGreaterThan(0);
    expect(shown.scrollWidth).toBeLessThanOrEqual(shown.clientWidth);
  });

  it('saves a new fit of the chosen species phase with its method and source', async () => {
    await chooseWaterGas();
    const numbers = element().querySelector<HTMLTextAreaElement>('textarea[formcontrolname="numbers"]')!;
    numbers.value = '30.092 6.832514 6.793435 -2.53448 0.082139 -250.881 223.3967 -241.8264';
    numbers.dispatchEvent(new Event('input'));
    await choose('Method', 'critically evaluated');
    const source = fixture.debugElement.query(By.directive(SourcePicker)).componentInstance as SourcePicker;
    source.source.set({ id: 's9', shortKey: 'nist-webbook', title: 'NIST Chemistry WebBook' });
    await fixture.whenStable();

    element().querySelector<HTMLButtonElement>('.kx-save-item')!.click();
    await fixture.whenStable();
    expect(saved.length).toBe(1);
    expect(saved[0].kind).toBe('add_fit');
    expect(saved[0].sourceId).toBe('s9');
    expect(saved[0].prerequisites).toEqual([]);
    expect(saved[0].payload).toEqual(jasmine.objectContaining({ speciesId: 'sp-1', phase: 'g', form: 'shomate', tMin: 298.15, tMax: 1000, method: 'evaluated', pressurePa: 100000 }));
  });

  it('refuses a fit without method or source, and says so', async () => {
    await chooseWaterGas();
    element().querySelector<HTMLButtonElement>('.kx-save-item')!.click();
    await fixture.whenStable();
    expect(saved).toEqual([]);
    expect(element().querySelector('.kx-form-problem')!.textContent).toContain('Some fields need attention before the fit can be saved.');
    const errors = Array.from(element().querySelectorAll('mat-error')).map((e) => e.textContent!.trim());
    expect(errors).toContain('Say how the fit was obtained.');
    expect(errors.some((e) => e.startsWith('Choose a source from the list'))).toBeTrue();
  });
});
