import { TestBed } from '@angular/core/testing';
import { MatIconTestingModule } from '@angular/material/icon/testing';
import { provideRouter } from '@angular/router';

import { NotFoundPage } from './not-found-page';

describe('NotFoundPage', () => {
  it('says the page does not exist and links back to the overview', async () => {
    TestBed.configureTestingModule({ imports: [MatIconTestingModule], providers: [provideRouter([])] });
    const fixture = TestBed.createComponent(NotFoundPage);
    await fixture.whenStable();
    const page = fixture.nativeElement as HTMLElement;

    expect(page.querySelector('h1')!.textContent).toBe('Page not found');
    expect(page.querySelector('kx-empty-state h2')!.textContent).toBe('There is no page at this address');
    expect(page.querySelector('a')!.getAttribute('href')).toBe('/');
  });
});
