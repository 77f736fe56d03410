const MINUTE = 60_000;
const HOUR = 60 * MINUTE;
const DAY = 24 * HOUR;

/** How long ago `since` was, in the largest whole unit: "just now", "5 min", "3 h", "12 days". */
export function ageText(since: string | Date, now: Date = new Date()): string {
  const elapsed = now.getTime() - new Date(since).getTime();
  if (!(elapsed >= MINUTE)) {
    return 'just now';
  }
  if (elapsed < HOUR) {
    return `${Math.floor(elapsed / MINUTE)} min`;
  }
  if (elapsed < DAY) {
    return `${Math.floor(elapsed / HOUR)} h`;
  }
  const days = Math.floor(elapsed / DAY);
  return `${days} day${days === 1 ? '' : 's'}`;
}
