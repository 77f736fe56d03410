import { ChangeDetectionStrategy, Component, computed, inject, input, signal } from '@angular/core';
import { toObservable, toSignal } from '@angular/core/rxjs-interop';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { Router } from '@angular/router';
import { debounceTime, switchMap } from 'rxjs';

import { AuthService } from '../core/auth';
import { downloadFile } from '../shared/csv/csv-file';
import { ErrorState } from '../shared/error-state/error-state';
import { Loadable, loadable } from '../shared/loadable/loadable';
import { LoadingIndicator } from '../shared/loading-indicator/loading-indicator';
import { SourceImportForm } from '../shared/sources/source-import-form';
import { SourceChoice, SourcePicker } from '../shared/sources/source-picker';
import { MergeResult, Source, SourcesApi, firstAuthor } from '../shared/sources/sources-api';
import { DuplicatePair, likelyDuplicates } from './duplicates';

interface Merging {
  readonly duplicate: Source;
  readonly keep: SourceChoice | null;
}

/**
 * Bibliographic sources: find them, add them from BibTeX, RIS or a DOI, export one as BibTeX,
 * and (editors) merge duplicates into the source kept, after comparing the two side by side.
 */
@Component({
  selector: 'kx-sources-page',
  imports: [ErrorState, LoadingIndicator, MatButtonModule, MatFormFieldModule, MatInputModule, SourceImportForm, SourcePicker],
  templateUrl: './sources-page.html',
  styleUrl: './sources-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class SourcesPage {
  private readonly sources = inject(SourcesApi);
  private readonly router = inject(Router);
  private readonly auth = inject(AuthService);
  private readonly reloads = signal(0);

  /** The search, from the URL (`?q=janaf`). */
  readonly q = input<string>();

  protected readonly isEditor = computed(() => this.auth.user()?.roles.includes('editor') ?? false);
  protected readonly query = computed(() => this.q() ?? '');
  protected readonly list = toSignal(
    toObservable(computed(() => ({ q: this.query(), reload: this.reloads() }))).pipe(
      debounceTime(0),
      switchMap(({ q }) => loadable(this.sources.search(q, 200))),
    ),
    { initialValue: { state: 'loading' } as Loadable<{ items: Source[]; total: number }> },
  );
  protected readonly rows = computed(() => {
    const list = this.list();
    return list.state === 'ok' ? list.value.items.map((s) => ({ source: s, author: firstAuthor(s) })) : [];
  });
  protected readonly duplicates = computed(() => likelyDuplicates(this.rows().map((r) => r.source)));
  protected readonly merging = signal<Merging | null>(null);
  protected readonly keptRecord = signal<Source | null>(null);
  protected readonly merged = signal<MergeResult | null>(null);
  protected readonly adding = signal(false);
  protected readonly announcement = signal('');

  protected search(text: string): void {
    void this.router.navigate([], { queryParams: { q: text.trim() || null }, replaceUrl: true });
  }

  protected created(sources: Source[]): void {
    this.announcement.set(`Added ${sources.map((s) => s.shortKey).join(', ')}.`);
    this.adding.set(false);
    this.reloads.update((n) => n + 1);
  }

  protected exportBibtex(source: Source): void {
    this.sources.bibtex(source.id).subscribe((text) => downloadFile(text, `${source.shortKey}.bib`, 'application/x-bibtex;charset=utf-8'));
  }

  protected startMerge(duplicate: Source, keep: Source | null = null): void {
    this.merged.set(null);
    this.merging.set({ duplicate, keep: keep ? { id: keep.id, shortKey: keep.shortKey, title: keep.title } : null });
    this.keptRecord.set(keep);
  }

  protected chooseKept(choice: SourceChoice | null): void {
    const merging = this.merging();
    if (!merging) {
      return;
    }
    this.merging.set({ ...merging, keep: choice });
    this.keptRecord.set(null);
    if (choice) {
      this.sources.get(choice.id).subscribe((source) => this.keptRecord.set(source));
    }
  }

  protected mergeSources(): void {
    const merging = this.merging();
    if (!merging?.keep) {
      return;
    }
    this.sources.merge(merging.duplicate.id, merging.keep.id).subscribe((result) => {
      this.merging.set(null);
      this.merged.set(result);
      this.announcement.set(`Merged ${result.merged.shortKey} into ${result.into.shortKey}.`);
      this.reloads.update((n) => n + 1);
    });
  }

  protected pairKey(pair: DuplicatePair): string {
    return `${pair.duplicate.id}|${pair.keep.id}`;
  }

  protected authorOf(source: Source): string {
    return firstAuthor(source) ?? '—';
  }

  protected retry(): void {
    this.reloads.update((n) => n + 1);
  }
}
