import { describe, expect, it } from 'vitest';
import { cycleAngles, radialBarRadius } from '../../src/derive/radial.js';

describe('radial bar geometry', () => {
  it('keys sit at equal steps clockwise from 12 o\'clock, so the last is one step from the first', () => {
    expect(cycleAngles(4)).toEqual([0, 90, 180, 270]);
    const twelve = cycleAngles(12);
    expect(twelve[1]! - twelve[0]!).toBe(30);
    expect(360 - twelve[11]! + twelve[0]!).toBe(30);
  });

  it('a bar\'s length from the inner ring is proportional to its value', () => {
    const length = (v: number) => radialBarRadius(v, 800, 50, 250) - 50;
    expect(length(0)).toBe(0);
    expect(length(800)).toBe(200);
    expect(length(200)).toBe(50);
    expect(length(600) / length(300)).toBeCloseTo(2, 12);
  });

  it('with no positive maximum every bar stays at the inner ring', () => {
    expect(radialBarRadius(0, 0, 40, 200)).toBe(40);
  });
});
