import { CitedValue, citationBibtex, citationText, escapeBibtex } from './citation';

const cited: CitedValue = {
  speciesName: 'water',
  formula: 'H2O',
  phase: 'g',
  quantityCode: 'dfH',
  symbol: 'ΔfH°',
  valueText: '-241.826 ± 0.040 kJ/mol',
  uncertaintyNote: 'standard uncertainty',
  temperature: 298.15,
  source: { id: 4, key: 'CODATA 1989', citation: 'Cox, Wagman & Medvedev, CODATA Key Values for Thermodynamics (1989)', doi: '10.1000/codata' },
  release: '2025.1',
  valueId: 812,
  url: 'https://kelvindex.example/species/7?release=2025.1&phase=g',
  accessed: new Date(2026, 0, 5),
};

describe('citationText', () => {
  it('names the value, its conditions, its original source and the release', () => {
    expect(citationText(cited)).toBe(
      'ΔfH°(H2O, g, 298.15 K) = -241.826 ± 0.040 kJ/mol (standard uncertainty), water. ' +
        'Source: Cox, Wagman & Medvedev, CODATA Key Values for Thermodynamics (1989). https://doi.org/10.1000/codata. ' +
        'Retrieved from Kelvindex release 2025.1 (value 812), https://kelvindex.example/species/7?release=2025.1&phase=g (accessed 2026-01-05).',
    );
  });

  it('leaves out what the value does not have', () => {
    const text = citationText({ ...cited, temperature: null, uncertaintyNote: '', source: { ...cited.source, doi: null } });
    expect(text).toContain('ΔfH°(H2O, g) = -241.826 ± 0.040 kJ/mol, water.');
    expect(text).not.toContain('doi.org');
  });
});

describe('citationBibtex', () => {
  it('gives an entry for the release value and one for the source', () => {
    const bibtex = citationBibtex(cited);
    expect(bibtex).toContain('@misc{kelvindex_2025.1_H2O_g_dfH,'.replace('.', '_'));
    expect(bibtex).toContain('howpublished = {Kelvindex release 2025.1, value 812}');
    expect(bibtex).toContain('note         = {Original source: Cox, Wagman \\& Medvedev');
    expect(bibtex).toContain('url          = {https://kelvindex.example/species/7?release=2025.1&phase=g}');
    expect(bibtex).toContain('@misc{CODATA_1989,');
    expect(bibtex).toContain('doi  = {10.1000/codata}');
  });

  it('balances its braces', () => {
    const bibtex = citationBibtex(cited);
    expect(bibtex.split('{').length).toBe(bibtex.split('}').length);
  });
});

describe('escapeBibtex', () => {
  it('escapes LaTeX specials', () => {
    expect(escapeBibtex('50% & $5 #1 a_b')).toBe('50\\% \\& \\$5 \\#1 a\\_b');
  });
});
