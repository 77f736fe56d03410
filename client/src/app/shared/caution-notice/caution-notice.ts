import { ChangeDetectionStrategy, Component } from '@angular/core';
import { MatIconModule } from '@angular/material/icon';

/**
 * Shown wherever a reaction heat or adiabatic temperature rise is displayed: those figures are
 * screening estimates, and decisions rest with a qualified process-safety review and local codes.
 * Projected content adds context (e.g. which assumptions the figure rests on).
 */
@Component({
  selector: 'kx-caution-notice',
  imports: [MatIconModule],
  templateUrl: './caution-notice.html',
  styleUrl: './caution-notice.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
  host: { role: 'note', 'aria-label': 'Safety caution' },
})
export class CautionNotice {}
