import { TestBed } from '@angular/core/testing';
import { MatIconTestingModule } from '@angular/material/icon/testing';
import { provideRouter } from '@angular/router';

import { NotAllowedPage } from './not-allowed-page';

describe('NotAllowedPage', () => {
  it('names the roles the page needs', async () => {
    TestBed.configureTestingModule({ imports: [MatIconTestingModule], providers: [provideRouter([])] });
    const fixture = TestBed.createComponent(NotAllowedPage);
    fixture.componentRef.setInput('roles', 'reviewer,editor');
    await fixture.whenStable();
    const page = fixture.nativeElement as HTMLElement;
    expect(page.querySelector('kx-empty-state h2')!.textContent).toBe('Your account cannot open that page');
    expect(page.textContent).toContain('It needs the reviewer or editor role.');
  });
});
