import { ChangeDetectionStrategy, Component, computed, input, model } from '@angular/core';
import { DatePipe } from '@angular/common';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatSelectModule } from '@angular/material/select';

import { ReleaseSummary } from './release-summary';

/**
 * Chooses which published release values are read from:
 * `<kx-release-picker [releases]="releases()" [(version)]="release" />`. A null version means
 * "the latest published", and shows that release as chosen.
 */
@Component({
  selector: 'kx-release-picker',
  imports: [DatePipe, MatFormFieldModule, MatSelectModule],
  templateUrl: './release-picker.html',
  styleUrl: './release-picker.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ReleasePicker {
  readonly releases = input.required<readonly ReleaseSummary[]>();
  readonly version = model<string | null>(null);
  readonly label = input('Release');

  /** Releases in preparation are still changing and cannot be read from here. */
  protected readonly published = computed(() => this.releases().filter((release) => release.status === 'published'));
  protected readonly shownLabel = computed(
    () => this.version() ?? this.published().find((release) => release.latest)?.label ?? null,
  );

  protected selectLabel(label: string): void {
    this.version.set(label);
  }
}
