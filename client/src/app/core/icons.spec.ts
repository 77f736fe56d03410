import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';
import { MatIconRegistry } from '@angular/material/icon';
import { firstValueFrom } from 'rxjs';

import { APP_ICON_NAMES, provideAppIcons } from './icons';

describe('provideAppIcons', () => {
  beforeEach(() => {
    TestBed.configureTestingModule({
      providers: [provideHttpClient(), provideHttpClientTesting(), provideAppIcons()],
    });
  });

  it('serves each icon from the app’s own icons folder', async () => {
    const registry = TestBed.inject(MatIconRegistry);
    const backend = TestBed.inject(HttpTestingController);

    const icon = firstValueFrom(registry.getNamedSvgIcon('caution'));
    backend.expectOne('icons/caution.svg').flush('<svg viewBox="0 0 24 24"><path d="M0 0h1"/></svg>');

    expect((await icon).tagName.toLowerCase()).toBe('svg');
    backend.verify();
  });

  it('has a drawn SVG file for every registered name', async () => {
    for (const name of APP_ICON_NAMES) {
      const response = await fetch(`/icons/${name}.svg`);
      expect(response.ok).withContext(name).toBeTrue();
      expect(await response.text()).withContext(name).toMatch(/^<svg [^>]*viewBox="0 0 24 24"/);
    }
  });
});
