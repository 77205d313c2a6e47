/**
 * Every date the client shows goes through here, so one screen never writes a date
 * differently from another. Times come from the server as ISO timestamps (UTC) and are
 * shown in the browser's time zone and locale; calendar days (a due date, a calibration
 * date) come as `YYYY-MM-DD` and are shown as that day wherever the browser is.
 */
const date = new Intl.DateTimeFormat(undefined, { dateStyle: 'medium' });
const dateTime = new Intl.DateTimeFormat(undefined, { dateStyle: 'medium', timeStyle: 'short' });
const time = new Intl.DateTimeFormat(undefined, { timeStyle: 'short' });
const calendarDay = new Intl.DateTimeFormat(undefined, { dateStyle: 'medium', timeZone: 'UTC' });
// The charts' axis labels: short and the same on every machine.
const month = new Intl.DateTimeFormat('en-US', {
  month: 'short',
  year: 'numeric',
  timeZone: 'UTC',
});

type When = string | number | Date;

/** `Mar 5, 2026` */
export const formatDate = (when: When) => date.format(new Date(when));

/** `Mar 5, 2026, 2:07 PM` */
export const formatDateTime = (when: When) => dateTime.format(new Date(when));

/** `2:07 PM` */
export const formatTime = (when: When) => time.format(new Date(when));

/** A calendar day `2026-03-05` → `Mar 5, 2026`, the same day in every time zone. */
export const formatCalendarDate = (day: string) => calendarDay.format(new Date(`${day}T00:00:00Z`));

/** `2026-03` → `Mar 2026` */
export function formatMonth(yearMonth: string): string {
  const [y, m] = yearMonth.split('-').map(Number);
  return month.format(new Date(Date.UTC(y, m - 1, 1)));
}

/** The `YYYY-MM-DD` of a server timestamp (its UTC day), where a screen lists days as the server writes them. */
export const isoDayOf = (timestamp: string) => timestamp.slice(0, 10);

/** Today's calendar date in the user's time zone, `YYYY-MM-DD`. */
export function todayIso(now = new Date()): string {
  const m = String(now.getMonth() + 1).padStart(2, '0');
  const d = String(now.getDate()).padStart(2, '0');
  return `${now.getFullYear()}-${m}-${d}`;
}
