import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';

import { WatchlistService, WatchedSpecies } from './watchlist';

describe('WatchlistService', () => {
  let service: WatchlistService;
  let backend: HttpTestingController;

  beforeEach(() => {
    TestBed.configureTestingModule({ providers: [provideHttpClient(), provideHttpClientTesting()] });
    service = TestBed.inject(WatchlistService);
    backend = TestBed.inject(HttpTestingController);
  });

  afterEach(() => backend.verify());

  it('lists the watched species', () => {
    let items: readonly WatchedSpecies[] = [];
    service.list().subscribe((list) => (items = list));
    backend.expectOne('/api/v1/watchlist').flush({ items: [{ speciesId: 7, formula: 'H2O', name: 'water', createdAt: '2025-01-01' }] });
    expect(items.map((item) => item.name)).toEqual(['water']);
  });

  it('watches with PUT and stops with DELETE', () => {
    service.watch(7).subscribe();
    const put = backend.expectOne('/api/v1/watchlist/7');
    expect(put.request.method).toBe('PUT');
    put.flush(null, { status: 204, statusText: 'No Content' });

    service.unwatch(7).subscribe();
    const remove = backend.expectOne('/api/v1/watchlist/7');
    expect(remove.request.method).toBe('DELETE');
    remove.flush(null, { status: 204, statusText: 'No Content' });
  });
});
