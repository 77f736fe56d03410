import { HttpErrorResponse } from '@angular/common/http';
import { ComponentFixture, TestBed } from '@angular/core/testing';
import { MatIconTestingModule } from '@angular/material/icon/testing';
import { Router, provideRouter } from '@angular/router';
import { of, throwError } from 'rxjs';

import { AuthService } from '../core/auth';
import { AcceptInvitationPage } from './accept-invitation-page';

describe('AcceptInvitationPage', () => {
  let fixture: ComponentFixture<AcceptInvitationPage>;
  let page: HTMLElement;
  let acceptInvitation: jasmine.Spy;

  function type(name: string, value: string): void {
    const input = page.querySelector<HTMLInputElement>(`input[formcontrolname="${name}"]`)!;
    input.value = value;
    input.dispatchEvent(new Event('input'));
  }

  async function create(token: string | null): Promise<void> {
    fixture = TestBed.createComponent(AcceptInvitationPage);
    if (token) {
      fixture.componentRef.setInput('token', token);
    }
    page = fixture.nativeElement as HTMLElement;
    await fixture.whenStable();
  }

  beforeEach(() => {
    acceptInvitation = jasmine.createSpy('acceptInvitation');
    TestBed.configureTestingModule({
      imports: [MatIconTestingModule],
      providers: [provideRouter([]), { provide: AuthService, useValue: { acceptInvitation } }],
    });
  });

  it('creates the account and opens it', async () => {
    const navigate = spyOn(TestBed.inject(Router), 'navigateByUrl').and.resolveTo(true);
    acceptInvitation.and.returnValue(of({ id: 9, email: 'new@kelvindex.test', name: 'Ada Ngata', roles: ['reader'] }));
    await create('i'.repeat(40));
    type('name', ' Ada Ngata ');
    type('password', 'a-long-password');
    type('confirmation', 'a-long-password');
    page.querySelector<HTMLButtonElement>('button[type="submit"]')!.click();
    await fixture.whenStable();

    expect(acceptInvitation).toHaveBeenCalledOnceWith('i'.repeat(40), 'Ada Ngata', 'a-long-password');
    expect(navigate).toHaveBeenCalledOnceWith('/account');
  });

  it('shows the API’s reason when the invitation was already used', async () => {
    acceptInvitation.and.returnValue(
      throwError(() => new HttpErrorResponse({ status: 422, error: { error: 'unprocessable', message: 'This invitation was already used.' } })),
    );
    await create('i'.repeat(40));
    type('name', 'Ada');
    type('password', 'a-long-password');
    type('confirmation', 'a-long-password');
    page.querySelector<HTMLButtonElement>('button[type="submit"]')!.click();
    await fixture.whenStable();
    expect(page.querySelector('[role="alert"]')!.textContent).toContain('already used');
  });

  it('explains a link without a token', async () => {
    await create(null);
    expect(page.querySelector('form')).toBeNull();
    expect(page.querySelector('kx-empty-state h2')!.textContent).toBe('This invitation link is incomplete');
  });
});
