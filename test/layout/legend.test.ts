import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { layoutLegend, sizeLegendValues, type LegendLayout, type LegendPlace, type LegendSpec } from '../../src/layout/legend.js';
import type { Box, SceneNode, TextNode } from '../../src/scene/types.js';
import type { Style } from '../../src/style/types.js';
import { env, runs } from '../helpers.js';

const loaded = env.style('report', undefined);
if (!loaded.ok) throw new Error('report style did not load');
const style: Style = loaded.value;
const EPS = 1e-6;

/** Every leaf node, depth first. */
function leaves(nodes: readonly SceneNode[]): SceneNode[] {
  return nodes.flatMap((n) => (n.kind === 'group' ? leaves(n.children) : [n]));
}

/** The box a leaf node covers. */
function bounds(n: SceneNode): Box {
  switch (n.kind) {
    case 'text': return n.box;
    case 'circle': return { x: n.cx - n.r, y: n.cy - n.r, width: 2 * n.r, height: 2 * n.r };
    case 'path': {
      const pts = n.commands.flatMap((c) => ('x' in c ? [c] : []));
      const xs = pts.map((p) => p.x), ys = pts.map((p) => p.y);
      return { x: Math.min(...xs), y: Math.min(...ys), width: Math.max(...xs) - Math.min(...xs), height: Math.max(...ys) - Math.min(...ys) };
    }
    case 'rect': case 'image': return n;
    case 'group': throw new Error('groups have no box of their own');
  }
}

const overlaps = (a: Box, b: Box) =>
  a.x < b.x + b.width - EPS && b.x < a.x + a.width - EPS && a.y < b.y + b.height - EPS && b.y < a.y + a.height - EPS;
const within = (b: Box, o: Box) =>
  b.x >= o.x - EPS && b.y >= o.y - EPS && b.x + b.width <= o.x + o.width + EPS && b.y + b.height <= o.y + o.height + EPS;

/** The legend's own promises: texts apart, everything inside the place given and inside its reported size. */
function expectTidy(legend: LegendLayout, place: LegendPlace): void {
  const nodes = leaves(legend.nodes);
  const texts = nodes.filter((n): n is TextNode => n.kind === 'text');
  texts.forEach((t, i) => texts.slice(i + 1).forEach((u) => expect(overlaps(t.box, u.box), `${t.text} / ${u.text}`).toBe(false)));
  expect(legend.width).toBeLessThanOrEqual(place.width + EPS);
  for (const n of nodes) expect(within(bounds(n), { x: place.x, y: place.y, width: legend.width, height: legend.height }), n.id).toBe(true);
  expect(legend.info.box).toEqual({ x: place.x, y: place.y, width: legend.width, height: legend.height });
}

const swatches = (l: LegendLayout) => leaves(l.nodes).filter((n) => n.role === 'legend-swatch');
const labels = (l: LegendLayout) => leaves(l.nodes).filter((n): n is TextNode => n.role === 'legend-label');

const piers: LegendSpec = {
  kind: 'categorical', field: 'pier', title: 'Pier',
  entries: ['North', 'South', 'Harbour Mouth', 'East Breakwater', 'Old Ferry Landing', 'West'].map((label, i) => ({ label, fill: `#${i}0${i}0${i}0` })),
};

