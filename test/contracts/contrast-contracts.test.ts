import { describe, expect, it } from 'vitest';
import type { Scene, SceneNode } from '../../src/scene/types.js';
import { markContrasts, textContrasts } from './contrast-contracts.js';

const text = (fill: string, x: number, y: number): SceneNode => ({ kind: 'text', id: 't', role: 'label', text: 'Label', x, y: y + 12, anchor: 'start', size: 12, weight: 'regular', fill, box: { x, y, width: 30, height: 16 } });
const scene = (nodes: SceneNode[], background = '#ffffff'): Scene => ({
  form: 'bar', width: 200, height: 100, background, title: '', description: '', root: { kind: 'group', id: 'root', role: 'chart', children: nodes }, axes: [], plot: { x: 0, y: 0, width: 200, height: 100 }, panels: [], legends: [],
});

describe('the contrast contract helpers', () => {
  it('measure a text against the page, and against a bar it is drawn on, as drawn in order', () => {
    const bar: SceneNode = { kind: 'rect', id: 'b', role: 'bar', x: 0, y: 0, width: 100, height: 50, fill: '#000000' };
    const [onPage, onBar] = textContrasts(scene([bar, text('#ffffff', 120, 10), text('#ffffff', 10, 10)]));
    expect(onPage).toMatchObject({ on: 'background', ratio: 1 });
    expect(onBar).toMatchObject({ on: 'bar', under: '#000000', ratio: 21 });
  });

  it('find a label inside a donut wedge (a path with arcs) and composite a translucent fill on the page', () => {
    const wedge: SceneNode = { kind: 'path', id: 'w', role: 'segment', fill: '#000000', opacity: 0.5, commands: [{ op: 'M', x: 100, y: 0 }, { op: 'A', rx: 50, ry: 50, rotation: 0, large: false, sweep: true, x: 150, y: 50 }, { op: 'L', x: 100, y: 50 }, { op: 'Z' }] };
    const [t] = textContrasts(scene([wedge, text('#ffffff', 118, 22)]));
    expect(t!.on).toBe('segment');
    expect(t!.under).toBe('#808080');
  });

  it('hold a mark by its own colour, and as drawn', () => {
    const faint: SceneNode = { kind: 'circle', id: 'p', role: 'point', cx: 10, cy: 10, r: 3, fill: '#000000', opacity: 0.2 };
    const [m] = markContrasts(scene([faint]));
    expect(m!.ratio).toBe(21);
    expect(m!.drawnRatio).toBeLessThan(3);
  });
});
