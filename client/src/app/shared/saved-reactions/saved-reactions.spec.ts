import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';

import { SavedReaction, SavedReactionsService, reactionPageParams } from './saved-reactions';

describe('SavedReactionsService', () => {
  let service: SavedReactionsService;
  let backend: HttpTestingController;

  beforeEach(() => {
    TestBed.configureTestingModule({ providers: [provideHttpClient(), provideHttpClientTesting()] });
    service = TestBed.inject(SavedReactionsService);
    backend = TestBed.inject(HttpTestingController);
  });

  afterEach(() => backend.verify());

  it('saves a reaction with its temperature range', () => {
    let saved: SavedReaction | undefined;
    service.save({ name: 'Methane combustion', equation: 'CH4(g) + 2 O2(g) -> CO2(g) + 2 H2O(g)', tMin: 300, tMax: 1500 }).subscribe((item) => (saved = item));
    const request = backend.expectOne('/api/v1/saved-reactions');
    expect(request.request.method).toBe('POST');
    expect(request.request.body).toEqual({ name: 'Methane combustion', equation: 'CH4(g) + 2 O2(g) -> CO2(g) + 2 H2O(g)', tMin: 300, tMax: 1500 });
    request.flush({ id: 3, ...request.request.body, createdAt: '2025-01-01T00:00:00Z' });
    expect(saved?.id).toBe(3);
  });

  it('lists and deletes', () => {
    let names: string[] = [];
    service.list().subscribe((items) => (names = items.map((item) => item.name)));
    backend.expectOne('/api/v1/saved-reactions').flush({ items: [{ id: 1, name: 'a', equation: 'x', tMin: 1, tMax: 2, createdAt: '' }] });
    expect(names).toEqual(['a']);

    service.remove(1).subscribe();
    expect(backend.expectOne('/api/v1/saved-reactions/1').request.method).toBe('DELETE');
  });
});

describe('reactionPageParams', () => {
  it('carries the equation and range to the reaction page', () => {
    expect(reactionPageParams({ equation: 'H2(g) + 0.5 O2(g) -> H2O(l)', tMin: 298.15, tMax: 600 })).toEqual({
      equation: 'H2(g) + 0.5 O2(g) -> H2O(l)',
      tMin: '298.15',
      tMax: '600',
    });
  });
});
