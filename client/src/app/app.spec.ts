import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';
import { MatIconTestingModule } from '@angular/material/icon/testing';
import { provideRouter } from '@angular/router';
import { RouterTestingHarness } from '@angular/router/testing';

import { App } from './app';
import { routes } from './app.routes';
import { PREFERS_DARK_QUERY, THEME_STORAGE } from './core/theme';

describe('App', () => {
  beforeEach(() => {
    TestBed.configureTestingModule({
      imports: [MatIconTestingModule],
      providers: [
        provideRouter(routes),
        provideHttpClient(),
        provideHttpClientTesting(),
        { provide: THEME_STORAGE, useValue: null },
        { provide: PREFERS_DARK_QUERY, useValue: null },
      ],
    });
  });

  afterEach(() => document.documentElement.classList.remove('kx-theme-light', 'kx-theme-dark'));

  it('renders the toolbar and a skip link to the main content', async () => {
    const fixture = TestBed.createComponent(App);
    await fixture.whenStable();
    const host = fixture.nativeElement as HTMLElement;

    expect(host.querySelector('kx-toolbar')).not.toBeNull();
    host.querySelector<HTMLAnchorElement>('.kx-skip-link')!.click();
    expect(document.activeElement).toBe(host.querySelector('main'));
  });

  it('loads the overview at the root address', async () => {
    const harness = await RouterTestingHarness.create('/');
    expect(harness.routeNativeElement!.querySelector('h1')!.textContent).toContain('Thermochemical reference values');
    TestBed.inject(HttpTestingController).expectOne('/api/v1/health');
  });

  it('shows the not-found page for an unknown address', async () => {
    const harness = await RouterTestingHarness.create('/no/such/page');
    expect(harness.routeNativeElement!.textContent).toContain('There is no page at this address');
  });
});
