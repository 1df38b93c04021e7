import { expect } from 'vitest';
import type { DumpMark, SceneDump } from '../../src/scene/dump.js';
import { checkTexts } from './text-contracts.js';

export { checkTexts };

/** A linear axis as a function from value to px. */
export function axisPx(dump: SceneDump, orient: 'left' | 'bottom'): (v: number) => number {
  const axis = dump.axes.find((a) => a.orient === orient)!;
  const [d0, d1] = axis.domain as number[];
  const [r0, r1] = axis.range;
  return (v) => r0 + ((v - d0!) * (r1 - r0)) / (d1! - d0!);
}

export const points = (dump: SceneDump): DumpMark[] => dump.marks.filter((m) => m.role === 'point');

/**
 * The contracts of a scatter of points: every point at its x and y on the axes' scales (within
 * 0.5 px) and inside the plot; where area is coded, r² ∝ the area value (within 1 %); every
 * axis titled; texts on the canvas and apart.
 */
export function checkScatterContracts(dump: SceneDump, x: string, y: string, area?: string): void {
  const [px, py] = [axisPx(dump, 'bottom'), axisPx(dump, 'left')];
  const marks = points(dump);
  for (const m of marks) {
    expect(Math.abs(m.cx! - px(m.datum![x] as number))).toBeLessThanOrEqual(0.5);
    expect(Math.abs(m.cy! - py(m.datum![y] as number))).toBeLessThanOrEqual(0.5);
    expect(m.cx!).toBeGreaterThanOrEqual(dump.plot.x - 0.5);
    expect(m.cx!).toBeLessThanOrEqual(dump.plot.x + dump.plot.width + 0.5);
    expect(m.cy!).toBeGreaterThanOrEqual(dump.plot.y - 0.5);
    expect(m.cy!).toBeLessThanOrEqual(dump.plot.y + dump.plot.height + 0.5);
    expect(typeof m.shape).toBe('string');
  }
  if (area) {
    // Area-true: each circle's r² relative to the largest's equals its value relative to the
    // largest value, within 1 % (radii under 0.5 px within the dump's 0.001 px rounding instead).
    const sized = marks.filter((m) => (m.datum![area] as number) > 0);
    for (const m of marks) if (m.datum![area] === 0) expect(m.r).toBe(0);
    const top = sized.reduce<DumpMark | undefined>((a, m) => (!a || (m.datum![area] as number) > (a.datum![area] as number) ? m : a), undefined);
    for (const m of sized) {
      const share = (m.datum![area] as number) / (top!.datum![area] as number);
      if (m.r! >= 0.5) expect(Math.abs((m.r! / top!.r!) ** 2 / share - 1)).toBeLessThanOrEqual(0.01);
      else expect(Math.abs(m.r! - top!.r! * Math.sqrt(share))).toBeLessThanOrEqual(0.002);
    }
  }
  for (const a of dump.axes) expect(a.title.trim()).not.toBe('');
  checkTexts(dump);
}
