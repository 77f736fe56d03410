import { randomBytes } from 'node:crypto';
import request from 'supertest';
import { testApp, type TestApp } from '../testing/test-app';
import { isolatedTestApp, type IsolatedApp } from '../testing/isolated-app';
import { bearerFor } from '../testing/sign-in';
import type { Express } from 'express';

const HEADER = 'formula,name,phase,polymorph,quantity,value,unit,uncertainty,uncertaintyKind,coverageFactor,temperature,pressure,method,methodDetail,sourceKey,doi';

/** Polls the job until it has finished. */
async function finished(app: Express, auth: string, id: string, timeoutMs = 120_000): Promise<{ status: string; proposalId: string | null; processedRows: number; totalRows: number; errors: unknown[] }> {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    const job = (await request(app).get(`/api/v1/imports/${id}`).set('Authorization', auth).expect(200)).body;
    if (job.status !== 'running' && job.status !== 'queued') return job;
    if (Date.now() > deadline) throw new Error(`import ${id} still ${job.status} after ${timeoutMs / 1000} s`);
    await new Promise((r) => setTimeout(r, 100));
  }
}

const GASES = [['H2O', 'water'], ['CO2', 'carbon dioxide'], ['CH4', 'methane'], ['N2', 'nitrogen'], ['O2', 'oxygen'], ['H2', 'hydrogen'], ['CO', 'carbon monoxide'], ['NH3', 'ammonia']];

/** `n` valid, distinct Cp° rows (HEADER's columns) of gases in the demo catalogue, at temperatures from `fromK`. */
function cpRows(n: number, fromK = 300): string[] {
  const lines: string[] = [];
  for (let i = 0; i < n; i++) {
    const [formula, name] = GASES[i % GASES.length];
    const temperature = (fromK + Math.floor(i / GASES.length) * 0.05).toFixed(2);
    lines.push(`${formula},${name},g,,Cp,${(30 + (i % 997) / 100).toFixed(2)},J/(mol·K),0.05,standard,,${temperature},100000,measured,,qpc-dsc07-2026,`);
  }
  return lines;
}

