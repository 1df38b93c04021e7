import { describe, expect, it } from 'vitest';
import { dumpScene } from '../../src/scene/dump.js';
import type { Scene, SceneNode } from '../../src/scene/types.js';
import { pathData, polyline } from '../../src/svg/path.js';
import { writeSvg } from '../../src/svg/write.js';
import { parseXml } from '../helpers.js';

function sceneOf(children: SceneNode[]): Scene {
  const plot = { x: 0, y: 0, width: 100, height: 100 };
  return {
    form: 'test', width: 100, height: 100, background: '#ffffff', title: 't', description: 'd',
    root: { kind: 'group', id: 'chart', role: 'chart', children }, axes: [], plot, panels: [{ id: 'panel', plot, axes: [] }], legends: [],
  };
}

describe('structured paths', () => {
  it('write every command with every number through the one formatter', () => {
    expect(pathData([{ op: 'M', x: 1.23456, y: -0.0001 }, { op: 'L', x: 10, y: 2e-7 }, { op: 'C', x1: 1, y1: 2, x2: 3, y2: 4, x: 5.555, y: 6 }, { op: 'A', rx: 3, ry: 3, rotation: 0, large: true, sweep: false, x: 1, y: 1 }, { op: 'Z' }]))
      .toBe('M1.23 0L10 0C1 2 3 4 5.56 6A3 3 0 1 0 1 1Z');
  });

  it('refuse a non-finite coordinate instead of writing it', () => {
    expect(() => pathData([{ op: 'M', x: Number.NaN, y: 0 }])).toThrow(RangeError);
  });

  it('keep the points and data of a line for the scene dump', () => {
    const points = [{ x: 0, y: 10, datum: { t: 1 } }, { x: 50.00049, y: 20, datum: { t: 2 } }];
    const dump = dumpScene(sceneOf([{ kind: 'path', id: 'l', role: 'line', commands: polyline(points), points, series: { route: 'A' }, stroke: '#112233', strokeWidth: 2 }]));
    expect(dump.marks[0]).toMatchObject({ role: 'line', d: 'M0 10L50 20', stroke: '#112233', strokeWidth: 2, series: { route: 'A' }, points: [{ x: 0, y: 10, datum: { t: 1 } }, { x: 50, y: 20, datum: { t: 2 } }] });
  });
});

describe('paint and rotation', () => {
  it('writes stroke, dash and opacity only where a mark sets them', () => {
    const svg = writeSvg(sceneOf([
      { kind: 'rect', id: 'a', role: 'cell', x: 0, y: 0, width: 10, height: 10, fill: '#ff0000' },
      { kind: 'circle', id: 'b', role: 'point', cx: 5, cy: 5, r: 2, fill: '#00ff00', stroke: '#000000', strokeWidth: 0.5, opacity: 0.4 },
      { kind: 'path', id: 'c', role: 'reference', commands: polyline([{ x: 0, y: 0 }, { x: 9, y: 9 }]), stroke: '#0000ff', strokeWidth: 1, dash: [4, 3] },
    ]), { kind: 'live', family: 'Source Sans 3' });
    parseXml(svg);
    expect(svg).toContain('<rect class="cell" x="0" y="0" width="10" height="10" fill="#ff0000"/>');
    expect(svg).toContain('<circle class="point" cx="5" cy="5" r="2" fill="#00ff00" stroke="#000000" stroke-width="0.5" opacity="0.4"/>');
    expect(svg).toContain('<path class="reference" d="M0 0L9 9" fill="none" stroke="#0000ff" stroke-width="1" stroke-dasharray="4 3"/>');
  });

  it('rotates text about its anchor and keeps a shortened label\'s full text as its title', () => {
    const text: SceneNode = { kind: 'text', id: 't', role: 'tick', text: 'Long na…', full: 'Long name <x>', x: 20, y: 30, anchor: 'end', size: 12, weight: 'regular', fill: '#000000', rotate: -45, box: { x: 0, y: 0, width: 20, height: 16 } };
    const svg = writeSvg(sceneOf([text]), { kind: 'live', family: 'Source Sans 3' });
    parseXml(svg);
    expect(svg).toContain('transform="rotate(-45 20 30)"><title>Long name &lt;x&gt;</title>Long na…</text>');
    expect(dumpScene(sceneOf([text])).texts[0]).toMatchObject({ rotate: -45, text: 'Long na…' });
  });
});
