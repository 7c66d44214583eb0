/** "Tue 14:05" now in a time zone (or '—' for a zone the browser does not know). */
export function localTime(timeZone: string, now = new Date()): string {
  try {
    return new Intl.DateTimeFormat('en-GB', { timeZone, weekday: 'short', hour: '2-digit', minute: '2-digit', hour12: false }).format(now);
  } catch {
    return '—';
  }
}

/** The zone's offset from UTC now, e.g. "UTC−05:00". */
export function utcOffset(timeZone: string, now = new Date()): string {
  try {
    const part = new Intl.DateTimeFormat('en-US', { timeZone, timeZoneName: 'longOffset' })
      .formatToParts(now)
      .find((p) => p.type === 'timeZoneName')?.value;
    return part === 'GMT' ? 'UTC±00:00' : (part ?? '').replace('GMT', 'UTC').replace('-', '−');
  } catch {
    return '';
  }
}
