import { changeRows, snapshotText } from './change-log';
import { ChangeEntry } from './releases-api';

describe('change log rows', () => {
  const revised: ChangeEntry = {
    speciesId: 's1',
    formula: 'CH3CH2CH2OH',
    hillFormula: 'C3H8O',
    name: 'propan-1-ol',
    phase: 'l',
    polymorph: null,
    kind: 'value',
    quantity: 'dfH',
    transitionKind: null,
    change: 'revised',
    reason: 'now recommended',
    before: { kind: 'value', id: 'a', versionNo: 1, value: -302600, uncertainty: 400, unit: 'J/mol', source: 'e2e-2027', recommended: false },
    after: { kind: 'value', id: 'a', versionNo: 1, value: -302600, uncertainty: 400, unit: 'J/mol', source: 'e2e-2027', recommended: true },
  };

  it('shows values in kJ/mol with their source and whether recommended', () => {
    expect(snapshotText(revised.after)).toBe('-302.6 ± 0.4 kJ/mol (e2e-2027, recommended)');
    expect(snapshotText({ kind: 'value', id: 'b', versionNo: 2, value: 144.2, uncertainty: null, unit: 'J/(mol·K)', source: 'qpc', recommended: false })).toBe(
      '144.2 J/(mol·K) (qpc)',
    );
    expect(snapshotText(null)).toBe('—');
  });

  it('names what changed with its IUPAC symbol and phase', () => {
    const fit: ChangeEntry = {
      ...revised,
      kind: 'fit',
      quantity: 'Cp',
      phase: 'g',
      change: 'added',
      reason: 'new lineage',
      before: null,
      after: { kind: 'fit', id: 'f', versionNo: 1, form: 'nasa7', tMin: 200, tMax: 6000, source: 'nasa-tm-4513', recommended: true },
    };
    const [value, added] = changeRows([revised, fit]);
    expect(value).toEqual(jasmine.objectContaining({ what: 'ΔfH°(l)', change: 'revised', reason: 'now recommended' }));
    expect(added).toEqual(jasmine.objectContaining({ what: 'Cp°(T) fit (g)', before: '—', after: 'nasa7 fit 200–6000 K (nasa-tm-4513, recommended)' }));
  });
});
