import { ageText } from './age';

describe('ageText', () => {
  const now = new Date('2026-11-30T12:00:00Z');

  it('says how long ago in the largest whole unit', () => {
    expect(ageText('2026-11-30T11:59:30Z', now)).toBe('just now');
    expect(ageText('2026-11-30T11:15:00Z', now)).toBe('45 min');
    expect(ageText('2026-11-30T02:00:00Z', now)).toBe('10 h');
    expect(ageText('2026-11-29T11:00:00Z', now)).toBe('1 day');
    expect(ageText('2026-10-31T12:00:00Z', now)).toBe('30 days');
  });

  it('treats a time in the future (clock skew) as just now', () => {
    expect(ageText('2026-11-30T12:05:00Z', now)).toBe('just now');
  });
});
