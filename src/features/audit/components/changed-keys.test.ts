import { describe, expect, it } from 'vitest';
import { changedKeys } from './changed-keys';

describe('changedKeys', () => {
  it('names keys that changed, appeared or disappeared, in order', () => {
    expect(changedKeys({ role: 'engineer', active: true, a: 1 }, { role: 'reviewer', active: true, b: 2 })).toEqual(['a', 'b', 'role']);
  });

  it('compares nested values by content', () => {
    expect(changedKeys({ zones: [1, 2] }, { zones: [1, 2] })).toEqual([]);
    expect(changedKeys({ zones: [1, 2] }, { zones: [1, 3] })).toEqual(['zones']);
  });

  it('lists every key of a record that was created (no before)', () => {
    expect(changedKeys(null, { email: 'x', role: 'engineer' })).toEqual(['email', 'role']);
  });

  it('gives nothing when neither snapshot is an object', () => {
    expect(changedKeys(null, null)).toEqual([]);
    expect(changedKeys('a', 'b')).toEqual([]);
  });
});