// Numbers are invented test inputs.
describe('bulk import', () => {
  let t: TestApp;
  let steward: string;
  const post = (dryRun: string | undefined, body: string, filename: string, contentType: string) =>
    request(t.app).post(`/api/v1/imports${dryRun === undefined ? '' : `?dryRun=${dryRun}`}`).set('Authorization', steward).attach('file', Buffer.from(body), { filename, contentType });
  const counts = async () => (await t.dataSource.query(
    `SELECT (SELECT count(*) FROM proposals)::int AS proposals, (SELECT count(*) FROM proposal_items)::int AS items,
            (SELECT count(*) FROM thermo_values)::int AS values, (SELECT count(*) FROM species)::int AS species`,
  ))[0];

  beforeAll(async () => {
    t = await testApp();
    steward = await bearerFor(t.app, 'steward');
  });

  const badCsv = [
    HEADER,
    'H2O,water,g,,dfH,-241.80,kJ/mol,0.10,expanded,2,298.15,1 bar,measured,,codata-1989,', // 2: fine
    'H2O,water,g,,dfH,-241.80,kJ,0.10,expanded,2,298.15,1 bar,measured,,codata-1989,', // 3: unit
    'Xx2,,g,,S,10,J/(mol·K),,,,298.15,100000,measured,,codata-1989,', // 4: formula
    '# a comment line',
    'CO2,carbon dioxide,g,,S,-213.8,J/(mol·K),,,,298.15,100000,measured,,codata-1989,', // 6: negative entropy
    'CO2,carbon dioxide,g,,S,213.8,J/(mol·K),-0.1,,,298.15,100000,measured,,codata-1989,', // 7: uncertainty
    'CH4,methane,g,,Cp,35.7,J/(mol·K),,,,298.15,100,measured,,codata-1989,', // 8: pressure
    'CH4,methane,g,,Cp,35.7,J/(mol·K),,,,298.15,100000,computed,,nowhere-2026,', // 9: source and level of theory
    'C8H18,octane,l,,dfH,-250.1,kJ/mol,,,,298.15,100000,measured,,,', // 10: no source
    'CH4,methane,g,,Cp,35.7,J/(mol·K),,,,298.15,1 atm,measured,,codata-1989,', // 11: fine
    'CH4,methane,g,,Cp,35.8,J/(mol·K),,,,298.15,1 atm,measured,,codata-1989,', // 12: repeats line 11
    'H2O,water,cr,,S,41,J/(mol·K),,,,298.15,100000,measured,,codata-1989,', // 13: fine (new phase of water)
    'CH4,methane,g,,Cp,35.7,J/(mol·K),,,,298.15,100000,measured,,codata-1989', // 14: one field short
  ].join('\n');

  it('answers a dry run with every problem and its line number, and writes nothing', async () => {
    const before = await counts();
    const res = await post('true', badCsv, 'batch.csv', 'text/csv').expect(200);
    expect(res.body).toEqual(jasmine.objectContaining({ dryRun: true, status: 'succeeded', format: 'csv', totalRows: 12 }));
    const problems = res.body.errors as { line: number; field?: string; message: string }[];
    const at = (line: number) => problems.filter((p) => p.line === line);
    expect(problems.map((p) => p.line)).toEqual([...problems.map((p) => p.line)].sort((a, b) => a - b));
    expect(at(2)).toEqual([]);
    expect(at(3)).toEqual([jasmine.objectContaining({ field: 'unit' })]);
    expect(at(4)[0]).toEqual(jasmine.objectContaining({ field: 'formula' }));
    expect(at(6)).toEqual([jasmine.objectContaining({ field: 'value', message: jasmine.stringMatching(/entropy S° must be positive/) })]);
    expect(at(7)).toEqual([jasmine.objectContaining({ field: 'uncertainty' })]);
    expect(at(8)).toEqual([jasmine.objectContaining({ field: 'pressure' })]);
    expect(at(9).map((p) => p.field).sort()).toEqual(['sourceKey']);
    expect(at(10)).toEqual([jasmine.objectContaining({ field: 'sourceKey', message: jasmine.stringMatching(/no value without a source/) })]);
    expect(at(11)).toEqual([]);
    expect(at(12)).toEqual([jasmine.objectContaining({ message: jasmine.stringMatching(/line 11 already gives Cp/) })]);
    expect(at(13)).toEqual([]);
    expect(at(14)).toEqual([jasmine.objectContaining({ message: '15 fields where the header has 16' })]);
    expect(res.body.errorCount).toBe(problems.length);
    expect(res.body.wouldCreate).toEqual({ species: 0, phases: 1, values: jasmine.any(Number) });
    expect(await counts()).toEqual(before);
    const job = (await request(t.app).get(`/api/v1/imports/${res.body.id}`).set('Authorization', steward).expect(200)).body;
    expect(job.errors.length).toBe(problems.length);
  });

  it('refuses a real import with bad rows as a whole: 422 with every problem, nothing written', async () => {
    const before = await counts();
    const res = await post('false', badCsv, 'batch.csv', 'text/csv').expect(422);
    expect(res.body.message).toMatch(/problems in batch\.csv; nothing was imported/);
    expect(res.body.details.problems.length).toBeGreaterThanOrEqual(9);
    expect(await counts()).toEqual(before);
    const job = (await request(t.app).get(`/api/v1/imports/${res.body.details.jobId}`).set('Authorization', steward).expect(200)).body;
    expect(job).toEqual(jasmine.objectContaining({ status: 'failed', proposalId: null }));
  });

  it('reads the XML layout with line numbers and refuses DOCTYPE and ENTITY declarations', async () => {
    const xml = `<?xml version="1.0" encoding="UTF-8"?>
<kelvindex-import>
  <record>
    <formula>H2O</formula><name>water</name><phase>g</phase><quantity>S</quantity><value>188.80</value><unit>J/(mol·K)</unit>
    <pressure>100000</pressure><method>evaluated</method><sourceKey>janaf-1998</sourceKey>
  </record>
  <record>
    <formula>H2O</formula><phase>g</phase><quantity>S</quantity><value>188.80</value><unit>J/(mol·K)</unit>
    <pressure>100000</pressure><method>evaluated</method><sourceKey>janaf-1998</sourceKey>
  </record>
  <record>
    <formula>CO2</formula><phase>plasma</phase><quantity>S</quantity><value>213.8</value><unit>J/(mol·K)</unit>
    <pressure>100000</pressure><method>evaluated</method><sourceKey>janaf-1998</sourceKey>
  </record>
</kelvindex-import>
`;
    const res = await post('true', xml, 'batch.xml', 'application/xml').expect(200);
    expect(res.body.format).toBe('xml');
    expect(res.body.errors).toEqual([
      jasmine.objectContaining({ line: 7, message: jasmine.stringMatching(/line 3 already gives S/) }),
      jasmine.objectContaining({ line: 11, field: 'phase' }),
    ]);
    const before = await counts();
    const bomb = '<?xml version="1.0"?>\n<!DOCTYPE kelvindex-import [\n<!ENTITY a "aaaaaaaaaa">\n<!ENTITY b "&a;&a;&a;&a;&a;&a;&a;&a;&a;&a;">\n]>\n<kelvindex-import><record><formula>&b;</formula></record></kelvindex-import>';
    const refused = await post('false', bomb, 'bomb.xml', 'text/xml').expect(422);
    expect(refused.body.details.problems).toEqual([{ line: 2, message: 'DOCTYPE declarations are not accepted in import files (no DTDs, no entities)' }]);
    const external = await post('true', '<?xml version="1.0"?>\n<!ENTITY x SYSTEM "file:///etc/passwd">\n<kelvindex-import/>', 'x.xml', 'application/xml').expect(200);
    expect(external.body.errors).toEqual([jasmine.objectContaining({ line: 2, message: jasmine.stringMatching(/^ENTITY declarations are not accepted/) })]);
    const malformed = await post('true', '<kelvindex-import>\n<record>\n<formula>H2O</phase>\n</record>\n</kelvindex-import>', 'm.xml', 'application/xml').expect(200);
    expect(malformed.body.errors[0].line).toBe(3);
    expect(await counts()).toEqual(before);
  });

  it('finds species by synonym, and sees a new species clash with any species of that name or formula', async () => {
    const csv = [
      HEADER,
      'H2O,Steam,g,,S,188.80,J/(mol·K),,,,298.15,100000,measured,,codata-1989,', // 2: water, by a synonym in other case
      'C9H20,Marsh Gas,l,,S,250,J/(mol·K),,,,298.15,100000,measured,,codata-1989,', // 3: new species named as methane's synonym
      'C10H22,ch3oh,l,,S,260,J/(mol·K),,,,298.15,100000,measured,,codata-1989,', // 4: new species named as methanol's formula
    ].join('\n');
    const res = await post('true', csv, 'names.csv', 'text/csv').expect(200);
    const problems = res.body.errors as { line: number; field?: string; message: string }[];
    expect(problems.filter((p) => p.line === 2)).toEqual([]);
    expect(problems.filter((p) => p.line === 3).length).toBeGreaterThan(0);
    for (const p of problems.filter((x) => x.line === 3)) {
      expect(p).toEqual({ line: 3, field: 'name', message: '"Marsh Gas" names 2 species (Marsh Gas, C9H20; methane, CH4); give speciesId' });
    }
    expect(problems.filter((p) => p.line === 4).length).toBeGreaterThan(0);
    for (const p of problems.filter((x) => x.line === 4)) {
      expect(p).toEqual({ line: 4, field: 'name', message: jasmine.stringMatching(/^"ch3oh" names 2 species \(ch3oh, C10H22; methanol, CH4O\)/) });
    }
    expect(res.body.wouldCreate.species).toBe(2);
  });

  it('refuses a real import whose only problem is on its last line, writing nothing', async () => {
    const rows = cpRows(2000, 1000);
    const csv = [HEADER, ...rows, 'CH4,methane,g,,Cp,35.7,J/(mol·K),,,,298.15,100000,measured,,no-such-source-2026,'].join('\n');
    const before = await counts();
    const res = await post('false', csv, 'last-line.csv', 'text/csv').expect(422);
    expect(res.body.details.problems).toEqual([jasmine.objectContaining({ line: rows.length + 2, field: 'sourceKey' })]);
    expect(await counts()).toEqual(before);
  });

  it('refuses what is not an import file', async () => {
    await post('true', 'hello', 'notes.txt', 'text/plain').expect(415);
    await post(undefined, badCsv, 'batch.csv', 'text/csv').expect(400);
    await post('maybe', badCsv, 'batch.csv', 'text/csv').expect(400);
    const latin1 = Buffer.concat([Buffer.from(`${HEADER}\n`), Buffer.from([0x48, 0x32, 0x4f, 0x2c, 0xe9, 0x0a])]);
    const res = await request(t.app).post('/api/v1/imports?dryRun=true').set('Authorization', steward).attach('file', latin1, { filename: 'l.csv', contentType: 'text/csv' }).expect(200);
    expect(res.body.errors).toEqual([{ line: 1, message: 'the file is not UTF-8 text' }]);
    await request(t.app).post('/api/v1/imports?dryRun=true').set('Authorization', await bearerFor(t.app, 'reviewer')).attach('file', Buffer.from(badCsv), { filename: 'b.csv', contentType: 'text/csv' }).expect(403);
  });

  it('creates one draft proposal from a valid file, with new species and phases as items, and shows its progress', async () => {
    const name = `spec solvent ${randomBytes(3).toString('hex')}`;
    const csv = [
      HEADER,
      `C5H12O,${name},l,,dfH,-351.6,kJ/mol,0.8,expanded,2,298.15,1 bar,measured,,qpc-tc03-2025,`,
      `C5H12O,${name},l,,Cp,208.1,J/(mol·K),1.5,expanded,2,298.15,1 bar,measured,,qpc-dsc07-2026,`,
      `C5H12O,${name},g,,dfH,-294.6,kJ/mol,1.2,standard,,298.15,1 bar,computed,G4,qpc-est01-2026,`,
      'CH4,,g,,S,186.27,J/(mol·K),0.02,,,298.15,1 bar,evaluated,,qpc-est01-2026,',
    ].join('\r\n');
    const before = await counts();
    const started = await post('false', csv, 'solvents.csv', 'text/csv').expect(202);
    expect(started.body).toEqual(jasmine.objectContaining({ dryRun: false, totalRows: 4, wouldCreate: { species: 1, phases: 2, values: 4 } }));
    const job = await finished(t.app, steward, started.body.id);
    expect(job).toEqual(jasmine.objectContaining({ status: 'succeeded', processedRows: 4, totalRows: 4 }));
    const proposal = (await request(t.app).get(`/api/v1/proposals/${job.proposalId}`).set('Authorization', steward).expect(200)).body;
    expect(proposal.state).toBe('draft');
    // The title counts the values, known only once the whole file was read.
    expect(proposal.title).toBe('Import of solvents.csv (4 values)');
    expect(proposal.items.map((i: { kind: string }) => i.kind)).toEqual(['add_species', 'add_phase', 'add_phase', 'add_value', 'add_value', 'add_value', 'add_value']);
    expect(proposal.items[5].payload).toEqual(jasmine.objectContaining({ levelOfTheory: 'G4', method: 'computed' }));
    const after = await counts();
    expect(after).toEqual({ ...before, proposals: before.proposals + 1, items: before.items + 7 });
    // The reference columns the import wrote are those the proposal workflow resolves against the whole catalogue.
    const columns = () => t.dataSource.query(
      `SELECT id, position, kind, payload, source_id, species_id, species_phase_id, target_value_id, target_fit_id FROM proposal_items WHERE proposal_id = $1 ORDER BY position`,
      [job.proposalId],
    );
    const written = await columns();
    expect(written.map((i: { position: number }) => i.position)).toEqual([1, 2, 3, 4, 5, 6, 7]);
    // A draft: the steward submits it like any other; nothing enters the catalogue before approval.
    const submitted = await request(t.app).post(`/api/v1/proposals/${job.proposalId}/submit`).set('Authorization', steward).send({}).expect(200);
    expect(submitted.body.state).toBe('submitted');
    expect(await columns()).toEqual(written);
  });
});

