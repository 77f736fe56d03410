import { catalogueFixture } from '../db/spec-fixtures';
import { createScratchDatabase, type ScratchDatabase } from '../db/test-database';
import { prepareRelease, publishRelease, putInRelease } from './release-assembly';

/**
 * Two connections at once: while one transaction publishes a release, another tries to add a
 * member. The member trigger locks the release row (FOR SHARE), so the insert waits for the
 * publication and is then refused: nothing slips into a release after it is published.
 * Runs in a scratch database because both sides must commit.
 */
describe('publishing a release while someone adds to it', () => {
  let scratch: ScratchDatabase;
  beforeAll(async () => {
    scratch = await createScratchDatabase();
    await scratch.dataSource.runMigrations({ transaction: 'each' });
  });
  afterAll(async () => {
    await scratch?.drop();
  });

  it('makes the late insert wait for the publication and then refuses it', async () => {
    const ds = scratch.dataSource;
    const { releaseId, lateValueId } = await ds.transaction(async (m) => {
      const f = await catalogueFixture(m);
      const first = await f.value();
      const late = await f.value({ valueSi: -106000, enteredValue: '-106.0' });
      const release = await prepareRelease(m, { label: '2030.1' });
      await putInRelease(m, release.id, { valueId: first.id, recommended: true });
      return { releaseId: release.id, lateValueId: late.id };
    });

    const publisher = ds.createQueryRunner();
    await publisher.connect();
    await publisher.startTransaction();
    try {
      await publishRelease(publisher.manager, releaseId);
      let settled = false;
      const lateInsert = ds.query(`INSERT INTO release_members (release_id, value_id) VALUES ($1, $2)`, [releaseId, lateValueId]);
      lateInsert.then(() => (settled = true), () => (settled = true));
      await new Promise((resolve) => setTimeout(resolve, 300));
      expect(settled).withContext('the insert waits for the publishing transaction').toBeFalse();
      await publisher.commitTransaction();
      await expectAsync(lateInsert).toBeRejectedWithError(/2030\.1 is published/);
    } finally {
      if (publisher.isTransactionActive) await publisher.rollbackTransaction();
      await publisher.release();
    }
    const members = await ds.query(`SELECT count(*)::int AS n FROM release_members WHERE release_id = $1`, [releaseId]);
    expect(members[0].n).toBe(1);
  });
});
