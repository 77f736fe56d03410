import { provideHttpClient, withInterceptors } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { ComponentFixture, TestBed } from '@angular/core/testing';
import { MatIconTestingModule } from '@angular/material/icon/testing';
import { MatSnackBar } from '@angular/material/snack-bar';

import { apiErrorInterceptor } from '../core/api-error-interceptor';
import { HomePage } from './home-page';

describe('HomePage', () => {
  let fixture: ComponentFixture<HomePage>;
  let backend: HttpTestingController;
  let snackBar: jasmine.SpyObj<MatSnackBar>;

  function page(): HTMLElement {
    return fixture.nativeElement as HTMLElement;
  }

  function text(selector: string): string {
    return page().querySelector(selector)?.textContent?.replace(/\s+/g, ' ').trim() ?? '';
  }

  function healthFacts(): Record<string, string> {
    const terms = Array.from(page().querySelectorAll('.kx-health-facts dt'));
    return Object.fromEntries(terms.map((term) => [term.textContent!.trim(), term.nextElementSibling!.textContent!.trim()]));
  }

  beforeEach(async () => {
    snackBar = jasmine.createSpyObj<MatSnackBar>('MatSnackBar', ['open']);
    TestBed.configureTestingModule({
      imports: [MatIconTestingModule],
      providers: [
        provideHttpClient(withInterceptors([apiErrorInterceptor])),
        provideHttpClientTesting(),
        { provide: MatSnackBar, useValue: snackBar },
      ],
    });
    backend = TestBed.inject(HttpTestingController);
    fixture = TestBed.createComponent(HomePage);
    await fixture.whenStable();
  });

  afterEach(() => backend.verify());

  it('explains what Kelvindex is', () => {
    expect(text('h1')).toBe('Thermochemical reference values you can cite, check and repeat');
    expect(text('.kx-intro')).toContain('numbered releases that never change');
    backend.expectOne('/api/v1/health');
  });

  it('shows a loading state while the health check runs', () => {
    backend.expectOne('/api/v1/health');
    expect(text('kx-loading-indicator')).toBe('Checking the API…');
    expect(page().querySelector('.kx-health-facts')).toBeNull();
  });

  it('shows that the API and database are up, with the version', async () => {
    backend.expectOne('/api/v1/health').flush({ status: 'ok', database: 'up', version: '0.1.0' });
    await fixture.whenStable();

    expect(page().querySelector('kx-loading-indicator')).toBeNull();
    expect(text('.kx-health-ok')).toBe('All systems running: the API and its database are up.');
    expect(healthFacts()).toEqual({ API: 'online', Database: 'up', Version: '0.1.0' });
  });

  it('shows a degraded API when the database is down, without a second error snackbar', async () => {
    backend
      .expectOne('/api/v1/health')
      .flush({ status: 'degraded', database: 'down', version: '0.1.0' }, { status: 503, statusText: 'Service Unavailable' });
    await fixture.whenStable();

    expect(text('.kx-health-degraded')).toContain('its database is down');
    expect(page().querySelector('.kx-health-degraded')!.getAttribute('role')).toBe('alert');
    expect(healthFacts()).toEqual(jasmine.objectContaining({ API: 'degraded', Database: 'down' }));
    expect(snackBar.open).not.toHaveBeenCalled();
  });

  it('shows an error state when the API cannot be reached, and checks again on request', async () => {
    backend.expectOne('/api/v1/health').error(new ProgressEvent('error'), { status: 0 });
    await fixture.whenStable();

    expect(text('kx-error-state h2')).toBe('The API did not answer');
    expect(text('kx-error-state p')).toContain('cannot reach its server');

    page().querySelector<HTMLButtonElement>('kx-error-state button')!.click();
    await fixture.whenStable();
    expect(text('kx-loading-indicator')).toBe('Checking the API…');

    backend.expectOne('/api/v1/health').flush({ status: 'ok', database: 'up', version: '0.1.0' });
    await fixture.whenStable();
    expect(page().querySelector('kx-error-state')).toBeNull();
    expect(healthFacts()['Database']).toBe('up');
  });

  it('checks again from a known status', async () => {
    backend.expectOne('/api/v1/health').flush({ status: 'ok', database: 'up', version: '0.1.0' });
    await fixture.whenStable();

    const recheck = Array.from(page().querySelectorAll('button')).find((b) => b.textContent!.includes('Check again'))!;
    recheck.click();
    await fixture.whenStable();

    backend
      .expectOne('/api/v1/health')
      .flush({ status: 'degraded', database: 'down' }, { status: 503, statusText: 'Service Unavailable' });
    await fixture.whenStable();
    expect(healthFacts()).toEqual({ API: 'degraded', Database: 'down' });
  });
});
