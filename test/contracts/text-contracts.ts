import { expect } from 'vitest';
import type { DumpText, SceneDump } from '../../src/scene/dump.js';

/** Two text boxes overlap by more than 0.01 px (touching boxes do not). */
function overlap(a: DumpText, b: DumpText): boolean {
  const eps = 0.01;
  return a.x < b.x + b.width - eps && b.x < a.x + a.width - eps && a.y < b.y + b.height - eps && b.y < a.y + a.height - eps;
}

/** No text off the canvas, and no two texts (labels, ticks, titles, legend) overlapping. */
export function checkTexts(dump: SceneDump): void {
  for (const t of dump.texts) {
    expect(t.x).toBeGreaterThanOrEqual(0);
    expect(t.y).toBeGreaterThanOrEqual(0);
    expect(t.x + t.width).toBeLessThanOrEqual(dump.width);
    expect(t.y + t.height).toBeLessThanOrEqual(dump.height);
  }
  for (let i = 0; i < dump.texts.length; i++) {
    for (let j = i + 1; j < dump.texts.length; j++) {
      const [a, b] = [dump.texts[i]!, dump.texts[j]!];
      if (overlap(a, b)) throw new Error(`texts overlap: ${JSON.stringify(a.text)} (${a.role}) and ${JSON.stringify(b.text)} (${b.role})`);
    }
  }
}
