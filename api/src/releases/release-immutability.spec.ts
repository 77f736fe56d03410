import { translateDatabaseError } from '../shared/database-errors';
import { catalogueFixture } from '../db/spec-fixtures';
import { attempt, inRolledBackTransaction } from '../db/test-database';
import { reviseValue } from '../values/value-versions';
import { prepareRelease, publishRelease, putInRelease } from './release-assembly';
import { Release } from './release.entity';

// Each spec builds its own catalogue and releases inside a transaction that is rolled back.
const label = () => `2099.${Math.floor(Math.random() * 1e6) + 1}`;

describe('a published release', () => {
  it('refuses UPDATE and DELETE of its row and any change to its membership, even by direct SQL', async () => {
    await inRolledBackTransaction(async (m) => {
      const f = await catalogueFixture(m);
      const kept = await f.value();
      const other = await f.value({ valueSi: -108000, enteredValue: '-108.0 ± 1.0' });
      const release = await prepareRelease(m, { label: label() });
      const memberId = await putInRelease(m, release.id, { valueId: kept.id, recommended: true });
      await publishRelease(m, release.id, { publishedBy: f.author.id });

      const refusals = [
        await attempt(m, `UPDATE releases SET notes = 'edited' WHERE id = $1`, [release.id]),
        await attempt(m, `UPDATE releases SET status = 'preparing', published_at = NULL WHERE id = $1`, [release.id]),
        await attempt(m, `DELETE FROM releases WHERE id = $1`, [release.id]),
        await attempt(m, `INSERT INTO release_members (release_id, value_id) VALUES ($1, $2)`, [release.id, other.id]),
        await attempt(m, `UPDATE release_members SET is_recommended = false WHERE id = $1`, [memberId]),
        await attempt(m, `UPDATE release_members SET release_id = release_id WHERE id = $1`, [memberId]),
        await attempt(m, `DELETE FROM release_members WHERE id = $1`, [memberId]),
        await attempt(m, `TRUNCATE release_members`),
        await attempt(m, `TRUNCATE releases CASCADE`),
      ];
      for (const refusal of refusals) {
        expect(refusal).withContext('every change must be refused').toBeDefined();
        expect(refusal!.message).toMatch(/published|TRUNCATE/);
        // The API answers with a 4xx naming the rule, not a 500.
        expect(translateDatabaseError(refusal!.error)?.status).toBe(409);
      }
      // Through TypeORM as well.
      const viaOrm = await attempt(m, () => m.update(Release, { id: release.id }, { notes: 'edited' }));
      expect(viaOrm?.constraint).toBe('releases_published_immutable');

      const [row] = await m.query(`SELECT notes, status FROM releases WHERE id = $1`, [release.id]);
      expect(row).toEqual({ notes: '', status: 'published' });
      const members = await m.query(`SELECT value_id, is_recommended FROM release_members WHERE release_id = $1`, [release.id]);
      expect(members).toEqual([{ value_id: kept.id, is_recommended: true }]);
    });
  });

  it('can only be published from preparation, with exactly one recommended value per species phase and quantity', async () => {
    await inRolledBackTransaction(async (m) => {
      const f = await catalogueFixture(m);
      const a = await f.value();
      const b = await f.value({ valueSi: -106500, enteredValue: '-106.5' });

      const born = await attempt(m, `INSERT INTO releases (label, status, published_at) VALUES ($1, 'published', now())`, [label()]);
      expect(born?.constraint).toBe('releases_published_immutable');

      const release = await prepareRelease(m, { label: label() });
      await putInRelease(m, release.id, { valueId: a.id });
      await putInRelease(m, release.id, { valueId: b.id });
      const noneRecommended = await attempt(m, () => publishRelease(m, release.id));
      expect(noneRecommended?.constraint).toBe('releases_recommendation_complete');

      const twoRecommended = await attempt(m, `UPDATE release_members SET is_recommended = true WHERE release_id = $1`, [release.id]);
      expect(twoRecommended?.constraint).toBe('release_members_one_recommended');

      await m.query(`UPDATE release_members SET is_recommended = true WHERE release_id = $1 AND value_id = $2`, [release.id, b.id]);
      expect(await attempt(m, () => publishRelease(m, release.id, { publishedBy: f.author.id }))).toBeUndefined();
    });
  });

  it('while in preparation, takes new versions in place of old ones and copies their subject from the value', async () => {
    await inRolledBackTransaction(async (m) => {
      const f = await catalogueFixture(m);
      const v1 = await f.value();
      const release = await prepareRelease(m, { label: label() });
      await putInRelease(m, release.id, { valueId: v1.id, recommended: true });
      const [member] = await m.query(`SELECT member_kind, lineage_id, species_phase_id, quantity FROM release_members WHERE release_id = $1`, [release.id]);
      expect(member).toEqual({ member_kind: 'value', lineage_id: v1.lineageId, species_phase_id: f.gas.id, quantity: 'dfH' });

      // A member cannot claim another subject than its value's.
      await m.query(`UPDATE release_members SET quantity = 'S', species_phase_id = $2 WHERE release_id = $1`, [release.id, f.solid.id]);
      const [after] = await m.query(`SELECT species_phase_id, quantity FROM release_members WHERE release_id = $1`, [release.id]);
      expect(after).toEqual({ species_phase_id: f.gas.id, quantity: 'dfH' });

      // Two versions of one lineage cannot both be members.
      const v2 = await reviseValue(m, v1.id, { uncertaintySi: 500, enteredValue: '-107.0 ± 0.5' });
      const both = await attempt(m, `INSERT INTO release_members (release_id, value_id) VALUES ($1, $2)`, [release.id, v2.id]);
      expect(both?.constraint).toBe('release_members_lineage_unique');
      await putInRelease(m, release.id, { valueId: v2.id });
      const members = await m.query(`SELECT value_id, is_recommended FROM release_members WHERE release_id = $1`, [release.id]);
      expect(members).toEqual([{ value_id: v2.id, is_recommended: true }]);
    });
  });
});
