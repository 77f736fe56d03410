import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, TestRequest, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';
import { MatIconTestingModule } from '@angular/material/icon/testing';
import { MatSnackBar } from '@angular/material/snack-bar';
import { Router, provideRouter, withComponentInputBinding } from '@angular/router';
import { RouterTestingHarness } from '@angular/router/testing';

import { PREFERS_DARK_QUERY, THEME_STORAGE } from '../core/theme';
import { SpeciesPage } from './species-page';
import { PropertyRow, PropertyTable, SpeciesDetail, ThermoValue } from './species-record';

const source = { id: 1, key: 'REF-1', citation: 'Reference tables of the invented lab (2020)', doi: '10.1000/ref1' };

function value(overrides: Partial<ThermoValue>): ThermoValue {
  return {
    id: 100, lineageId: 100, value: 0, uncertainty: null, uncertaintyKind: 'standard', coverageFactor: null, unit: 'J/mol',
    temperature: 298.15, pressure: 100000, method: 'evaluated', methodDetail: null, source, enteredBy: 'T. Okafor',
    approvedBy: 'I. Marchetti', createdAt: '2025-01-01T00:00:00Z', history: [], ...overrides,
  };
}

const water: SpeciesDetail = {
  id: 7, formula: 'H2O', hillFormula: 'H2O', name: 'water', charge: 0, molarMass: 18.01528, synonyms: ['oxidane'],
  identifiers: { inchi: 'InChI=1S/H2O/h1H2', inchiKey: 'XLYOFNOQVPJJNP-UHFFFAOYSA-N', casRn: '7732-18-5', smiles: 'O' },
  release: '2025.1',
  phases: [
    {
      phase: 'g', polymorph: null,
      quantities: [
        {
          quantity: 'dfH', symbol: 'ΔfH°', unit: 'J/mol',
          recommended: value({ id: 812, value: -241826, uncertainty: 40, history: [{ id: 811, value: -241818, uncertainty: 42, createdAt: '2024-01-01T00:00:00Z', releases: ['2024.2'] }] }),
          alternatives: [value({ id: 900, value: -241830, uncertainty: 100, uncertaintyKind: 'expanded', coverageFactor: 2, method: 'measured', source: { ...source, id: 2, key: 'LAB-7', doi: null, citation: 'Invented lab notebook 7' } })],
        },
        { quantity: 'S', symbol: 'S°', unit: 'J/(mol·K)', recommended: value({ id: 813, value: 188.835, uncertainty: 0.01, unit: 'J/(mol·K)' }), alternatives: [] },
      ],
      fits: [{ id: 5, form: 'nasa7', tMin: 200, tMax: 6000, source, recommended: true }],
    },
    { phase: 'l', polymorph: null, quantities: [{ quantity: 'dfH', symbol: 'ΔfH°', unit: 'J/mol', recommended: value({ id: 814, value: -285830, uncertainty: 40 }), alternatives: [] }], fits: [] },
  ],
};

function propertyTable(temperatures: number[], units = 'kJ'): PropertyTable {
  const energy = units === 'kJ' ? 'kJ/mol' : 'kcal/mol';
  const rows: PropertyRow[] = temperatures.map((T) => ({
    T, extrapolated: false,
    Cp: { value: 33.6 + T / 100, uncertainty: 0.1, unit: 'J/(mol·K)' },
    S: { value: 188.8, uncertainty: 0.01, unit: 'J/(mol·K)' },
    HminusH298: { value: (T - 298.15) * 0.034, uncertainty: null, unit: energy },
    gibbsEnergyFunction: { value: 188.8, uncertainty: null, unit: 'J/(mol·K)' },
    deltaFH: { value: -241.826, uncertainty: 0.04, unit: energy },
    deltaFG: { value: -228.6 + T / 100, uncertainty: 0.04, unit: energy },
    log10Kf: { value: 40.05, uncertainty: 0.01, unit: '' },
  }));
  return { species: { id: 7, formula: 'H2O', name: 'water' }, phase: 'g', polymorph: null, release: '2025.1', units: units as 'kJ', fit: { form: 'nasa7', tMin: 200, tMax: 6000 }, rows };
}

