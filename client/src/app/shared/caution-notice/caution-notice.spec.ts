import { Component } from '@angular/core';
import { TestBed } from '@angular/core/testing';
import { MatIconTestingModule } from '@angular/material/icon/testing';

import { CautionNotice } from './caution-notice';

@Component({
  imports: [CautionNotice],
  template: `<kx-caution-notice><p class="context">Assumes no heat loss.</p></kx-caution-notice>`,
})
class CautionNoticeHost {}

describe('CautionNotice', () => {
  let notice: HTMLElement;

  beforeEach(() => {
    TestBed.configureTestingModule({ imports: [MatIconTestingModule] });
    const fixture = TestBed.createComponent(CautionNoticeHost);
    fixture.detectChanges();
    notice = (fixture.nativeElement as HTMLElement).querySelector('kx-caution-notice')!;
  });

  it('says the figures are a screening estimate only', () => {
    expect(notice.textContent).toContain('Screening estimate only.');
  });

  it('refers to a qualified process-safety review and local codes', () => {
    const text = notice.textContent!.replace(/\s+/g, ' ');
    expect(text).toContain('refer them to a qualified process-safety review');
    expect(text).toContain('follow your local codes and regulations');
  });

  it('is announced as a note about safety', () => {
    expect(notice.getAttribute('role')).toBe('note');
    expect(notice.getAttribute('aria-label')).toBe('Safety caution');
  });

  it('shows projected context after the caution', () => {
    expect(notice.querySelector('.context')?.textContent).toBe('Assumes no heat loss.');
  });
});
