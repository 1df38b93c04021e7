import { expect } from 'vitest';
import type { DumpMark, SceneDump } from '../../src/scene/dump.js';
import type { AxisInfo } from '../../src/scene/types.js';
import { checkTexts } from './text-contracts.js';

/** A continuous axis as a function from value (or epoch ms) to px, read from the dump alone. */
export function axisPx(axis: AxisInfo): (v: number) => number {
  const [d0, d1] = axis.domain as number[];
  const [r0, r1] = axis.range;
  return (v) => r0 + ((v - d0!) * (r1 - r0)) / (d1! - d0!);
}

const marks = (dump: SceneDump, role: string): DumpMark[] => dump.marks.filter((m) => m.role === role);

/**
 * Perceptual contracts of a slope chart: every line has two points, on the two vertical axes (the
 * bottom axis's two band centres), each at the height of its value on the one shared left scale
 * (within 0.5 px; `value` names the column of both ends, or of each); up and down lines have different colours; no two texts overlap.
 */
export function checkSlopeContracts(dump: SceneDump, value: string | [string, string]) {
  const columns = typeof value === 'string' ? [value, value] : value;
  const [left, bottom] = dump.axes as [AxisInfo, AxisInfo];
  expect(left.orient).toBe('left');
  expect(bottom.tickPositions).toHaveLength(2);
  const y = axisPx(left);
  // The two vertical axes stand at the band centres and span the plot's height.
  const axisLines = marks(dump, 'axis-line').map((m) => m.d!.match(/-?[\d.]+/g)!.map(Number));
  expect(axisLines).toHaveLength(2);
  axisLines.forEach(([x1, y1, x2, y2], i) => {
    expect([x1, x2].map((v) => Math.abs(v! - bottom.tickPositions[i]!) <= 0.01)).toEqual([true, true]);
    expect([Math.min(y1!, y2!), Math.max(y1!, y2!)]).toEqual([dump.plot.y, dump.plot.y + dump.plot.height].map((v) => expect.closeTo(v, 1)));
  });
  for (const line of marks(dump, 'line')) {
    expect(line.points).toHaveLength(2);
    line.points!.forEach((p, i) => {
      expect(Math.abs(p.x - bottom.tickPositions[i]!)).toBeLessThanOrEqual(0.5);
      expect(Math.abs(p.y - y(p.datum![columns[i]!] as number))).toBeLessThanOrEqual(0.5);
    });
  }
  const stroke = (dir: string) => new Set(marks(dump, 'line').filter((l) => l.datum!.direction === dir).map((l) => l.stroke));
  for (const dir of ['up', 'down', 'unchanged']) expect(stroke(dir).size).toBeLessThanOrEqual(1);
  const [up, down] = [[...stroke('up')][0], [...stroke('down')][0]];
  if (up && down) expect(up).not.toBe(down);
  checkTexts(dump);
}

const time = (v: unknown) => (typeof v === 'number' ? v : Date.parse(String(v)));

/**
 * Perceptual contracts of a Gantt chart: each task's bar starts and ends at its start and end on
 * the bottom time scale (within 0.5 px), tasks run top to bottom by start, each connector joins
 * its predecessor's end to its successor's start, and no two texts overlap.
 */
export function checkGanttContracts(dump: SceneDump, names: { task: string; start: string; end: string }, sortedByStart = true) {
  const bottom = dump.axes.find((a) => a.orient === 'bottom')!;
  const x = axisPx(bottom);
  const tasks = marks(dump, 'task');
  const byName = new Map(tasks.map((t) => [t.datum![names.task] as string, t]));
  for (const t of tasks) {
    expect(Math.abs(t.x! - x(time(t.datum![names.start])))).toBeLessThanOrEqual(0.5);
    expect(Math.abs(t.x! + t.width! - x(time(t.datum![names.end])))).toBeLessThanOrEqual(0.5);
  }
  const down = [...tasks].sort((a, b) => a.y! - b.y!);
  if (sortedByStart) for (let i = 1; i < down.length; i++) expect(time(down[i]!.datum![names.start])).toBeGreaterThanOrEqual(time(down[i - 1]!.datum![names.start]));
  for (const dep of marks(dump, 'dependency')) {
    const [from, to] = [byName.get(dep.datum!.from as string)!, byName.get(dep.datum!.to as string)!];
    const [p, s] = [dep.points![0]!, dep.points!.at(-1)!];
    expect(Math.abs(p.x - (from.x! + from.width!))).toBeLessThanOrEqual(0.5);
    expect(Math.abs(p.y - (from.y! + from.height! / 2))).toBeLessThanOrEqual(0.5);
    expect(Math.abs(s.x - to.x!)).toBeLessThanOrEqual(0.5);
    expect(Math.abs(s.y - (to.y! + to.height! / 2))).toBeLessThanOrEqual(0.5);
  }
  checkTexts(dump);
}
