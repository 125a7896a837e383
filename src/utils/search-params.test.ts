/** Page and filters live in the URL so a filtered list can be bookmarked and shared. */
import { describe, expect, it } from 'vitest';
import { readPage, readText, withParams } from './search-params';

describe('readPage', () => {
  it.each([
    ['page=3', 3],
    ['', 1],
    ['page=0', 1],
    ['page=-2', 1],
    ['page=2.5', 1],
    ['page=abc', 1],
    ['page=100001', 1],
  ])('reads "%s" as page %i', (query, page) => {
    expect(readPage(new URLSearchParams(query))).toBe(page);
  });
});

describe('readText', () => {
  it('trims and drops blanks', () => {
    expect(readText(new URLSearchParams('q=%20ann%20'), 'q')).toBe('ann');
    expect(readText(new URLSearchParams('q=%20%20'), 'q')).toBeUndefined();
  });
});

describe('withParams', () => {
  it('returns to page 1 when a filter changes', () => {
    expect(withParams(new URLSearchParams('page=4&q=a'), { q: 'b' }).toString()).toBe('q=b');
  });

  it('keeps filters when the page changes', () => {
    expect(withParams(new URLSearchParams('q=a'), { page: 2 }).toString()).toBe('q=a&page=2');
  });

  it('removes blank filters', () => {
    expect(withParams(new URLSearchParams('q=a&actor=x'), { q: '', actor: undefined }).toString()).toBe('');
  });
});
