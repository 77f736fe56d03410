import { TM4513 } from '../thermo/testing/published-values';
import { e15, nasa7Lines, nasa7Record } from './nasa7-format';

describe('NASA-7 fixed-column records (NASA TM-4513 layout)', () => {
  it('writes numbers as Fortran 1PE15.8', () => {
    expect(e15(3.53100528)).toBe(' 3.53100528E+00');
    expect(e15(-1.23660987e-4)).toBe('-1.23660987E-04');
    expect(e15(-1046.97628)).toBe('-1.04697628E+03');
    expect(e15(0)).toBe(' 0.00000000E+00');
    // A three-digit exponent still fits 15 columns, with fewer digits.
    expect(e15(-1.5e-120).length).toBe(15);
    expect(Number(e15(-1.5e-120))).toBeCloseTo(-1.5e-120, 125);
  });

  it('lays out the TM-4513 N2 set in four 80-column lines that read back to the same coefficients', () => {
    // NASA TM-4513 (McBride, Gordon & Reno 1993), N2(g), 200–1000–6000 K, as in published-values.md.
    const record = nasa7Record({
      name: 'N2', code: 'TEST01', composition: { N: 2 }, charge: 0, phase: 'g',
      ranges: TM4513.N2.ranges.map((r) => ({ tMin: r.tMin, tMax: r.tMax, coefficients: [...r.coefficients] })),
    });
    if ('skipped' in record) throw new Error(record.skipped);
    const lines = nasa7Lines(record);
    expect(lines.map((l) => l.length)).toEqual([80, 80, 80, 80]);
    expect(lines.map((l) => l[79])).toEqual(['1', '2', '3', '4']);
    expect(lines[0]).toBe('N2                TEST01N   2               G   200.000  6000.0001000.000      1');
    const numbers = lines.slice(1).flatMap((l) => l.slice(0, 75).match(/.{15}/g)!.map(Number)).slice(0, 14);
    expect(numbers.slice(0, 7)).toEqual([...TM4513.N2.ranges[1].coefficients]);
    expect(numbers.slice(7)).toEqual([...TM4513.N2.ranges[0].coefficients]);
  });

  it('writes an ion with its electrons (E) and refuses what the layout cannot hold', () => {
    const ranges = TM4513.N2.ranges.map((r) => ({ tMin: r.tMin, tMax: r.tMax, coefficients: [...r.coefficients] }));
    const ion = nasa7Record({ name: 'NH4+', code: 'X', composition: { N: 1, H: 4 }, charge: 1, phase: 'g', ranges });
    if ('skipped' in ion) throw new Error(ion.skipped);
    expect(nasa7Lines(ion)[0].slice(24, 44)).toBe('H   4N   1E  -1     ');
    const single = nasa7Record({ name: 'X', code: 'X', composition: { N: 2 }, charge: 0, phase: 'g', ranges: ranges.slice(0, 1) });
    expect('skipped' in single ? single.skipped : [single.tLow, single.tCommon, single.tHigh]).toEqual([200, 1000, 1000]);
    expect(nasa7Record({ name: 'Fe0.947O', code: 'X', composition: { Fe: 0.947, O: 1 }, charge: 0, phase: 'cr', ranges })).toEqual({ skipped: 'fractional or very large atom counts' });
    expect('skipped' in nasa7Record({ name: 'X', code: 'X', composition: { N: 2 }, charge: 0, phase: 'g', ranges: [...ranges, ...ranges] })).toBeTrue();
    expect('skipped' in nasa7Record({ name: 'A'.repeat(19), code: 'X', composition: { N: 2 }, charge: 0, phase: 'g', ranges })).toBeTrue();
  });
});
