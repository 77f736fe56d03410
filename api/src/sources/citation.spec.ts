import { formatCitation } from './citation';

describe('one-line citations from CSL-JSON', () => {
  it('cites a book, a journal supplement and a report in author–title–container–year order', () => {
    // Bibliographic records as in seeds-demo/reference-set.ts.
    expect(formatCitation({
      type: 'book', title: 'CODATA Key Values for Thermodynamics',
      author: [{ family: 'Cox', given: 'J. D.' }, { family: 'Wagman', given: 'D. D.' }, { family: 'Medvedev', given: 'V. A.' }],
      publisher: 'Hemisphere Publishing Corp.', 'publisher-place': 'New York', issued: { 'date-parts': [[1989]] },
    }, { title: 'x', year: null, doi: null })).toBe('Cox, J. D.; Wagman, D. D.; Medvedev, V. A. CODATA Key Values for Thermodynamics. Hemisphere Publishing Corp.: New York, 1989.');
    expect(formatCitation({
      type: 'article-journal', title: 'Some title', author: [{ family: 'Wagman', given: 'D. D.' }],
      'container-title': 'Journal of Physical and Chemical Reference Data', volume: '11', 'collection-title': 'Supplement No. 2', issued: { 'date-parts': [[1982]] },
    }, { title: 'x', year: null, doi: '10.1000/example' })).toBe('Wagman, D. D. Some title. Journal of Physical and Chemical Reference Data 1982, 11, Supplement No. 2. https://doi.org/10.1000/example');
    expect(formatCitation({ author: [{ family: 'Chase', given: 'M. W.', suffix: 'Jr.' }], title: 'Tables' }, { title: 'x', year: 1998, doi: null })).toBe('Chase, M. W., Jr. Tables. 1998.');
  });

  it('falls back to the source row when the record is empty', () => {
    expect(formatCitation({}, { title: 'In-house report', year: 2025, doi: null })).toBe('In-house report. 2025.');
    expect(formatCitation(null, { title: 'Untitled', year: null, doi: null })).toBe('Untitled.');
  });
});
