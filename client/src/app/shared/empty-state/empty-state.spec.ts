import { Component } from '@angular/core';
import { TestBed } from '@angular/core/testing';
import { MatIconTestingModule } from '@angular/material/icon/testing';

import { EmptyState } from './empty-state';

@Component({
  imports: [EmptyState],
  template: `
    <kx-empty-state heading="No values yet" message="Nothing has been entered for this species.">
      <a class="action" href="/proposals/new">Propose a value</a>
    </kx-empty-state>
    <kx-empty-state class="bare" heading="No results" />
  `,
})
class EmptyStateHost {}

describe('EmptyState', () => {
  let host: HTMLElement;

  beforeEach(async () => {
    TestBed.configureTestingModule({ imports: [MatIconTestingModule] });
    const fixture = TestBed.createComponent(EmptyStateHost);
    await fixture.whenStable();
    host = fixture.nativeElement as HTMLElement;
  });

  it('shows the heading, the reason and the projected way forward', () => {
    const state = host.querySelector('kx-empty-state')!;
    expect(state.querySelector('h2')!.textContent).toBe('No values yet');
    expect(state.querySelector('p')!.textContent).toBe('Nothing has been entered for this species.');
    expect(state.querySelector('.action')!.textContent).toBe('Propose a value');
  });

  it('leaves out the message paragraph when there is none', () => {
    const bare = host.querySelector('kx-empty-state.bare')!;
    expect(bare.querySelector('h2')!.textContent).toBe('No results');
    expect(bare.querySelector('p')).toBeNull();
  });
});
