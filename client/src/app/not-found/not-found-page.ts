import { ChangeDetectionStrategy, Component } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { RouterLink } from '@angular/router';

import { EmptyState } from '../shared/empty-state/empty-state';

/** Shown for any address the app has no page for. */
@Component({
  selector: 'kx-not-found-page',
  imports: [EmptyState, MatButtonModule, RouterLink],
  templateUrl: './not-found-page.html',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class NotFoundPage {}
