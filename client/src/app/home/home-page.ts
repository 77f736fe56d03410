import { ChangeDetectionStrategy, Component, computed, inject } from '@angular/core';
import { toSignal } from '@angular/core/rxjs-interop';
import { MatButtonModule } from '@angular/material/button';
import { MatIconModule } from '@angular/material/icon';
import { Subject, startWith, switchMap } from 'rxjs';

import { ErrorState } from '../shared/error-state/error-state';
import { LoadingIndicator } from '../shared/loading-indicator/loading-indicator';
import { HealthService } from './health';

/** The overview: what Kelvindex is for, and whether its API is up. */
@Component({
  selector: 'kx-home-page',
  imports: [ErrorState, LoadingIndicator, MatButtonModule, MatIconModule],
  templateUrl: './home-page.html',
  styleUrl: './home-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class HomePage {
  private readonly healthService = inject(HealthService);
  private readonly recheckRequests = new Subject<void>();

  protected readonly health = toSignal(
    this.recheckRequests.pipe(
      startWith(undefined),
      switchMap(() => this.healthService.check()),
    ),
    { requireSync: true },
  );
  protected readonly report = computed(() => {
    const health = this.health();
    return health.state === 'ok' || health.state === 'degraded' ? health.report : null;
  });
  protected readonly unreachableMessage = computed(() => {
    const health = this.health();
    return health.state === 'unreachable' ? health.message : '';
  });

  protected recheckHealth(): void {
    this.recheckRequests.next();
  }
}
