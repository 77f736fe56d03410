import { HttpErrorResponse, HttpEvent, HttpEventType } from '@angular/common/http';
import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { Observable, catchError, filter, map, of, startWith } from 'rxjs';

import { describeHttpError } from '../../core/api-error';

/** Where an upload is: not started, sending (with the share sent when known), done or failed. */
export type UploadState<T> =
  | { readonly state: 'idle' }
  | { readonly state: 'sending'; readonly loaded: number; readonly total: number | null }
  | { readonly state: 'done'; readonly result: T }
  | { readonly state: 'failed'; readonly message: string };

/**
 * Turns the events of a request sent with `reportProgress: true, observe: 'events'` into upload
 * states: `sending` as bytes leave (0 at first), then `done` with the answer, or `failed` with the
 * API's message.
 */
export function uploadStates<T>(events: Observable<HttpEvent<T>>): Observable<UploadState<T>> {
  return events.pipe(
    filter((event) => event.type === HttpEventType.UploadProgress || event.type === HttpEventType.Response),
    map((event): UploadState<T> =>
      event.type === HttpEventType.UploadProgress
        ? { state: 'sending', loaded: event.loaded, total: event.total ?? null }
        : { state: 'done', result: (event as { body: T }).body },
    ),
    startWith<UploadState<T>>({ state: 'sending', loaded: 0, total: null }),
    catchError((error: unknown) =>
      of<UploadState<T>>({
        state: 'failed',
        message: error instanceof HttpErrorResponse ? describeHttpError(error) : 'The upload failed.',
      }),
    ),
  );
}

/** The share of an upload sent, 0–100, or null while the size is unknown. */
export function uploadPercent(state: UploadState<unknown>): number | null {
  if (state.state === 'done') {
    return 100;
  }
  if (state.state !== 'sending' || !state.total) {
    return null;
  }
  return Math.min(100, Math.round((100 * state.loaded) / state.total));
}

/** A progress bar for an upload with its percentage in words: `<kx-upload-progress [upload]="s" label="…" />`. */
@Component({
  selector: 'kx-upload-progress',
  imports: [MatProgressBarModule],
  template: `
    @if (active()) {
      <mat-progress-bar
        [mode]="percent() === null ? 'indeterminate' : 'determinate'"
        [value]="percent() ?? 0"
        [attr.aria-label]="label()"
      />
      <span class="kx-upload-text" role="status" aria-live="polite">{{ text() }}</span>
    }
  `,
  styles: `
    :host {
      display: block;
    }
    .kx-upload-text {
      font: var(--mat-sys-body-small);
      color: var(--mat-sys-on-surface-variant);
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class UploadProgress {
  readonly upload = input.required<UploadState<unknown>>();
  readonly label = input('Upload progress');

  protected readonly active = computed(() => this.upload().state === 'sending' || this.upload().state === 'done');
  protected readonly percent = computed(() => uploadPercent(this.upload()));
  protected readonly text = computed(() => {
    const upload = this.upload();
    if (upload.state === 'done') {
      return 'Uploaded.';
    }
    const percent = this.percent();
    return percent === null ? 'Uploading…' : `Uploading: ${percent} %`;
  });
}
