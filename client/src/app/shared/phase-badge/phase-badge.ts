import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';

import { describePhase } from './phase';

/**
 * A phase as its IUPAC abbreviation (`g`, `l`, `cr, graphite`, `aq`…) in a small badge; screen
 * readers hear the words ("gas"), sighted readers get them as a tooltip.
 */
@Component({
  selector: 'kx-phase-badge',
  templateUrl: './phase-badge.html',
  styleUrl: './phase-badge.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
  host: {
    '[class]': '"kx-phase-" + description().family',
    '[attr.title]': 'description().label',
  },
})
export class PhaseBadge {
  readonly phase = input.required<string>();
  readonly polymorph = input<string | null>(null);

  protected readonly description = computed(() => describePhase(this.phase(), this.polymorph()));
}