describe('legend', () => {
  it('wraps a top legend into rows within the width, one swatch per entry in its colour', () => {
    const place: LegendPlace = { x: 20, y: 30, width: 260, placement: 'top' };
    const l = layoutLegend(piers, place, style, env.measure);
    expectTidy(l, place);
    expect(new Set(labels(l).map((t) => t.y)).size).toBeGreaterThan(1);
    expect(swatches(l).map((s) => (s.kind === 'rect' ? s.fill : ''))).toEqual(piers.kind === 'categorical' ? piers.entries.map((e) => e.fill) : []);
    expect(labels(l).map((t) => t.text)).toEqual(l.info.entries.map((e) => e.label));
    expect(l.nodes.map((n) => n.role)).toEqual(['legend']);
    expect(leaves(l.nodes).filter((n) => n.role === 'legend-title').map((n) => (n as TextNode).text)).toEqual(['Pier']);
  });

  it('stacks a right legend in one column with keys on one centre line', () => {
    const place: LegendPlace = { x: 500, y: 40, width: 140, placement: 'right' };
    const l = layoutLegend(piers, place, style, env.measure);
    expectTidy(l, place);
    const ys = labels(l).map((t) => t.y);
    for (let i = 1; i < ys.length; i++) expect(ys[i]!).toBeGreaterThan(ys[i - 1]!);
    expect(new Set(swatches(l).map((s) => (s.kind === 'rect' ? s.x : NaN))).size).toBe(1);
  });

  it('shortens a label too long for the width and keeps the full text', () => {
    const spec: LegendSpec = { kind: 'categorical', field: 'f', title: '', entries: [{ label: 'The longest pier name anyone has ever given a pier', fill: '#123456' }] };
    const place: LegendPlace = { x: 0, y: 0, width: 120, placement: 'right' };
    const l = layoutLegend(spec, place, style, env.measure);
    expectTidy(l, place);
    expect(labels(l)[0]!.text.endsWith('…')).toBe(true);
    expect(labels(l)[0]!.full).toBe('The longest pier name anyone has ever given a pier');
  });

  it('states the class boundaries of a binned legend', () => {
    const spec: LegendSpec = { kind: 'binned', field: 'rain', title: 'Rain (mm)', bins: [{ from: 0, to: 10, fill: '#eeeeee' }, { from: 10, to: 20, fill: '#999999' }, { from: 20, to: 50, fill: '#333333' }] };
    const l = layoutLegend(spec, { x: 0, y: 0, width: 400, placement: 'top' }, style, env.measure);
    expect(labels(l).map((t) => t.text)).toEqual(['0–10', '10–20', '20–50']);
    expect(l.info.entries.map((e) => [e.from, e.to])).toEqual([[0, 10], [10, 20], [20, 50]]);
    const negative: LegendSpec = { ...spec, bins: [{ from: -10, to: 0, fill: '#eeeeee' }] };
    expect(labels(layoutLegend(negative, { x: 0, y: 0, width: 400, placement: 'top' }, style, env.measure))[0]!.text).toBe('\u221210 to 0');
    // One legend reads one way: once a class crosses below zero, every class says "to" (regression: "−2 to 0" beside "0–2").
    const diverging: LegendSpec = { ...spec, bins: [{ from: -2, to: 0, fill: '#eeeeee' }, { from: 0, to: 2, fill: '#999999' }] };
    expect(labels(layoutLegend(diverging, { x: 0, y: 0, width: 400, placement: 'top' }, style, env.measure)).map((t) => t.text)).toEqual(['\u22122 to 0', '0 to 2']);
  });

  it('draws a size legend at round values with area, not radius, proportional to value', () => {
    expect(sizeLegendValues(873, 30)).toEqual([800, 200, 50]);
    expect(sizeLegendValues(1, 3)).toEqual([1]); // smaller circles would be under 2 px
    const spec: LegendSpec = { kind: 'size', field: 'visits', title: 'Visits', maxValue: 873, maxRadius: 30, fill: '#888888' };
    for (const placement of ['top', 'right'] as const) {
      const place: LegendPlace = { x: 10, y: 10, width: 300, placement };
      const l = layoutLegend(spec, place, style, env.measure);
      expectTidy(l, place);
      const circles = swatches(l).flatMap((s) => (s.kind === 'circle' ? [s] : []));
      expect(circles).toHaveLength(3);
      // Area-true: r² / value is the same for every circle and equals maxRadius² / maxValue.
      circles.forEach((c, i) => expect(Math.abs((c.r ** 2 / l.info.entries[i]!.value!) / (30 ** 2 / 873) - 1)).toBeLessThan(0.01));
      expect(labels(l).map((t) => t.text)).toEqual(['800', '200', '50']);
    }
  });

  it('draws a shape legend with each entry\'s shape', () => {
    const spec: LegendSpec = { kind: 'shape', field: 'kind', title: 'Kind', entries: [
      { label: 'Ferry', shape: 'circle', fill: '#111111' }, { label: 'Barge', shape: 'triangle', fill: '#111111' }, { label: 'Yacht', shape: 'star', fill: '#111111' },
    ] };
    const place: LegendPlace = { x: 0, y: 0, width: 300, placement: 'top' };
    const l = layoutLegend(spec, place, style, env.measure);
    expectTidy(l, place);
    expect(swatches(l).map((s) => s.kind)).toEqual(['circle', 'path', 'path']);
    expect(l.info.entries.map((e) => e.shape)).toEqual(['circle', 'triangle', 'star']);
  });

  it('property: any labels at any width keep texts apart and inside the box', () => {
    const word = fc.constantFrom('North', 'Pier', 'Harbour', 'Ω', 'Longwindedly-named', 'Ferry', 'x', '12');
    const input = fc.record({
      labels: fc.array(fc.array(word, { minLength: 1, maxLength: 4 }).map((w) => w.join(' ')), { minLength: 1, maxLength: 12 }),
      title: fc.array(word, { maxLength: 6 }).map((w) => w.join(' ')),
      width: fc.integer({ min: 60, max: 600 }),
      placement: fc.constantFrom('top' as const, 'right' as const),
    });
    fc.assert(fc.property(input, ({ labels: names, title, width, placement }) => {
      const spec: LegendSpec = { kind: 'categorical', field: 'f', title, entries: names.map((label, i) => ({ label, fill: `#00${String(i).padStart(2, '0')}00` })) };
      const place: LegendPlace = { x: 7, y: 11, width, placement };
      const l = layoutLegend(spec, place, style, env.measure);
      expectTidy(l, place);
      expect(swatches(l).map((s) => (s.kind === 'rect' ? s.fill : ''))).toEqual(spec.entries.map((e) => e.fill));
    }), { numRuns: runs(200) });
  });
});
