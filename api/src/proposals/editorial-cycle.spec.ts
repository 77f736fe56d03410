import { createHash, randomBytes } from 'node:crypto';
import request from 'supertest';
import { seedId } from '../../../seeds-demo/seed-support';
import { releaseSnapshot } from '../releases/release-snapshot';
import { isolatedTestApp, type IsolatedApp } from '../testing/isolated-app';
import { waitForMail } from '../testing/outbox';
import { bearerFor, type DemoRole } from '../testing/sign-in';

// The whole editorial cycle on a database of its own, because it publishes release 2027.1 of the
// demo data, which other specs read as "in preparation". The numbers are invented test inputs.
describe('the editorial cycle, end to end', () => {
  let iso: IsolatedApp;
  const auth: Partial<Record<DemoRole, string>> = {};
  const call = (who: DemoRole, method: 'get' | 'post' | 'put' | 'patch' | 'delete', path: string) =>
    request(iso.app)[method](`/api/v1${path}`).set('Authorization', auth[who]!);

  beforeAll(async () => {
    iso = await isolatedTestApp();
    for (const who of ['steward', 'reviewer', 'reviewer2', 'editor', 'reader'] as const) auth[who] = await bearerFor(iso.app, who);
  }, 60_000);

  afterAll(async () => {
    await iso?.close();
  });

  it('takes a proposal with an imported BibTeX source and evidence through review, into a published release, and tells the watchers', async () => {
    const propanolLiquid = seedId('phase', 'C3H7OH(l)');
    const propanolCp = seedId('value', 'demo:propanol(l):Cp');
    const propanolDfH = seedId('value', 'demo:propanol(l):dfH');
    const dscSource = seedId('source', 'qpc-dsc07-2026');
    const m = iso.dataSource.manager;
    const before2026 = JSON.stringify(await releaseSnapshot(m, '2026.2'));
    const tag = randomBytes(3).toString('hex');
    const title = `Propan-1-ol (l): ΔfH° from a second laboratory (${tag})`;

    // 1. The source, imported from BibTeX.
    const doi = `10.5555/kelvindex.cycle.${tag}`;
    const bib = `@article{lindqvist2026,\n  author = {Lindqvist, Rosa and Haldane, Kwame},\n  title = {Combustion calorimetry of {C3} alcohols},\n  journal = {Journal of Invented Thermochemistry},\n  volume = {12},\n  pages = {101--117},\n  year = {2026},\n  doi = {${doi}}\n}\n`;
    const imported = await call('steward', 'post', '/sources/import').send({ text: bib }).expect(201);
    expect(imported.body.format).toBe('bibtex');
    const source = imported.body.items[0];
    expect(source).toEqual(jasmine.objectContaining({ doi, year: 2026, shortKey: 'lindqvist-2026' }));

    // 2. A draft with two items: a second source's ΔfH°, and a revision of Cp°.
    const draft = await call('steward', 'post', '/proposals').send({ title, summary: 'Second laboratory, same sample lot.' }).expect(201);
    expect(draft.body.state).toBe('draft');
    const id = draft.body.id as string;
    const dfH = await call('steward', 'post', `/proposals/${id}/items`).send({
      kind: 'add_value', sourceId: source.id,
      payload: { speciesPhaseId: propanolLiquid, quantity: 'dfH', value: '-302.4', unit: 'kJ/mol', uncertainty: '0.6', uncertaintyKind: 'expanded', coverageFactor: 2, temperatureK: 298.15, pressurePa: 100000, method: 'measured', sourceLocator: 'Table 3' },
    }).expect(201);
    const cp = await call('steward', 'post', `/proposals/${id}/items`).send({
      kind: 'revise_value', sourceId: dscSource,
      payload: { valueId: propanolCp, value: '143.9', unit: 'J/(mol·K)', uncertainty: '1.0', uncertaintyKind: 'expanded', coverageFactor: 2, pressurePa: 100000, method: 'measured' },
    }).expect(201);
    expect(cp.body.targetValueId).toBe(propanolCp);

    // 3. Evidence: a CSV of the runs, checked by content and fingerprinted.
    const runs = Buffer.from('run,mass_g,energy_J_per_g\nL-1,0.80122,-33581.0\nL-2,0.79954,-33586.4\n');
    const evidence = await call('steward', 'post', `/proposals/${id}/items/${dfH.body.id}/evidence`)
      .attach('file', runs, { filename: 'lindqvist-runs.csv', contentType: 'text/csv' })
      .field('description', 'Runs L-1 and L-2')
      .expect(201);
    expect(evidence.body).toEqual(jasmine.objectContaining({ fileName: 'lindqvist-runs.csv', mediaType: 'text/csv', sizeBytes: runs.length, sha256: createHash('sha256').update(runs).digest('hex') }));

    // 4. Submitted: the checks ran on every item; the reviewers are told.
    let proposal = (await call('steward', 'post', `/proposals/${id}/submit`).send({ version: (await call('steward', 'get', `/proposals/${id}`).expect(200)).body.version }).expect(200)).body;
    expect(proposal.state).toBe('submitted');
    expect(proposal.items.every((i: { checks: unknown[] }) => i.checks.length > 0)).toBeTrue();
    expect(proposal.checkSummary.fail).toBe(0);
    const agreement = proposal.items[0].checks.find((c: { code: string }) => c.code === 'source-agreement');
    expect(agreement).toEqual(jasmine.objectContaining({ status: 'pass' }));
    expect(agreement.message).toContain('qpc-tc03-2025');
    await waitForMail('reviewer@kelvindex.test', new RegExp(`Proposal to review: .*${tag}`));
    await waitForMail('reviewer2@kelvindex.test', new RegExp(`Proposal to review: .*${tag}`));

    // The impact of the Cp° revision: the saved reaction that burns propan-1-ol is touched.
    const impact = (await call('reviewer', 'get', `/proposals/${id}/impact`).expect(200)).body;
    expect(impact.items.length).toBe(1);
    expect(impact.items[0].savedReactions.map((r: { name: string }) => r.name)).toContain('Propan-1-ol combustion');
    expect(impact.items[0].watcherCount).toBeGreaterThanOrEqual(1);

    // 5. A reviewer asks for changes; the author hears of it.
    proposal = (await call('reviewer', 'post', `/proposals/${id}/reviews`).send({ decision: 'request_changes', comment: 'State the uncertainty as printed in Table 3.', version: proposal.version }).expect(201)).body;
    expect(proposal.state).toBe('changes_requested');
    await waitForMail('steward@kelvindex.test', new RegExp(`sent back with a request for changes: .*${tag}`));

    // 6. The steward revises the item and resubmits.
    await call('steward', 'patch', `/proposals/${id}/items/${dfH.body.id}`).send({
      payload: { speciesPhaseId: propanolLiquid, quantity: 'dfH', value: '-302.5', unit: 'kJ/mol', uncertainty: '0.7', uncertaintyKind: 'expanded', coverageFactor: 2, temperatureK: 298.15, pressurePa: 100000, method: 'measured', sourceLocator: 'Table 3' },
    }).expect(200);
    proposal = (await call('steward', 'post', `/proposals/${id}/resubmit`).send({}).expect(200)).body;
    expect(proposal.state).toBe('resubmitted');

    // 7. Another reviewer approves: the values are written as new rows.
    proposal = (await call('reviewer2', 'post', `/proposals/${id}/reviews`).send({ decision: 'approve', comment: 'Consistent with TC-03.', version: proposal.version }).expect(201)).body;
    expect(proposal.state).toBe('approved');
    const newDfH = proposal.items[0].resultValueId as string;
    const newCp = proposal.items[1].resultValueId as string;
    expect(newDfH).toBeTruthy();
    const [cpRow] = await m.query(`SELECT supersedes_id, value_si, entered_by IS NOT NULL AS entered, approved_by IS NOT NULL AS approved FROM thermo_values WHERE id = $1`, [newCp]);
    expect(cpRow).toEqual({ supersedes_id: propanolCp, value_si: 143.9, entered: true, approved: true });
    await waitForMail('steward@kelvindex.test', new RegExp(`Your proposal was approved: .*${tag}`));

    // 8. The editor puts it into 2027.1 and recommends the new ΔfH° where the two sources disagree.
    const added = (await call('editor', 'post', '/releases/2027.1/proposals').send({ proposalId: id }).expect(200)).body;
    expect(added.added).toEqual(jasmine.objectContaining({ added: 1, revised: 1 }));
    expect(added.needsRecommendation).toEqual([]);
    const recommended = (await call('editor', 'put', '/releases/2027.1/recommended').send({ speciesPhaseId: propanolLiquid, quantity: 'dfH', valueId: newDfH }).expect(200)).body;
    expect(recommended.members.map((x: { valueId: string; recommended: boolean }) => [x.valueId, x.recommended])).toEqual([[newDfH, true], [propanolDfH, false]]);
    await call('editor', 'patch', '/releases/2027.1').send({ notes: `Adds ethyl acetate (l); second-laboratory ΔfH° of propan-1-ol (l) (${tag}).` }).expect(200);

    // 9. Published: immutable from now on.
    await call('editor', 'post', '/releases/2027.1/publish').send({}).expect(400);
    const published = (await call('editor', 'post', '/releases/2027.1/publish').send({ confirm: true }).expect(200)).body;
    expect(published.status).toBe('published');
    expect(published.changeLog.summary).toEqual(jasmine.objectContaining({ added: jasmine.any(Number), revised: 1 }));
    const propanol = published.changeLog.species.find((s: { name: string }) => s.name === 'propan-1-ol');
    expect(propanol.added.map((e: { label: string }) => e.label)).toEqual(['ΔfH°(l)']);
    expect(propanol.revised.map((e: { label: string; from: { entered: string }; to: { entered: string } }) => [e.label, e.from.entered, e.to.entered])).toEqual([['Cp°(l)', '144.2 ± 1.2 J/(mol·K)', '143.9 ± 1.0 J/(mol·K)']]);
    await call('editor', 'patch', '/releases/2027.1').send({ notes: 'too late' }).expect(409);
    expect((await call('steward', 'get', `/proposals/${id}`).expect(200)).body.state).toBe('released');

    // 10. The new values are in 2027.1; 2026.2 answers exactly as before.
    expect(JSON.stringify(await releaseSnapshot(m, '2026.2'))).toBe(before2026);
    const current = (await releaseSnapshot(m, '2027.1', { speciesPhaseId: propanolLiquid }))!;
    expect(current.release.status).toBe('published');
    expect(current.values.filter((v) => v.quantity === 'dfH').map((v) => [v.valueId, v.recommended, v.valueSi])).toEqual([[newDfH, true, -302500], [propanolDfH, false, -302900]]);
    expect(current.values.filter((v) => v.quantity === 'Cp').map((v) => v.valueId)).toEqual([newCp]);
    const old = (await releaseSnapshot(m, '2026.2', { speciesPhaseId: propanolLiquid }))!;
    expect(old.values.filter((v) => v.quantity === 'Cp').map((v) => [v.valueId, v.valueSi])).toEqual([[propanolCp, 144.2]]);

    // 11. The watcher of propan-1-ol got one e-mail with what changed for it.
    const watcherMail = await waitForMail('reader@kelvindex.test', /Release 2027\.1 changes species you watch/);
    expect(watcherMail.text).toContain('propan-1-ol');
    expect(watcherMail.text).toContain('ΔfH°(l) added: -302.5 ± 0.7 kJ/mol (lindqvist-2026), recommended');
    expect(watcherMail.text).toContain('Cp°(l) revised: 144.2 ± 1.2 J/(mol·K) (qpc-dsc07-2026) → 143.9 ± 1.0 J/(mol·K) (qpc-dsc07-2026)');
    await waitForMail('steward@kelvindex.test', /Release 2027\.1 changes species you watch/);

    // 12. The evidence is there for the reviewers, not for a reader; every step is in the audit trail.
    const download = await call('reviewer', 'get', `/evidence/${evidence.body.id}`).buffer(true).parse((res, done) => {
      const chunks: Buffer[] = [];
      res.on('data', (c: Buffer) => chunks.push(c));
      res.on('end', () => done(null, Buffer.concat(chunks)));
    }).expect(200);
    expect(Buffer.compare(download.body as Buffer, runs)).toBe(0);
    expect(download.headers['content-disposition']).toContain('attachment');
    await call('reader', 'get', `/evidence/${evidence.body.id}`).expect(403);
    const trail: { action: string }[] = await m.query(`SELECT action FROM audit_entries WHERE entity_id = $1 ORDER BY id`, [id]);
    expect(trail.map((a) => a.action)).toEqual(['proposal.create', 'proposal.item_add', 'proposal.item_add', 'proposal.submit', 'proposal.review', 'proposal.item_update', 'proposal.resubmit', 'proposal.review', 'proposal.release']);

    // 13. The next release opens in preparation, holding what 2027.1 holds.
    const next = (await call('editor', 'post', '/releases').send({ label: '2027.2' }).expect(201)).body;
    expect(next).toEqual(jasmine.objectContaining({ label: '2027.2', status: 'preparing' }));
    const [counts] = await m.query(`SELECT (SELECT count(*) FROM release_members m JOIN releases r ON r.id = m.release_id WHERE r.label = '2027.1')::int AS a,
                                           (SELECT count(*) FROM release_members m JOIN releases r ON r.id = m.release_id WHERE r.label = '2027.2')::int AS b`);
    expect(counts.a).toBe(counts.b);
    await call('editor', 'post', '/releases').send({ label: '2027.3' }).expect(409);
  });

  it('applies an approval once when ten reviewers approve at the same moment: one wins, nine get 409, all audited', async () => {
    const m = iso.dataSource.manager;
    const phase = seedId('phase', 'CH4(g)');
    const source = (await call('steward', 'post', '/sources').send({ type: 'dataset', title: `Concurrency spec ${randomBytes(3).toString('hex')}` }).expect(201)).body;
    const created = (await call('steward', 'post', '/proposals').send({ title: 'Concurrent approvals' }).expect(201)).body;
    await call('steward', 'post', `/proposals/${created.id}/items`).send({
      kind: 'add_value', sourceId: source.id,
      payload: { speciesPhaseId: phase, quantity: 'S', value: '186.30', unit: 'J/(mol·K)', uncertainty: '0.05', pressurePa: 100000, method: 'evaluated' },
    }).expect(201);
    const submitted = (await call('steward', 'post', `/proposals/${created.id}/submit`).send({}).expect(200)).body;
    expect(submitted.checkSummary.fail).toBe(0);
    const [{ n: valuesBefore }] = await m.query(`SELECT count(*)::int AS n FROM thermo_values`);

    const answers = await Promise.all(Array.from({ length: 10 }, (_, i) =>
      call(i % 2 ? 'reviewer' : 'reviewer2', 'post', `/proposals/${created.id}/reviews`).send({ decision: 'approve', comment: `Approval ${i}`, version: submitted.version })));
    expect(answers.map((a) => a.status).sort()).toEqual([201, 409, 409, 409, 409, 409, 409, 409, 409, 409]);
    const [{ n: valuesAfter }] = await m.query(`SELECT count(*)::int AS n FROM thermo_values`);
    expect(valuesAfter - valuesBefore).toBe(1);
    const [{ n: reviews }] = await m.query(`SELECT count(*)::int AS n FROM proposal_reviews WHERE proposal_id = $1`, [created.id]);
    expect(reviews).toBe(1);
    const trail: { action: string }[] = await m.query(`SELECT action FROM audit_entries WHERE entity_id = $1 AND action LIKE 'proposal.review%'`, [created.id]);
    expect(trail.map((a) => a.action).sort()).toEqual(['proposal.review', ...Array(9).fill('proposal.review_refused')]);
  });

  it('lets a reviewer approve despite a failed check only with a justification, which is kept with the review', async () => {
    const m = iso.dataSource.manager;
    const source = (await call('steward', 'post', '/sources').send({ type: 'dataset', title: `Justification spec ${randomBytes(3).toString('hex')}` }).expect(201)).body;
    const created = (await call('steward', 'post', '/proposals').send({ title: 'A value far from the others' }).expect(201)).body;
    await call('steward', 'post', `/proposals/${created.id}/items`).send({
      kind: 'add_value', sourceId: source.id,
      payload: { speciesPhaseId: seedId('phase', 'H2O(g)'), quantity: 'dfH', value: '-240.0', unit: 'kJ/mol', uncertainty: '0.1', pressurePa: 100000, method: 'computed', levelOfTheory: 'W1-F12' },
    }).expect(201);
    const submitted = (await call('steward', 'post', `/proposals/${created.id}/submit`).send({}).expect(200)).body;
    expect(submitted.items[0].checks).toContain(jasmine.objectContaining({ code: 'source-agreement', status: 'fail' }));
    const [{ n: before }] = await m.query(`SELECT count(*)::int AS n FROM thermo_values`);
    await call('reviewer', 'post', `/proposals/${created.id}/reviews`).send({ decision: 'approve', version: submitted.version }).expect(422);
    expect((await m.query(`SELECT count(*)::int AS n FROM thermo_values`))[0].n).toBe(before);
    const justification = 'The W1-F12 value is kept as a computed alternative; the editor will not recommend it.';
    const approved = (await call('reviewer', 'post', `/proposals/${created.id}/reviews`).send({ decision: 'approve', justification, version: submitted.version }).expect(201)).body;
    expect(approved.state).toBe('approved');
    expect(approved.reviews.at(-1)).toEqual(jasmine.objectContaining({ decision: 'approve', justification }));
    const [row] = await m.query(`SELECT method, level_of_theory FROM thermo_values WHERE id = $1`, [approved.items[0].resultValueId]);
    expect(row).toEqual({ method: 'computed', level_of_theory: 'W1-F12' });
  });

  it('retires a recommended value: publishing then waits until the editor recommends another', async () => {
    const m = iso.dataSource.manager;
    const janaf = seedId('value', 'janaf-1998:CH4(g):dfH');
    const nbs = seedId('value', 'nbs-1982:CH4(g):dfH');
    const methane = seedId('phase', 'CH4(g)');
    let [preparing] = await m.query(`SELECT label FROM releases WHERE status = 'preparing'`);
    if (!preparing) preparing = (await call('editor', 'post', '/releases').send({ label: '2027.9' }).expect(201)).body;
    const label = preparing.label as string;

    const created = (await call('steward', 'post', '/proposals').send({ title: 'Retire the JANAF ΔfH° of methane (test)' }).expect(201)).body;
    await call('steward', 'post', `/proposals/${created.id}/items`).send({ kind: 'retire_value', payload: { valueId: janaf, reason: 'Test: superseded by a re-evaluation.' } }).expect(201);
    const submitted = (await call('steward', 'post', `/proposals/${created.id}/submit`).send({}).expect(200)).body;
    expect(submitted.items[0].checks).toEqual([jasmine.objectContaining({ code: 'retires-recommended', status: 'warn' })]);
    const approved = (await call('reviewer', 'post', `/proposals/${created.id}/reviews`).send({ decision: 'approve', version: submitted.version }).expect(201)).body;
    const added = (await call('editor', 'post', `/releases/${label}/proposals`).send({ proposalId: created.id }).expect(200)).body;
    expect(added.added.retired).toBe(1);
    expect(added.needsRecommendation).toEqual([jasmine.objectContaining({ speciesPhaseId: methane, quantity: 'dfH', members: 1, recommended: 0 })]);

    const blocked = await call('editor', 'post', `/releases/${label}/publish`).send({ confirm: true }).expect(409);
    expect(blocked.body.message).toMatch(/need exactly one recommended value first: dfH of methane \(g\)/);
    expect(blocked.body.details.needsRecommendation.length).toBe(1);
    await call('editor', 'put', `/releases/${label}/recommended`).send({ speciesPhaseId: methane, quantity: 'dfH', valueId: nbs }).expect(200);
    const published = (await call('editor', 'post', `/releases/${label}/publish`).send({ confirm: true }).expect(200)).body;
    const entry = published.changeLog.species.find((x: { hillFormula: string }) => x.hillFormula === 'CH4');
    expect(entry.retired.map((e: { label: string; from: { sourceKey: string } }) => [e.label, e.from.sourceKey])).toEqual([['ΔfH°(g)', 'janaf-1998']]);
    expect(entry.recommendation.map((e: { to: { sourceKey: string; recommended: boolean } }) => [e.to.sourceKey, e.to.recommended])).toEqual([['nbs-1982', true]]);
    const snapshot = (await releaseSnapshot(m, label, { speciesPhaseId: methane, quantity: 'dfH' }))!;
    expect(snapshot.values.map((v) => [v.valueId, v.recommended])).toEqual([[nbs, true]]);
    expect((await releaseSnapshot(m, '2026.2', { speciesPhaseId: methane, quantity: 'dfH' }))!.values.map((v) => v.valueId).sort()).toEqual([janaf, nbs].sort());
    expect(approved.items[0].resultValueId).toBeTruthy();
  });

  it('approves the demo scenario\'s waiting proposals as they were seeded (subjects named by the item rows)', async () => {
    const m = iso.dataSource.manager;
    for (const key of ['submitted-ethyl-acetate-vap', 'resubmitted-butanol-cp']) {
      const id = seedId('proposal', key);
      const current = (await call('reviewer', 'get', `/proposals/${id}`).expect(200)).body;
      const approved = (await call('reviewer', 'post', `/proposals/${id}/reviews`).send({ decision: 'approve', comment: 'Fine.', version: current.version }).expect(201)).body;
      expect(approved.state).withContext(key).toBe('approved');
    }
    const [vap] = await m.query(`SELECT v.quantity, v.transition_kind, v.value_si, v.species_phase_id FROM thermo_values v JOIN proposal_items i ON i.result_value_id = v.id WHERE i.proposal_id = $1`, [seedId('proposal', 'submitted-ethyl-acetate-vap')]);
    expect(vap).toEqual({ quantity: 'dtrsH', transition_kind: 'vap', value_si: 35400, species_phase_id: seedId('phase', 'EtOAc(l)') });
    const [butanol] = await m.query(`SELECT s.hill_formula, s.cas_rn, count(v.id)::int AS values FROM species s JOIN species_phases sp ON sp.species_id = s.id LEFT JOIN thermo_values v ON v.species_phase_id = sp.id WHERE s.name = 'butan-1-ol' GROUP BY s.id`);
    expect(butanol).toEqual({ hill_formula: 'C4H10O', cas_rn: '71-36-3', values: 1 });
  });
});
