import { Component, signal } from '@angular/core';
import { ComponentFixture, TestBed } from '@angular/core/testing';

import { ReleasePicker } from './release-picker';
import { ReleaseSummary } from './release-summary';

@Component({
  imports: [ReleasePicker],
  template: `<kx-release-picker [releases]="releases()" [(version)]="version" />`,
})
class ReleasePickerHost {
  readonly releases = signal<readonly ReleaseSummary[]>([
    { label: '2025.3', status: 'preparing', publishedAt: null },
    { label: '2025.2', status: 'published', publishedAt: '2025-09-30T10:00:00Z', latest: true },
    { label: '2025.1', status: 'published', publishedAt: '2025-03-31T10:00:00Z' },
  ]);
  readonly version = signal<string | null>('2025.1');
}

describe('ReleasePicker', () => {
  let fixture: ComponentFixture<ReleasePickerHost>;
  let host: HTMLElement;

  async function openPanel(): Promise<HTMLElement[]> {
    host.querySelector<HTMLElement>('.mat-mdc-select-trigger')!.click();
    await fixture.whenStable();
    return Array.from(document.querySelectorAll<HTMLElement>('mat-option'));
  }

  beforeEach(async () => {
    fixture = TestBed.createComponent(ReleasePickerHost);
    host = fixture.nativeElement as HTMLElement;
    await fixture.whenStable();
  });

  it('shows the bound release under its label', () => {
    expect(host.querySelector('mat-label')!.textContent).toBe('Release');
    expect(host.querySelector('.mat-mdc-select-value')!.textContent).toContain('2025.1');
  });

  it('shows the latest published release when none is bound', async () => {
    fixture.componentInstance.version.set(null);
    await fixture.whenStable();
    expect(host.querySelector('.mat-mdc-select-value')!.textContent).toContain('2025.2');
  });

  it('lists every published release with its publication date and marks the latest', async () => {
    const options = await openPanel();
    const texts = options.map((option) => option.textContent!.replace(/\s+/g, ' ').trim());
    expect(texts).toEqual(['2025.2 · 2025-09-30 latest', '2025.1 · 2025-03-31']);
  });

  it('writes the chosen version back through the two-way binding', async () => {
    const options = await openPanel();
    options[0].click();
    await fixture.whenStable();
    expect(fixture.componentInstance.version()).toBe('2025.2');
  });

  it('says so when there is no published release', async () => {
    fixture.componentInstance.releases.set([]);
    await fixture.whenStable();
    const options = await openPanel();
    expect(options.length).toBe(1);
    expect(options[0].textContent).toContain('No published release yet');
    expect(options[0].getAttribute('aria-disabled')).toBe('true');
  });
});
