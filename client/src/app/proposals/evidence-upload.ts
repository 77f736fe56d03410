import { ChangeDetectionStrategy, Component, ElementRef, computed, inject, input, output, signal, viewChild } from '@angular/core';
import { FormControl, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';

import { EvidenceFile } from '../shared/proposals/proposal';
import { ProposalsApi } from '../shared/proposals/proposals-api';
import { fileSize } from '../shared/proposals/evidence-list';
import { UploadProgress, UploadState, uploadStates } from '../shared/uploads/upload-progress';

let nextUploadId = 0;

/**
 * Attaches an evidence file to an item (a paper, a calorimetry data file): chosen from the disk,
 * sent with a progress bar; the API checks its type by content and records its SHA-256.
 */
@Component({
  selector: 'kx-evidence-upload',
  imports: [MatButtonModule, MatFormFieldModule, MatInputModule, ReactiveFormsModule, UploadProgress],
  template: `
    <div class="kx-upload-row">
      <input #fileInput type="file" class="kx-visually-hidden" [id]="inputId" aria-label="Evidence file" tabindex="-1" (change)="chooseFile($event)" accept=".pdf,.png,.jpg,.jpeg,.zip,.txt,.csv,.json,.xlsx,.docx" />
      <button mat-stroked-button type="button" class="kx-choose-file" (click)="fileInput.click()">Choose a file…</button>
      <span class="kx-chosen" aria-live="polite">{{ chosenText() }}</span>
    </div>
    @if (file()) {
      <div class="kx-upload-row">
        <mat-form-field appearance="outline" subscriptSizing="dynamic" class="kx-description">
          <mat-label>Description (optional)</mat-label>
          <input matInput [formControl]="description" autocomplete="off" />
        </mat-form-field>
        <button mat-flat-button type="button" class="kx-upload-evidence" [disabled]="sending()" (click)="uploadFile()">Upload</button>
      </div>
    }
    <kx-upload-progress [upload]="upload()" [label]="'Uploading ' + (file()?.name ?? 'the file')" />
    @if (failure()) {
      <p class="kx-upload-problem" role="alert">{{ failure() }}</p>
    }
    <p class="kx-upload-hint">PDF, PNG, JPEG, ZIP (office files too), text, CSV or JSON; the type is judged from the content.</p>
  `,
  styles: `
    :host {
      display: block;
    }
    .kx-upload-row {
      display: flex;
      flex-wrap: wrap;
      gap: 0.5rem 1rem;
      align-items: center;
      margin-bottom: 0.5rem;
    }
    .kx-description {
      flex: 1 1 16rem;
    }
    .kx-chosen,
    .kx-upload-hint {
      font: var(--mat-sys-body-small);
      color: var(--mat-sys-on-surface-variant);
    }
    .kx-upload-hint {
      margin: 0.25rem 0 0;
    }
    .kx-upload-problem {
      color: var(--mat-sys-error);
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class EvidenceUpload {
  private readonly proposals = inject(ProposalsApi);
  private readonly fileInput = viewChild.required<ElementRef<HTMLInputElement>>('fileInput');

  readonly proposalId = input.required<string>();
  readonly itemId = input.required<string>();
  readonly uploaded = output<EvidenceFile>();

  protected readonly inputId = `kx-evidence-${nextUploadId++}`;
  protected readonly file = signal<File | null>(null);
  protected readonly description = new FormControl('', { nonNullable: true, validators: Validators.maxLength(2000) });
  protected readonly upload = signal<UploadState<EvidenceFile>>({ state: 'idle' });
  protected readonly sending = computed(() => this.upload().state === 'sending');
  protected readonly failure = computed(() => {
    const upload = this.upload();
    return upload.state === 'failed' ? upload.message : '';
  });
  protected readonly chosenText = computed(() => {
    const file = this.file();
    return file ? `${file.name} (${fileSize(file.size)})` : 'No file chosen';
  });

  protected chooseFile(event: Event): void {
    const input = event.target as HTMLInputElement;
    this.file.set(input.files?.[0] ?? null);
    this.upload.set({ state: 'idle' });
  }

  protected uploadFile(): void {
    const file = this.file();
    if (!file) {
      return;
    }
    uploadStates(this.proposals.uploadEvidence(this.proposalId(), this.itemId(), file, this.description.value)).subscribe((state) => {
      this.upload.set(state);
      if (state.state === 'done') {
        this.file.set(null);
        this.description.reset();
        this.fileInput().nativeElement.value = '';
        this.uploaded.emit(state.result);
      }
    });
  }
}
