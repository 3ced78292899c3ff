/** Dates and numbers as people read them; dates always in the company's time zone. */

const dateFormats = new Map<string, Intl.DateTimeFormat>();

function dateFormat(timeZone: string, withTime: boolean): Intl.DateTimeFormat {
  const key = `${timeZone}|${withTime}`;
  let format = dateFormats.get(key);
  if (!format) {
    format = new Intl.DateTimeFormat('en-US', {
      timeZone,
      year: 'numeric',
      month: 'short',
      day: 'numeric',
      ...(withTime ? { hour: 'numeric', minute: '2-digit' } : {}),
    });
    dateFormats.set(key, format);
  }
  return format;
}

/** `Mar 4, 2026` in the given IANA time zone. */
export function formatDate(iso: string, timeZone: string): string {
  return dateFormat(timeZone, false).format(new Date(iso));
}

/** `Mar 4, 2026, 3:05 PM` in the given IANA time zone. */
export function formatDateTime(iso: string, timeZone: string): string {
  return dateFormat(timeZone, true).format(new Date(iso));
}

/** The hour of day in the time zone, for a greeting. */
export function hourIn(timeZone: string, now: Date = new Date()): number {
  const hour = new Intl.DateTimeFormat('en-US', {
    timeZone,
    hour: 'numeric',
    hourCycle: 'h23',
  }).format(now);
  return Number(hour);
}

/** `3 sites`, `1 site`. */
export function countOf(count: number, singular: string, plural = `${singular}s`): string {
  return `${count.toLocaleString('en-US')} ${count === 1 ? singular : plural}`;
}
