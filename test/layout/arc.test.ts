import { describe, expect, it } from 'vitest';
import { polar, shareAngles, wedgePath } from '../../src/layout/arc.js';
import { pathData } from '../../src/svg/path.js';

describe('ring wedges', () => {
  it('measures angles clockwise from 12 o\'clock', () => {
    const top = polar(100, 100, 10, 0);
    const right = polar(100, 100, 10, Math.PI / 2);
    expect([top.x, top.y]).toEqual([100, 90]);
    expect(right.x).toBeCloseTo(110, 12);
    expect(right.y).toBeCloseTo(100, 12);
  });

  it('gives each share its angle, end to end, the last ending at exactly a full turn', () => {
    const angles = shareAngles([0.5, 0.3, 0.2]);
    expect(angles[0]).toEqual({ start: 0, end: Math.PI });
    expect(angles[1]!.start).toBe(angles[0]!.end);
    expect(angles[2]!.start).toBe(angles[1]!.end);
    expect(angles[2]!.end).toBe(2 * Math.PI);
    // Sweep ∝ share: 0.3 of a turn.
    expect(angles[1]!.end - angles[1]!.start).toBeCloseTo(0.3 * 2 * Math.PI, 12);
  });

  it('draws the outer arc clockwise and the inner one back, the large-arc flag set past half a turn', () => {
    const small = wedgePath({ cx: 0, cy: 0, inner: 5, outer: 10, start: 0, end: Math.PI / 2 });
    expect(pathData(small)).toBe('M0 -10A10 10 0 0 1 10 0L5 0A5 5 0 0 0 0 -5Z');
    const large = wedgePath({ cx: 0, cy: 0, inner: 5, outer: 10, start: 0, end: 1.5 * Math.PI });
    expect(large.filter((c) => c.op === 'A').every((c) => c.op === 'A' && c.large)).toBe(true);
  });

  it('draws a full turn as two halves (an SVG arc whose ends meet draws nothing)', () => {
    const full = wedgePath({ cx: 0, cy: 0, inner: 5, outer: 10, start: 0, end: 2 * Math.PI });
    expect(full.filter((c) => c.op === 'M')).toHaveLength(2);
  });
});
