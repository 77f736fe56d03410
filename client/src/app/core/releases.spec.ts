import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';

import { ReleaseSummary } from '../shared/release-picker/release-summary';
import { ReleasesService } from './releases';

describe('ReleasesService', () => {
  let service: ReleasesService;
  let backend: HttpTestingController;

  beforeEach(() => {
    TestBed.configureTestingModule({ providers: [provideHttpClient(), provideHttpClientTesting()] });
    service = TestBed.inject(ReleasesService);
    backend = TestBed.inject(HttpTestingController);
  });

  afterEach(() => backend.verify());

  it('asks once and shares the list', () => {
    const seen: (readonly ReleaseSummary[])[] = [];
    service.list().subscribe((list) => seen.push(list));
    service.list().subscribe((list) => seen.push(list));
    backend.expectOne('/api/v1/releases').flush({ items: [{ label: '2025.1', status: 'published', publishedAt: '2025-03-31', latest: true }] });
    expect(seen.length).toBe(2);
    expect(seen[1][0].label).toBe('2025.1');
  });

  it('asks again after a failure', () => {
    service.list().subscribe({ error: () => undefined });
    backend.expectOne('/api/v1/releases').flush(null, { status: 503, statusText: 'Unavailable' });
    let labels: string[] | undefined;
    service.list().subscribe((list) => (labels = list.map((release) => release.label)));
    backend.expectOne('/api/v1/releases').flush({ items: [{ label: '2025.2', status: 'published', publishedAt: null }] });
    expect(labels).toEqual(['2025.2']);
  });
});
