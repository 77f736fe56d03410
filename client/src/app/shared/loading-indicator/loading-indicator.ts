import { ChangeDetectionStrategy, Component, input } from '@angular/core';
import { MatProgressSpinnerModule } from '@angular/material/progress-spinner';

/** A small spinner with words saying what is loading; announced politely to screen readers. */
@Component({
  selector: 'kx-loading-indicator',
  imports: [MatProgressSpinnerModule],
  templateUrl: './loading-indicator.html',
  styleUrl: './loading-indicator.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
  host: { role: 'status', 'aria-live': 'polite' },
})
export class LoadingIndicator {
  readonly label = input('Loading');
}
