import { ChangeDetectionStrategy, Component, inject, input } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';

import { downloadFile } from '../csv/csv-file';
import { EvidenceFile } from './proposal';
import { ProposalsApi } from './proposals-api';

/** Bytes as KiB or MiB for people. */
export function fileSize(bytes: number): string {
  if (bytes >= 1024 * 1024) {
    return `${(bytes / (1024 * 1024)).toFixed(1)} MiB`;
  }
  if (bytes >= 1024) {
    return `${(bytes / 1024).toFixed(1)} KiB`;
  }
  return `${bytes} bytes`;
}

/**
 * The evidence files behind an item: name, type judged from the content, size and SHA-256, each
 * downloadable by whoever may see the proposal (fetched with the reader's token, then saved).
 */
@Component({
  selector: 'kx-evidence-list',
  imports: [MatButtonModule],
  template: `
    @if (files().length > 0) {
      <ul class="kx-evidence">
        @for (file of files(); track file.id) {
          <li>
            <button mat-button type="button" class="kx-evidence-download" [attr.aria-label]="'Download ' + file.fileName" (click)="download(file)">
              {{ file.fileName }}
            </button>
            <span class="kx-evidence-meta">{{ file.mediaType }}, {{ size(file.sizeBytes) }}, SHA-256 <code [title]="file.sha256">{{ file.sha256.slice(0, 12) }}…</code></span>
            @if (file.description) {
              <span class="kx-evidence-meta">{{ file.description }}</span>
            }
          </li>
        }
      </ul>
    } @else {
      <p class="kx-evidence-none">{{ emptyText() }}</p>
    }
  `,
  styles: `
    .kx-evidence {
      margin: 0;
      padding: 0;
      list-style: none;
    }
    li {
      display: flex;
      flex-wrap: wrap;
      align-items: center;
      gap: 0 0.75rem;
    }
    .kx-evidence-meta,
    .kx-evidence-none {
      margin: 0;
      font: var(--mat-sys-body-small);
      color: var(--mat-sys-on-surface-variant);
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class EvidenceList {
  private readonly proposals = inject(ProposalsApi);

  readonly files = input.required<readonly EvidenceFile[]>();
  readonly emptyText = input('No evidence files.');

  protected size(bytes: number): string {
    return fileSize(bytes);
  }

  protected download(file: EvidenceFile): void {
    this.proposals.downloadEvidence(file.id).subscribe((blob) => downloadFile(blob, file.fileName));
  }
}
