import { HttpErrorResponse, provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';

import { REPORT_HTTP_ERRORS } from '../core/api-error-interceptor';
import { ReactionsApi, speciesProblems } from './reactions-api';

describe('ReactionsApi', () => {
  let api: ReactionsApi;
  let backend: HttpTestingController;

  beforeEach(() => {
    TestBed.configureTestingModule({ providers: [provideHttpClient(), provideHttpClientTesting()] });
    api = TestBed.inject(ReactionsApi);
    backend = TestBed.inject(HttpTestingController);
  });

  afterEach(() => backend.verify());

  it('evaluates over the given temperatures, pinned to a release when one is chosen', () => {
    api.evaluate('H2(g) + 0.5 O2(g) -> H2O(g)', [298.15, 1000], '2025.1').subscribe();
    const request = backend.expectOne('/api/v1/reactions/evaluate');
    expect(request.request.body).toEqual({ equation: 'H2(g) + 0.5 O2(g) -> H2O(g)', temperatures: [298.15, 1000], release: '2025.1' });
    expect(request.request.context.get(REPORT_HTTP_ERRORS)).toBeFalse();

    api.evaluate('x', [298.15], '').subscribe();
    expect(backend.expectOne('/api/v1/reactions/evaluate').request.body).toEqual({ equation: 'x', temperatures: [298.15] });
  });

  it('sends the adiabatic-rise inputs in SI', () => {
    api.adiabaticRise(-241826, 2, 10, 4180).subscribe();
    expect(backend.expectOne('/api/v1/reactions/adiabatic-rise').request.body).toEqual({ deltaH: -241826, amount: 2, mass: 10, specificHeat: 4180 });
  });

  it('balances', () => {
    api.balance('H2 + O2 -> H2O').subscribe();
    expect(backend.expectOne('/api/v1/reactions/balance').request.body).toEqual({ equation: 'H2 + O2 -> H2O' });
  });
});

describe('speciesProblems', () => {
  it('reads missing species and suggestions from a 422', () => {
    const error = new HttpErrorResponse({
      status: 422,
      error: { error: 'unprocessable', message: 'Unknown species: C2H6O(g)', details: { missing: ['C2H6O(g)'], suggestions: { C2H6O: ['ethanol', 'dimethyl ether'] } } },
    });
    expect(speciesProblems(error)).toEqual({
      message: 'Unknown species: C2H6O(g)',
      missing: ['C2H6O(g)'],
      suggestions: [{ formula: 'C2H6O', names: ['ethanol', 'dimethyl ether'] }],
    });
  });

  it('is null for other failures', () => {
    expect(speciesProblems(new HttpErrorResponse({ status: 500 }))).toBeNull();
  });
});
