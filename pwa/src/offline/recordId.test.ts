import { validate, version } from 'uuid';
import { describe, expect, it } from 'vitest';
import { recordId } from './recordId';

describe('record ids', () => {
  it('are version 7 UUIDs (RFC 9562 §5.7) whose leading 48 bits are the time in ms', () => {
    const before = Date.now();
    const id = recordId();
    expect(validate(id)).toBe(true);
    expect(version(id)).toBe(7);
    const ms = parseInt(id.replace(/-/g, '').slice(0, 12), 16);
    expect(ms).toBeGreaterThanOrEqual(before);
    expect(ms).toBeLessThanOrEqual(Date.now());
  });

  it('made one after another sort in the order they were made', () => {
    const ids = Array.from({ length: 1000 }, recordId);
    expect([...ids].sort()).toEqual(ids);
    expect(new Set(ids).size).toBe(ids.length);
  });
});
