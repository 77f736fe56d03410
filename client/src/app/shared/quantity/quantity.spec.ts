import { ComponentFixture, TestBed } from '@angular/core/testing';

import { Quantity } from './quantity';

describe('Quantity', () => {
  let fixture: ComponentFixture<Quantity>;

  function render(value: number | null, uncertainty: number | null, unit = ''): string {
    fixture.componentRef.setInput('value', value);
    fixture.componentRef.setInput('uncertainty', uncertainty);
    fixture.componentRef.setInput('unit', unit);
    fixture.detectChanges();
    return (fixture.nativeElement as HTMLElement).textContent!.replace(/\s+/g, ' ').trim();
  }

  beforeEach(() => {
    fixture = TestBed.createComponent(Quantity);
  });

  it('shows value ± uncertainty and unit in one cell, rounded to the uncertainty', () => {
    expect(render(-241.8264, 0.0423, 'kJ/mol')).toBe('-241.826 ± 0.042 kJ/mol');
  });

  it('keeps the unit together with the number', () => {
    render(-393.51, 0.13, 'kJ/mol');
    const unit = (fixture.nativeElement as HTMLElement).querySelector('.kx-quantity-unit')!;
    expect(unit.textContent).toBe('\u00a0kJ/mol');
  });

  it('shows a value without uncertainty as given', () => {
    expect(render(-285.83, null, 'kJ/mol')).toBe('-285.83 kJ/mol');
  });

  it('writes very small numbers with a shared power of ten', () => {
    expect(render(1.2345e-5, 3.2e-7)).toBe('(1.235 ± 0.032) × 10⁻⁵');
  });

  it('shows a dash for a missing value', () => {
    expect(render(null, null, 'kJ/mol')).toBe('—');
  });

  it('updates when the inputs change', () => {
    render(1.23456, 0.5, 'kJ/mol');
    expect(render(1.23456, 0.052, 'kcal/mol')).toBe('1.235 ± 0.052 kcal/mol');
  });

  it('right-aligns its text with tabular figures', () => {
    render(1, 0.1, 'J/(mol·K)');
    const style = getComputedStyle(fixture.nativeElement as HTMLElement);
    expect(['end', 'right']).toContain(style.textAlign);
    expect(style.fontVariantNumeric).toBe('tabular-nums');
  });
});
