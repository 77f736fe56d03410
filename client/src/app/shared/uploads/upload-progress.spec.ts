import { HttpErrorResponse, HttpEvent, HttpEventType, HttpResponse } from '@angular/common/http';
import { TestBed } from '@angular/core/testing';
import { Subject } from 'rxjs';

import { UploadProgress, UploadState, uploadPercent, uploadStates } from './upload-progress';

describe('uploadStates', () => {
  it('reports the bytes sent, then the answer', () => {
    const events = new Subject<HttpEvent<{ id: string }>>();
    const seen: UploadState<{ id: string }>[] = [];
    uploadStates(events).subscribe((state) => seen.push(state));
    events.next({ type: HttpEventType.Sent });
    events.next({ type: HttpEventType.UploadProgress, loaded: 512, total: 2048 });
    events.next(new HttpResponse({ body: { id: 'e1' } }));
    expect(seen).toEqual([
      { state: 'sending', loaded: 0, total: null },
      { state: 'sending', loaded: 512, total: 2048 },
      { state: 'done', result: { id: 'e1' } },
    ]);
    expect(uploadPercent(seen[1])).toBe(25);
    expect(uploadPercent(seen[2])).toBe(100);
  });

  it('ends in a failure carrying the API’s message', () => {
    const events = new Subject<HttpEvent<unknown>>();
    const seen: UploadState<unknown>[] = [];
    uploadStates(events).subscribe((state) => seen.push(state));
    events.error(new HttpErrorResponse({ status: 413, error: { error: 'payload_too_large', message: 'The file is larger than the upload limit of 20 MiB' } }));
    expect(seen.at(-1)).toEqual({ state: 'failed', message: 'The file is larger than the upload limit of 20 MiB' });
    expect(uploadPercent(seen.at(-1)!)).toBeNull();
  });
});

describe('UploadProgress', () => {
  it('shows a determinate bar and the percentage while sending', async () => {
    const fixture = TestBed.createComponent(UploadProgress);
    fixture.componentRef.setInput('upload', { state: 'sending', loaded: 300, total: 400 });
    await fixture.whenStable();
    const element = fixture.nativeElement as HTMLElement;
    expect(element.querySelector('mat-progress-bar')!.getAttribute('aria-valuenow')).toBe('75');
    expect(element.querySelector('[role="status"]')!.textContent).toBe('Uploading: 75 %');
  });

  it('shows nothing before an upload starts', async () => {
    const fixture = TestBed.createComponent(UploadProgress);
    fixture.componentRef.setInput('upload', { state: 'idle' });
    await fixture.whenStable();
    expect((fixture.nativeElement as HTMLElement).querySelector('mat-progress-bar')).toBeNull();
  });
});
