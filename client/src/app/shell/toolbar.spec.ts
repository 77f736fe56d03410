import { signal } from '@angular/core';
import { ComponentFixture, TestBed } from '@angular/core/testing';
import { MatIconTestingModule } from '@angular/material/icon/testing';
import { Router, provideRouter } from '@angular/router';
import { of } from 'rxjs';

import { AuthService, User } from '../core/auth';
import { PREFERS_DARK_QUERY, THEME_STORAGE, ThemeService } from '../core/theme';
import { Toolbar } from './toolbar';

describe('Toolbar', () => {
  let fixture: ComponentFixture<Toolbar>;
  let host: HTMLElement;
  const user = signal<User | null>(null);
  let signOut: jasmine.Spy;

  function navLabels(): string[] {
    return Array.from(host.querySelectorAll('nav[aria-label="Main"] a')).map((link) => link.textContent!.trim());
  }

  beforeEach(async () => {
    user.set(null);
    signOut = jasmine.createSpy('signOut').and.callFake(() => {
      user.set(null);
      return of(undefined);
    });
    TestBed.configureTestingModule({
      imports: [MatIconTestingModule],
      providers: [
        provideRouter([]),
        { provide: THEME_STORAGE, useValue: null },
        { provide: PREFERS_DARK_QUERY, useValue: null },
        { provide: AuthService, useValue: { user, signOut } },
      ],
    });
    fixture = TestBed.createComponent(Toolbar);
    host = fixture.nativeElement as HTMLElement;
    await fixture.whenStable();
  });

  afterEach(() => document.documentElement.classList.remove('kx-theme-light', 'kx-theme-dark'));

  it('names the product and links it to the overview', () => {
    const brand = host.querySelector<HTMLAnchorElement>('.kx-brand')!;
    expect(brand.textContent!.trim()).toBe('Kelvindex');
    expect(brand.getAttribute('href')).toBe('/');
  });

  it('lists the public destinations and a sign-in link to a signed-out reader', () => {
    expect(navLabels()).toEqual(['Overview', 'Search', 'Reactions']);
    const signIn = host.querySelector<HTMLAnchorElement>('.kx-sign-in')!;
    expect(signIn.textContent!.trim()).toBe('Sign in');
    expect(signIn.getAttribute('href')).toBe('/sign-in?returnUrl=%2F');
  });

  it('adds the account and a personal menu once signed in', async () => {
    user.set({ id: 2, email: 'steward@kelvindex.test', name: 'Tomasz Okafor', roles: ['reader', 'steward'] });
    await fixture.whenStable();

    expect(navLabels()).toEqual(['Overview', 'Search', 'Reactions', 'Proposals', 'Releases', 'Account']);
    expect(host.querySelector('.kx-sign-in')).toBeNull();
    const menuButton = host.querySelector<HTMLButtonElement>('.kx-user-button')!;
    expect(menuButton.querySelector('.kx-visually-hidden')!.textContent).toBe('Your account: ');
    expect(menuButton.querySelector('.kx-user-name')!.textContent).toBe('Tomasz Okafor');
    expect(menuButton.querySelector('.kx-user-initials')!.textContent).toBe('TO');
    expect(menuButton.querySelector('.kx-user-initials')!.getAttribute('aria-hidden')).toBe('true');
  });

  it('signs out from the personal menu and returns to the overview', async () => {
    user.set({ id: 2, email: 'steward@kelvindex.test', name: 'Tomasz Okafor', roles: ['reader', 'steward'] });
    await fixture.whenStable();
    const navigate = spyOn(TestBed.inject(Router), 'navigateByUrl').and.resolveTo(true);

    host.querySelector<HTMLButtonElement>('.kx-user-button')!.click();
    await fixture.whenStable();
    const menu = document.querySelector('.mat-mdc-menu-panel')!;
    expect(menu.textContent).toContain('Roles: reader, steward');
    menu.querySelector<HTMLButtonElement>('.kx-sign-out')!.click();
    await fixture.whenStable();

    expect(signOut).toHaveBeenCalled();
    expect(navigate).toHaveBeenCalledWith('/');
    expect(host.querySelector('.kx-sign-in')).not.toBeNull();
  });

  it('switches the theme and labels the button with what it will do', async () => {
    const toggle = host.querySelector<HTMLButtonElement>('.kx-theme-toggle')!;
    expect(toggle.getAttribute('aria-label')).toBe('Switch to dark theme');

    toggle.click();
    await fixture.whenStable();

    expect(TestBed.inject(ThemeService).scheme()).toBe('dark');
    expect(toggle.getAttribute('aria-label')).toBe('Switch to light theme');
    expect(document.documentElement.classList).toContain('kx-theme-dark');
  });
});
