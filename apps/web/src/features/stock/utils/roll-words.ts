/** `Mar 4, 2026` for a calendar date (`2026-03-04`); a day date has no time zone to shift. */
export function formatDay(day: string): string {
  return new Intl.DateTimeFormat('en-US', {
    timeZone: 'UTC',
    year: 'numeric',
    month: 'short',
    day: 'numeric',
  }).format(new Date(`${day}T00:00:00Z`));
}

/** `Roll` or `Remnant`. */
export function kindLabel(roll: { isRemnant: boolean }): string {
  return roll.isRemnant ? 'Remnant' : 'Roll';
}

/** Today as a calendar date in the company's time zone (`2026-03-04`). */
export function todayIn(timeZone: string, now: Date = new Date()): string {
  // en-CA writes dates as YYYY-MM-DD.
  return new Intl.DateTimeFormat('en-CA', {
    timeZone,
    year: 'numeric',
    month: '2-digit',
    day: '2-digit',
  }).format(now);
}
