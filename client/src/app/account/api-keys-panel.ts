import { ClipboardModule } from '@angular/cdk/clipboard';
import { DatePipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, ElementRef, afterRenderEffect, computed, inject, signal, viewChild } from '@angular/core';
import { toSignal } from '@angular/core/rxjs-interop';
import { FormControl, FormGroup, FormGroupDirective, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatDialog } from '@angular/material/dialog';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MatSelectModule } from '@angular/material/select';
import { Subject, catchError, filter, map, of, startWith, switchMap } from 'rxjs';

import { ConfirmDialog, ConfirmDialogData } from '../shared/confirm-dialog/confirm-dialog';
import { LoadingIndicator } from '../shared/loading-indicator/loading-indicator';
import { ApiKey, ApiKeyScope, ApiKeysService, CreatedApiKey } from './api-keys';

type KeyList = { readonly state: 'loading' } | { readonly state: 'ok'; readonly keys: readonly ApiKey[] } | { readonly state: 'failed' };

/** Create, list and revoke API keys; a new key's secret is shown once, with a copy button. */
@Component({
  selector: 'kx-api-keys-panel',
  imports: [ClipboardModule, DatePipe, LoadingIndicator, MatButtonModule, MatFormFieldModule, MatInputModule, MatSelectModule, ReactiveFormsModule],
  templateUrl: './api-keys-panel.html',
  styleUrl: './account-panels.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ApiKeysPanel {
  private readonly apiKeys = inject(ApiKeysService);
  private readonly dialog = inject(MatDialog);
  private readonly reloads = new Subject<void>();
  private readonly secretPanel = viewChild<ElementRef<HTMLElement>>('secretPanel');

  protected readonly form = new FormGroup({
    name: new FormControl('', { nonNullable: true, validators: [Validators.required, Validators.maxLength(80)] }),
    scope: new FormControl<ApiKeyScope>('read', { nonNullable: true }),
  });
  protected readonly creating = signal(false);
  protected readonly created = signal<CreatedApiKey | null>(null);
  protected readonly copied = signal('');
  protected readonly announcement = signal('');

  protected readonly list = toSignal(
    this.reloads.pipe(
      startWith(undefined),
      switchMap(() =>
        this.apiKeys.list().pipe(
          map((keys): KeyList => ({ state: 'ok', keys })),
          catchError(() => of<KeyList>({ state: 'failed' })),
          startWith<KeyList>({ state: 'loading' }),
        ),
      ),
    ),
    { initialValue: { state: 'loading' } as KeyList },
  );
  protected readonly keys = computed(() => {
    const list = this.list();
    return list.state === 'ok' ? list.keys : [];
  });

  constructor() {
    // Move focus to a new secret so a screen reader reads it and keyboard users reach its copy button.
    afterRenderEffect(() => {
      if (this.created()) {
        this.secretPanel()?.nativeElement.focus();
      }
    });
  }

  protected createKey(formDirective: FormGroupDirective): void {
    if (this.form.invalid) {
      this.form.markAllAsTouched();
      return;
    }
    const { name, scope } = this.form.getRawValue();
    this.creating.set(true);
    this.apiKeys.create(name.trim(), scope).subscribe({
      next: (key) => {
        this.creating.set(false);
        this.copied.set('');
        this.created.set(key);
        formDirective.resetForm({ name: '', scope: 'read' });
        this.reloads.next();
      },
      error: () => this.creating.set(false),
    });
  }

  protected markCopied(succeeded: boolean): void {
    this.copied.set(succeeded ? 'Copied to the clipboard.' : 'Could not copy; select the key and copy it by hand.');
  }

  protected dismissSecret(): void {
    this.created.set(null);
  }

  protected revokeKey(key: ApiKey): void {
    const data: ConfirmDialogData = {
      title: `Revoke “${key.name}”?`,
      message: 'Tools that use this key stop working at once. This cannot be undone.',
      confirmLabel: 'Revoke key',
    };
    this.dialog
      .open(ConfirmDialog, { data })
      .afterClosed()
      .pipe(
        filter((confirmed) => confirmed === true),
        switchMap(() => this.apiKeys.revoke(key.id)),
      )
      .subscribe(() => {
        this.announcement.set(`Key “${key.name}” revoked.`);
        this.reloads.next();
      });
  }
}
