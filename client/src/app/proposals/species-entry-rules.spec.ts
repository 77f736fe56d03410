import { FormControl } from '@angular/forms';

import { casRnRule, formulaRule, inchiKeyRule, isInchiKey, isValidCasRn, looksLikeFormula } from './species-entry-rules';

describe('species entry rules', () => {
  it('checks the CAS RN check digit', () => {
    expect(isValidCasRn('7732-18-5')).toBeTrue(); // water
    expect(isValidCasRn('71-36-3')).toBeTrue(); // butan-1-ol
    expect(isValidCasRn('7732-18-4')).toBeFalse();
    expect(isValidCasRn('773218-5')).toBeFalse();
    expect(casRnRule(new FormControl('64-17-6'))).toEqual({ casRn: true });
    expect(casRnRule(new FormControl(''))).toBeNull();
  });

  it('checks the form of an InChIKey', () => {
    expect(isInchiKey('LRHPLDYGYMQRHN-UHFFFAOYSA-N')).toBeTrue();
    expect(isInchiKey('LRHPLDYGYMQRHN-UHFFFAOYSA')).toBeFalse();
    expect(inchiKeyRule(new FormControl('not-a-key'))).toEqual({ inchikey: true });
  });

  it('takes formulas as chemists type them', () => {
    expect(looksLikeFormula('CH3CH2CH2OH')).toBeTrue();
    expect(looksLikeFormula('SO4^2-')).toBeTrue();
    expect(looksLikeFormula('CuSO4·5H2O')).toBeTrue();
    expect(looksLikeFormula('propanol')).toBeFalse();
    expect(formulaRule(new FormControl('2H2O?'))).toEqual({ formula: true });
  });
});
