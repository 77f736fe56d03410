import { randomBytes, randomUUID } from 'node:crypto';
import bcrypt from 'bcryptjs';
import request from 'supertest';
import { DEMO_PASSWORD } from '../../../seeds-demo/demo-accounts';
import { seedId } from '../../../seeds-demo/seed-support';
import { declaredRoutes } from '../auth/access';
import type { Role } from '../auth/principal';
import { sharedDataSource } from '../db/test-database';
import { releaseSnapshot } from '../releases/release-snapshot';
import { testApp, type TestApp } from '../testing/test-app';
import { bearerFor, type DemoRole } from '../testing/sign-in';

// Workflow rules on the shared demo database. Nothing here approves a proposal (approval writes
// values other specs would see; that happens in editorial-cycle.spec on a database of its own).
// Numbers are invented test inputs.
describe('proposal workflow', () => {
  let t: TestApp;
  const auth: Partial<Record<DemoRole | 'both', string>> = {};
  const call = (who: DemoRole | 'both', method: 'get' | 'post' | 'put' | 'patch' | 'delete', path: string) =>
    request(t.app)[method](`/api/v1${path}`).set('Authorization', auth[who]!);
  const waterGas = seedId('phase', 'H2O(g)');
  let sourceId: string;

  const valuePayload = (value = '-241.80') => ({
    speciesPhaseId: waterGas, quantity: 'dfH', value, unit: 'kJ/mol', uncertainty: '0.10', uncertaintyKind: 'expanded', coverageFactor: 2,
    temperatureK: 298.15, pressurePa: 100000, method: 'measured',
  });

  /** A draft with one ΔfH° item; submitted when asked. */
  async function proposal(options: { submit?: boolean; author?: 'steward' | 'both' } = {}) {
    const author = options.author ?? 'steward';
    const created = await call(author, 'post', '/proposals').send({ title: `Workflow spec ${randomBytes(3).toString('hex')}` }).expect(201);
    const item = await call(author, 'post', `/proposals/${created.body.id}/items`).send({ kind: 'add_value', sourceId, payload: valuePayload() }).expect(201);
    if (!options.submit) return { id: created.body.id as string, itemId: item.body.id as string, version: created.body.version as number };
    const submitted = await call(author, 'post', `/proposals/${created.body.id}/submit`).send({}).expect(200);
    return { id: created.body.id as string, itemId: item.body.id as string, version: submitted.body.version as number };
  }

  const counts = async () => (await t.dataSource.query(
    `SELECT (SELECT count(*) FROM thermo_values)::int AS values, (SELECT count(*) FROM proposal_reviews)::int AS reviews,
            (SELECT count(*) FROM evidence_files)::int AS evidence, (SELECT count(*) FROM proposal_items)::int AS items,
            (SELECT count(*) FROM release_members)::int AS members`,
  ))[0];

  beforeAll(async () => {
    t = await testApp();
    for (const who of ['steward', 'reviewer', 'reviewer2', 'editor', 'reader', 'admin'] as const) auth[who] = await bearerFor(t.app, who);
    // Someone who is both steward and reviewer, to meet the four-eyes rule head on.
    const email = `steward-reviewer-${randomBytes(3).toString('hex')}@kelvindex.test`;
    await t.dataSource.query(`INSERT INTO users (email, display_name, password_hash, roles, email_verified_at) VALUES ($1, 'Spec Steward-Reviewer', $2, '{reader,steward,reviewer}', now())`,
      [email, await bcrypt.hash(DEMO_PASSWORD, 4)]);
    const signIn = await request(t.app).post('/api/v1/auth/login').send({ email, password: DEMO_PASSWORD }).expect(200);
    auth.both = `Bearer ${signIn.body.accessToken}`;
    const source = await call('steward', 'post', '/sources').send({ type: 'report', title: `Workflow spec source ${randomBytes(3).toString('hex')}`, issued: { 'date-parts': [[2026]] } }).expect(201);
    sourceId = source.body.id;
  });

  it('moves only along the state machine: an illegal transition is 409 with the reason and changes nothing', async () => {
    const empty = await call('steward', 'post', '/proposals').send({ title: 'Nothing in it' }).expect(201);
    const noItems = await call('steward', 'post', `/proposals/${empty.body.id}/submit`).send({}).expect(422);
    expect(noItems.body.message).toContain('at least one item');

    const p = await proposal();
    const early = await call('steward', 'post', `/proposals/${p.id}/resubmit`).send({}).expect(409);
    expect(early.body.message).toMatch(/draft cannot be resubmitted: submit it first/);
    await call('reviewer', 'post', `/proposals/${p.id}/reviews`).send({ decision: 'approve', version: p.version }).expect(404); // a draft is the author's own

    const submitted = await call('steward', 'post', `/proposals/${p.id}/submit`).send({ version: p.version + 1 }).expect(200);
    expect(submitted.body.state).toBe('submitted');
    const again = await call('steward', 'post', `/proposals/${p.id}/submit`).send({}).expect(409);
    expect(again.body.message).toMatch(/already waiting for review/);
    const locked = await call('steward', 'post', `/proposals/${p.id}/items`).send({ kind: 'add_value', sourceId, payload: valuePayload('-241.7') }).expect(409);
    expect(locked.body.message).toMatch(/draft or after a request for changes/);
    await call('steward', 'patch', `/proposals/${p.id}/items/${p.itemId}`).send({ payload: valuePayload('-241.7') }).expect(409);
    await call('steward', 'delete', `/proposals/${p.id}/items/${p.itemId}`).expect(409);

    const before = await counts();
    const stale = await call('reviewer', 'post', `/proposals/${p.id}/reviews`).send({ decision: 'reject', comment: 'No.', version: submitted.body.version - 1 }).expect(409);
    expect(stale.body.message).toMatch(/changed since you loaded it/);
    const noComment = await call('reviewer', 'post', `/proposals/${p.id}/reviews`).send({ decision: 'reject', version: submitted.body.version }).expect(422);
    expect(noComment.body.message).toMatch(/comment/);
    expect(await counts()).toEqual(before);

    const rejected = await call('reviewer', 'post', `/proposals/${p.id}/reviews`).send({ decision: 'reject', comment: 'Duplicate of the CODATA value.', version: submitted.body.version }).expect(201);
    expect(rejected.body.state).toBe('rejected');
    const ended = await call('steward', 'post', `/proposals/${p.id}/withdraw`).send({}).expect(409);
    expect(ended.body.message).toMatch(/rejected cannot be withdrawn: its workflow has ended/);
    const twice = await call('reviewer2', 'post', `/proposals/${p.id}/reviews`).send({ decision: 'approve', version: rejected.body.version }).expect(409);
    expect(twice.body.message).toMatch(/rejected cannot be approved/);
    expect((await call('steward', 'get', `/proposals/${p.id}`).expect(200)).body).toEqual(jasmine.objectContaining({ state: 'rejected', version: rejected.body.version }));
    const refused: { action: string }[] = await t.dataSource.query(`SELECT action FROM audit_entries WHERE entity_id = $1 AND action LIKE '%refused' ORDER BY id`, [p.id]);
    expect(refused.map((r) => r.action)).toEqual(['proposal.resubmit_refused', 'proposal.submit_refused', 'proposal.review_refused', 'proposal.review_refused', 'proposal.withdraw_refused', 'proposal.review_refused']);

    const withdrawable = await proposal({ submit: true });
    expect((await call('steward', 'post', `/proposals/${withdrawable.id}/withdraw`).send({}).expect(200)).body.state).toBe('withdrawn');
  });

  it('keeps the four-eyes rule: nobody reviews their own proposal (403 with the reason), in the API and in the database', async () => {
    const own = await proposal({ submit: true, author: 'both' });
    const before = await counts();
    const refused = await call('both', 'post', `/proposals/${own.id}/reviews`).send({ decision: 'approve', version: own.version }).expect(403);
    expect(refused.body.message).toMatch(/Nobody reviews their own proposal/);
    expect(await counts()).toEqual(before);
    const [{ id: authorId }] = await t.dataSource.query(`SELECT author_id AS id FROM proposals WHERE id = $1`, [own.id]);
    const direct = await (await sharedDataSource()).query(`INSERT INTO proposal_reviews (proposal_id, reviewer_id, decision) VALUES ($1, $2, 'approve')`, [own.id, authorId]).then(() => undefined, (e: Error) => e);
    expect((direct as Error).message).toContain('Nobody reviews their own proposal');
    // The same person may review someone else's proposal.
    const other = await proposal({ submit: true });
    await call('both', 'post', `/proposals/${other.id}/reviews`).send({ decision: 'request_changes', comment: 'Give the run numbers.', version: other.version }).expect(201);
  });

  it('lets exactly one of fifty simultaneous reviews win; the others get 409 and every attempt is audited', async () => {
    const ATTEMPTS = 50;
    const p = await proposal({ submit: true });
    const attempts = Array.from({ length: ATTEMPTS }, (_, i) =>
      call(i % 2 ? 'reviewer' : 'reviewer2', 'post', `/proposals/${p.id}/reviews`).send({ decision: i % 3 ? 'request_changes' : 'reject', comment: `Attempt ${i}`, version: p.version }));
    const answers = await Promise.all(attempts);
    const statuses = answers.map((a) => a.status).sort();
    expect(statuses).toEqual([201, ...Array<number>(ATTEMPTS - 1).fill(409)]);
    const [{ n }] = await t.dataSource.query(`SELECT count(*)::int AS n FROM proposal_reviews WHERE proposal_id = $1`, [p.id]);
    expect(n).toBe(1);
    const trail: { action: string; status: number | null }[] = await t.dataSource.query(
      `SELECT action, (details->>'status')::int AS status FROM audit_entries WHERE entity_id = $1 AND action LIKE 'proposal.review%' ORDER BY id`, [p.id]);
    expect(trail.length).toBe(ATTEMPTS);
    expect(trail.filter((a) => a.action === 'proposal.review').length).toBe(1);
    expect(trail.filter((a) => a.action === 'proposal.review_refused' && a.status === 409).length).toBe(ATTEMPTS - 1);
  });

  it('checks items when they are added: a source is required, the payload is checked field by field', async () => {
    const p = await proposal();
    const noSource = await call('steward', 'post', `/proposals/${p.id}/items`).send({ kind: 'add_value', payload: valuePayload() }).expect(422);
    expect(noSource.body.details.fields).toContain(jasmine.objectContaining({ field: 'sourceId' }));
    const bad = await call('steward', 'post', `/proposals/${p.id}/items`).send({
      kind: 'add_value', sourceId,
      payload: { ...valuePayload(), value: 'about -241', unit: 'kJ', pressurePa: 100, method: 'guessed', colour: 'blue' },
    }).expect(422);
    expect(bad.body.details.fields.map((f: { field: string }) => f.field).sort()).toEqual(['payload.colour', 'payload.method', 'payload.pressurePa', 'payload.unit', 'payload.value']);
    await call('steward', 'post', `/proposals/${p.id}/items`).send({ kind: 'rename_species', payload: {} }).expect(400);
    const negative = await call('steward', 'post', `/proposals/${p.id}/items`).send({ kind: 'add_value', sourceId, payload: { ...valuePayload(), quantity: 'S', value: '-5', unit: 'J/(mol·K)' } }).expect(422);
    expect(negative.body.message).toMatch(/third-law entropy S° must be positive/);
    const superseded = await call('steward', 'post', `/proposals/${p.id}/items`).send({
      kind: 'revise_value', sourceId, payload: { valueId: seedId('value', 'codata-1989:C(g):dfH'), value: '716.7', unit: 'kJ/mol', pressurePa: 100000, method: 'evaluated' },
    }).expect(422);
    expect(superseded.body.message).toMatch(/has been superseded/);
    const unknownPhase = await call('steward', 'post', `/proposals/${p.id}/items`).send({
      kind: 'add_value', sourceId, payload: { ...valuePayload(), speciesPhaseId: undefined, species: 'water', phase: 'cr' },
    }).expect(422);
    expect(unknownPhase.body.message).toMatch(/water has no phase cr yet: add an add_phase item/);
    const added = await call('steward', 'post', `/proposals/${p.id}/items`).send({
      kind: 'add_value', sourceId, payload: { ...valuePayload('-241.9'), speciesPhaseId: undefined, species: 'water', phase: 'g' },
    }).expect(201);
    expect(added.body).toEqual(jasmine.objectContaining({ speciesPhaseId: waterGas, position: 2 }));
    await call('steward', 'patch', `/proposals/${p.id}/items/${added.body.id}`).send({ payload: { ...valuePayload(), unit: 'furlongs' } }).expect(422);
    await call('steward', 'delete', `/proposals/${p.id}/items/${added.body.id}`).expect(204);
    await call('steward', 'delete', `/proposals/${p.id}/items/${added.body.id}`).expect(404);
    await call('reviewer', 'post', `/proposals/${p.id}/items`).send({ kind: 'add_value', sourceId, payload: valuePayload() }).expect(403);
  });

  it('stores the checks on submission and flags a kJ/J slip as failed', async () => {
    const p = await proposal();
    await call('steward', 'post', `/proposals/${p.id}/items`).send({ kind: 'add_value', sourceId, payload: { ...valuePayload('-241826'), uncertainty: undefined, uncertaintyKind: undefined, coverageFactor: undefined } }).expect(201);
    const submitted = (await call('steward', 'post', `/proposals/${p.id}/submit`).send({}).expect(200)).body;
    const slip = submitted.items[1].checks;
    expect(slip).toContain(jasmine.objectContaining({ code: 'plausible-magnitude', status: 'fail' }));
    expect(slip.find((c: { code: string }) => c.code === 'plausible-magnitude').message).toMatch(/×1000/);
    expect(slip).toContain(jasmine.objectContaining({ code: 'source-agreement', status: 'fail' }));
    expect(submitted.items[0].checks).toContain(jasmine.objectContaining({ code: 'standard-pressure', status: 'pass' }));
    expect(submitted.checkSummary.fail).toBeGreaterThanOrEqual(2);
    const listed = (await call('reviewer', 'get', '/proposals?state=submitted&assignedToMe=true&sort=-submittedAt').expect(200)).body;
    expect(listed.items.find((x: { id: string }) => x.id === p.id)).toEqual(jasmine.objectContaining({ failedChecks: submitted.checkSummary.fail, itemCount: 2 }));
    const before = await counts();
    const blocked = await call('reviewer', 'post', `/proposals/${p.id}/reviews`).send({ decision: 'approve', version: submitted.version }).expect(422);
    expect(blocked.body.message).toMatch(/failed; approving needs a justification/);
    expect(blocked.body.details.failed.length).toBe(submitted.checkSummary.fail);
    expect(await counts()).toEqual(before);
  });

  it('shows proposals to the people concerned, and comments move a waiting proposal into review', async () => {
    const draft = await proposal();
    const submitted = await proposal({ submit: true });
    await call('reader', 'get', '/proposals').expect(403);
    await call('reviewer', 'get', `/proposals/${draft.id}`).expect(404);
    const mine = (await call('steward', 'get', '/proposals?mine=true&state=draft&limit=500').expect(200)).body;
    expect(mine.items.some((x: { id: string }) => x.id === draft.id)).toBeTrue();
    const queue = (await call('reviewer', 'get', '/proposals?assignedToMe=true&limit=500').expect(200)).body;
    expect(queue.items.some((x: { id: string }) => x.id === submitted.id)).toBeTrue();
    expect(queue.items.some((x: { id: string }) => x.id === draft.id)).toBeFalse();
    await call('reviewer', 'get', '/proposals?state=pending').expect(400);
    await call('reviewer', 'get', '/proposals?sort=colour').expect(400);

    const comment = (await call('reviewer', 'post', `/proposals/${submitted.id}/comments`).send({ body: 'Which calorimeter?', itemId: submitted.itemId }).expect(201)).body;
    expect(comment).toEqual(jasmine.objectContaining({ itemId: submitted.itemId, proposalState: 'in_review', proposalVersion: submitted.version + 1 }));
    await call('steward', 'post', `/proposals/${submitted.id}/comments`).send({ body: 'The TC-03 bomb.' }).expect(201);
    await call('steward', 'post', `/proposals/${submitted.id}/comments`).send({ body: 'x', itemId: randomUUID() }).expect(404);
    const thread = (await call('steward', 'get', `/proposals/${submitted.id}/comments`).expect(200)).body.items;
    expect(thread.map((c: { body: string }) => c.body)).toEqual(['Which calorimeter?', 'The TC-03 bomb.']);
    const decided = await call('reviewer2', 'post', `/proposals/${submitted.id}/reviews`).send({ decision: 'request_changes', comment: 'Name it in the item.', version: comment.proposalVersion }).expect(201);
    expect(decided.body.state).toBe('changes_requested');
    expect(decided.body.allowedActions).toEqual([]);
    expect((await call('steward', 'get', `/proposals/${submitted.id}`).expect(200)).body.allowedActions).toEqual(['withdraw', 'resubmit', 'edit_items']);
  });

  it('reports the impact of a revision on saved reactions with old and new ΔrH° and ΔrG° at 298.15 K', async () => {
    const co2 = seedId('value', 'codata-1989:CO2(g):dfH');
    const created = await call('steward', 'post', '/proposals').send({ title: 'Impact spec' }).expect(201);
    await call('steward', 'post', `/proposals/${created.body.id}/items`).send({
      kind: 'revise_value', sourceId, payload: { valueId: co2, value: '-393.40', unit: 'kJ/mol', uncertainty: '0.13', uncertaintyKind: 'expanded', coverageFactor: 2, pressurePa: 100000, method: 'evaluated' },
    }).expect(201);
    const impact = (await call('steward', 'get', `/proposals/${created.body.id}/impact`).expect(200)).body;
    expect(impact.release).toBe('2026.2');
    const item = impact.items[0];
    expect(item).toEqual(jasmine.objectContaining({ quantity: 'dfH', recommendedInRelease: true, old: jasmine.objectContaining({ valueSi: -393510 }), new: jasmine.objectContaining({ valueSi: -393400 }) }));
    expect(item.watcherCount).toBeGreaterThanOrEqual(1);
    const combustion = item.savedReactions.find((r: { name: string }) => r.name === 'Methane combustion');

    // Expected with Hess's law from the release's recommended values (CH4 + 2 O2 -> CO2 + 2 H2O(l)).
    const snapshot = (await releaseSnapshot(t.dataSource.manager, '2026.2', { recommendedOnly: true }))!;
    const of = (formula: string, phase: string, quantity: 'dfH' | 'S') => snapshot.values.find((v) => v.hillFormula === formula && v.phase === phase && v.quantity === quantity)!.valueSi;
    const deltaH = of('CO2', 'g', 'dfH') + 2 * of('H2O', 'l', 'dfH') - of('CH4', 'g', 'dfH') - 2 * of('O2', 'g', 'dfH');
    const deltaS = of('CO2', 'g', 'S') + 2 * of('H2O', 'l', 'S') - of('CH4', 'g', 'S') - 2 * of('O2', 'g', 'S');
    expect(combustion.deltaH.old).toBeCloseTo(deltaH, 6);
    expect(combustion.deltaH.new).toBeCloseTo(deltaH + 110, 6);
    expect(combustion.deltaH.change).toBeCloseTo(110, 6);
    expect(combustion.deltaG.old).toBeCloseTo(deltaH - 298.15 * deltaS, 6);
    expect(combustion.deltaG.change).toBeCloseTo(110, 6);
    expect(item.savedReactions.map((r: { name: string }) => r.name)).toEqual(jasmine.arrayContaining(['Water-gas shift']));
  });

  it('answers every workflow route with a client error, never a 500, for an empty body and an unknown id', async () => {
    const mine = ['/proposals', '/evidence', '/releases', '/sources', '/imports', '/watchlist', '/saved-reactions', '/me'];
    const roleFor: Record<string, DemoRole> = { steward: 'steward', reviewer: 'reviewer', editor: 'editor', admin: 'admin', reader: 'reader' };
    const problems: string[] = [];
    for (const route of declaredRoutes.filter((r) => mine.some((p) => r.path.startsWith(p)))) {
      const who = route.access === 'public' || route.access === 'read' || route.access === 'signed-in' ? 'steward' : roleFor[(route.access.roles as Role[])[0]];
      const url = `/api/v1${route.path.replace(/:label/g, '1999.1').replace(/:\w+/g, randomUUID())}`;
      let req = request(t.app)[route.method](url).set('Authorization', auth[who]!);
      if (route.method !== 'get' && route.method !== 'delete') req = req.send({});
      const res = await req;
      if (![200, 201, 204, 400, 404, 409, 422].includes(res.status)) problems.push(`${route.method.toUpperCase()} ${route.path} as ${who}: ${res.status} ${res.body?.message ?? ''}`);
    }
    expect(problems).toEqual([]);
  });
});
