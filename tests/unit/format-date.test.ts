import { describe, expect, it } from 'vitest';
import { formatDate, formatDateTime } from '@/lib/format/date';

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
});
