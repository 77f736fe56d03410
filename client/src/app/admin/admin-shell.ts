import { ChangeDetectionStrategy, Component } from '@angular/core';
import { MatTabsModule } from '@angular/material/tabs';
import { RouterLink, RouterLinkActive, RouterOutlet } from '@angular/router';

const SECTIONS = [
  { path: 'users', label: 'Users and roles' },
  { path: 'api-keys', label: 'API keys' },
  { path: 'audit', label: 'Audit trail' },
  { path: 'outbox', label: 'Outbox' },
] as const;

/** The administration area: a tab bar over its pages. */
@Component({
  selector: 'kx-admin-shell',
  imports: [MatTabsModule, RouterLink, RouterLinkActive, RouterOutlet],
  template: `
    <nav mat-tab-nav-bar [tabPanel]="panel" aria-label="Administration">
      @for (section of sections; track section.path) {
        <a mat-tab-link [routerLink]="section.path" routerLinkActive #active="routerLinkActive" [active]="active.isActive">{{ section.label }}</a>
      }
    </nav>
    <mat-tab-nav-panel #panel>
      <router-outlet />
    </mat-tab-nav-panel>
  `,
  styles: `
    nav {
      margin-bottom: 1.5rem;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class AdminShell {
  protected readonly sections = SECTIONS;
}
