import { Source } from '../shared/sources/sources-api';
import { likelyDuplicates, titleKey } from './duplicates';

function source(id: string, title: string, extra: Partial<Source> = {}): Source {
  return { id, shortKey: id, title, year: null, doi: null, csl: {}, notes: null, mergedIntoId: null, createdAt: '', updatedAt: '', version: 1, ...extra };
}

describe('likelyDuplicates', () => {
  it('compares titles by their letters and digits only', () => {
    expect(titleKey('NIST-JANAF Thermochemical Tables, 4th ed.')).toBe(titleKey('NIST–JANAF thermochemical tables (4th ed)'));
  });

  it('pairs sources with the same title, keeping the one with a DOI and authors', () => {
    const withDoi = source('a', 'Enthalpies of combustion of C3 alcohols', { doi: '10.5555/x', year: 2027, csl: { author: [{ family: 'Okafor' }] } });
    const bare = source('b', 'Enthalpies of Combustion of C3 Alcohols.', { year: 2027 });
    expect(likelyDuplicates([bare, withDoi])).toEqual([{ duplicate: bare, keep: withDoi, reason: 'same title' }]);
  });

  it('pairs a source made from its DOI alone with the one carrying that DOI', () => {
    const placeholder = source('p', 'DOI 10.5555/x');
    const full = source('f', 'Enthalpies of combustion', { doi: '10.5555/x' });
    expect(likelyDuplicates([placeholder, full])).toEqual([{ duplicate: placeholder, keep: full, reason: 'made from DOI 10.5555/x alone' }]);
  });

  it('never pairs sources with different DOIs, different years, or already merged ones', () => {
    expect(likelyDuplicates([source('a', 'Same', { doi: '10.1/a' }), source('b', 'Same', { doi: '10.1/b' })])).toEqual([]);
    expect(likelyDuplicates([source('a', 'Same', { year: 1989 }), source('b', 'Same', { year: 1998 })])).toEqual([]);
    expect(likelyDuplicates([source('a', 'Same'), source('b', 'Same', { mergedIntoId: 'a' })])).toEqual([]);
  });
});
