import { describe, expect, it } from 'vitest';
import type { StreamPlan } from '../../src/forms/stream-plan.js';
import { dumpScene } from '../../src/scene/dump.js';
import { codes, renderRows } from '../helpers.js';

const unit = { v: { unit: 'boats' } };
const rows = (series: number, keys = 6) => Array.from({ length: keys }, (_, k) => Array.from({ length: series }, (_, i) => ({ t: `2026-0${k + 1}-01`, s: `Series ${i}`, v: ((k + i) % 4) + 1 }))).flat();

describe('rules for the flow intent', () => {
  it('an ordered key, a series key and a value get a streamgraph, with wiggle, inside-out order and smoothing stated', async () => {
    const r = await renderRows({ intent: 'flow', keys: ['t', 's'], values: 'v', fields: unit }, rows(4));
    expect(r.ok).toBe(true);
    expect(r.choice).toMatchObject({ form: 'stream', rule: 'flow.ordered-key-and-series' });
    const text = r.rationale.map((d) => `${d.decision} | ${d.rule}`).join('\n');
    expect(text).toMatch(/weighted wiggle \| Byron & Wattenberg 2008/);
    expect(text).toMatch(/inside-out/);
    expect(text).toMatch(/never overshoot \| monotone cubic interpolation \(Steffen 1990\)/);
    const dump = dumpScene(r.scene!);
    expect(dump.marks.filter((m) => m.role === 'layer')).toHaveLength(4);
    expect(dump.legends[0]).toMatchObject({ kind: 'categorical', field: 's' });
  });

  it('more series than colours: no legend, colours by onset, and a note counts the layers left unlabelled', async () => {
    // Four thick layers and ten hairlines: the hairlines cannot hold their names.
    const r = await renderRows({ intent: 'flow', keys: ['t', 's'], values: 'v', fields: unit }, rows(14).map((x) => (Number(x.s.slice(7)) < 4 ? { ...x, v: 20 } : { ...x, v: 0.2 })));
    expect(r.ok).toBe(true);
    expect((r.choice!.plan as StreamPlan).colourEach).toBe(false);
    const dump = dumpScene(r.scene!);
    expect(dump.legends).toEqual([]);
    const labelled = dump.texts.filter((t) => t.role === 'label').length;
    expect(labelled).toBeGreaterThanOrEqual(4);
    expect(labelled).toBeLessThanOrEqual(4);
    const note = dump.texts.find((t) => t.role === 'note' && /unlabelled/.test(t.text));
    expect(note!.text).toContain(`${14 - labelled} of 14 layers`);
  });

  it('negative values are refused, offering lines', async () => {
    const r = await renderRows({ intent: 'flow', keys: ['t', 's'], values: 'v', fields: unit }, rows(3).map((x, i) => (i === 4 ? { ...x, v: -2 } : x)));
    expect(r.diagnostics).toMatchObject([{ code: 'choice.stream-negative', path: '/values', field: 'v' }]);
    expect(r.diagnostics[0]!.hint).toMatch(/lines/);
  });

  it('one key only is refused: a flow needs the series key too', async () => {
    const r = await renderRows({ intent: 'flow', keys: 't', values: 'v', fields: unit }, rows(2));
    expect(r.diagnostics).toMatchObject([{ code: 'choice.flow-needs-series', path: '/keys' }]);
  });

  it('a categorical first key is refused: layers connect neighbouring keys', async () => {
    const r = await renderRows({ intent: 'flow', keys: ['s', 't'], values: 'v', fields: { ...unit, t: { type: 'categorical' } } }, rows(3));
    expect(codes(r)).toContain('choice.line-on-categorical');
  });

  it('a single key value is refused: a stream needs two keys to flow between', async () => {
    const r = await renderRows({ intent: 'flow', keys: ['t', 's'], values: 'v', fields: unit }, rows(3, 1));
    expect(codes(r)).toContain('derive.stream-too-few-keys');
  });

  it('a text value is refused for layer thickness', async () => {
    const r = await renderRows({ intent: 'flow', keys: ['t', 's'], values: 'w', fields: unit }, rows(2).map((x) => ({ ...x, w: 'many' })));
    expect(r.diagnostics).toMatchObject([{ code: 'choice.value-not-quantitative', path: '/values' }]);
  });
});
