import { ChangeDetectionStrategy, Component, computed, inject } from '@angular/core';
import { toSignal } from '@angular/core/rxjs-interop';
import { MatButtonModule } from '@angular/material/button';
import { MatIconModule } from '@angular/material/icon';
import { MatMenuModule } from '@angular/material/menu';
import { MatToolbarModule } from '@angular/material/toolbar';
import { NavigationEnd, Router, RouterLink, RouterLinkActive } from '@angular/router';
import { filter, map } from 'rxjs';

import { AuthService } from '../core/auth';
import { ThemeService } from '../core/theme';
import { NAV_LINKS, visibleNavLinks } from './nav-links';

/**
 * The app bar: product name, navigation (a menu on narrow screens) shaped by who is signed in,
 * the theme switch and the reader's own menu (or a sign-in link).
 */
@Component({
  selector: 'kx-toolbar',
  imports: [MatButtonModule, MatIconModule, MatMenuModule, MatToolbarModule, RouterLink, RouterLinkActive],
  templateUrl: './toolbar.html',
  styleUrl: './toolbar.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class Toolbar {
  private readonly theme = inject(ThemeService);
  private readonly auth = inject(AuthService);
  private readonly router = inject(Router);
  private readonly currentUrl = toSignal(
    this.router.events.pipe(
      filter((event) => event instanceof NavigationEnd),
      map((event) => event.urlAfterRedirects),
    ),
    { initialValue: '/' },
  );

  protected readonly user = this.auth.user;
  protected readonly links = computed(() => visibleNavLinks(NAV_LINKS, this.user()));
  protected readonly initials = computed(() =>
    (this.user()?.name ?? '')
      .split(/\s+/)
      .filter(Boolean)
      .slice(0, 2)
      .map((word) => word[0].toUpperCase())
      .join(''),
  );
  /** Where the sign-in page sends the reader back to; not to itself. */
  protected readonly signInReturn = computed(() => {
    const url = this.currentUrl();
    return url.startsWith('/sign-in') ? null : url;
  });
  protected readonly themeToggleLabel = computed(() =>
    this.theme.scheme() === 'dark' ? 'Switch to light theme' : 'Switch to dark theme',
  );
  protected readonly themeToggleIcon = computed(() => (this.theme.scheme() === 'dark' ? 'theme-light' : 'theme-dark'));

  protected toggleTheme(): void {
    this.theme.toggle();
  }

  protected signOut(): void {
    this.auth.signOut().subscribe(() => void this.router.navigateByUrl('/'));
  }
}
