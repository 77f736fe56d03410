import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';

import { ApiKeysService, CreatedApiKey } from './api-keys';

describe('ApiKeysService', () => {
  let service: ApiKeysService;
  let backend: HttpTestingController;

  beforeEach(() => {
    TestBed.configureTestingModule({ providers: [provideHttpClient(), provideHttpClientTesting()] });
    service = TestBed.inject(ApiKeysService);
    backend = TestBed.inject(HttpTestingController);
  });

  afterEach(() => backend.verify());

  it('creates a key with a name and scope and returns its secret once', () => {
    let created: CreatedApiKey | undefined;
    service.create('simulator', 'read').subscribe((key) => (created = key));
    const request = backend.expectOne('/api/v1/api-keys');
    expect(request.request.method).toBe('POST');
    expect(request.request.body).toEqual({ name: 'simulator', scope: 'read' });
    request.flush({ id: 1, name: 'simulator', scope: 'read', prefix: 'kx_ab', createdAt: '', lastUsedAt: null, revokedAt: null, secret: 'kx_abcdef' });
    expect(created?.secret).toBe('kx_abcdef');
  });

  it('lists and revokes keys', () => {
    let count = 0;
    service.list().subscribe((keys) => (count = keys.length));
    backend.expectOne('/api/v1/api-keys').flush({ items: [{ id: 1 }, { id: 2 }] });
    expect(count).toBe(2);

    service.revoke(2).subscribe();
    expect(backend.expectOne('/api/v1/api-keys/2').request.method).toBe('DELETE');
  });
});