// Large imports on a database of their own (the draft proposals they make are large).
describe('bulk import of many rows', () => {
  let iso: IsolatedApp;
  let steward: string;
  const upload = (csv: string, filename: string) =>
    request(iso.app).post('/api/v1/imports?dryRun=false').set('Authorization', steward).attach('file', Buffer.from(csv), { filename, contentType: 'text/csv' });
  const totals = async () => (await iso.dataSource.query(`SELECT (SELECT count(*) FROM proposals)::int AS proposals, (SELECT count(*) FROM proposal_items)::int AS items`))[0];

  beforeAll(async () => {
    iso = await isolatedTestApp();
    steward = await bearerFor(iso.app, 'steward');
  }, 60_000);
  afterAll(async () => {
    await iso?.close();
  });

  it('writes all of 10 000 rows (two full statements) with their references, positions and text as given', async () => {
    const notes = 'first line\nsecond line, a back\\slash and a\ttab';
    const rows = cpRows(10_000).map((line) => `${line},`);
    rows[0] = `${rows[0]}"${notes.replace(/"/g, '""')}"`;
    const csv = [`${HEADER},notes`, ...rows].join('\n');
    const started = await upload(csv, 'cp-10k.csv').expect(202);
    const job = await finished(iso.app, steward, started.body.id);
    expect(job).toEqual(jasmine.objectContaining({ status: 'succeeded', processedRows: 10_000, totalRows: 10_000 }));
    const [stats] = await iso.dataSource.query(
      `SELECT count(*)::int AS n, min(position)::int AS first, max(position)::int AS last, count(DISTINCT position)::int AS positions,
              count(*) FILTER (WHERE i.kind = 'add_value' AND i.source_id IS NOT NULL AND sp.species_id = i.species_id AND (i.payload->>'speciesPhaseId')::uuid = i.species_phase_id)::int AS resolved
         FROM proposal_items i LEFT JOIN species_phases sp ON sp.id = i.species_phase_id WHERE i.proposal_id = $1`,
      [job.proposalId],
    );
    expect(stats).toEqual({ n: 10_000, first: 1, last: 10_000, positions: 10_000, resolved: 10_000 });
    const [first] = await iso.dataSource.query(`SELECT payload FROM proposal_items WHERE proposal_id = $1 AND position = 1`, [job.proposalId]);
    expect(first.payload).toEqual({
      speciesPhaseId: jasmine.any(String), quantity: 'Cp', value: '30.00', unit: 'J/(mol·K)', uncertainty: '0.05', uncertaintyKind: 'standard',
      temperatureK: 300, pressurePa: 100000, method: 'measured', notes,
    });
  }, 120_000);

  it('writes nothing when the database refuses a row after the first statement went in', async () => {
    const before = await totals();
    // A constraint only this spec has: the rows after position 7000 (in the second COPY statement) are refused.
    await iso.dataSource.query(`ALTER TABLE proposal_items ADD CONSTRAINT spec_refuses_late_positions CHECK (position <= 7000) NOT VALID`);
    try {
      const started = await upload([HEADER, ...cpRows(10_000, 2000)].join('\n'), 'cp-refused.csv').expect(202);
      const job = await finished(iso.app, steward, started.body.id);
      expect(job).toEqual(jasmine.objectContaining({ status: 'failed', proposalId: null, processedRows: 0 }));
      expect(job.errors).toEqual([jasmine.objectContaining({ line: 0, message: jasmine.stringMatching(/^the import was rolled back: .*spec_refuses_late_positions/) })]);
    } finally {
      await iso.dataSource.query(`ALTER TABLE proposal_items DROP CONSTRAINT spec_refuses_late_positions`);
    }
    expect(await totals()).toEqual(before);
  }, 120_000);

  it('goes 100 000 rows into one draft proposal in one transaction, reporting progress', async () => {
    const n = 100_000;
    const csv = [HEADER, ...cpRows(n)].join('\n');
    const [{ n: valuesBefore }] = await iso.dataSource.query(`SELECT count(*)::int AS n FROM thermo_values`);
    const t0 = performance.now();
    const started = await request(iso.app).post('/api/v1/imports?dryRun=false').set('Authorization', steward).attach('file', Buffer.from(csv), { filename: 'cp-100k.csv', contentType: 'text/csv' }).expect(202);
    const seen = new Set<number>();
    let job = started.body;
    while (job.status === 'running') {
      seen.add(job.processedRows);
      await new Promise((r) => setTimeout(r, 50));
      job = (await request(iso.app).get(`/api/v1/imports/${started.body.id}`).set('Authorization', steward).expect(200)).body;
    }
    const seconds = (performance.now() - t0) / 1000;
    expect(job).toEqual(jasmine.objectContaining({ status: 'succeeded', processedRows: n, totalRows: n, progress: 1 }));
    // Progress moved in steps while the transaction ran (its own rows stay invisible until it commits).
    expect(seen.size).toBeGreaterThan(1);
    const [{ items }] = await iso.dataSource.query(`SELECT count(*)::int AS items FROM proposal_items WHERE proposal_id = $1`, [job.proposalId]);
    expect(items).toBe(n);
    const [{ n: valuesAfter }] = await iso.dataSource.query(`SELECT count(*)::int AS n FROM thermo_values`);
    expect(valuesAfter).toBe(valuesBefore);
    console.log(`\n    bulk import: ${n} rows in ${seconds.toFixed(1)} s (${Math.round(n / seconds)} rows/s, checked ${started.body.checkedInMs} ms)`);
  }, 180_000);
});
