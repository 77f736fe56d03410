import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { ComponentFixture, TestBed } from '@angular/core/testing';
import { MatDialog } from '@angular/material/dialog';
import { Router, provideRouter } from '@angular/router';
import { of } from 'rxjs';

import { ReleaseWorkspace } from './releases-api';
import { ReleaseWorkspacePage } from './release-workspace-page';

const source = (key: string) => ({ id: key, key, citation: `${key} citation`, doi: null });
const value = (id: string, si: number, key: string) => ({
  id, lineageId: id, versionNo: 1, value: si, uncertainty: 400, uncertaintyKind: 'standard', coverageFactor: null,
  unit: 'J/mol', temperature: 298.15, pressure: 100000, method: 'measured', methodDetail: null, source: source(key),
});

function workspace(gaps = 0): ReleaseWorkspace {
  const entry = {
    change: 'added', memberKind: 'value', lineageId: 'new', speciesPhaseId: 'ph-l', phase: 'l', polymorph: null, quantity: 'dfH', transitionKind: null, label: 'ΔfH°(l)',
    from: null, to: { id: 'new', valueSi: -302600, uncertaintySi: 350, entered: '-302.6 ± 0.35 kJ/mol', sourceKey: 'okafor-2027', recommended: false },
  };
  return {
    id: 'r', label: '2027.1', status: 'preparing', notes: 'Draft notes', createdAt: '', publishedAt: null, publishedBy: null, version: 7, memberCount: 100,
    proposals: [],
    needsRecommendation: Array.from({ length: gaps }, () => ({
      speciesPhaseId: 'ph-x', memberKind: 'value' as const, quantity: 'S' as const, transitionKind: null, speciesName: 'x', hillFormula: 'X', phase: 'g' as const, polymorph: null, members: 2, recommended: 0,
    })),
    changeLog: {
      release: '2027.1', comparedWith: '2026.2', summary: { added: 1, revised: 0, retired: 0, removed: 0, recommendation: 0 },
      species: [{ speciesId: 'sp', hillFormula: 'C3H8O', name: 'propan-1-ol', added: [entry], revised: [], retired: [], removed: [], recommendation: [] }],
    },
  } as unknown as ReleaseWorkspace;
}

describe('ReleaseWorkspacePage', () => {
  let fixture: ComponentFixture<ReleaseWorkspacePage>;
  let backend: HttpTestingController;
  let confirmed: boolean;
  const element = () => fixture.nativeElement as HTMLElement;

  async function open(gaps = 0): Promise<void> {
    confirmed = true;
    TestBed.configureTestingModule({
      providers: [
        provideHttpClient(),
        provideHttpClientTesting(),
        provideRouter([]),
        { provide: MatDialog, useValue: { open: () => ({ afterClosed: () => of(confirmed) }) } },
      ],
    });
    backend = TestBed.inject(HttpTestingController);
    fixture = TestBed.createComponent(ReleaseWorkspacePage);
    fixture.componentRef.setInput('label', '2027.1');
    await fixture.whenStable();
    backend.expectOne('/api/v1/releases/2027.1/workspace').flush(workspace(gaps));
    await answerSideRequests(gaps);
  }

  async function answerSideRequests(gaps = 0): Promise<void> {
    await fixture.whenStable();
    backend.expectOne((r) => r.url === '/api/v1/proposals').flush({ items: [], total: 0, limit: 200, offset: 0 });
    if (gaps > 0) {
      backend.expectOne((r) => r.url === '/api/v1/species' && r.params.get('q') === 'X').flush({ items: [] });
    }
    backend
      .expectOne((r) => r.url === '/api/v1/species/sp' && r.params.get('release') === '2027.1')
      .flush({
        id: 'sp', formula: 'CH3CH2CH2OH', name: 'propan-1-ol', release: '2027.1',
        phases: [{ phase: 'l', polymorph: null, fits: [], quantities: [{ quantity: 'dfH', symbol: 'ΔfH°', unit: 'J/mol', transitionKind: null, recommended: value('old', -302900, 'qpc-tc03-2025'), alternatives: [value('new', -302600, 'okafor-2027')] }] }],
      });
    await fixture.whenStable();
  }

  afterEach(() => backend.verify());

  it('sets the disagreeing values side by side and recommends the one chosen', async () => {
    await open();
    const rows = Array.from(element().querySelectorAll('.kx-candidates tbody tr'));
    expect(rows.map((row) => row.querySelector('td:last-child strong')!.textContent)).toEqual(['qpc-tc03-2025', 'okafor-2027']);
    expect(rows[0].classList).toContain('kx-chosen');
    rows[1].querySelector<HTMLInputElement>('input[type=radio]')!.click();
    const recommend = backend.expectOne('/api/v1/releases/2027.1/recommended');
    expect(recommend.request.method).toBe('PUT');
    expect(recommend.request.body).toEqual({ speciesPhaseId: 'ph-l', quantity: 'dfH', valueId: 'new' });
    recommend.flush({});
    backend.expectOne('/api/v1/releases/2027.1/workspace').flush(workspace());
    await answerSideRequests();
  });

  it('publishes after a confirmation, sending the version the editor saw', async () => {
    await open();
    const navigate = spyOn(TestBed.inject(Router), 'navigate').and.resolveTo(true);
    element().querySelector<HTMLButtonElement>('.kx-publish-button')!.click();
    const publish = backend.expectOne('/api/v1/releases/2027.1/publish');
    expect(publish.request.body).toEqual({ confirm: true, version: 7 });
    publish.flush(workspace());
    expect(navigate).toHaveBeenCalledWith(['/releases', '2027.1']);
  });

  it('publishes nothing when the editor cancels', async () => {
    await open();
    confirmed = false;
    element().querySelector<HTMLButtonElement>('.kx-publish-button')!.click();
    backend.expectNone('/api/v1/releases/2027.1/publish');
    expect(element().querySelector('.kx-publish-button')).not.toBeNull();
  });

  it('holds publishing back while a species phase and quantity lacks a recommended value', async () => {
    await open(1);
    expect(element().querySelector<HTMLButtonElement>('.kx-publish-button')!.disabled).toBeTrue();
    expect(element().textContent).toContain('1 group still needs a recommended value before publishing.');
  });
});
