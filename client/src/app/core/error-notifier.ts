import { Injectable, inject } from '@angular/core';
import { MatSnackBar } from '@angular/material/snack-bar';

const SHOWN_FOR_MS = 10_000;

/** Shows an error to the reader in a snackbar; the one place errors become visible. */
@Injectable({ providedIn: 'root' })
export class ErrorNotifier {
  private readonly snackBar = inject(MatSnackBar);

  notify(message: string): void {
    this.snackBar.open(message, 'Dismiss', {
      duration: SHOWN_FOR_MS,
      panelClass: 'kx-snackbar-error',
      politeness: 'assertive',
    });
  }
}
