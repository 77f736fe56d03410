import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';
import { MatIconTestingModule } from '@angular/material/icon/testing';
import { Router, provideRouter } from '@angular/router';
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

  it('sends a signed-out reader from the account to sign in, after checking for a session', async () => {
    const harness = await RouterTestingHarness.create();
    const backend = TestBed.inject(HttpTestingController);
    const navigation = harness.navigateByUrl('/account');
    let refresh = backend.match('/api/v1/auth/refresh');
    for (let tick = 0; refresh.length === 0 && tick < 50; tick++) {
      await new Promise((resolve) => setTimeout(resolve, 10));
      refresh = backend.match('/api/v1/auth/refresh');
    }
    refresh[0].flush({ error: 'unauthorized', message: 'No session' }, { status: 401, statusText: 'Unauthorized' });
    await navigation;

    expect(TestBed.inject(Router).url).toBe('/sign-in?returnUrl=%2Faccount');
    expect(harness.routeNativeElement!.querySelector('h1')!.textContent).toBe('Sign in');
  });

  it('loads the search page without signing in', async () => {
    const harness = await RouterTestingHarness.create('/search');
    expect(harness.routeNativeElement!.querySelector('h1')!.textContent).toBe('Search species');
  });

  it('shows the not-found page for an unknown address', async () => {
    const harness = await RouterTestingHarness.create('/no/such/page');
    expect(harness.routeNativeElement!.textContent).toContain('There is no page at this address');
  });
});
