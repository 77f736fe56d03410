import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { signal } from '@angular/core';
import { ComponentFixture, TestBed } from '@angular/core/testing';
import { MatIconTestingModule } from '@angular/material/icon/testing';
import { MatSnackBar } from '@angular/material/snack-bar';
import { provideRouter } from '@angular/router';
import { of } from 'rxjs';

import { AuthService } from '../core/auth';
import { PreferencesService } from '../core/preferences';
import { AccountPage } from './account-page';

describe('AccountPage', () => {
  let fixture: ComponentFixture<AccountPage>;
  let backend: HttpTestingController;
  let saveEnergyUnit: jasmine.Spy;

  const page = () => fixture.nativeElement as HTMLElement;
  const text = (selector: string) => page().querySelector(selector)?.textContent?.replace(/\s+/g, ' ').trim() ?? '';

  beforeEach(async () => {
    saveEnergyUnit = jasmine.createSpy('saveEnergyUnit').and.returnValue(of(undefined));
    TestBed.configureTestingModule({
      imports: [MatIconTestingModule],
      providers: [
        provideRouter([]),
        provideHttpClient(),
        provideHttpClientTesting(),
        { provide: MatSnackBar, useValue: jasmine.createSpyObj('MatSnackBar', ['open']) },
        {
          provide: AuthService,
          useValue: { user: signal({ id: 2, email: 'steward@kelvindex.test', name: 'Tomasz Okafor', roles: ['reader', 'steward'] }) },
        },
        { provide: PreferencesService, useValue: { energyUnit: signal('kJ/mol'), saveEnergyUnit } },
      ],
    });
    backend = TestBed.inject(HttpTestingController);
    fixture = TestBed.createComponent(AccountPage);
    await fixture.whenStable();
  });

  function answerLists(): void {
    backend.expectOne('/api/v1/api-keys').flush({ items: [] });
    backend.expectOne('/api/v1/watchlist').flush({ items: [{ speciesId: 7, formula: 'H2O', name: 'water', createdAt: '2025-02-01T00:00:00Z' }] });
    backend.expectOne('/api/v1/saved-reactions').flush({
      items: [{ id: 4, name: 'Steam reforming', equation: 'CH4(g) + H2O(g) -> CO(g) + 3 H2(g)', tMin: 600, tMax: 1200, createdAt: '2025-02-01T00:00:00Z' }],
    });
  }

  it('shows who is signed in and their roles', () => {
    answerLists();
    expect(text('.kx-profile')).toContain('Tomasz Okafor');
    expect(text('.kx-profile')).toContain('reader, steward');
    expect(page().querySelector('a[href="/account/password"]')).not.toBeNull();
  });

  it('saves the preferred energy unit', async () => {
    answerLists();
    Array.from(page().querySelectorAll<HTMLButtonElement>('kx-unit-selector button')).find((b) => b.textContent!.includes('kcal'))!.click();
    await fixture.whenStable();
    expect(saveEnergyUnit).toHaveBeenCalledOnceWith('kcal/mol');
    expect(text('.kx-saved')).toContain('kcal/mol');
  });

  it('lists watched species and stops watching one', async () => {
    answerLists();
    await fixture.whenStable();
    const item = page().querySelector('#watchlist-heading ~ .kx-plain-list li')!;
    expect(item.querySelector('a')!.getAttribute('href')).toBe('/species/7');
    item.querySelector('button')!.click();
    const remove = backend.expectOne('/api/v1/watchlist/7');
    expect(remove.request.method).toBe('DELETE');
    remove.flush(null, { status: 204, statusText: 'No Content' });
    backend.expectOne('/api/v1/watchlist').flush({ items: [] });
    await fixture.whenStable();
    expect(text('#watchlist-heading + p')).toContain('You watch no species yet');
  });

  it('opens a saved reaction on the reaction page through its query parameters', async () => {
    answerLists();
    await fixture.whenStable();
    const link = page().querySelector<HTMLAnchorElement>('#reactions-heading ~ .kx-plain-list a')!;
    expect(link.textContent!.trim()).toBe('Steam reforming');
    const url = new URL(link.href);
    expect(url.pathname).toBe('/reactions');
    expect(url.searchParams.get('equation')).toBe('CH4(g) + H2O(g) -> CO(g) + 3 H2(g)');
    expect(url.searchParams.get('tMin')).toBe('600');
    expect(url.searchParams.get('tMax')).toBe('1200');
  });
});
