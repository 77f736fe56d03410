import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { signal } from '@angular/core';
import { ComponentFixture, TestBed } from '@angular/core/testing';
import { MatDialog } from '@angular/material/dialog';
import { of } from 'rxjs';

import { AuthService } from '../core/auth';
import { ManagedUser } from './admin-api';
import { UsersPage } from './users-page';

const users: ManagedUser[] = [
  { id: 'u-admin', email: 'admin@kelvindex.test', name: 'Jonas Ferreira', roles: ['reader', 'admin'], active: true, emailVerified: true, lastSignInAt: null, createdAt: '' },
  { id: 'u-steward', email: 'steward@kelvindex.test', name: 'Tomasz Okafor', roles: ['reader', 'steward'], active: true, emailVerified: true, lastSignInAt: null, createdAt: '' },
];

describe('UsersPage', () => {
  let fixture: ComponentFixture<UsersPage>;
  let backend: HttpTestingController;
  const element = () => fixture.nativeElement as HTMLElement;
  const checkbox = (label: string) => element().querySelector<HTMLInputElement>(`input[aria-label="${label}"]`)!;

  beforeEach(async () => {
    TestBed.configureTestingModule({
      providers: [
        provideHttpClient(),
        provideHttpClientTesting(),
        { provide: AuthService, useValue: { user: signal({ id: 'u-admin', roles: ['reader', 'admin'] }) } },
        { provide: MatDialog, useValue: { open: () => ({ afterClosed: () => of(true) }) } },
      ],
    });
    backend = TestBed.inject(HttpTestingController);
    fixture = TestBed.createComponent(UsersPage);
    await fixture.whenStable();
    backend.expectOne('/api/v1/users').flush({ items: users });
    await fixture.whenStable();
  });

  afterEach(() => backend.verify());

  it('gives a role by ticking it, keeping the roles in their usual order', async () => {
    checkbox('reviewer role of Tomasz Okafor').click();
    const request = backend.expectOne('/api/v1/users/u-steward/roles');
    expect(request.request.body).toEqual({ roles: ['reader', 'steward', 'reviewer'] });
    request.flush({ ...users[1], roles: ['reader', 'steward', 'reviewer'] });
    await fixture.whenStable();
    backend.expectOne('/api/v1/users').flush({ items: users });
  });

  it('never lets an admin take away their own admin role or deactivate themselves', () => {
    expect(checkbox('admin role of Jonas Ferreira').disabled).toBeTrue();
    expect(element().querySelector('button[aria-label="Deactivate Jonas Ferreira"]')).toBeNull();
    expect(element().querySelector('button[aria-label="Deactivate Tomasz Okafor"]')).not.toBeNull();
  });

  it('deactivates after a confirmation', async () => {
    element().querySelector<HTMLButtonElement>('button[aria-label="Deactivate Tomasz Okafor"]')!.click();
    backend.expectOne('/api/v1/users/u-steward/deactivate').flush({ ...users[1], active: false });
    await fixture.whenStable();
    backend.expectOne('/api/v1/users').flush({ items: users });
    await fixture.whenStable();
    expect(element().querySelector('[role="status"]')!.textContent).toContain('Tomasz Okafor is deactivated.');
  });

  it('invites with the address and the roles ticked, and says for how long the link works', async () => {
    const email = element().querySelector<HTMLInputElement>('input[type="email"]')!;
    email.value = 'new.steward@kelvindex.test';
    email.dispatchEvent(new Event('input'));
    Array.from(element().querySelectorAll<HTMLInputElement>('.kx-roles input[type="checkbox"]'))
      .find((input) => input.closest('mat-checkbox')!.textContent!.trim() === 'steward')!
      .click();
    element().querySelector<HTMLButtonElement>('.kx-send-invitation')!.click();
    const request = backend.expectOne('/api/v1/users/invitations');
    expect(request.request.body).toEqual({ email: 'new.steward@kelvindex.test', roles: ['reader', 'steward'] });
    request.flush({ email: 'new.steward@kelvindex.test', roles: ['reader', 'steward'], expiresInHours: 168 });
    await fixture.whenStable();
    expect(element().querySelector('.kx-done')!.textContent).toContain('the link works once, for 7 days');
  });
});
