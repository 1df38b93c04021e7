import { describe, expect, it } from 'vitest';
import { BRIEF_SCHEMA } from '../../src/pipeline/vocabulary.js';
import { smallestFrame } from '../../src/pipeline/smallest-frame.js';
import { codes, renderRows } from '../helpers.js';

const size = BRIEF_SCHEMA.properties!.size!.properties!;
const minimum = { width: size.width!.minimum!, height: size.height!.minimum! };
const unit = { fields: { v: { unit: 'units' } } };
const bare: [string, Record<string, unknown>, Record<string, unknown>[]][] = [
  ['bar', { intent: 'compare', keys: 'k', values: 'v' }, ['North', 'South', 'East'].map((k, i) => ({ k, v: 10 + i * 7 }))],
  ['line', { intent: 'trend', keys: 'd', values: 'v' }, [1, 2, 3, 4].map((i) => ({ d: `2024-0${i}-01`, v: i * 3 }))],
  ['scatter', { intent: 'correlation', values: ['x', 'v'], fields: { v: { unit: 'units' }, x: { unit: 'units' } } }, [1, 2, 3, 4].map((i) => ({ x: i, v: i * i }))],
];
const titled = { title: 'Sales by region', source: 'Source: invented' };
const hinted = (hint: string | undefined) => {
  const m = /width: (\d+), height: (\d+)/.exec(hint ?? '');
  return m ? { width: Number(m[1]), height: Number(m[2]) } : undefined;
};

describe('the smallest frame', () => {
  for (const [form, brief, rows] of bare) {
    it(`a bare ${form} chart (no title or source) draws at the schema's minimum frame`, async () => {
      const r = await renderRows({ ...unit, ...brief, size: minimum }, rows);
      expect(codes(r)).toEqual([]);
      expect(r.ok).toBe(true);
    });
  }

  it('a frame below the schema minimum is refused at the brief, with its path', async () => {
    const [, brief, rows] = bare[0]!;
    const r = await renderRows({ ...brief, ...unit, size: { width: minimum.width, height: minimum.height - 1 } }, rows);
    expect(r.diagnostics).toMatchObject([{ code: 'brief.out-of-range', path: '/size/height' }]);
  });

  it('a bar chart with a title and a source in the minimum frame is refused with the least frame that draws it, and that frame draws it', async () => {
    const [, brief, rows] = bare[0]!;
    const r = await renderRows({ ...brief, ...unit, ...titled, size: minimum }, rows);
    expect(r.diagnostics).toMatchObject([{ code: 'layout.frame-too-small', path: '/size' }]);
    const least = hinted(r.diagnostics[0]!.hint)!;
    expect(least.width).toBe(minimum.width);
    expect((await renderRows({ ...brief, ...unit, ...titled, size: least }, rows)).ok).toBe(true);
    // One pixel less high does not draw: the hint is the least, not merely enough.
    expect(codes(await renderRows({ ...brief, ...unit, ...titled, size: { ...least, height: least.height - 1 } }, rows))).toContain('layout.frame-too-small');
  });

  it('the search finds the least frame where the layout is not linear in the size (a note that appears only when cramped)', () => {
    // Renders from 151 px high, or from 400 px high at widths under 200: growing the height alone finds 151.
    const renders = ({ width, height }: { width: number; height: number }) => height >= 151 && (width >= 200 || height >= 400);
    expect(smallestFrame({ width: 250, height: 120 }, renders)).toEqual({ width: 250, height: 151 });
    expect(smallestFrame({ width: 160, height: 120 }, renders)).toEqual({ width: 160, height: 400 });
    // Where only a wider frame renders, the width grows and is cut back to the least.
    expect(smallestFrame({ width: 160, height: 500 }, ({ width }) => width >= 333)).toEqual({ width: 333, height: 500 });
    expect(smallestFrame({ width: 160, height: 160 }, () => false)).toBeUndefined();
  });
});
