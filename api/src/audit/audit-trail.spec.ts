import { attempt, inRolledBackTransaction } from '../db/test-database';
import { translateDatabaseError } from '../shared/database-errors';
import { AuditEntry } from './audit-entry.entity';

describe('the audit trail', () => {
  it('takes new entries and refuses UPDATE, DELETE and TRUNCATE, even by direct SQL', async () => {
    await inRolledBackTransaction(async (m) => {
      const entry = await m.save(AuditEntry, m.create(AuditEntry, {
        action: 'proposal.submit', entityType: 'proposal', entityId: 'spec-entry', actorLabel: 'spec@kelvindex.test', details: { from: 'draft', to: 'submitted' }, ipAddress: '127.0.0.1',
      }));
      expect(entry.id).toMatch(/^\d+$/);
      expect(entry.occurredAt).toBeInstanceOf(Date);

      const refusals = [
        await attempt(m, `UPDATE audit_entries SET action = 'proposal.approve' WHERE id = $1`, [entry.id]),
        await attempt(m, `UPDATE audit_entries SET details = '{}'`),
        await attempt(m, `DELETE FROM audit_entries WHERE id = $1`, [entry.id]),
        await attempt(m, `DELETE FROM audit_entries`),
        await attempt(m, `TRUNCATE audit_entries`),
        await attempt(m, () => m.delete(AuditEntry, { id: entry.id })),
        await attempt(m, () => m.update(AuditEntry, { id: entry.id }, { actorLabel: 'someone else' })),
      ];
      for (const refusal of refusals) {
        expect(refusal).withContext('every change must be refused').toBeDefined();
        expect(refusal!.message).toContain('the audit trail is append-only');
        expect(translateDatabaseError(refusal!.error)?.status).toBe(409);
      }
      const [row] = await m.query(`SELECT action, actor_label, details FROM audit_entries WHERE id = $1`, [entry.id]);
      expect(row).toEqual({ action: 'proposal.submit', actor_label: 'spec@kelvindex.test', details: { from: 'draft', to: 'submitted' } });
    });
  });

  it('checks the shape of what is written', async () => {
    await inRolledBackTransaction(async (m) => {
      expect((await attempt(m, `INSERT INTO audit_entries (action) VALUES ('Submit')`))?.constraint).toBe('audit_entries_action_format');
      expect((await attempt(m, `INSERT INTO audit_entries (action, entity_type) VALUES ('a.b', 'proposal')`))?.constraint).toBe('audit_entries_entity');
      expect((await attempt(m, `INSERT INTO audit_entries (id, action) VALUES (1, 'a.b')`))?.code).toBe('428C9'); // GENERATED ALWAYS
    });
  });
});
