import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { signal } from '@angular/core';
import { TestBed } from '@angular/core/testing';

import { AuthService, User } from './auth';
import { PreferencesService, molarEnergyUnitOf, preferenceOf } from './preferences';

describe('PreferencesService', () => {
  let user: ReturnType<typeof signal<User | null>>;
  let backend: HttpTestingController;
  let preferences: PreferencesService;

  beforeEach(() => {
    user = signal<User | null>(null);
    TestBed.configureTestingModule({
      providers: [provideHttpClient(), provideHttpClientTesting(), { provide: AuthService, useValue: { user } }],
    });
    backend = TestBed.inject(HttpTestingController);
    preferences = TestBed.inject(PreferencesService);
    TestBed.tick();
  });

  afterEach(() => backend.verify());

  it('uses kJ/mol for anonymous readers without asking the API', () => {
    expect(preferences.energyUnit()).toBe('kJ/mol');
    backend.expectNone('/api/v1/me/preferences');
  });

  it('loads the preference when someone signs in and forgets it when they sign out', () => {
    user.set({ id: 1, email: 'a@k.test', name: 'A', roles: ['reader'] });
    TestBed.tick();
    backend.expectOne('/api/v1/me/preferences').flush({ energyUnit: 'kcal' });
    expect(preferences.energyUnit()).toBe('kcal/mol');

    user.set(null);
    TestBed.tick();
    expect(preferences.energyUnit()).toBe('kJ/mol');
  });

  it('stores a new preference', () => {
    preferences.saveEnergyUnit('kcal/mol').subscribe();
    const request = backend.expectOne('/api/v1/me/preferences');
    expect(request.request.method).toBe('PUT');
    expect(request.request.body).toEqual({ energyUnit: 'kcal' });
    request.flush({ energyUnit: 'kcal' });
    expect(preferences.energyUnit()).toBe('kcal/mol');
  });

  it('maps the API’s names to the unit selector’s', () => {
    expect(molarEnergyUnitOf('kcal')).toBe('kcal/mol');
    expect(preferenceOf('kJ/mol')).toBe('kJ');
  });
});
