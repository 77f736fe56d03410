import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { signal } from '@angular/core';
import { ComponentFixture, TestBed } from '@angular/core/testing';
import { MatSnackBar } from '@angular/material/snack-bar';
import { provideRouter } from '@angular/router';

import { AuthService } from '../core/auth';
import { WatchButton } from './watch-button';

describe('WatchButton', () => {
  let fixture: ComponentFixture<WatchButton>;
  let backend: HttpTestingController;
  const signedIn = signal(true);

  const button = () => (fixture.nativeElement as HTMLElement).querySelector<HTMLButtonElement>('button.kx-watch')!;

  beforeEach(async () => {
    signedIn.set(true);
    TestBed.configureTestingModule({
      providers: [
        provideRouter([]),
        provideHttpClient(),
        provideHttpClientTesting(),
        { provide: MatSnackBar, useValue: jasmine.createSpyObj('MatSnackBar', ['open']) },
        { provide: AuthService, useValue: { isSignedIn: signedIn } },
      ],
    });
    backend = TestBed.inject(HttpTestingController);
    fixture = TestBed.createComponent(WatchButton);
    fixture.componentRef.setInput('speciesId', 7);
    fixture.componentRef.setInput('speciesName', 'water');
    await fixture.whenStable();
  });

  afterEach(() => backend.verify());

  it('knows from the watchlist whether the species is watched, and toggles it', async () => {
    expect(button().disabled).toBeTrue();
    backend.expectOne('/api/v1/watchlist').flush({ items: [{ speciesId: 7, formula: 'H2O', name: 'water', createdAt: '' }] });
    await fixture.whenStable();
    expect(button().textContent!.trim()).toBe('Watching');
    expect(button().getAttribute('aria-pressed')).toBe('true');

    button().click();
    const remove = backend.expectOne('/api/v1/watchlist/7');
    expect(remove.request.method).toBe('DELETE');
    remove.flush(null, { status: 204, statusText: 'No Content' });
    await fixture.whenStable();
    expect(button().textContent!.trim()).toBe('Watch');
    expect((fixture.nativeElement as HTMLElement).querySelector('[role="status"]')!.textContent).toBe('You stopped watching water.');

    button().click();
    const put = backend.expectOne('/api/v1/watchlist/7');
    expect(put.request.method).toBe('PUT');
    put.flush(null, { status: 204, statusText: 'No Content' });
    await fixture.whenStable();
    expect(button().getAttribute('aria-pressed')).toBe('true');
  });
});
