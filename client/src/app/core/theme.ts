import { DOCUMENT } from '@angular/common';
import { DestroyRef, Injectable, InjectionToken, computed, effect, inject, signal } from '@angular/core';

export type ColorScheme = 'light' | 'dark';

/** The parts of `Storage` the theme needs; swapped for an in-memory fake in specs. */
export type ThemeStorage = Pick<Storage, 'getItem' | 'setItem' | 'removeItem'>;

/** The system's dark-mode media query, or null where there is none. */
export const PREFERS_DARK_QUERY = new InjectionToken<MediaQueryList | null>('PREFERS_DARK_QUERY', {
  providedIn: 'root',
  factory: () => inject(DOCUMENT).defaultView?.matchMedia?.('(prefers-color-scheme: dark)') ?? null,
});

export const THEME_STORAGE = new InjectionToken<ThemeStorage | null>('THEME_STORAGE', {
  providedIn: 'root',
  factory: () => {
    try {
      return inject(DOCUMENT).defaultView?.localStorage ?? null;
    } catch {
      return null; // storage blocked by the browser's privacy settings
    }
  },
});

export const THEME_STORAGE_KEY = 'kelvindex.color-scheme';

const SCHEME_CLASSES: Record<ColorScheme, string> = {
  light: 'kx-theme-light',
  dark: 'kx-theme-dark',
};

/**
 * Light or dark theme: the reader's stored choice, or the system setting until they choose.
 * Applies it as a class on <html>, which sets `color-scheme` for the Material theme.
 */
@Injectable({ providedIn: 'root' })
export class ThemeService {
  private readonly document = inject(DOCUMENT);
  private readonly storage = inject(THEME_STORAGE);
  private readonly prefersDark = inject(PREFERS_DARK_QUERY);
  private readonly chosenScheme = signal<ColorScheme | null>(this.readChoice());
  private readonly systemScheme = signal<ColorScheme>(this.prefersDark?.matches ? 'dark' : 'light');

  readonly scheme = computed(() => this.chosenScheme() ?? this.systemScheme());
  readonly followsSystem = computed(() => this.chosenScheme() === null);

  constructor() {
    const followSystemChange = (event: MediaQueryListEvent) =>
      this.systemScheme.set(event.matches ? 'dark' : 'light');
    this.prefersDark?.addEventListener('change', followSystemChange);
    inject(DestroyRef).onDestroy(() => this.prefersDark?.removeEventListener('change', followSystemChange));

    effect(() => this.applyScheme(this.scheme()));
  }

  toggle(): void {
    this.choose(this.scheme() === 'dark' ? 'light' : 'dark');
  }

  choose(scheme: ColorScheme): void {
    this.chosenScheme.set(scheme);
    this.writeChoice(scheme);
  }

  followSystem(): void {
    this.chosenScheme.set(null);
    this.writeChoice(null);
  }

  private applyScheme(scheme: ColorScheme): void {
    const classes = this.document.documentElement.classList;
    classes.toggle(SCHEME_CLASSES.dark, scheme === 'dark');
    classes.toggle(SCHEME_CLASSES.light, scheme === 'light');
  }

  private readChoice(): ColorScheme | null {
    const stored = this.storage?.getItem(THEME_STORAGE_KEY);
    return stored === 'light' || stored === 'dark' ? stored : null;
  }

  private writeChoice(scheme: ColorScheme | null): void {
    try {
      if (scheme === null) {
        this.storage?.removeItem(THEME_STORAGE_KEY);
      } else {
        this.storage?.setItem(THEME_STORAGE_KEY, scheme);
      }
    } catch {
      // Storage full or blocked: the choice still holds for this visit.
    }
  }
}
