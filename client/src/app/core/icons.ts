import { EnvironmentProviders, inject, provideEnvironmentInitializer } from '@angular/core';
import { MatIconRegistry } from '@angular/material/icon';
import { DomSanitizer } from '@angular/platform-browser';

/** Icons drawn for Kelvindex, served from client/public/icons (no icon font, no other host). */
export const APP_ICON_NAMES = [
  'caution',
  'empty',
  'error',
  'menu',
  'ok',
  'refresh',
  'theme-dark',
  'theme-light',
] as const;

export type AppIconName = (typeof APP_ICON_NAMES)[number];

/** Registers the app's SVG icons for `<mat-icon svgIcon="…">`; fetched on first use. */
export function provideAppIcons(): EnvironmentProviders {
  return provideEnvironmentInitializer(() => {
    const registry = inject(MatIconRegistry);
    const sanitizer = inject(DomSanitizer);
    for (const name of APP_ICON_NAMES) {
      registry.addSvgIcon(name, sanitizer.bypassSecurityTrustResourceUrl(`icons/${name}.svg`));
    }
  });
}
