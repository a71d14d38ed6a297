import { describe, expect, it } from 'vitest';
import { documentLocale, formatDate, formatDateTime } from '@/lib/format/date';
import { formatDay, formatWhen } from '@/components/scenes/format';
import { when, day } from '@/components/plan-pdf/format';

describe('the one date format (Intl.DateTimeFormat, the reader’s locale)', () => {
  it('writes a calendar day the way the locale does', () => {
    expect(formatDate('2026-11-02', 'en-GB')).toBe('2 Nov 2026');
    expect(formatDate('2026-11-02', 'en-US')).toBe('Nov 2, 2026');
  });

  it('keeps a bare calendar day on its own day whatever the reader’s time zone', () => {
    // UTC midnight read in a zone west of Greenwich would otherwise fall on 1 November.
    expect(formatDate('2026-11-02', 'en-GB')).not.toContain('1 Nov');
  });

  it('writes a moment with its time', () => {
    expect(formatDateTime(new Date(Date.UTC(2026, 11, 2, 15, 4)), 'en-GB')).toMatch(/^2 Dec 2026(,| at)? \d{2}:\d{2}$/);
  });

  it('writes a moment in a stated zone, as the plan document does', () => {
    expect(formatDateTime('2026-12-02T14:05:00Z', 'en-US', 'UTC')).toMatch(/^Dec 2, 2026, 2:05\sPM$/);
    expect(formatDateTime('2026-12-02T14:05:00Z', 'en-GB', 'UTC')).toBe('2 Dec 2026, 14:05');
    expect(when('2026-12-02T14:05:00Z', 'metric')).toBe('2 Dec 2026, 14:05 UTC');
    expect(when('2026-12-02T14:05:00Z', 'imperial')).toMatch(/^Dec 2, 2026, 2:05\sPM UTC$/);
    expect(day('2026-11-02', 'imperial')).toBe('Nov 2, 2026');
    expect(documentLocale('metric')).toBe('en-GB');
  });

  it('is the one format behind the screens’ helpers too: no ISO date or slashed date comes out', () => {
    expect(formatDay('2026-11-02')).toBe(formatDate('2026-11-02'));
    expect(formatWhen('2026-12-02T14:05:00Z')).toBe(formatDateTime('2026-12-02T14:05:00Z'));
    for (const out of [formatDay('2026-11-02'), formatWhen('2026-12-02T14:05:00Z'), when('2026-12-02T14:05:00Z', 'imperial'), day('2026-11-02', 'metric')]) {
      expect(out).not.toMatch(/\d{4}-\d{2}-\d{2}|\d{1,2}\/\d{1,2}\/\d{2,4}/);
    }
  });

  it('gives back what it cannot read, rather than "Invalid Date"', () => {
    expect(formatDate('not a date')).toBe('not a date');
    expect(formatDateTime('not a date')).toBe('not a date');
  });
});
