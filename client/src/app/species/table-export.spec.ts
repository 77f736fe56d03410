import { PropertyRow } from './species-record';
import { ExportColumn, csvField, exportFileName, propertyRowsToCsv, propertyRowsToJson } from './table-export';

const context = { formula: 'H2O', name: 'water', phase: 'g', release: '2025.1' };
const columns: ExportColumn[] = [
  { key: 'deltaFH', header: 'ΔfH°', unit: 'kJ/mol' },
  { key: 'Cp', header: 'Cp°', unit: 'J/(mol·K)' },
];
const rows: PropertyRow[] = [
  { T: 298.15, extrapolated: false, deltaFH: { value: -241.826, uncertainty: 0.04, unit: 'kJ/mol' }, Cp: { value: 33.58, uncertainty: null, unit: 'J/(mol·K)' } },
  { T: 7000, extrapolated: true, deltaFH: null, Cp: { value: 61.2, uncertainty: 0.5, unit: 'J/(mol·K)' } },
];

describe('propertyRowsToCsv', () => {
  it('writes the shown columns with units in the headings and all digits', () => {
    expect(propertyRowsToCsv(context, columns, rows).split('\r\n')).toEqual([
      'species,formula,phase,release,T (K),extrapolated,ΔfH° (kJ/mol),u(ΔfH°) (kJ/mol),Cp° (J/(mol·K)),u(Cp°) (J/(mol·K))',
      'water,H2O,g,2025.1,298.15,false,-241.826,0.04,33.58,',
      'water,H2O,g,2025.1,7000,true,,,61.2,0.5',
      '',
    ]);
  });
});

describe('propertyRowsToJson', () => {
  it('states the context and units once and keeps every row', () => {
    const parsed = JSON.parse(propertyRowsToJson(context, columns, rows));
    expect(parsed.release).toBe('2025.1');
    expect(parsed.columns[0]).toEqual({ key: 'T', header: 'T', unit: 'K' });
    expect(parsed.rows[0]).toEqual({ T: 298.15, extrapolated: false, deltaFH: { value: -241.826, uncertainty: 0.04 }, Cp: { value: 33.58, uncertainty: null } });
    expect(parsed.rows[1].deltaFH).toBeNull();
  });
});

describe('csvField', () => {
  it('quotes commas and quotes, and defuses formulas', () => {
    expect(csvField('a, "b"')).toBe('"a, ""b"""');
    expect(csvField('=HYPERLINK("x")')).toBe('"\'=HYPERLINK(""x"")"');
    expect(csvField('plain')).toBe('plain');
  });
});

describe('exportFileName', () => {
  it('names the species, phase and release', () => {
    expect(exportFileName({ ...context, phase: 'cr, graphite', formula: 'C' }, 'csv')).toBe('kelvindex-C-cr_graphite-2025.1.csv');
  });
});
