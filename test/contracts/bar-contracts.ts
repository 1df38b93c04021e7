import { expect } from 'vitest';
import type { SceneDump } from '../../src/scene/dump.js';
import { checkTexts } from './text-contracts.js';

/** The value axis of a bar chart and a function from value to px along it. */
function valueAxis(dump: SceneDump) {
  const axis = dump.axes[0]!;
  const [d0, d1] = axis.domain as number[];
  const [r0, r1] = axis.range;
  return { axis, px: (v: number) => r0! + ((v - d0!) * (r1! - r0!)) / (d1! - d0!), perUnit: Math.abs(r1! - r0!) / (d1! - d0!) };
}

export function bars(dump: SceneDump) {
  return dump.marks.filter((m) => m.role === 'bar');
}

export { checkTexts };

/** Perceptual contracts every bar chart must keep, asserted on its scene. */
export function checkBarContracts(dump: SceneDump, valueName: string, keyName: string) {
  const vertical = dump.axes[0]!.orient === 'left';
  const { px, perUnit } = valueAxis(dump);
  const zero = px(0);
  for (const bar of bars(dump)) {
    const value = bar.datum![valueName] as number;
    const length = vertical ? bar.height! : bar.width!;
    // Bar length ∝ value: the same px per unit for every bar, within 0.5 px.
    expect(Math.abs(length - Math.abs(value) * perUnit)).toBeLessThanOrEqual(0.5);
    // One baseline: every bar starts at the zero of the shared scale.
    const start = vertical ? (value >= 0 ? bar.y! + bar.height! : bar.y!) : (value >= 0 ? bar.x! : bar.x! + bar.width!);
    expect(Math.abs(start - zero)).toBeLessThanOrEqual(0.5);
  }
  // The value axis includes zero.
  const [d0, d1] = dump.axes[0]!.domain as number[];
  expect(d0).toBeLessThanOrEqual(0);
  expect(d1).toBeGreaterThanOrEqual(0);
  // A zero line is drawn where the bars start.
  expect(dump.marks.filter((m) => m.role === 'zero-line')).toHaveLength(1);
  // Every axis has a non-empty title, and names its field.
  for (const a of dump.axes) expect(a.title.trim()).not.toBe('');
  expect(dump.axes.map((a) => a.field)).toEqual([valueName, keyName]);
  // No text outside the canvas, and no two texts overlap.
  checkTexts(dump);
  // Every mark lies inside the canvas.
  for (const m of dump.marks.filter((x) => x.kind === 'rect')) {
    expect(m.x!).toBeGreaterThanOrEqual(0);
    expect(m.x! + m.width!).toBeLessThanOrEqual(dump.width + 1e-6);
    expect(m.y! + m.height!).toBeLessThanOrEqual(dump.height + 1e-6);
  }
}


