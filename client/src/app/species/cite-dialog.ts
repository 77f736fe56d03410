import { ChangeDetectionStrategy, Component, computed, inject, signal } from '@angular/core';
import { ClipboardModule } from '@angular/cdk/clipboard';
import { MatButtonModule } from '@angular/material/button';
import { MAT_DIALOG_DATA, MatDialogModule } from '@angular/material/dialog';

import { CitedValue, citationBibtex, citationText } from './citation';

/** "Cite this": the value with its source and release, as a sentence and as BibTeX, each with a copy button. */
@Component({
  selector: 'kx-cite-dialog',
  imports: [ClipboardModule, MatButtonModule, MatDialogModule],
  template: `
    <h2 mat-dialog-title>Cite {{ cited.symbol }} of {{ cited.speciesName }}</h2>
    <mat-dialog-content>
      <p class="kx-cite-hint">
        Cite the original source and the Kelvindex release together, so that others can find the
        same number again.
      </p>
      <h3 id="cite-text-heading">As text</h3>
      <pre class="kx-cite-block" aria-labelledby="cite-text-heading" tabindex="0">{{ text() }}</pre>
      <button mat-stroked-button type="button" [cdkCopyToClipboard]="text()" (cdkCopyToClipboardCopied)="markCopied('text', $event)">
        Copy text
      </button>
      <h3 id="cite-bibtex-heading">As BibTeX</h3>
      <pre class="kx-cite-block" aria-labelledby="cite-bibtex-heading" tabindex="0">{{ bibtex() }}</pre>
      <button mat-stroked-button type="button" [cdkCopyToClipboard]="bibtex()" (cdkCopyToClipboardCopied)="markCopied('BibTeX', $event)">
        Copy BibTeX
      </button>
      <p class="kx-cite-copied" role="status" aria-live="polite">{{ copied() }}</p>
    </mat-dialog-content>
    <mat-dialog-actions align="end">
      <button mat-flat-button type="button" mat-dialog-close>Close</button>
    </mat-dialog-actions>
  `,
  styles: `
    .kx-cite-block {
      max-width: 100%;
      margin: 0 0 0.5rem;
      padding: 0.75rem;
      overflow-x: auto;
      white-space: pre-wrap;
      word-break: break-word;
      border-radius: var(--mat-sys-corner-small);
      background: var(--mat-sys-surface-container-high);
      font: 0.85rem/1.4 ui-monospace, 'DejaVu Sans Mono', monospace;
    }
    h3 {
      margin-top: 1rem;
    }
    .kx-cite-copied {
      min-height: 1.5em;
      margin: 0.5rem 0 0;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class CiteDialog {
  protected readonly cited = inject<CitedValue>(MAT_DIALOG_DATA);
  protected readonly text = computed(() => citationText(this.cited));
  protected readonly bibtex = computed(() => citationBibtex(this.cited));
  protected readonly copied = signal('');

  protected markCopied(what: string, succeeded: boolean): void {
    this.copied.set(succeeded ? `The ${what} is on the clipboard.` : `The ${what} could not be copied; select it and copy it by hand.`);
  }
}
