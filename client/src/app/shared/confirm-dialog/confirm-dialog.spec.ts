import { TestBed } from '@angular/core/testing';
import { MatDialog } from '@angular/material/dialog';
import { firstValueFrom } from 'rxjs';

import { ConfirmDialog } from './confirm-dialog';

describe('ConfirmDialog', () => {
  it('shows the question and closes with true when confirmed', async () => {
    const dialog = TestBed.inject(MatDialog);
    const ref = dialog.open(ConfirmDialog, {
      data: { title: 'Revoke this key?', message: 'Tools using it stop working.', confirmLabel: 'Revoke key' },
    });
    const closed = firstValueFrom(ref.afterClosed());
    TestBed.tick();

    const surface = document.querySelector('kx-confirm-dialog')!;
    expect(surface.querySelector('h2')!.textContent).toBe('Revoke this key?');
    expect(surface.textContent).toContain('Tools using it stop working.');
    surface.querySelector<HTMLButtonElement>('.kx-confirm')!.click();

    expect(await closed).toBeTrue();
  });

  it('closes with false on cancel', async () => {
    const ref = TestBed.inject(MatDialog).open(ConfirmDialog, { data: { title: 't', message: 'm', confirmLabel: 'Go' } });
    const closed = firstValueFrom(ref.afterClosed());
    TestBed.tick();
    Array.from(document.querySelectorAll<HTMLButtonElement>('kx-confirm-dialog button'))
      .find((button) => button.textContent!.trim() === 'Cancel')!
      .click();
    expect(await closed).toBeFalse();
  });
});
