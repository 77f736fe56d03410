import { ATOMIC_WEIGHTS, atomicWeight } from './atomic-weights';

describe('atomic weights', () => {
  it('covers every element H (Z = 1) to Og (Z = 118), once, in order, plus D and T', () => {
    const elements = [...ATOMIC_WEIGHTS.values()].filter((e) => e.kind !== 'isotope');
    expect(elements.length).toBe(118);
    elements.forEach((e, i) => expect(e.z).withContext(e.symbol).toBe(i + 1));
    expect(elements[0].symbol).toBe('H');
    expect(elements[117].symbol).toBe('Og');
    expect(atomicWeight('D')?.kind).toBe('isotope');
    expect(atomicWeight('T')?.kind).toBe('isotope');
  });

  // IUPAC/CIAAW 2021 conventional values (Prohaska et al., Pure Appl. Chem. 94, 573, 2022),
  // confirmed in published-values.md.
  const conventional: Array<[string, number]> = [
    ['H', 1.008], ['C', 12.011], ['N', 14.007], ['O', 15.999], ['S', 32.06], ['Cl', 35.45],
  ];
  for (const [symbol, weight] of conventional) {
    it(`uses the CIAAW 2021 conventional value for ${symbol}: ${weight}`, () => {
      expect(atomicWeight(symbol)).toEqual(jasmine.objectContaining({ weight, kind: 'conventional' }));
    });
  }

  // CIAAW 2021 standard atomic weights (ciaaw.org table as read in a public copy), abridged to
  // five significant figures: Ca 40.078(4), Fe 55.845(2), Cu 63.546(3), Zn 65.38(2),
  // K 39.0983 → 39.098, Na 22.98976928 → 22.990, Al 26.9815384 → 26.982, P 30.973761998 → 30.974.
  const abridged: Array<[string, number]> = [
    ['Ca', 40.078], ['Fe', 55.845], ['Cu', 63.546], ['Zn', 65.38], ['K', 39.098], ['Na', 22.99], ['Al', 26.982], ['P', 30.974],
  ];
  for (const [symbol, weight] of abridged) {
    it(`uses the CIAAW 2021 abridged value for ${symbol}: ${weight}`, () => {
      expect(atomicWeight(symbol)).toEqual(jasmine.objectContaining({ weight, kind: 'abridged' }));
    });
  }

  it('marks elements without a standard atomic weight with a mass number (Tc, Pm, Po…Ac, Np…Og)', () => {
    // CIAAW 2021 gives no standard atomic weight for Tc, Pm, Po, At, Rn, Fr, Ra, Ac and Z ≥ 93
    // (Th, Pa and U have one); the table carries integer mass numbers for those.
    const massNumbers = [...ATOMIC_WEIGHTS.values()].filter((e) => e.kind === 'mass-number');
    expect(massNumbers.map((e) => e.symbol)).toEqual([
      'Tc', 'Pm', 'Po', 'At', 'Rn', 'Fr', 'Ra', 'Ac', 'Np', 'Pu', 'Am', 'Cm', 'Bk', 'Cf', 'Es', 'Fm', 'Md', 'No', 'Lr',
      'Rf', 'Db', 'Sg', 'Bh', 'Hs', 'Mt', 'Ds', 'Rg', 'Cn', 'Nh', 'Fl', 'Mc', 'Lv', 'Ts', 'Og',
    ]);
    massNumbers.forEach((e) => expect(Number.isInteger(e.weight)).withContext(e.symbol).toBeTrue());
    expect(atomicWeight('U')).toEqual(jasmine.objectContaining({ weight: 238.03, kind: 'abridged' }));
  });

  it('gives nothing for an unknown symbol', () => {
    expect(atomicWeight('Xx')).toBeUndefined();
  });
});
