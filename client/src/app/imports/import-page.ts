import { DatePipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, DestroyRef, ElementRef, computed, inject, signal, viewChild } from '@angular/core';
import { takeUntilDestroyed, toSignal } from '@angular/core/rxjs-interop';
import { FormControl, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { RouterLink } from '@angular/router';
import { Subject, catchError, map, of, startWith, switchMap, takeWhile, throwError, timer } from 'rxjs';

import { downloadFile } from '../shared/csv/csv-file';
import { fileSize } from '../shared/proposals/evidence-list';
import { UploadProgress, UploadState, uploadStates } from '../shared/uploads/upload-progress';
import { problemsCsv, problemsOfRefusal, reportFileName } from './import-report';
import { ImportJob, ImportProblem, ImportReport, ImportsApi } from './imports-api';

const COUNT_FORMAT = new Intl.NumberFormat();

/** How often a running import is asked for its progress, ms. */
export const POLL_INTERVAL_MS = 500;

type Phase = 'choose' | 'checking' | 'checked' | 'importing' | 'done' | 'failed';

/**
 * Bulk import: upload a CSV or XML file of values, read the dry run's report (every problem with
 * its line number, downloadable as CSV), then run the import with a progress bar; the rows become
 * one draft proposal, opened from here. Nothing is written while any row has a problem.
 */
@Component({
  selector: 'kx-import-page',
  imports: [DatePipe, MatButtonModule, MatFormFieldModule, MatInputModule, MatProgressBarModule, ReactiveFormsModule, RouterLink, UploadProgress],
  templateUrl: './import-page.html',
  styleUrl: './import-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ImportPage {
  private readonly imports = inject(ImportsApi);
  private readonly destroyRef = inject(DestroyRef);
  private readonly fileInput = viewChild.required<ElementRef<HTMLInputElement>>('fileInput');
  private readonly listReloads = new Subject<void>();

  protected readonly file = signal<File | null>(null);
  protected readonly title = new FormControl('', { nonNullable: true, validators: Validators.maxLength(300) });
  protected readonly phase = signal<Phase>('choose');
  protected readonly upload = signal<UploadState<ImportReport>>({ state: 'idle' });
  protected readonly report = signal<ImportReport | null>(null);
  protected readonly problems = signal<readonly ImportProblem[]>([]);
  protected readonly failure = signal('');
  protected readonly job = signal<ImportJob | null>(null);

  protected readonly chosenText = computed(() => {
    const file = this.file();
    return file ? `${file.name} (${fileSize(file.size)})` : 'No file chosen';
  });
  protected readonly canImport = computed(() => this.phase() === 'checked' && this.problems().length === 0 && (this.report()?.rows ?? 0) > 0);
  protected readonly percent = computed(() => Math.round(100 * (this.job()?.progress ?? 0)));
  protected readonly recent = toSignal(
    this.listReloads.pipe(
      startWith(undefined),
      switchMap(() => this.imports.list().pipe(map((answer) => answer.items.slice(0, 10)), catchError(() => of([] as ImportJob[])))),
    ),
    { initialValue: [] as ImportJob[] },
  );

  protected chooseFile(event: Event): void {
    this.file.set((event.target as HTMLInputElement).files?.[0] ?? null);
    this.phase.set('choose');
    this.report.set(null);
    this.problems.set([]);
    this.failure.set('');
    this.job.set(null);
    this.upload.set({ state: 'idle' });
  }

  protected pickFile(): void {
    this.fileInput().nativeElement.click();
  }

  /** Uploads the file for a dry run: every problem, nothing written. */
  protected checkFile(): void {
    const file = this.file();
    if (!file) {
      return;
    }
    this.phase.set('checking');
    this.failure.set('');
    uploadStates(this.imports.upload(file, { dryRun: true, title: this.title.value }))
      .pipe(takeUntilDestroyed(this.destroyRef))
      .subscribe((state) => {
        this.upload.set(state);
        if (state.state === 'done') {
          this.report.set(state.result);
          this.problems.set(state.result.errors);
          this.phase.set('checked');
        } else if (state.state === 'failed') {
          this.failure.set(state.message);
          this.phase.set('failed');
        }
      });
  }

  /** Uploads the file again for the real import, then follows the job until it has made the draft. */
  protected runImport(): void {
    const file = this.file();
    if (!file || !this.canImport()) {
      return;
    }
    this.phase.set('importing');
    this.imports
      .upload(file, { dryRun: false, title: this.title.value })
      .pipe(
        // A row that went wrong since the check (a source removed…) is refused with every problem.
        catchError((error: unknown) => {
          this.problems.set(problemsOfRefusal(error) ?? []);
          return throwError(() => error);
        }),
        uploadStates,
        takeUntilDestroyed(this.destroyRef),
      )
      .subscribe((state) => {
        this.upload.set(state);
        if (state.state === 'done') {
          this.job.set(state.result);
          this.follow(state.result.id);
        } else if (state.state === 'failed') {
          this.phase.set('failed');
          this.failure.set(state.message);
        }
      });
  }

  /** A count with thousands grouped, as the reader's language writes it. */
  protected count(n: number | null | undefined): string {
    return n === null || n === undefined ? '—' : COUNT_FORMAT.format(n);
  }

  protected downloadProblems(): void {
    downloadFile(problemsCsv(this.problems()), reportFileName(this.file()?.name ?? 'import'));
  }

  private follow(id: string): void {
    timer(0, POLL_INTERVAL_MS)
      .pipe(
        switchMap(() => this.imports.job(id)),
        takeWhile((job) => job.status === 'running' || job.status === 'queued', true),
        takeUntilDestroyed(this.destroyRef),
      )
      .subscribe({
        next: (job) => {
          this.job.set(job);
          if (job.status === 'succeeded') {
            this.phase.set('done');
            this.listReloads.next();
          } else if (job.status === 'failed' || job.status === 'cancelled') {
            this.phase.set('failed');
            this.problems.set(job.errors);
            this.failure.set(`The import was rolled back; nothing was written.`);
          }
        },
        error: () => this.phase.set('failed'),
      });
  }
}
