import { ThermoInputError } from './errors';
import { expectWithin } from './testing/expect-within';
import { exact, expandedFromStandard, standardFromExpanded, weightedSum } from './uncertain-value';

describe('uncertain values (GUM, JCGM 100:2008)', () => {
  it('turns an expanded uncertainty U with coverage factor k into u = U/k (GUM 6.2.1) and back', () => {
    // e.g. a value quoted "± 0.26 (k = 2)" has u = 0.13
    expectWithin(standardFromExpanded(0.26, 2), 0.13, 1e-15, 'u');
    expectWithin(expandedFromStandard(0.13, 2), 0.26, 1e-15, 'U');
  });

  it('refuses a coverage factor that is not positive and a negative U', () => {
    expect(() => standardFromExpanded(0.2, 0)).toThrowError(ThermoInputError);
    expect(() => standardFromExpanded(-0.2, 2)).toThrowError(ThermoInputError);
    expect(() => expandedFromStandard(0.2, Number.NaN)).toThrowError(ThermoInputError);
  });

  it('propagates a linear combination uncorrelated: u = sqrt(Σν²u²) (GUM eq. 10)', () => {
    // CODATA 1989: CO(g) −110.53 ± 0.17, CO2(g) −393.51 ± 0.13 kJ/mol; CO + ½O2 → CO2
    const r = weightedSum([
      { coefficient: -1, value: { value: -110.53, uncertainty: 0.17 } },
      { coefficient: -0.5, value: exact(0) },
      { coefficient: 1, value: { value: -393.51, uncertainty: 0.13 } },
    ]);
    expectWithin(r.value, -282.98, 1e-9, 'value');
    expectWithin(r.uncertainty, Math.sqrt(0.17 ** 2 + 0.13 ** 2), 1e-15, 'u');
  });
});
