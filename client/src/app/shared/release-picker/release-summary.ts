/** A release as `GET /api/v1/releases` lists it. */
export interface ReleaseSummary {
  /** Version label, e.g. `2025.2`; also the value kept in URLs (`?release=2025.2`). */
  readonly label: string;
  /** Only published releases can be read from; one in preparation is still changing. */
  readonly status: 'published' | 'preparing';
  readonly notes?: string | null;
  /** ISO 8601 time of publication; null while preparing. */
  readonly publishedAt: string | null;
  readonly publishedBy?: string | null;
  /** True for the newest published release, the one read when no release is named. */
  readonly latest?: boolean;
}
