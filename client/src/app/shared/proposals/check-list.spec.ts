import { TestBed } from '@angular/core/testing';
import { MatIconTestingModule } from '@angular/material/icon/testing';

import { CheckList, checkNumbers } from './check-list';

describe('checkNumbers', () => {
  it('turns camelCase keys into words and rounds numbers to six significant digits', () => {
    expect(checkNumbers({ combinedUncertainty: 640.312423743, z: 0.4685, otherSource: 'codata-1989', ratio: null })).toEqual([
      { label: 'combined uncertainty', value: '640.312' },
      { label: 'z', value: '0.4685' },
      { label: 'other source', value: 'codata-1989' },
      { label: 'ratio', value: '—' },
    ]);
  });

  it('leaves out nested structures', () => {
    expect(checkNumbers({ composition: { C: 3 }, pressure: 100000 })).toEqual([{ label: 'pressure', value: '100000' }]);
  });
});

describe('CheckList', () => {
  beforeEach(() => {
    TestBed.configureTestingModule({ imports: [MatIconTestingModule] });
  });

  it('lists failed checks first, with their numbers', async () => {
    const fixture = TestBed.createComponent(CheckList);
    fixture.componentRef.setInput('checks', [
      { code: 'entropy-positive', status: 'pass', message: 'S° > 0' },
      { code: 'source-agreement', status: 'fail', message: 'differs from codata-1989', details: { difference: 2400, z: 3.2 } },
    ]);
    await fixture.whenStable();
    const items = Array.from((fixture.nativeElement as HTMLElement).querySelectorAll('li'));
    expect(items[0].className).toBe('kx-check-fail');
    expect(items[0].textContent).toContain('failed: source-agreement differs from codata-1989');
    expect(items[0].querySelector('dl')!.textContent).toContain('difference');
    expect(items[1].className).toBe('kx-check-pass');
  });

  it('says that the checks run at submission when there are none yet', async () => {
    const fixture = TestBed.createComponent(CheckList);
    fixture.componentRef.setInput('checks', null);
    await fixture.whenStable();
    expect((fixture.nativeElement as HTMLElement).textContent).toContain('run when the proposal is submitted');
  });
});
