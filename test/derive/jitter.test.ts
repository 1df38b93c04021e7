import { describe, expect, it } from 'vitest';
import { jitterOffsets, seedOf } from '../../src/derive/jitter.js';

describe('seeded jitter', () => {
  it('is deterministic: the same label and count give the same offsets', () => {
    expect(jitterOffsets(50, 'North pier')).toEqual(jitterOffsets(50, 'North pier'));
  });

  it('offset i does not depend on the count, so adding a point moves no other', () => {
    expect(jitterOffsets(80, 'A').slice(0, 40)).toEqual(jitterOffsets(40, 'A'));
  });

  it('different labels give different offsets (strips do not repeat one pattern)', () => {
    expect(jitterOffsets(20, 'A')).not.toEqual(jitterOffsets(20, 'B'));
  });

  it('stays in [−1, 1) and spreads across it: every tenth of the interval is hit in 1,000 draws', () => {
    const offsets = jitterOffsets(1000, 'spread');
    for (const o of offsets) {
      expect(o).toBeGreaterThanOrEqual(-1);
      expect(o).toBeLessThan(1);
    }
    const deciles = new Set(offsets.map((o) => Math.floor((o + 1) * 5)));
    expect(deciles.size).toBe(10);
    const mean = offsets.reduce((a, b) => a + b, 0) / offsets.length;
    expect(Math.abs(mean)).toBeLessThan(0.1);
  });

  it('the seed is FNV-1a of the label: the published 32-bit test vector for "a" is 0xe40c292c', () => {
    // FNV-1a 32-bit test vectors (Fowler, Noll & Vo; draft-eastlake-fnv): "" → 0x811c9dc5, "a" → 0xe40c292c.
    expect(seedOf('')).toBe(0x811c9dc5);
    expect(seedOf('a')).toBe(0xe40c292c);
  });
});
