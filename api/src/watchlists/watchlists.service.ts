import type { Request } from 'express';
import type { AppContext } from '../app-context';
import type { Principal } from '../auth/principal';
import { recordAudit } from '../audit/audit.service';
import { queryRows } from '../db/returned-rows';
import { NotFoundError } from '../shared/errors';

export interface WatchlistItem {
  speciesId: string;
  formula: string;
  name: string;
  createdAt: Date;
}

const ITEM_COLUMNS = `w.species_id AS "speciesId", s.formula, s.name, w.created_at AS "createdAt"`;

/** A user's watched species: they get an e-mail when a published release changes their data. */
export class WatchlistsService {
  constructor(private readonly ctx: AppContext) {}

  async list(user: Principal): Promise<{ items: WatchlistItem[] }> {
    const items = await this.ctx.dataSource.query(
      `SELECT ${ITEM_COLUMNS} FROM watches w JOIN species s ON s.id = w.species_id WHERE w.user_id = $1 ORDER BY lower(s.name), s.id`,
      [user.userId],
    );
    return { items };
  }

  /** Watches a species; watching it again changes nothing. */
  async watch(user: Principal, speciesId: string, req: Request): Promise<{ item: WatchlistItem; created: boolean }> {
    return this.ctx.dataSource.transaction(async (m) => {
      const [species] = await m.query(`SELECT id FROM species WHERE id = $1`, [speciesId]);
      if (!species) throw new NotFoundError(`No species ${speciesId}`);
      const inserted = await m.query(
        `INSERT INTO watches (user_id, species_id) VALUES ($1, $2) ON CONFLICT (user_id, species_id) DO NOTHING RETURNING id`,
        [user.userId, speciesId],
      );
      if (inserted.length > 0) await recordAudit(m, { action: 'watchlist.add', actor: user, entityType: 'species', entityId: speciesId }, req);
      const [item] = await m.query(`SELECT ${ITEM_COLUMNS} FROM watches w JOIN species s ON s.id = w.species_id WHERE w.user_id = $1 AND w.species_id = $2`, [user.userId, speciesId]);
      return { item, created: inserted.length > 0 };
    });
  }

  async unwatch(user: Principal, speciesId: string, req: Request): Promise<void> {
    await this.ctx.dataSource.transaction(async (m) => {
      const [species] = await m.query(`SELECT id FROM species WHERE id = $1`, [speciesId]);
      if (!species) throw new NotFoundError(`No species ${speciesId}`);
      const removed = await queryRows(m, `DELETE FROM watches WHERE user_id = $1 AND species_id = $2 RETURNING id`, [user.userId, speciesId]);
      if (removed.length > 0) await recordAudit(m, { action: 'watchlist.remove', actor: user, entityType: 'species', entityId: speciesId }, req);
    });
  }
}
