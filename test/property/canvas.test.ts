import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { CATALOGUE } from '../../src/diagnostics/catalogue.js';
import type { Scene, TextNode } from '../../src/scene/types.js';
import { nodesOf } from '../../src/scene/walk.js';
import { renderRows, runs } from '../helpers.js';

// Letters of several widths (W is wide, i narrow), an accented one, digits and spaces, so
// labels range from many short words to one long word with no space to break at.
const unit = fc.constantFrom('a', 'e', 'i', 'W', 'M', 'x', 'é', '7', ' ', ' ', '-', '(');
/** A text of 1–120 code points that is not blank (a blank key is a missing key). */
const text = fc.string({ unit, minLength: 1, maxLength: 120 }).map((s) => (s.trim() ? s : `${s}x`));
const longWord = fc.integer({ min: 1, max: 120 }).map((n) => 'W'.repeat(n));
const label = fc.oneof({ weight: 3, arbitrary: text }, { weight: 1, arbitrary: longWord });

/** The forms under test and how to build a brief and rows for each from the same random labels. */
const FORMS: Record<string, (labels: string[], values: number[]) => { brief: Record<string, unknown>; rows: Record<string, unknown>[] }> = {
  bar: (labels, v) => ({ brief: { intent: 'compare', keys: 'k', values: 'v' }, rows: labels.map((k, i) => ({ k, v: v[i % v.length] })) }),
  line: (labels, v) => ({
    brief: { intent: 'trend', keys: ['d', 's'], values: 'v' },
    rows: labels.slice(0, 4).flatMap((s, j) => Array.from({ length: 8 }, (_, i) => ({ d: `2024-${String(i + 1).padStart(2, '0')}-01`, s, v: v[(i + j * 8) % v.length] }))),
  }),
  scatter: (labels, v) => ({
    brief: { intent: 'correlation', values: ['x', 'y'], color: 'c' },
    rows: labels.slice(0, 5).flatMap((c, j) => [0, 1, 2].map((i) => ({ x: v[(j * 3 + i) % v.length], y: v[(j * 3 + i + 1) % v.length]! * 2, c }))).slice(0, 60),
  }),
  'stacked-bar': (labels, v) => ({
    brief: { intent: 'composition', keys: ['g', 'p'], values: 'v' },
    rows: labels.slice(0, 5).flatMap((g, j) => labels.slice(0, 3).map((p, i) => ({ g, p: `${p}${i}`, v: Math.abs(v[(j * 3 + i) % v.length]!) + 1 }))),
  }),
  'faceted bar': (labels, v) => ({
    brief: { intent: 'compare', keys: 'k', values: 'v', facet: { by: 's' } },
    rows: labels.slice(0, 3).flatMap((s, j) => labels.slice(0, 5).map((k, i) => ({ s: `${s}${j}`, k: `${k}${i}`, v: Math.abs(v[(j * 5 + i) % v.length]!) }))),
  }),
  donut: (labels, v) => ({
    brief: { intent: 'part-to-whole', keys: 'k', values: 'v', form: 'donut' },
    rows: labels.slice(0, 3).map((k, i) => ({ k: `${k}${i}`, v: Math.abs(v[i % v.length]!) + 1 })),
  }),
  heatmap: (labels, v) => ({
    brief: { intent: 'matrix', keys: ['r', 'c'], values: 'v' },
    rows: labels.slice(0, 6).flatMap((r, j) => labels.slice(0, 5).map((c, i) => ({ r, c: `${c}${i}`, v: v[(j * 5 + i) % v.length] }))),
  }),
};

/** Pairs of text boxes that overlap by more than float noise: counted here, not by the checks under test. */
function overlaps(texts: TextNode[]): [TextNode, TextNode][] {
  const out: [TextNode, TextNode][] = [];
  for (let i = 0; i < texts.length; i++) {
    for (let j = i + 1; j < texts.length; j++) {
      const [a, b] = [texts[i]!.box, texts[j]!.box];
      if (a.x < b.x + b.width - 0.01 && b.x < a.x + a.width - 0.01 && a.y < b.y + b.height - 0.01 && b.y < a.y + a.height - 0.01) out.push([texts[i]!, texts[j]!]);
    }
  }
  return out;
}

function expectTextsOnCanvas(scene: Scene): void {
  const texts = nodesOf(scene.root).filter((n): n is TextNode => n.kind === 'text');
  for (const t of texts) {
    const where = `${t.role} ${JSON.stringify(t.text)} at ${JSON.stringify(t.box)} in ${scene.width} × ${scene.height}`;
    expect(t.box.x, where).toBeGreaterThanOrEqual(-0.01);
    expect(t.box.y, where).toBeGreaterThanOrEqual(-0.01);
    expect(t.box.x + t.box.width, where).toBeLessThanOrEqual(scene.width + 0.01);
    expect(t.box.y + t.box.height, where).toBeLessThanOrEqual(scene.height + 0.01);
  }
  const pairs = overlaps(texts).map(([a, b]) => `${a.role} ${JSON.stringify(a.text)} / ${b.role} ${JSON.stringify(b.text)}`);
  expect(pairs).toEqual([]);
}

describe('property: no text ever leaves the canvas', () => {
  for (const [form, build] of Object.entries(FORMS)) {
    it(`${form}: any frame from the schema minimum, labels of 1–120 characters and any title, subtitle and source render inside the canvas, or fail as frame-too-small`, async () => {
      const input = fc.record({
        width: fc.integer({ min: 160, max: 1400 }), height: fc.integer({ min: 160, max: 1000 }),
        labels: fc.array(label, { minLength: 6, maxLength: 24 }),
        values: fc.array(fc.integer({ min: -500, max: 5000 }), { minLength: 6, maxLength: 24 }),
        title: fc.option(text, { nil: undefined }), subtitle: fc.option(text, { nil: undefined }), source: fc.option(text, { nil: undefined }),
        axis: fc.option(text, { nil: undefined }),
      });
      let drawn = 0;
      await fc.assert(fc.asyncProperty(input, async (d) => {
        const { brief, rows } = build(d.labels, d.values);
        const words = { ...(d.title ? { title: d.title } : {}), ...(d.subtitle ? { subtitle: d.subtitle } : {}), ...(d.source ? { source: d.source } : {}) };
        const fields = d.axis ? { [form === 'scatter' ? 'y' : 'v']: { label: d.axis } } : {};
        const r = await renderRows({ ...brief, ...words, fields, size: { width: d.width, height: d.height } }, rows);
        for (const x of r.diagnostics) expect(Object.keys(CATALOGUE)).toContain(x.code);
        const found = r.diagnostics.map((x) => x.code);
        expect(found).not.toContain('render.internal');
        expect(found).not.toContain('layout.text-off-canvas');
        if (!r.ok) {
          expect(r.diagnostics.filter((x) => x.severity === 'error').map((x) => x.code)).toEqual(['layout.frame-too-small']);
          return;
        }
        expect(found).not.toContain('layout.text-overlap');
        expectTextsOnCanvas(r.scene!);
        drawn++;
      }), { numRuns: runs(40) });
      // Most frames are large enough: the property is about drawn charts, not refusals.
      expect(drawn).toBeGreaterThan(runs(40) / 2);
    });
  }
});
