import { describe, expect, it } from 'vitest';
import { layoutLegend, type LegendSpec } from '../../src/layout/legend.js';
import { layoutLegends } from '../../src/layout/legends.js';
import type { Style } from '../../src/style/types.js';
import { env } from '../helpers.js';

const loaded = env.style('report', undefined);
if (!loaded.ok) throw new Error('report style did not load');
const style: Style = loaded.value;
const colours: LegendSpec = { kind: 'categorical', field: 'kind', title: 'Kind', entries: [{ label: 'a', fill: '#111111' }, { label: 'b', fill: '#222222' }] };
const sizes: LegendSpec = { kind: 'size', field: 'pop', title: 'Population', maxValue: 900, maxRadius: 16, fill: '#ffffff', stroke: '#444444' };
const apart = (a: { x: number; y: number; width: number; height: number }, b: typeof a) => a.x + a.width <= b.x + 1e-9 || b.x + b.width <= a.x + 1e-9 || a.y + a.height <= b.y + 1e-9 || b.y + b.height <= a.y + 1e-9;

describe('layoutLegends', () => {
  it('one legend is laid out exactly as layoutLegend lays it out', () => {
    const place = { x: 10, y: 20, width: 500, placement: 'top' as const };
    expect(layoutLegends([colours], place, style, env.measure)).toEqual(layoutLegend(colours, place, style, env.measure));
  });

  it('two legends sit side by side above the plot when they fit, each reported, their boxes apart', () => {
    const out = layoutLegends([colours, sizes], { x: 10, y: 20, width: 600, placement: 'top' }, style, env.measure);
    expect(out.infos!.map((i) => i.kind)).toEqual(['categorical', 'size']);
    const [a, b] = out.infos!.map((i) => i.box);
    expect(a!.y).toBe(b!.y);
    expect(apart(a!, b!)).toBe(true);
    expect(out.width).toBeLessThanOrEqual(600);
  });

  it('stack one under another when the row is too narrow, or at the right', () => {
    for (const place of [{ x: 0, y: 0, width: 90, placement: 'top' as const }, { x: 0, y: 0, width: 300, placement: 'right' as const }]) {
      const out = layoutLegends([colours, sizes], place, style, env.measure);
      const [a, b] = out.infos!.map((i) => i.box);
      expect(b!.y).toBeGreaterThanOrEqual(a!.y + a!.height);
      expect(out.height).toBeGreaterThanOrEqual(b!.y + b!.height - a!.y - 1e-9);
    }
  });
});
