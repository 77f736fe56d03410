import { ComponentFixture, TestBed } from '@angular/core/testing';

import { PhaseBadge } from './phase-badge';

describe('PhaseBadge', () => {
  let fixture: ComponentFixture<PhaseBadge>;
  let host: HTMLElement;

  function render(phase: string, polymorph: string | null = null): void {
    fixture.componentRef.setInput('phase', phase);
    fixture.componentRef.setInput('polymorph', polymorph);
    fixture.detectChanges();
  }

  beforeEach(() => {
    fixture = TestBed.createComponent(PhaseBadge);
    host = fixture.nativeElement as HTMLElement;
  });

  it('shows the IUPAC abbreviation and gives screen readers the words', () => {
    render('g');
    const visible = host.querySelector('[aria-hidden="true"]')!;
    const spoken = host.querySelector('.kx-visually-hidden')!;
    expect(visible.textContent).toBe('g');
    expect(spoken.textContent).toBe('gas');
    expect(host.getAttribute('title')).toBe('gas');
  });

  it('hides the spoken label visually', () => {
    render('l');
    const spoken = host.querySelector<HTMLElement>('.kx-visually-hidden')!;
    expect(spoken.getBoundingClientRect().width).toBeLessThanOrEqual(1);
  });

  it('adds a polymorph after the abbreviation', () => {
    render('cr', 'graphite');
    expect(host.querySelector('[aria-hidden="true"]')!.textContent).toBe('cr, graphite');
    expect(host.querySelector('.kx-visually-hidden')!.textContent).toBe('crystalline solid, graphite');
  });

  it('marks its phase family for styling', () => {
    render('aq');
    expect(host.classList).toContain('kx-phase-solution');
    render('cr');
    expect(host.classList).toContain('kx-phase-solid');
    expect(host.classList).not.toContain('kx-phase-solution');
  });
});
