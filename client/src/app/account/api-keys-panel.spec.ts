import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { Clipboard } from '@angular/cdk/clipboard';
import { ComponentFixture, TestBed } from '@angular/core/testing';
import { MatSnackBar } from '@angular/material/snack-bar';
import { MatDialog } from '@angular/material/dialog';
import { of } from 'rxjs';

import { ApiKeysPanel } from './api-keys-panel';

const key = { id: 3, name: 'simulator', scope: 'read', prefix: 'kx_7Hq2', createdAt: '2025-03-01T10:00:00Z', lastUsedAt: null, revokedAt: null };

describe('ApiKeysPanel', () => {
  let fixture: ComponentFixture<ApiKeysPanel>;
  let backend: HttpTestingController;
  let clipboard: jasmine.SpyObj<Clipboard>;
  let dialog: jasmine.SpyObj<MatDialog>;

  const panel = () => fixture.nativeElement as HTMLElement;

  function type(selector: string, value: string): void {
    const input = panel().querySelector<HTMLInputElement>(selector)!;
    input.value = value;
    input.dispatchEvent(new Event('input'));
  }

  beforeEach(async () => {
    clipboard = jasmine.createSpyObj<Clipboard>('Clipboard', ['copy']);
    clipboard.copy.and.returnValue(true);
    dialog = jasmine.createSpyObj<MatDialog>('MatDialog', ['open']);
    TestBed.configureTestingModule({
      providers: [
        provideHttpClient(),
        provideHttpClientTesting(),
        { provide: MatSnackBar, useValue: jasmine.createSpyObj('MatSnackBar', ['open']) },
        { provide: Clipboard, useValue: clipboard },
        { provide: MatDialog, useValue: dialog },
      ],
    });
    backend = TestBed.inject(HttpTestingController);
    fixture = TestBed.createComponent(ApiKeysPanel);
    await fixture.whenStable();
  });

  afterEach(() => backend.verify());

  it('lists keys by name, scope and prefix, never their secret', async () => {
    backend.expectOne('/api/v1/api-keys').flush({ items: [key] });
    await fixture.whenStable();
    const cells = Array.from(panel().querySelectorAll('tbody td')).map((td) => td.textContent!.trim());
    expect(cells.slice(0, 3)).toEqual(['simulator', 'read only', 'kx_7Hq2…']);
    expect(cells[4]).toBe('never');
  });

  it('creates a key and shows its secret once, with a copy button', async () => {
    backend.expectOne('/api/v1/api-keys').flush({ items: [] });
    type('input[formcontrolname="name"]', 'simulator');
    panel().querySelector<HTMLButtonElement>('.kx-create-key')!.click();
    await fixture.whenStable();

    const create = backend.expectOne((request) => request.method === 'POST');
    expect(create.request.body).toEqual({ name: 'simulator', scope: 'read' });
    create.flush({ ...key, secret: 'kx_7Hq2.secret-value' });
    backend.expectOne('/api/v1/api-keys').flush({ items: [key] });
    await fixture.whenStable();

    const secretPanel = panel().querySelector<HTMLElement>('.kx-secret-panel')!;
    expect(secretPanel.querySelector('.kx-secret')!.textContent).toBe('kx_7Hq2.secret-value');
    expect(secretPanel.textContent).toContain('shown only this once');
    expect(document.activeElement).toBe(secretPanel);

    secretPanel.querySelector<HTMLButtonElement>('.kx-copy-secret')!.click();
    await fixture.whenStable();
    expect(clipboard.copy).toHaveBeenCalledWith('kx_7Hq2.secret-value');
    expect(secretPanel.textContent).toContain('Copied to the clipboard.');

    Array.from(secretPanel.querySelectorAll('button')).find((b) => b.textContent!.includes('I have stored it'))!.click();
    await fixture.whenStable();
    expect(panel().querySelector('.kx-secret-panel')).toBeNull();
  });

  it('revokes a key after confirmation', async () => {
    backend.expectOne('/api/v1/api-keys').flush({ items: [key] });
    await fixture.whenStable();
    dialog.open.and.returnValue({ afterClosed: () => of(true) } as ReturnType<MatDialog['open']>);

    panel().querySelector<HTMLButtonElement>('.kx-revoke')!.click();
    expect(dialog.open.calls.mostRecent().args[1]!.data).toEqual(jasmine.objectContaining({ confirmLabel: 'Revoke key' }));
    const revoke = backend.expectOne('/api/v1/api-keys/3');
    expect(revoke.request.method).toBe('DELETE');
    revoke.flush(null, { status: 204, statusText: 'No Content' });
    backend.expectOne('/api/v1/api-keys').flush({ items: [{ ...key, revokedAt: '2025-03-02T00:00:00Z' }] });
    await fixture.whenStable();
    expect(panel().querySelector('.kx-revoke')).toBeNull();
    expect(panel().querySelector('tbody td:last-child')!.textContent).toContain('revoked 2025-03-02');
  });

  it('does nothing when the revocation is cancelled', async () => {
    backend.expectOne('/api/v1/api-keys').flush({ items: [key] });
    await fixture.whenStable();
    dialog.open.and.returnValue({ afterClosed: () => of(false) } as ReturnType<MatDialog['open']>);
    panel().querySelector<HTMLButtonElement>('.kx-revoke')!.click();
    backend.expectNone('/api/v1/api-keys/3');
    expect(dialog.open).toHaveBeenCalled();
  });
});
