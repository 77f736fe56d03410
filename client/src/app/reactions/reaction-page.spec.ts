import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, TestRequest, provideHttpClientTesting } from '@angular/common/http/testing';
import { signal } from '@angular/core';
import { TestBed } from '@angular/core/testing';
import { MatIconTestingModule } from '@angular/material/icon/testing';
import { MatSnackBar } from '@angular/material/snack-bar';
import { Router, provideRouter, withComponentInputBinding } from '@angular/router';
import { RouterTestingHarness } from '@angular/router/testing';

import { AuthService, User } from '../core/auth';
import { PreferencesService } from '../core/preferences';
import { PREFERS_DARK_QUERY, THEME_STORAGE } from '../core/theme';
import { EQUATION_CHECK_DEBOUNCE_MS, ReactionPage } from './reaction-page';
import { ReactionEvaluation } from './reactions-api';

const combustion = 'CH4(g) + 2 O2(g) -> CO2(g) + 2 H2O(g)';

function evaluation(temperatures: number[]): ReactionEvaluation {
  return {
    equation: combustion,
    balanced: true,
    release: '2025.1',
    species: [
      { formula: 'CH4', phase: 'g', coefficient: -1, speciesId: 1, name: 'methane' },
      { formula: 'O2', phase: 'g', coefficient: -2, speciesId: 2, name: 'oxygen' },
      { formula: 'CO2', phase: 'g', coefficient: 1, speciesId: 3, name: 'carbon dioxide' },
      { formula: 'H2O', phase: 'g', coefficient: 2, speciesId: 4, name: 'water' },
    ],
    results: temperatures.map((T) => ({
      T,
      deltaH: { value: -802.3, uncertainty: 0.43, unit: 'kJ/mol' },
      deltaS: { value: -5.1, uncertainty: 0.2, unit: 'J/(mol·K)' },
      deltaG: { value: -800.8 + T / 1000, uncertainty: 0.45, unit: 'kJ/mol' },
      deltaCp: { value: -2.3, uncertainty: 0.5, unit: 'J/(mol·K)' },
      log10K: { value: 140.3, uncertainty: 0.08 },
      K: 2.0e140,
      favouredBy: 'enthalpy',
    })),
    crossoverT: null,
  };
}

const wait = (ms: number) => new Promise((resolve) => setTimeout(resolve, ms));

