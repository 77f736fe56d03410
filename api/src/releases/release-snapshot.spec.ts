import { catalogueFixture } from '../db/spec-fixtures';
import { attempt, inRolledBackTransaction } from '../db/test-database';
import { retireValue, reviseValue, valueHistory } from '../values/value-versions';
import { prepareRelease, publishRelease, putInRelease, removeLineageFromRelease } from './release-assembly';
import { releaseDiff } from './release-diff';
import { findRelease, releaseSnapshot } from './release-snapshot';

// Labels far in the future so they never clash with the demo's releases in the shared database.
const labels = () => {
  const year = 2100 + Math.floor(Math.random() * 7000);
  return [`${year}.1`, `${year}.2`, `${year}.3`];
};

describe('as of release R', () => {
  it('a revision is a new version; the old one stays exactly as release R held it', async () => {
    await inRolledBackTransaction(async (m) => {
      const f = await catalogueFixture(m);
      const [r1, r2, r3] = labels();
      const v1 = await f.value();
      const entropy = await f.value({ quantity: 'S', valueSi: 254.0, uncertaintySi: null, uncertaintyKind: null, enteredValue: '254.0', enteredUnit: 'J/(mol·K)' });

      const first = await prepareRelease(m, { label: r1 });
      await putInRelease(m, first.id, { valueId: v1.id, recommended: true });
      await putInRelease(m, first.id, { valueId: entropy.id, recommended: true });
      await publishRelease(m, first.id);
      const asPublished = await releaseSnapshot(m, r1);

      // Revise: a new row superseding v1, in a new release that carries the rest over.
      const v2 = await reviseValue(m, v1.id, { valueSi: -106200, uncertaintySi: 400, enteredValue: '-106.2 ± 0.4' });
      expect(v2.id).not.toBe(v1.id);
      expect([v2.lineageId, v2.versionNo, v2.supersedesId]).toEqual([v1.id, 2, v1.id]);
      const second = await prepareRelease(m, { label: r2, carryOverFrom: r1 });
      await putInRelease(m, second.id, { valueId: v2.id });
      await publishRelease(m, second.id);

      const old = (await releaseSnapshot(m, r1))!;
      const current = (await releaseSnapshot(m, r2))!;
      expect(old).toEqual(asPublished!);
      expect(old.values.find((v) => v.quantity === 'dfH')).toEqual(jasmine.objectContaining({ valueId: v1.id, versionNo: 1, valueSi: -107000, uncertaintySi: 1000, recommended: true }));
      expect(current.values.find((v) => v.quantity === 'dfH')).toEqual(jasmine.objectContaining({ valueId: v2.id, versionNo: 2, valueSi: -106200, uncertaintySi: 400, recommended: true }));
      expect(current.values.find((v) => v.quantity === 'S')?.valueId).toBe(entropy.id);
      expect((await valueHistory(m, v1.lineageId)).map((v) => v.id)).toEqual([v1.id, v2.id]);

      // The old version cannot be edited or removed behind the release's back.
      expect((await attempt(m, `UPDATE thermo_values SET value_si = 0 WHERE id = $1`, [v1.id]))?.message).toContain('never changed in place');
      expect((await attempt(m, `UPDATE thermo_values SET notes = 'x' WHERE id = $1`, [v1.id]))?.message).toContain('never changed in place');
      expect((await attempt(m, `DELETE FROM thermo_values WHERE id = $1`, [v1.id]))?.message).toContain('never changed in place');

      // Retire: the lineage leaves the next release; both earlier releases still answer as before.
      const retired = await retireValue(m, v2.id, 'Superseded by a corrected measurement series', { enteredBy: f.author.id });
      expect([retired.isRetired, retired.versionNo, retired.valueSi]).toEqual([true, 3, -106200]);
      const third = await prepareRelease(m, { label: r3, carryOverFrom: r2 });
      expect(await removeLineageFromRelease(m, third.id, v1.lineageId)).toBeTrue();
      await publishRelease(m, third.id);
      expect((await releaseSnapshot(m, r3))!.values.map((v) => v.quantity)).toEqual(['S']);
      expect(await releaseSnapshot(m, r1)).toEqual(asPublished!);

      const firstToSecond = await releaseDiff(m, r1, r2);
      expect(firstToSecond.map((c) => [c.change, c.fromId, c.toId])).toEqual([['revised', v1.id, v2.id]]);
      const secondToThird = await releaseDiff(m, r2, r3);
      expect(secondToThird.map((c) => [c.change, c.fromId, c.toId])).toEqual([['retired', v2.id, null]]);
      expect((await findRelease(m, r3))?.status).toBe('published');
      expect(await releaseSnapshot(m, '1999.1')).toBeUndefined();
    });
  });

  it('refuses a fork of the version chain, a change of subject, and a retired value as a member', async () => {
    await inRolledBackTransaction(async (m) => {
      const f = await catalogueFixture(m);
      const v1 = await f.value();
      await reviseValue(m, v1.id, { valueSi: -106900 });
      const fork = await attempt(m, () => reviseValue(m, v1.id, { valueSi: -106800 }));
      expect(fork?.constraint).toMatch(/thermo_values_supersedes_once|thermo_values_lineage_version_unique/);

      const otherQuantity = await attempt(m,
        `INSERT INTO thermo_values (supersedes_id, species_phase_id, quantity, value_si, temperature_k, pressure_pa, method, source_id, entered_value, entered_unit)
         SELECT id, species_phase_id, 'S', 1, temperature_k, pressure_pa, method, source_id, '1', 'J/(mol·K)' FROM thermo_values WHERE supersedes_id = $1`, [v1.id]);
      expect(otherQuantity?.constraint).toBe('thermo_values_version_chain');

      const [latest] = await m.query(`SELECT id FROM thermo_values WHERE supersedes_id = $1`, [v1.id]);
      const retired = await retireValue(m, latest.id, 'Withdrawn by the source');
      const release = await prepareRelease(m, { label: labels()[0] });
      const refused = await attempt(m, `INSERT INTO release_members (release_id, value_id) VALUES ($1, $2)`, [release.id, retired.id]);
      expect(refused?.constraint).toBe('release_members_not_retired');
      const twice = await attempt(m, () => retireValue(m, retired.id, 'again'));
      expect(twice?.constraint).toBe('thermo_values_version_chain');
    });
  });

  it('findRelease without a label is the latest published release', async () => {
    await inRolledBackTransaction(async (m) => {
      const f = await catalogueFixture(m);
      const v = await f.value();
      const release = await prepareRelease(m, { label: '9999.1' });
      await putInRelease(m, release.id, { valueId: v.id, recommended: true });
      expect((await findRelease(m))?.label).not.toBe('9999.1');
      await publishRelease(m, release.id);
      expect((await findRelease(m))?.label).toBe('9999.1');
    });
  });
});
