import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { RouterLink } from '@angular/router';

import { EmptyState } from '../shared/empty-state/empty-state';

/** Where a role guard sends a signed-in reader whose account lacks the role a page needs. */
@Component({
  selector: 'kx-not-allowed-page',
  imports: [EmptyState, MatButtonModule, RouterLink],
  template: `
    <h1 class="kx-visually-hidden">Not allowed</h1>
    <kx-empty-state heading="Your account cannot open that page" [message]="message()">
      <a mat-flat-button routerLink="/">Go to the overview</a>
    </kx-empty-state>
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class NotAllowedPage {
  /** Comma-separated roles, from the `roles` query parameter. */
  readonly roles = input<string>();

  protected readonly message = computed(() => {
    const roles = (this.roles() ?? '').split(',').filter(Boolean);
    return roles.length === 0
      ? 'Ask your Kelvindex administrator for the role it needs.'
      : `It needs the ${roles.join(' or ')} role. Ask your Kelvindex administrator if you should have it.`;
  });
}