describe('ReactionPage', () => {
  let harness: RouterTestingHarness;
  let backend: HttpTestingController;
  let user: ReturnType<typeof signal<User | null>>;

  const page = () => harness.routeNativeElement!;
  const text = (selector: string) => page().querySelector(selector)?.textContent?.replace(/\s+/g, ' ').trim() ?? '';

  function evaluateRequests(): TestRequest[] {
    return backend.match('/api/v1/reactions/evaluate');
  }

  function type(selector: string, value: string): void {
    const input = page().querySelector<HTMLInputElement>(selector)!;
    input.value = value;
    input.dispatchEvent(new Event('input'));
  }

  beforeEach(() => {
    user = signal<User | null>(null);
    TestBed.configureTestingModule({
      imports: [MatIconTestingModule],
      providers: [
        provideRouter([{ path: 'reactions', component: ReactionPage }], withComponentInputBinding()),
        provideHttpClient(),
        provideHttpClientTesting(),
        { provide: MatSnackBar, useValue: jasmine.createSpyObj('MatSnackBar', ['open']) },
        { provide: AuthService, useValue: { user, isSignedIn: () => user() !== null } },
        { provide: PreferencesService, useValue: { energyUnit: signal('kJ/mol') } },
        { provide: THEME_STORAGE, useValue: null },
        { provide: PREFERS_DARK_QUERY, useValue: null },
      ],
    });
    backend = TestBed.inject(HttpTestingController);
  });

  afterEach(() => document.documentElement.classList.remove('kx-theme-light', 'kx-theme-dark'));

  it('balances the equation as it is typed and names its species', async () => {
    harness = await RouterTestingHarness.create('/reactions');
    type('input[formcontrolname="equation"]', 'CH4(g) + O2(g) -> CO2(g) + H2O(g)');
    await wait(EQUATION_CHECK_DEBOUNCE_MS + 50);

    const balance = backend.expectOne('/api/v1/reactions/balance');
    expect(balance.request.body).toEqual({ equation: 'CH4(g) + O2(g) -> CO2(g) + H2O(g)' });
    balance.flush({ equation: combustion, coefficients: [1, 2, 1, 2], species: evaluation([]).species, balanced: true });
    const check = backend.expectOne('/api/v1/reactions/evaluate');
    expect(check.request.body).toEqual({ equation: combustion, temperatures: [298.15] });
    check.flush(evaluation([298.15]));
    await harness.fixture.whenStable();

    expect(text('#equation-check')).toContain('Balanced, and every species is in the release.');
    expect(text('#equation-check')).toContain(combustion);
    const terms = Array.from(page().querySelectorAll('.kx-terms li')).map((li) => li.textContent!.replace(/\s+/g, ' ').trim());
    expect(terms[1]).toBe('2 O2(g) oxygen reactant');
    expect(terms[3]).toBe('2 H2O(g) water product');
  });

  it('says why an equation cannot be balanced', async () => {
    harness = await RouterTestingHarness.create('/reactions');
    type('input[formcontrolname="equation"]', 'H2(g) -> O2(g)');
    await wait(EQUATION_CHECK_DEBOUNCE_MS + 50);
    backend
      .expectOne('/api/v1/reactions/balance')
      .flush({ error: 'unprocessable', message: 'O appears on one side only' }, { status: 422, statusText: 'Unprocessable' });
    await harness.fixture.whenStable();
    expect(text('#equation-check')).toBe('Cannot balance: O appears on one side only');
  });

  it('names unknown species with suggestions', async () => {
    harness = await RouterTestingHarness.create('/reactions');
    type('input[formcontrolname="equation"]', 'C2H6O(g) + 3 O2(g) -> 2 CO2(g) + 3 H2O(g)');
    await wait(EQUATION_CHECK_DEBOUNCE_MS + 50);
    backend.expectOne('/api/v1/reactions/balance').flush({
      equation: 'C2H6O(g) + 3 O2(g) -> 2 CO2(g) + 3 H2O(g)', coefficients: [1, 3, 2, 3], balanced: true,
      species: [{ formula: 'C2H6O', phase: 'g', coefficient: -1 }],
    });
    backend.expectOne('/api/v1/reactions/evaluate').flush(
      { error: 'unprocessable', message: 'C2H6O(g) is ambiguous', details: { missing: ['C2H6O(g)'], suggestions: { C2H6O: ['ethanol', 'dimethyl ether'] } } },
      { status: 422, statusText: 'Unprocessable' },
    );
    await harness.fixture.whenStable();
    expect(text('#equation-check')).toContain('Balanced, but not every species is in the release.');
    expect(text('#equation-check .kx-problems')).toContain('For C2H6O, did you mean: ethanol, dimethyl ether');
    expect(page().querySelector('#equation-check a')!.getAttribute('href')).toBe('/search?q=ethanol');
  });

  it('evaluates over the range in the URL and shows the results with the caution', async () => {
    harness = await RouterTestingHarness.create(`/reactions?equation=${encodeURIComponent(combustion)}&tMin=300&tMax=700`);
    const [request] = evaluateRequests();
    expect(request.request.body).toEqual({ equation: combustion, temperatures: [300, 400, 500, 600, 700] });
    request.flush(evaluation([300, 400, 500, 600, 700]));
    await harness.fixture.whenStable();

    expect(page().querySelector<HTMLInputElement>('input[formcontrolname="equation"]')!.value).toBe(combustion);
    const rows = page().querySelectorAll('.kx-reaction-table tr.mat-mdc-row');
    expect(rows.length).toBe(5);
    const cells = Array.from(rows[0].querySelectorAll('td')).map((td) => td.textContent!.replace(/\s+/g, ' ').trim());
    expect(cells).toEqual(['300', '-802.30 ± 0.43', '-5.1 ± 0.2', '-800.50 ± 0.45', '2 × 10¹⁴⁰', '140.30 ± 0.08', 'enthalpy']);
    expect(page().querySelectorAll('kx-caution-notice').length).toBe(2);
    expect(page().querySelectorAll('kx-line-chart').length).toBe(2);
    expect(text('.kx-summary')).toContain('ΔrG° keeps its sign over this range.');
  });

  it('puts a newly evaluated reaction in the URL', async () => {
    harness = await RouterTestingHarness.create('/reactions');
    type('input[formcontrolname="equation"]', combustion);
    type('input[formcontrolname="tMax"]', '1000');
    page().querySelector<HTMLButtonElement>('.kx-evaluate')!.click();
    await harness.fixture.whenStable();
    expect(TestBed.inject(Router).url).toBe(`/reactions?equation=${encodeURIComponent(combustion).replace(/%20/g, '%20')}&tMin=298.15&tMax=1000`);
    expect(evaluateRequests().length).toBe(1);
  });

  it('lists species the release lacks when evaluation fails', async () => {
    harness = await RouterTestingHarness.create('/reactions?equation=XeF2(g)%20-%3E%20Xe(g)%20%2B%20F2(g)');
    evaluateRequests()[0].flush(
      { error: 'unprocessable', message: 'Unknown species', details: { missing: ['XeF2(g)'], suggestions: {} } },
      { status: 422, statusText: 'Unprocessable' },
    );
    await harness.fixture.whenStable();
    expect(text('.kx-results [role="alert"]')).toContain('Not found in this release: XeF2(g).');
  });

  it('estimates the adiabatic rise from the chosen ΔrH° in J/mol', async () => {
    harness = await RouterTestingHarness.create(`/reactions?equation=${encodeURIComponent(combustion)}&tMin=300&tMax=400`);
    evaluateRequests()[0].flush(evaluation([300, 400]));
    await harness.fixture.whenStable();

    const form = page().querySelector('kx-adiabatic-rise-form')!;
    form.querySelector<HTMLButtonElement>('button[type="submit"]')!.click();
    await harness.fixture.whenStable();
    const request = backend.expectOne('/api/v1/reactions/adiabatic-rise');
    expect(request.request.body).toEqual({ deltaH: -802300, amount: 1, mass: 1, specificHeat: 4184 });
    request.flush({ deltaT: 191.75, caution: 'Screening estimate; no heat losses assumed.' });
    await harness.fixture.whenStable();
    expect(form.querySelector('[role="status"]')!.textContent).toContain('+192 K');
    expect(form.textContent).toContain('Screening estimate; no heat losses assumed.');
    expect(form.querySelector('kx-caution-notice')).not.toBeNull();
  });

  it('saves the reaction for a signed-in reader', async () => {
    user.set({ id: 2, email: 'steward@kelvindex.test', name: 'T', roles: ['steward'] });
    harness = await RouterTestingHarness.create(`/reactions?equation=${encodeURIComponent(combustion)}&tMin=300&tMax=400`);
    evaluateRequests()[0].flush(evaluation([300, 400]));
    await harness.fixture.whenStable();

    type('.kx-save-form input', 'Burner screening');
    page().querySelector<HTMLButtonElement>('.kx-save')!.click();
    await harness.fixture.whenStable();
    const save = backend.expectOne('/api/v1/saved-reactions');
    expect(save.request.body).toEqual({ name: 'Burner screening', equation: combustion, tMin: 300, tMax: 400 });
    save.flush({ id: 1, ...save.request.body, createdAt: '' });
    await harness.fixture.whenStable();
    expect(text('.kx-subsection [role="status"]')).toContain('Saved.');
  });

  it('asks a signed-out reader to sign in to save, returning to this reaction', async () => {
    harness = await RouterTestingHarness.create(`/reactions?equation=${encodeURIComponent(combustion)}&tMin=300&tMax=400`);
    evaluateRequests()[0].flush(evaluation([300, 400]));
    await harness.fixture.whenStable();
    const link = Array.from(page().querySelectorAll('a')).find((a) => a.textContent!.includes('Sign in to save'))!;
    const returnUrl = new URL(link.href).searchParams.get('returnUrl')!;
    const back = TestBed.inject(Router).parseUrl(returnUrl);
    expect(back.queryParams).toEqual({ equation: combustion, tMin: '300', tMax: '400' });
  });
});
