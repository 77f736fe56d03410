import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { ComponentFixture, TestBed } from '@angular/core/testing';
import { provideRouter } from '@angular/router';

import { ImportPage } from './import-page';

const job = {
  id: 'j1', fileName: 'solvents.csv', format: 'csv', dryRun: true, status: 'succeeded', totalRows: 2, processedRows: 2,
  errorCount: 0, errors: [], proposalId: null, progress: 1, createdAt: '2026-11-30T10:00:00Z', finishedAt: '2026-11-30T10:00:01Z',
};

describe('ImportPage', () => {
  let fixture: ComponentFixture<ImportPage>;
  let backend: HttpTestingController;
  const element = () => fixture.nativeElement as HTMLElement;
  const button = (text: string) => Array.from(element().querySelectorAll('button, a')).find((b) => b.textContent!.trim() === text) as HTMLElement | undefined;

  beforeEach(async () => {
    TestBed.configureTestingModule({ providers: [provideHttpClient(), provideHttpClientTesting(), provideRouter([])] });
    backend = TestBed.inject(HttpTestingController);
    fixture = TestBed.createComponent(ImportPage);
    await fixture.whenStable();
    backend.expectOne('/api/v1/imports').flush({ items: [] });
    const input = element().querySelector<HTMLInputElement>('input[type=file]')!;
    const files = new DataTransfer();
    files.items.add(new File(['formula,phase\n'], 'solvents.csv', { type: 'text/csv' }));
    input.files = files.files;
    input.dispatchEvent(new Event('change'));
    await fixture.whenStable();
  });

  afterEach(() => backend.verify());

  async function check(answer: object): Promise<void> {
    button('Check the file')!.click();
    const request = backend.expectOne((r) => r.url === '/api/v1/imports' && r.method === 'POST');
    expect(request.request.params.get('dryRun')).toBe('true');
    expect((request.request.body as FormData).get('file')).toEqual(jasmine.any(File));
    request.flush(answer);
    await fixture.whenStable();
  }

  it('lists every problem of the dry run with its line, and offers no import', async () => {
    await check({ ...job, errorCount: 1, errors: [{ line: 3, field: 'unit', message: 'unit must be one of kJ/mol…' }], rows: 2, wouldCreate: { species: 0, phases: 0, values: 1 } });
    const cells = Array.from(element().querySelectorAll('.kx-problem-table tbody td')).map((td) => td.textContent!.trim());
    expect(cells).toEqual(['3', 'unit', 'unit must be one of kJ/mol…']);
    expect(element().textContent).toContain('nothing was written');
    expect(button('Download the problems as CSV')).toBeDefined();
    expect(button('Import into a draft proposal')).toBeUndefined();
  });

  it('keeps the problem table readable on a phone, scrolling it sideways in its own box', async () => {
    element().style.display = 'block';
    element().style.width = '358px';
    await check({ ...job, errorCount: 1, errors: [{ line: 3, field: 'unit', message: 'unit must be one of kJ/mol…' }], rows: 2, wouldCreate: { species: 0, phases: 0, values: 1 } });
    const table = element().querySelector<HTMLElement>('.kx-problem-table')!;
    const box = table.parentElement!;
    expect(table.offsetWidth).toBeGreaterThan(358);
    expect(box.clientWidth).toBeLessThanOrEqual(358);
    expect(box.scrollWidth).toBeGreaterThan(box.clientWidth);
    expect(box.getAttribute('tabindex')).toBe('0');
    expect(element().scrollWidth).toBeLessThanOrEqual(358);
  });

  it('imports a clean file, follows the job to the end and links the draft proposal', async () => {
    await check({ ...job, rows: 2, wouldCreate: { species: 0, phases: 0, values: 2 } });
    expect(element().textContent).toContain('No problems: the import would add 2 values');
    button('Import into a draft proposal')!.click();
    const run = backend.expectOne((r) => r.url === '/api/v1/imports' && r.method === 'POST');
    expect(run.request.params.get('dryRun')).toBe('false');
    run.flush({ ...job, dryRun: false, status: 'running', processedRows: 0, progress: 0, rows: 2, wouldCreate: { species: 0, phases: 0, values: 2 } });
    await new Promise((resolve) => setTimeout(resolve, 10));
    backend.expectOne('/api/v1/imports/j1').flush({ ...job, dryRun: false, status: 'succeeded', proposalId: 'p9' });
    await fixture.whenStable();
    backend.expectOne('/api/v1/imports').flush({ items: [] });
    await fixture.whenStable();
    expect(element().textContent).toContain('Done: 2 rows imported into a draft proposal.');
    expect(button('Open the draft proposal')!.getAttribute('href')).toBe('/proposals/p9');
  });
});
