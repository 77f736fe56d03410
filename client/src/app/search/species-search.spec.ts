import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';

import { REPORT_HTTP_ERRORS } from '../core/api-error-interceptor';
import { DEFAULT_QUERY, SpeciesSearchService, normaliseElements, searchParams } from './species-search';

describe('searchParams', () => {
  it('sends only the filters that are set, with sort and paging', () => {
    expect(searchParams(DEFAULT_QUERY).toString()).toBe('sort=name&page=1&pageSize=25');
  });

  it('sends the box text as q and the element mode with the elements', () => {
    const params = searchParams({ ...DEFAULT_QUERY, q: ' CH4 ', elements: 'C,H', elementsMode: 'only', phase: 'g', quantity: 'dfH', release: '2025.1', page: 2 });
    expect(params.toString()).toBe('q=CH4&elements=C,H&phase=g&quantity=dfH&release=2025.1&elementsMode=only&sort=name&page=2&pageSize=25');
  });
});

describe('normaliseElements', () => {
  it('accepts symbols typed in any case and separated anyhow', () => {
    expect(normaliseElements('c h o')).toBe('C,H,O');
    expect(normaliseElements('Fe; O, fe')).toBe('Fe,O');
    expect(normaliseElements('')).toBe('');
  });

  it('refuses what is not a symbol', () => {
    expect(normaliseElements('water')).toBeNull();
    expect(normaliseElements('C2')).toBeNull();
  });
});

describe('SpeciesSearchService', () => {
  let service: SpeciesSearchService;
  let backend: HttpTestingController;

  beforeEach(() => {
    TestBed.configureTestingModule({ providers: [provideHttpClient(), provideHttpClientTesting()] });
    service = TestBed.inject(SpeciesSearchService);
    backend = TestBed.inject(HttpTestingController);
  });

  afterEach(() => backend.verify());

  it('asks the API for one page of matches', () => {
    service.find({ ...DEFAULT_QUERY, q: 'water' }).subscribe();
    const request = backend.expectOne((r) => r.url === '/api/v1/species');
    expect(request.request.params.get('q')).toBe('water');
    expect(request.request.params.get('pageSize')).toBe('25');
  });

  it('asks for a few quiet suggestions', () => {
    let names: string[] = [];
    service.suggest('meth', '2025.1').subscribe((items) => (names = items.map((item) => item.name)));
    const request = backend.expectOne((r) => r.url === '/api/v1/species');
    expect(request.request.params.get('pageSize')).toBe('8');
    expect(request.request.params.get('release')).toBe('2025.1');
    expect(request.request.context.get(REPORT_HTTP_ERRORS)).toBeFalse();
    request.flush({ items: [{ id: 1, name: 'methane' }], total: 1, page: 1, pageSize: 8, release: '2025.1' });
    expect(names).toEqual(['methane']);
  });

  it('builds an export link with the same filters and no paging', () => {
    expect(service.exportUrl({ ...DEFAULT_QUERY, elements: 'C,H', page: 3 }, 'csv')).toBe(
      '/api/v1/export?elements=C,H&elementsMode=contains&format=csv',
    );
  });
});
