import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { ComponentFixture, TestBed } from '@angular/core/testing';
import { FormControl } from '@angular/forms';

import { SourceImportForm, doiValidator } from './source-import-form';
import { Source, firstAuthor, isDoi } from './sources-api';

describe('DOI rules', () => {
  it('accepts bare, doi: and https://doi.org/ forms', () => {
    expect(isDoi('10.1063/1.555805')).toBeTrue();
    expect(isDoi('doi:10.1063/1.555805')).toBeTrue();
    expect(isDoi('https://doi.org/10.1063/1.555805')).toBeTrue();
  });

  it('refuses text that is not a DOI, and leaves an empty field to the required rule', () => {
    expect(isDoi('1063/1.555805')).toBeFalse();
    expect(doiValidator(new FormControl('J. Phys. Chem. Ref. Data', { nonNullable: true }))).toEqual({ doi: true });
    expect(doiValidator(new FormControl('', { nonNullable: true }))).toBeNull();
  });

  it('names the first author of a CSL record', () => {
    expect(firstAuthor({ csl: { author: [{ family: 'Cox', given: 'J. D.' }, { family: 'Wagman' }] } })).toBe('Cox et al.');
    expect(firstAuthor({ csl: { author: [{ literal: 'CODATA' }] } })).toBe('CODATA');
    expect(firstAuthor({ csl: {} })).toBeNull();
  });
});

describe('SourceImportForm', () => {
  let fixture: ComponentFixture<SourceImportForm>;
  let backend: HttpTestingController;
  let created: Source[][];

  const element = () => fixture.nativeElement as HTMLElement;

  beforeEach(async () => {
    TestBed.configureTestingModule({ providers: [provideHttpClient(), provideHttpClientTesting()] });
    backend = TestBed.inject(HttpTestingController);
    fixture = TestBed.createComponent(SourceImportForm);
    created = [];
    fixture.componentInstance.created.subscribe((sources) => created.push(sources));
    await fixture.whenStable();
  });

  afterEach(() => backend.verify());

  it('asks for entries before importing', async () => {
    element().querySelector<HTMLButtonElement>('.kx-import-sources')!.click();
    await fixture.whenStable();
    expect(element().querySelector('mat-error')!.textContent).toContain('Paste at least one entry.');
    backend.expectNone('/api/v1/sources/import');
  });

  it('imports the pasted entries and emits the sources created', async () => {
    const textarea = element().querySelector<HTMLTextAreaElement>('textarea')!;
    textarea.value = '@article{demo, title = {A title}, year = {2027}}';
    textarea.dispatchEvent(new Event('input'));
    element().querySelector<HTMLButtonElement>('.kx-import-sources')!.click();
    const request = backend.expectOne('/api/v1/sources/import');
    expect(request.request.body).toEqual({ text: '@article{demo, title = {A title}, year = {2027}}' });
    request.flush({ format: 'bibtex', items: [{ id: 's1', shortKey: 'demo' }] });
    await fixture.whenStable();
    expect(created).toEqual([[{ id: 's1', shortKey: 'demo' } as Source]]);
  });

  it('shows the API’s reason in place when a DOI is already there', async () => {
    const textarea = element().querySelector<HTMLTextAreaElement>('textarea')!;
    textarea.value = '@article{x, title = {T}, doi = {10.1/x}}';
    textarea.dispatchEvent(new Event('input'));
    element().querySelector<HTMLButtonElement>('.kx-import-sources')!.click();
    backend
      .expectOne('/api/v1/sources/import')
      .flush({ error: 'conflict', message: 'A source with DOI 10.1/x already exists: cox-1989' }, { status: 409, statusText: 'Conflict' });
    await fixture.whenStable();
    expect(element().querySelector('[role="alert"]')!.textContent).toContain('already exists: cox-1989');
    expect(created).toEqual([]);
  });
});
