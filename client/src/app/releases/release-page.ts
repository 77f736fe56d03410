import { DatePipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, computed, inject, input } from '@angular/core';
import { toObservable, toSignal } from '@angular/core/rxjs-interop';
import { MatButtonModule } from '@angular/material/button';
import { RouterLink } from '@angular/router';
import { switchMap } from 'rxjs';

import { AuthService } from '../core/auth';
import { ErrorState } from '../shared/error-state/error-state';
import { Loadable, loadable } from '../shared/loadable/loadable';
import { LoadingIndicator } from '../shared/loading-indicator/loading-indicator';
import { ChangeLogTable } from './change-log-table';
import { ReleaseDetail, ReleasesApi } from './releases-api';

/** One release: when and by whom it was published, its notes, what it holds and its change log. */
@Component({
  selector: 'kx-release-page',
  imports: [ChangeLogTable, DatePipe, ErrorState, LoadingIndicator, MatButtonModule, RouterLink],
  template: `
    <p class="kx-crumbs"><a routerLink="/releases">Releases</a></p>
    @let state = release();
    @if (state.state === 'loading') {
      <kx-loading-indicator label="Loading the release" />
    } @else if (state.state === 'failed') {
      <h1>Release {{ label() }}</h1>
      <kx-error-state [heading]="state.status === 404 ? 'No such release' : 'The release could not be loaded'" [message]="state.message" [retryable]="state.status !== 404" />
    } @else {
      @let detail = state.value;
      <h1>Release {{ detail.label }}</h1>
      <p class="kx-meta">
        @if (detail.status === 'published') {
          Published {{ detail.publishedAt | date: 'yyyy-MM-dd HH:mm' }}{{ detail.publishedBy ? ' by ' + detail.publishedBy : '' }}{{ detail.latest ? ' · the latest release' : '' }}
        } @else {
          In preparation: it still changes until an editor publishes it.
        }
      </p>
      @if (detail.status === 'preparing' && isEditor()) {
        <a mat-flat-button class="kx-assemble" [routerLink]="['/releases', detail.label, 'edit']">Assemble {{ detail.label }}</a>
      }
      @if (detail.notes) {
        <p class="kx-notes">{{ detail.notes }}</p>
      }
      <dl class="kx-counts">
        <div><dt>Species</dt><dd class="kx-numeric">{{ detail.counts.species }}</dd></div>
        <div><dt>Species phases</dt><dd class="kx-numeric">{{ detail.counts.speciesPhases }}</dd></div>
        <div><dt>Values</dt><dd class="kx-numeric">{{ detail.counts.values }}</dd></div>
        <div><dt>Recommended values</dt><dd class="kx-numeric">{{ detail.counts.recommendedValues }}</dd></div>
        <div><dt>Heat-capacity fits</dt><dd class="kx-numeric">{{ detail.counts.fits }}</dd></div>
        <div><dt>Sources</dt><dd class="kx-numeric">{{ detail.counts.sources }}</dd></div>
      </dl>
      <section aria-labelledby="log-heading">
        <h2 id="log-heading">Change log</h2>
        <p>
          @if (detail.comparedWith) {
            Against {{ detail.comparedWith }}: {{ detail.summary.added }} added, {{ detail.summary.revised }} revised, {{ detail.summary.retired }} retired.
            <a routerLink="/releases" [queryParams]="{ from: detail.comparedWith, to: detail.label }">Compare with another release</a>
          } @else {
            The first release: everything in it is new.
          }
        </p>
        <kx-change-log-table
          [entries]="detail.changeLog"
          [release]="detail.label"
          [beforeLabel]="detail.comparedWith ? 'In ' + detail.comparedWith : 'Before'"
          [afterLabel]="'In ' + detail.label"
          [caption]="'Change log of release ' + detail.label"
        />
      </section>
    }
  `,
  styles: `
    .kx-crumbs {
      margin: 0 0 0.25rem;
    }
    .kx-meta {
      color: var(--mat-sys-on-surface-variant);
    }
    .kx-counts {
      display: flex;
      flex-wrap: wrap;
      gap: 0.5rem 2rem;
      margin: 1rem 0 1.5rem;
      div {
        display: flex;
        flex-direction: column;
      }
      dt {
        font: var(--mat-sys-label-medium);
        color: var(--mat-sys-on-surface-variant);
      }
      dd {
        margin: 0;
        font: var(--mat-sys-title-medium);
        text-align: start;
      }
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ReleasePage {
  private readonly releases = inject(ReleasesApi);
  private readonly auth = inject(AuthService);

  readonly label = input.required<string>();

  protected readonly isEditor = computed(() => this.auth.user()?.roles.includes('editor') ?? false);
  protected readonly release = toSignal(toObservable(this.label).pipe(switchMap((label) => loadable(this.releases.detail(label)))), {
    initialValue: { state: 'loading' } as Loadable<ReleaseDetail>,
  });
}
