import { MAX_RANGE_MONTHS } from '@gaugeproof/api-types';
import { DomainError, type FieldError } from '../common/domain-error';
import { addDays, isCalendarDate, isoDate } from '../common/calendar';
import { clock } from '../common/clock';

/** Longest range a scorecard answers: the contract's limit (libs/api-types). */
export { MAX_RANGE_MONTHS };

export interface MonthBucket {
  /** `YYYY-MM` */
  month: string;
  /** First instant of the bucket (the range start for the first month). */
  start: Date;
  /** First instant after the bucket (the day after `to` for the last month). */
  end: Date;
}

/**
 * A received-date range of calendar days, both ends inclusive, read in UTC like every
 * calendar date of the server (common/calendar.ts): a lot counts when
 * `from 00:00Z <= receivedAt < (to + 1 day) 00:00Z`.
 */
export interface ScorecardRange {
  from: string;
  to: string;
  start: Date;
  /** Exclusive end: midnight UTC after `to`. */
  end: Date;
  months: MonthBucket[];
}

function utcMidnight(date: string): Date {
  return new Date(`${date}T00:00:00.000Z`);
}

function firstOfMonth(year: number, monthIndex: number): Date {
  return new Date(Date.UTC(year, monthIndex, 1));
}

/** The first day of the 12th calendar month back from `date`'s, its own month the 12th. */
function twelveMonthsBefore(date: Date): string {
  return isoDate(firstOfMonth(date.getUTCFullYear(), date.getUTCMonth() - 11));
}

/** Default range: the last 12 calendar months, this month included, up to today. */
export function defaultRange(today: Date): { from: string; to: string } {
  return { from: twelveMonthsBefore(today), to: isoDate(today) };
}

/** Month buckets covering [start, end), each clipped to the range. */
export function monthBuckets(start: Date, end: Date): MonthBucket[] {
  const months: MonthBucket[] = [];
  let cursor = firstOfMonth(start.getUTCFullYear(), start.getUTCMonth());
  while (cursor < end) {
    const next = firstOfMonth(cursor.getUTCFullYear(), cursor.getUTCMonth() + 1);
    months.push({
      month: isoDate(cursor).slice(0, 7),
      start: cursor < start ? start : cursor,
      end: next > end ? end : next,
    });
    cursor = next;
  }
  return months;
}

/** Checks `from`/`to` (either may be missing) and builds the range; 400 with field messages. */
export function resolveRange(
  from: string | undefined,
  to: string | undefined,
  today: Date = clock.now(),
): ScorecardRange {
  const fallback = defaultRange(today);
  const toDate = to ?? fallback.to;
  const errors: FieldError[] = [];
  if (from !== undefined && !isCalendarDate(from)) {
    errors.push({ field: 'from', message: 'from must be a real calendar date (YYYY-MM-DD)' });
  }
  if (!isCalendarDate(toDate)) {
    errors.push({ field: 'to', message: 'to must be a real calendar date (YYYY-MM-DD)' });
  }
  if (errors.length) throw DomainError.invalid(errors);
  // Only now: counting back from a `to` like 0000-00-00 threw a RangeError (a 500).
  // `to` alone: the twelve calendar months ending with its month, as without it (365 days
  // back from a mid-month `to` spanned thirteen months).
  const fromDate = from ?? (to ? twelveMonthsBefore(utcMidnight(toDate)) : fallback.from);
  if (fromDate > toDate)
    throw DomainError.invalid([{ field: 'from', message: 'from must be on or before to' }]);
  const start = utcMidnight(fromDate);
  const end = utcMidnight(addDays(toDate, 1));
  const months = monthBuckets(start, end);
  if (months.length > MAX_RANGE_MONTHS) {
    throw DomainError.invalid([
      {
        field: 'from',
        message: `the range may span at most ${MAX_RANGE_MONTHS} calendar months (got ${months.length})`,
      },
    ]);
  }
  return { from: fromDate, to: toDate, start, end, months };
}