describe('SpeciesPage', () => {
  let harness: RouterTestingHarness;
  let backend: HttpTestingController;

  const page = () => harness.routeNativeElement!;
  const text = (selector: string) => page().querySelector(selector)?.textContent?.replace(/\s+/g, ' ').trim() ?? '';

  function propertyRequests(): TestRequest[] {
    return backend.match((request) => request.url === '/api/v1/species/7/properties');
  }

  /** Answers the plot request (many temperatures) and the table request (the default range). */
  async function answerProperties(units = 'kJ'): Promise<{ plot: TestRequest; table: TestRequest }> {
    const requests = propertyRequests();
    const [plot, table] = [...requests].sort((a, b) => b.request.params.get('T')!.split(',').length - a.request.params.get('T')!.split(',').length);
    for (const request of [plot, table]) {
      request.flush(propertyTable(request.request.params.get('T')!.split(',').map(Number), units));
    }
    await harness.fixture.whenStable();
    return { plot, table };
  }

  async function open(url: string): Promise<void> {
    harness = await RouterTestingHarness.create(url);
    backend.match('/api/v1/releases').forEach((request) => request.flush({ items: [] }));
    await harness.fixture.whenStable();
  }

  async function openWater(url = '/species/7'): Promise<void> {
    await open(url);
    backend.expectOne((request) => request.url === '/api/v1/species/7').flush(water);
    await harness.fixture.whenStable();
  }

  beforeEach(() => {
    TestBed.configureTestingModule({
      imports: [MatIconTestingModule],
      providers: [
        provideRouter([{ path: 'species/:id', component: SpeciesPage }], withComponentInputBinding()),
        provideHttpClient(),
        provideHttpClientTesting(),
        { provide: MatSnackBar, useValue: jasmine.createSpyObj('MatSnackBar', ['open']) },
        { provide: THEME_STORAGE, useValue: null },
        { provide: PREFERS_DARK_QUERY, useValue: null },
      ],
    });
    backend = TestBed.inject(HttpTestingController);
  });

  afterEach(() => {
    document.documentElement.classList.remove('kx-theme-light', 'kx-theme-dark');
    document.querySelectorAll('.cdk-overlay-container').forEach((overlay) => (overlay.innerHTML = ''));
  });

  it('shows the species’ identity and molar mass', async () => {
    await openWater();
    expect(text('h1')).toBe('water H2O');
    expect(text('.kx-release-line')).toContain('release 2025.1');
    const terms = Array.from(page().querySelectorAll('.kx-identity dt')).map((term) => term.textContent!.trim());
    expect(terms).toEqual(['Hill formula', 'Molar mass', 'Charge', 'CAS RN', 'InChIKey', 'InChI', 'SMILES', 'Other names']);
    expect(text('.kx-identity')).toContain('18.0153 g/mol');
    expect(text('.kx-identity')).toContain('7732-18-5');
  });

  it('shows each recommended value with uncertainty, conditions, method and source', async () => {
    await openWater();
    const cards = Array.from(page().querySelectorAll('.kx-value-card'));
    expect(cards.length).toBe(2);
    const enthalpy = cards[0];
    expect(enthalpy.querySelector('h3')!.textContent).toContain('ΔfH°');
    expect(enthalpy.querySelector('.kx-value-main')!.textContent!.replace(/\s+/g, ' ').trim()).toBe('-241.83 ± 0.04 kJ/mol');
    expect(enthalpy.textContent).toContain('standard uncertainty · 298.15 K · 1 bar · critically evaluated');
    expect(enthalpy.textContent).toContain('Reference tables of the invented lab (2020)');
    expect(enthalpy.querySelector('a[href="https://doi.org/10.1000/ref1"]')).not.toBeNull();
    expect(enthalpy.textContent).toContain('entered by T. Okafor, approved by I. Marchetti');
  });

  it('lists the alternatives and the history of the recommended value', async () => {
    await openWater();
    const panel = page().querySelector<HTMLElement>('.kx-value-card mat-expansion-panel-header')!;
    expect(panel.textContent).toContain('1 alternative and history');
    panel.click();
    await harness.fixture.whenStable();
    const more = page().querySelector('.kx-value-card .kx-value-more')!;
    expect(more.textContent).toContain('Invented lab notebook 7');
    expect(more.textContent).toContain('expanded uncertainty, k = 2');
    expect(more.textContent).toContain('-241.818 ± 0.042 kJ/mol');
    expect(more.textContent).toContain('2024.2');
  });

  it('plots four properties over the fit’s range and tabulates the default range', async () => {
    await openWater();
    const { plot, table } = await answerProperties();
    const plotTemperatures = plot.request.params.get('T')!.split(',').map(Number);
    expect(plotTemperatures[0]).toBe(200);
    expect(plotTemperatures.at(-1)).toBe(6000);
    expect(plot.request.params.get('phase')).toBe('g');
    expect(plot.request.params.get('units')).toBe('kJ');
    expect(table.request.params.get('T')).toBe('298.15,400,500,600,700,800,900,1000,1100,1200,1300,1400,1500');

    expect(page().querySelectorAll('kx-line-chart').length).toBe(4);
    expect(Array.from(page().querySelectorAll('figcaption')).map((caption) => caption.textContent!.trim())).toEqual([
      'Heat capacity, Cp°',
      'Entropy, S°',
      'Enthalpy above 298.15 K, H° − H°(298.15 K)',
      'Gibbs energy of formation, ΔfG°',
    ]);
    expect(text('kx-property-plots')).toContain('NASA 7-coefficient heat-capacity fit, valid from 200 K to 6000 K');

    const headers = Array.from(page().querySelectorAll('.kx-property-table th')).map((th) => th.textContent!.replace(/\s+/g, ' ').trim());
    expect(headers).toEqual(['T in K', 'ΔfH° in kJ/mol', 'ΔfG° in kJ/mol', 'log₁₀ Kf', 'Cp° in J/(mol·K)', 'S° in J/(mol·K)', 'H° − H°(298.15 K) in kJ/mol']);
    expect(page().querySelectorAll('.kx-property-table tr.mat-mdc-row').length).toBe(13);
  });

  it('asks again in kcal when the unit changes', async () => {
    await openWater();
    await answerProperties();
    Array.from(page().querySelectorAll<HTMLButtonElement>('kx-unit-selector button')).find((b) => b.textContent!.includes('kcal'))!.click();
    await harness.fixture.whenStable();
    const requests = propertyRequests();
    expect(requests.length).toBe(2);
    expect(requests.every((request) => request.request.params.get('units') === 'kcal')).toBeTrue();
    expect(page().querySelector('.kx-value-main')!.textContent).toContain('kcal/mol');
  });

  it('explains an out-of-range table and offers extrapolation', async () => {
    await openWater();
    const { table } = await answerProperties();
    expect(table).toBeDefined();
    const form = page().querySelector('.kx-table-settings')!;
    const tMax = form.querySelector<HTMLInputElement>('input[formcontrolname="tMax"]')!;
    tMax.value = '7000';
    tMax.dispatchEvent(new Event('input'));
    form.querySelector<HTMLButtonElement>('button[type="submit"]')!.click();
    await harness.fixture.whenStable();
    propertyRequests()[0].flush({ error: 'unprocessable', message: '7000 K is above the fit’s range (6000 K).' }, { status: 422, statusText: 'Unprocessable' });
    await harness.fixture.whenStable();
    expect(text('kx-temperature-table [role="alert"]')).toContain('above the fit’s range');
    expect(text('kx-temperature-table [role="alert"]')).toContain('allow extrapolation');
  });

  it('exports the table as shown, as CSV', async () => {
    await openWater();
    await answerProperties();
    const created = spyOn(URL, 'createObjectURL').and.returnValue('blob:kelvindex-test');
    spyOn(HTMLAnchorElement.prototype, 'click');
    page().querySelector<HTMLButtonElement>('.kx-download-csv')!.click();

    const blob = created.calls.mostRecent().args[0] as Blob;
    const csv = await blob.text();
    expect(csv.split('\r\n')[0]).toBe(
      'species,formula,phase,release,T (K),extrapolated,ΔfH° (kJ/mol),u(ΔfH°) (kJ/mol),ΔfG° (kJ/mol),u(ΔfG°) (kJ/mol),log₁₀ Kf,u(log₁₀ Kf),Cp° (J/(mol·K)),u(Cp°) (J/(mol·K)),S° (J/(mol·K)),u(S°) (J/(mol·K)),H° − H°(298.15 K) (kJ/mol),u(H° − H°(298.15 K)) (kJ/mol)',
    );
    expect(csv.split('\r\n')[1]).toMatch(/^water,H2O,g,2025\.1,298\.15,false,-241\.826,0\.04,/);
  });

  it('cites a value as text and BibTeX', async () => {
    await openWater();
    page().querySelector<HTMLButtonElement>('.kx-cite-button')!.click();
    await harness.fixture.whenStable();
    const dialog = document.querySelector('kx-cite-dialog')!;
    const blocks = Array.from(dialog.querySelectorAll('pre')).map((pre) => pre.textContent!);
    expect(blocks[0]).toContain('ΔfH°(H2O, g, 298.15 K) = -241.83 ± 0.04 kJ/mol (standard uncertainty), water.');
    expect(blocks[0]).toContain('Kelvindex release 2025.1 (value 812)');
    expect(blocks[0]).toContain('/species/7?release=2025.1&phase=g');
    expect(blocks[1]).toContain('@misc{kelvindex_2025_1_H2O_g_dfH,');
  });

  it('switches phase through the URL', async () => {
    await openWater('/species/7?phase=l');
    expect(text('#values-heading')).toBe('Reference values, liquid');
    expect(text('kx-property-plots')).toContain('no heat-capacity fit');

    Array.from(page().querySelectorAll<HTMLButtonElement>('.kx-phase-choice button')).find((b) => b.textContent!.includes('gas'))!.click();
    await harness.fixture.whenStable();
    expect(TestBed.inject(Router).url).toBe('/species/7?phase=g');
  });

  it('offers signed-out readers to sign in to watch', async () => {
    await openWater();
    expect(page().querySelector('kx-watch-button a')!.getAttribute('href')).toBe('/sign-in?returnUrl=%2Fspecies%2F7');
  });

  it('says so when the species does not exist', async () => {
    await open('/species/999?release=2024.2');
    const request = backend.expectOne((r) => r.url === '/api/v1/species/999');
    expect(request.request.params.get('release')).toBe('2024.2');
    request.flush({ error: 'not_found', message: 'No species 999' }, { status: 404, statusText: 'Not Found' });
    await harness.fixture.whenStable();
    expect(text('kx-empty-state h2')).toBe('No species with this address');
  });
});
