import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, TestRequest, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';
import { MatIconTestingModule } from '@angular/material/icon/testing';
import { MatSnackBar } from '@angular/material/snack-bar';
import { Router, provideRouter, withComponentInputBinding } from '@angular/router';
import { RouterTestingHarness } from '@angular/router/testing';

import { SearchPage, TYPEAHEAD_DEBOUNCE_MS } from './search-page';
import { SpeciesPage, SpeciesSummary } from './species-search';

const methane: SpeciesSummary = {
  id: 11, formula: 'CH4', hillFormula: 'CH4', name: 'methane', charge: 0, molarMass: 16.0425, phases: [{ phase: 'g', polymorph: null }],
};
const methanol: SpeciesSummary = {
  id: 12, formula: 'CH3OH', hillFormula: 'CH4O', name: 'methanol', charge: 0, molarMass: 32.042, phases: [{ phase: 'g', polymorph: null }, { phase: 'l', polymorph: null }],
};

function pageOf(items: SpeciesSummary[], total = items.length, page = 1): SpeciesPage {
  return { items, total, page, pageSize: 25, release: '2025.1' };
}

const wait = (ms: number) => new Promise((resolve) => setTimeout(resolve, ms));

describe('SearchPage', () => {
  let harness: RouterTestingHarness;
  let backend: HttpTestingController;
  let router: Router;

  function page(): HTMLElement {
    return harness.routeNativeElement!;
  }

  function searchRequests(): TestRequest[] {
    return backend.match((request) => request.url === '/api/v1/species' && request.params.get('pageSize') !== '8');
  }

  function answerSearch(result: SpeciesPage): TestRequest {
    const [request] = searchRequests();
    request.flush(result);
    return request;
  }

  function type(selector: string, value: string): void {
    const input = page().querySelector<HTMLInputElement>(selector)!;
    input.focus();
    input.value = value;
    input.dispatchEvent(new Event('input'));
  }

  async function open(url: string): Promise<void> {
    harness = await RouterTestingHarness.create(url);
    backend.match('/api/v1/releases').forEach((request) =>
      request.flush({ items: [{ label: '2025.1', status: 'published', publishedAt: '2025-03-31T00:00:00Z', latest: true, notes: '', publishedBy: 'e' }] }),
    );
    await harness.fixture.whenStable();
  }

  beforeEach(() => {
    TestBed.configureTestingModule({
      imports: [MatIconTestingModule],
      providers: [
        provideRouter([{ path: 'search', component: SearchPage }, { path: 'species/:id', children: [] }], withComponentInputBinding()),
        provideHttpClient(),
        provideHttpClientTesting(),
        { provide: MatSnackBar, useValue: jasmine.createSpyObj('MatSnackBar', ['open']) },
      ],
    });
    backend = TestBed.inject(HttpTestingController);
    router = TestBed.inject(Router);
  });

  it('runs the search the URL describes and fills the form from it', async () => {
    await open('/search?q=CH4&elements=C,H&elementsMode=only&phase=g&sort=-molarMass&page=2');
    const [request] = searchRequests();
    expect(request.request.params.toString()).toBe('q=CH4&elements=C,H&phase=g&elementsMode=only&sort=-molarMass&page=2&pageSize=25');
    expect(page().querySelector<HTMLInputElement>('input[type="search"]')!.value).toBe('CH4');
    expect(page().querySelector<HTMLInputElement>('input[formcontrolname="elements"]')!.value).toBe('C, H');
  });

  it('shows the matches in a table with links to each species, and says how many', async () => {
    await open('/search?q=meth');
    answerSearch(pageOf([methane, methanol], 2));
    await harness.fixture.whenStable();

    const rows = Array.from(page().querySelectorAll('tr.mat-mdc-row'));
    expect(rows.length).toBe(2);
    const link = rows[0].querySelector('a')!;
    expect(link.textContent!.trim()).toBe('methane');
    expect(link.getAttribute('href')).toBe('/species/11');
    expect(rows[1].querySelectorAll('kx-phase-badge').length).toBe(2);
    expect(rows[0].querySelector('.kx-numeric')!.textContent!.trim()).toBe('16.043');
    expect(page().querySelector('[role="status"].kx-summary')!.textContent).toContain('2 species match in release 2025.1');
  });

  it('puts a new search in the URL, from the first page, replacing the history entry', async () => {
    await open('/search?page=3');
    answerSearch(pageOf([]));
    const navigate = spyOn(router, 'navigate').and.callThrough();

    type('input[type="search"]', ' CO2 ');
    page().querySelector<HTMLButtonElement>('.kx-search-button')!.click();
    await harness.fixture.whenStable();

    expect(navigate.calls.mostRecent().args[1]).toEqual(jasmine.objectContaining({ replaceUrl: true }));
    expect(router.url).toBe('/search?q=CO2');
    expect(searchRequests()[0].request.params.get('q')).toBe('CO2');
  });

  it('applies element filters as they are typed, and refuses what is not a symbol', async () => {
    await open('/search');
    answerSearch(pageOf([]));

    type('input[formcontrolname="elements"]', 'c h o');
    await wait(450);
    await harness.fixture.whenStable();
    expect(router.url).toBe('/search?elements=C,H,O');

    type('input[formcontrolname="elements"]', 'water');
    page().querySelector<HTMLInputElement>('input[formcontrolname="elements"]')!.dispatchEvent(new Event('blur'));
    await wait(450);
    await harness.fixture.whenStable();
    expect(router.url).toBe('/search?elements=C,H,O');
    expect(page().querySelector('mat-error')!.textContent).toContain('Use element symbols');
  });

  it('sorts through the column headers', async () => {
    await open('/search?q=meth');
    answerSearch(pageOf([methane, methanol], 2));
    await harness.fixture.whenStable();

    const header = Array.from(page().querySelectorAll<HTMLElement>('th .mat-sort-header-container')).find((h) =>
      h.textContent!.includes('Molar mass'),
    )!;
    header.click();
    await harness.fixture.whenStable();
    expect(router.url).toBe('/search?q=meth&sort=molarMass');
    answerSearch(pageOf([methane, methanol], 2));
    await harness.fixture.whenStable();

    Array.from(page().querySelectorAll<HTMLElement>('th .mat-sort-header-container')).find((h) => h.textContent!.includes('Molar mass'))!.click();
    await harness.fixture.whenStable();
    expect(router.url).toBe('/search?q=meth&sort=-molarMass');
  });

  it('pages through the results', async () => {
    await open('/search');
    answerSearch(pageOf([methane], 60));
    await harness.fixture.whenStable();
    page().querySelector<HTMLButtonElement>('.mat-mdc-paginator-navigation-next')!.click();
    await harness.fixture.whenStable();
    expect(router.url).toBe('/search?page=2');
    expect(searchRequests()[0].request.params.get('page')).toBe('2');
  });

  it('suggests species while typing, once typing pauses, cancelling stale requests', async () => {
    await open('/search');
    answerSearch(pageOf([]));

    type('input[type="search"]', 'm');
    type('input[type="search"]', 'me');
    await wait(TYPEAHEAD_DEBOUNCE_MS + 50);
    const first = backend.expectOne((request) => request.params.get('pageSize') === '8');
    expect(first.request.params.get('q')).toBe('me');

    type('input[type="search"]', 'meth');
    await wait(TYPEAHEAD_DEBOUNCE_MS + 50);
    expect(first.cancelled).toBeTrue();
    const second = backend.expectOne((request) => request.params.get('pageSize') === '8');
    expect(second.request.params.get('q')).toBe('meth');
    second.flush(pageOf([methane, methanol], 2));
    await harness.fixture.whenStable();

    const options = Array.from(document.querySelectorAll('mat-option.kx-suggestion'));
    expect(options.map((option) => option.textContent!.replace(/\s+/g, ' ').trim())).toEqual(['CH4 methane', 'CH3OH methanol']);
  });

  it('opens a suggested species directly', async () => {
    await open('/search');
    answerSearch(pageOf([]));
    type('input[type="search"]', 'methane');
    await wait(TYPEAHEAD_DEBOUNCE_MS + 50);
    backend.expectOne((request) => request.params.get('pageSize') === '8').flush(pageOf([methane]));
    await harness.fixture.whenStable();

    document.querySelector<HTMLElement>('mat-option.kx-suggestion')!.click();
    await harness.fixture.whenStable();
    expect(router.url).toBe('/species/11');
  });

  it('shows an empty state when nothing matches', async () => {
    await open('/search?q=unobtainium');
    answerSearch(pageOf([]));
    await harness.fixture.whenStable();
    expect(page().querySelector('kx-empty-state h2')!.textContent).toBe('No species match');
    expect(page().querySelector('table')).toBeNull();
  });

  it('shows the failure and searches again on request', async () => {
    await open('/search?q=water');
    searchRequests()[0].flush({ error: 'bad_request', message: 'elements must be element symbols' }, { status: 400, statusText: 'Bad Request' });
    await harness.fixture.whenStable();
    expect(page().querySelector('kx-error-state')!.textContent).toContain('elements must be element symbols');

    page().querySelector<HTMLButtonElement>('kx-error-state button')!.click();
    await harness.fixture.whenStable();
    answerSearch(pageOf([methane]));
    await harness.fixture.whenStable();
    expect(page().querySelectorAll('tr.mat-mdc-row').length).toBe(1);
  });

  it('links the export to the same filters', async () => {
    await open('/search?elements=C,H&phase=g');
    const link = page().querySelector<HTMLAnchorElement>('a[download]')!;
    expect(link.getAttribute('href')).toBe('/api/v1/export?elements=C,H&phase=g&elementsMode=contains&format=csv');
  });
});
