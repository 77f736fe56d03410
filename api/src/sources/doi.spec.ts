import { isStoredDoi, normalizeDoi } from './doi';

describe('DOIs', () => {
  it('stores a DOI as its lower-case bare name, however it was typed', () => {
    // 10.5555 is a prefix reserved for examples and tests.
    const cases: [string, string][] = [
      ['10.5555/ABC.123', '10.5555/abc.123'],
      ['  doi:10.5555/abc.123 ', '10.5555/abc.123'],
      ['DOI: 10.5555/abc.123', '10.5555/abc.123'],
      ['https://doi.org/10.5555/abc.123', '10.5555/abc.123'],
      ['http://dx.doi.org/10.5555/a%2Fb', '10.5555/a/b'],
      ['10.123456789/x', '10.123456789/x'],
    ];
    for (const [typed, stored] of cases) expect(normalizeDoi(typed)).withContext(typed).toBe(stored);
  });

  it('refuses what is not a DOI', () => {
    for (const typed of ['', '10.55/x', '10.5555', '10.5555/', '11.5555/x', 'https://example.org/10.5555/x', '10.5555/has space', 'https://doi.org/10.5555/%E0%A4%A']) {
      expect(normalizeDoi(typed)).withContext(typed).toBeUndefined();
    }
  });

  it('knows the stored form', () => {
    expect(isStoredDoi('10.5555/abc')).toBeTrue();
    expect(isStoredDoi('10.5555/ABC')).toBeFalse();
    expect(isStoredDoi('doi:10.5555/abc')).toBeFalse();
  });
});
