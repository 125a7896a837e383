import { describe, expect, it } from 'vitest';
import { formatDateTime, formatRange, pageCount } from './format';

describe('formatDateTime', () => {
  it('writes year-month-day hour:minute in the zone given', () => {
    expect(formatDateTime('2025-03-14T09:05:59Z', 'UTC')).toBe('2025-03-14 09:05');
    // Central European Summer Time is UTC+2 in July (EU Directive 2000/84/EC summer time).
    expect(formatDateTime('2025-07-01T23:30:00Z', 'Europe/Berlin')).toBe('2025-07-02 01:30');
  });

  it('shows a dash for missing or unreadable times', () => {
    expect(formatDateTime(null)).toBe('—');
    expect(formatDateTime('not a date')).toBe('—');
  });
});

describe('formatRange and pageCount', () => {
  it('describes the rows on a page', () => {
    expect(formatRange(2, 25, 60)).toBe('26–50 of 60');
    expect(formatRange(3, 25, 60)).toBe('51–60 of 60');
    expect(formatRange(1, 25, 0)).toBe('None');
  });

  it('counts at least one page', () => {
    expect(pageCount(25, 0)).toBe(1);
    expect(pageCount(25, 25)).toBe(1);
    expect(pageCount(25, 26)).toBe(2);
  });
});
