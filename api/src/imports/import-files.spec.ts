import { csvRows, decodeUtf8, parseCsv, parseXml, rowsOf } from './import-files';
import { readPressure, readTemperature } from './import-rows';

describe('import files: CSV', () => {
  it('reads a header in any order, quoted fields with commas, quotes and line breaks, and skips blank and # lines', () => {
    const csv = [
      'Formula,name,phase,quantity,value,unit,pressure,method,sourceKey,notes',
      '# a comment',
      'H2O,water,l,dfH,-285.83,kJ/mol,100000,evaluated,codata-1989,"note, with a comma"',
      '',
      'CO2,carbon dioxide,g,S,213.785,J/(mol·K),1 bar,evaluated,codata-1989,"two',
      'lines and a ""quote"""',
      'CH4,methane,g,dfH,-74.87,kJ/mol,1 atm,evaluated,nbs-1982,',
    ].join('\n');
    const { rows, problems } = parseCsv(csv);
    expect(problems).toEqual([]);
    expect(rows.map((r) => r.line)).toEqual([3, 5, 7]);
    expect(rows[0].fields).toEqual(jasmine.objectContaining({ formula: 'H2O', notes: 'note, with a comma', sourceKey: 'codata-1989' }));
    expect(rows[1].fields.notes).toBe('two\nlines and a "quote"');
    expect(rows[2].fields.notes).toBeUndefined();
  });

  it('reads rows as they are asked for: the same rows, lines and problems as reading the whole file', () => {
    const lines = ['formula,name,phase,quantity,value,unit,pressure,method,sourceKey,notes'];
    for (let i = 1; i <= 25; i++) lines.push(i === 7 ? 'CH4,methane,g' : i === 12 ? '"multi\nline",x,g,S,1,J/(mol·K),1 bar,measured,k,' : `CH4,methane,g,Cp,${30 + i},J/(mol·K),1 bar,measured,k,`);
    const csv = lines.join('\n');
    const whole = parseCsv(csv);
    const reader = csvRows(csv);
    expect(reader.problems).toEqual([]);
    const parts = [reader.next(10), reader.next(10), reader.next(10), reader.next(10)];
    expect(parts.map((p) => p.length)).toEqual([10, 10, 4, 0]);
    expect(parts.flat()).toEqual(whole.rows);
    expect(reader.problems).toEqual(whole.problems);
    expect(reader.problems).toEqual([{ line: 8, message: '3 fields where the header has 10' }]);
    expect(reader.records).toBe(25);
    expect(whole.records).toBe(25);
    // A file read whole (XML) hands its rows out the same way.
    const handed = rowsOf(whole);
    expect([...handed.next(20), ...handed.next(20)]).toEqual(whole.rows);
  });

  it('refuses bytes that are not UTF-8, and NUL bytes, before reading anything', () => {
    expect(decodeUtf8(Buffer.from('formula\nH₂O', 'utf8'))).toEqual({ text: 'formula\nH₂O' });
    expect(decodeUtf8(Buffer.from([0x66, 0xff, 0x6f]))).toEqual({ problem: { line: 1, message: 'the file is not UTF-8 text' } });
    expect(decodeUtf8(Buffer.from([0x66, 0x00, 0x6f]))).toEqual({ problem: { line: 1, message: 'the file holds NUL bytes: it is not a text file' } });
  });

  it('reports unknown and missing columns on the header line and short rows on their own line', () => {
    const { problems } = parseCsv('formula,phase,quantity,value,colour\nH2O,l,dfH\n');
    expect(problems).toEqual(jasmine.arrayContaining([
      jasmine.objectContaining({ line: 1, field: 'colour' }),
      jasmine.objectContaining({ line: 1, field: 'unit' }),
      jasmine.objectContaining({ line: 1, field: 'sourceKey' }),
      jasmine.objectContaining({ line: 2, message: '3 fields where the header has 5' }),
    ]));
  });

  it('reports an unclosed quote at the line it starts', () => {
    const { problems } = parseCsv('formula,phase,quantity,value,unit,pressure,method,sourceKey\nH2O,l,dfH,"-285.83,kJ/mol,100000,evaluated,x\n');
    expect(problems.some((p) => p.line === 2 && /not closed/.test(p.message))).toBeTrue();
  });
});

describe('import files: XML', () => {
  const xml = `<?xml version="1.0" encoding="UTF-8"?>
<kelvindex-import>
  <record>
    <formula>H2O</formula><phase>l</phase><quantity>dfH</quantity>
    <value>-285.83</value><unit>kJ/mol</unit><pressure>100000</pressure><method>evaluated</method><sourceKey>codata-1989</sourceKey>
  </record>

  <record>
    <formula>CO2</formula><phase>g</phase><quantity>S</quantity><value>213.785</value>
    <unit>J/(mol·K)</unit><pressure>1 bar</pressure><method>evaluated</method><doi>10.1000/xyz</doi>
  </record>
</kelvindex-import>
`;

  it('reads one row per <record> with the line it starts on', () => {
    const { rows, problems } = parseXml(xml);
    expect(problems).toEqual([]);
    expect(rows.map((r) => r.line)).toEqual([3, 8]);
    expect(rows[1].fields).toEqual(jasmine.objectContaining({ formula: 'CO2', unit: 'J/(mol·K)', doi: '10.1000/xyz' }));
  });

  it('refuses DOCTYPE and ENTITY declarations outright, with their line', () => {
    const bomb = `<?xml version="1.0"?>\n<!DOCTYPE lolz [\n <!ENTITY lol "lol">\n <!ENTITY lol2 "&lol;&lol;&lol;">\n]>\n<kelvindex-import><record><formula>&lol2;</formula></record></kelvindex-import>`;
    expect(parseXml(bomb)).toEqual({ rows: [], records: 0, problems: [{ line: 2, message: 'DOCTYPE declarations are not accepted in import files (no DTDs, no entities)' }] });
    const external = `<?xml version="1.0"?>\n\n<!ENTITY xxe SYSTEM "file:///etc/passwd">\n<kelvindex-import/>`;
    expect(parseXml(external).problems[0]).toEqual(jasmine.objectContaining({ line: 3 }));
  });

  it('reports malformed XML, a wrong root and unknown elements with lines', () => {
    expect(parseXml('<kelvindex-import>\n<record>\n<formula>H2O</record>\n</kelvindex-import>').problems[0]).toEqual(jasmine.objectContaining({ line: 3 }));
    expect(parseXml('<values><record/></values>').problems[0].message).toMatch(/root element must be <kelvindex-import>/);
    const unknown = parseXml('<kelvindex-import>\n\n<record><formula>H2O</formula><colour>blue</colour></record></kelvindex-import>');
    expect(unknown.problems).toEqual([jasmine.objectContaining({ line: 3, field: 'colour' })]);
  });

  it('leaves character references as written (entity processing is off)', () => {
    const { rows } = parseXml('<kelvindex-import><record><name>a &amp; b</name></record></kelvindex-import>');
    expect(rows[0].fields.name).toBe('a &amp; b');
  });
});

describe('import fields', () => {
  it('read pressures in Pa, kPa, bar and atm, and temperatures in K', () => {
    expect(readPressure('100000')).toBe(100000);
    expect(readPressure('1 bar')).toBe(100000);
    expect(readPressure('1 atm')).toBe(101325);
    expect(readPressure('101.325 kPa')).toBe(101325);
    expect(readPressure('one bar')).toBeUndefined();
    expect(readTemperature('298.15 K')).toBe(298.15);
    expect(readTemperature('25 °C')).toBeUndefined();
  });
});
