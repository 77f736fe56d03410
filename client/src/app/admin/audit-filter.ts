import { AuditEntry, AuditQuery } from './admin-api';
import { csvText } from '../shared/csv/csv-file';

/** The audit filters as the URL holds them (all text; empty means no filter). */
export interface AuditFilterParams {
  readonly user?: string;
  readonly action?: string;
  readonly entityType?: string;
  readonly entityId?: string;
  readonly from?: string;
  readonly to?: string;
  readonly page?: string;
}

export const AUDIT_PAGE_SIZE = 50;

/**
 * The API query for the filters: a `to` date counts the whole day (up to its last millisecond),
 * a page below 1 or not a number is the first.
 */
export function auditQuery(params: AuditFilterParams): AuditQuery {
  const page = Number(params.page);
  return {
    user: params.user?.trim() || undefined,
    action: params.action?.trim() || undefined,
    entityType: params.entityType?.trim() || undefined,
    entityId: params.entityId?.trim() || undefined,
    from: params.from ? `${params.from}T00:00:00.000Z` : undefined,
    to: params.to ? `${params.to}T23:59:59.999Z` : undefined,
    page: Number.isInteger(page) && page >= 1 ? page : 1,
    pageSize: AUDIT_PAGE_SIZE,
  };
}

/** The details of an entry on one line, for the table (JSON without the braces' noise). */
export function detailsText(details: Readonly<Record<string, unknown>>): string {
  const entries = Object.entries(details ?? {});
  if (entries.length === 0) {
    return '';
  }
  return entries.map(([key, value]) => `${key}: ${typeof value === 'string' ? value : JSON.stringify(value)}`).join('; ');
}

/** The entries as CSV, for a download of what the filters show. */
export function auditCsv(entries: readonly AuditEntry[]): string {
  return csvText(
    ['occurredAt', 'actor', 'action', 'entityType', 'entityId', 'details', 'ipAddress'],
    entries.map((e) => [e.occurredAt, e.actorLabel ?? '', e.action, e.entityType ?? '', e.entityId ?? '', JSON.stringify(e.details ?? {}), e.ipAddress ?? '']),
  );
}
