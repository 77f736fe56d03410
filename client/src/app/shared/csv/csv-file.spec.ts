import { csvText } from './csv-file';

describe('csvText', () => {
  it('writes a header and rows with CRLF line ends', () => {
    expect(csvText(['line', 'message'], [[7, 'unit must be kJ/mol']])).toBe('line,message\r\n7,unit must be kJ/mol\r\n');
  });

  it('quotes fields with commas, quotes and line breaks, and leaves empty cells for missing values', () => {
    expect(csvText(['a', 'b', 'c'], [['"aq,inf"', null, 'two\nlines']])).toBe('a,b,c\r\n"""aq,inf""",,"two\nlines"\r\n');
  });
});
