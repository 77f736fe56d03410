import { defaultDiffPair, nextReleaseLabel } from './releases-page';
import { ReleaseSummary } from './releases-api';

describe('releases page rules', () => {
  const release = (label: string, status: 'published' | 'preparing' = 'published'): ReleaseSummary => ({
    label,
    status,
    notes: '',
    publishedAt: null,
    publishedBy: null,
    latest: false,
  });

  it('compares the latest published release with the one before it by default', () => {
    expect(defaultDiffPair([release('2027.1', 'preparing'), release('2026.2'), release('2026.1')])).toEqual({ from: '2026.1', to: '2026.2' });
    expect(defaultDiffPair([release('2026.1')])).toBeNull();
  });

  it('suggests the next label in the year of the latest release', () => {
    expect(nextReleaseLabel(['2026.1', '2026.2', '2027.1'], new Date('2026-12-01'))).toBe('2027.2');
    expect(nextReleaseLabel(['2026.1', '2026.9'], new Date('2026-12-01'))).toBe('2026.10');
    expect(nextReleaseLabel(['2025.3'], new Date('2026-03-01'))).toBe('2026.1');
  });
});
