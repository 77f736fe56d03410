import { TestBed } from '@angular/core/testing';

import { Formula, chargeText, formulaParts } from './formula';

describe('formulaParts', () => {
  it('subscripts atom counts after element symbols', () => {
    expect(formulaParts('C2H5OH')).toEqual([
      { text: 'C', subscript: false },
      { text: '2', subscript: true },
      { text: 'H', subscript: false },
      { text: '5', subscript: true },
      { text: 'OH', subscript: false },
    ]);
  });

  it('subscripts counts after a closing bracket', () => {
    expect(formulaParts('Ca(OH)2')).toEqual([
      { text: 'Ca(OH)', subscript: false },
      { text: '2', subscript: true },
    ]);
  });

  it('keeps a leading multiplier on the line', () => {
    expect(formulaParts('CuSO4·5H2O').map((part) => part.subscript)).toEqual([false, true, false, true, false]);
    expect(formulaParts('CuSO4·5H2O')[2].text).toBe('·5H');
  });
});

describe('chargeText', () => {
  it('writes charges as chemists do', () => {
    expect(chargeText(0)).toBe('');
    expect(chargeText(1)).toBe('+');
    expect(chargeText(-1)).toBe('−');
    expect(chargeText(-2)).toBe('2−');
  });
});

describe('Formula', () => {
  it('renders subscripts and a superscript charge', () => {
    const fixture = TestBed.createComponent(Formula);
    fixture.componentRef.setInput('formula', 'NH4');
    fixture.componentRef.setInput('charge', 1);
    fixture.detectChanges();
    const host = fixture.nativeElement as HTMLElement;
    expect(host.querySelector('sub')!.textContent).toBe('4');
    expect(host.querySelector('sup')!.textContent).toBe('+');
    expect(host.textContent).toBe('NH4+');
  });
});
