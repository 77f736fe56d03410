import { AuditEntry } from './admin-api';
import { auditCsv, auditQuery, detailsText } from './audit-filter';

describe('audit filters', () => {
  it('asks for the first page of everything by default', () => {
    expect(auditQuery({})).toEqual({
      user: undefined, action: undefined, entityType: undefined, entityId: undefined, from: undefined, to: undefined, page: 1, pageSize: 50,
    });
  });

  it('counts the whole of the last day and trims the text filters', () => {
    const query = auditQuery({ user: ' editor@kelvindex.test ', action: 'release.', from: '2026-11-01', to: '2026-11-30', page: '3' });
    expect(query).toEqual(jasmine.objectContaining({ user: 'editor@kelvindex.test', action: 'release.', page: 3 }));
    expect(query.from).toBe('2026-11-01T00:00:00.000Z');
    expect(query.to).toBe('2026-11-30T23:59:59.999Z');
    expect(auditQuery({ page: 'x' }).page).toBe(1);
  });

  it('shows details on one line and exports entries as CSV', () => {
    expect(detailsText({ from: 'approved', to: 'released', version: 5 })).toBe('from: approved; to: released; version: 5');
    const entry = { id: '1', occurredAt: '2026-11-30T10:00:00Z', actorLabel: 'editor@kelvindex.test', action: 'release.publish', entityType: 'release', entityId: 'r1', details: { label: '2027.1' }, ipAddress: '127.0.0.1' } as unknown as AuditEntry;
    expect(auditCsv([entry])).toBe(
      'occurredAt,actor,action,entityType,entityId,details,ipAddress\r\n2026-11-30T10:00:00Z,editor@kelvindex.test,release.publish,release,r1,"{""label"":""2027.1""}",127.0.0.1\r\n',
    );
  });
});
