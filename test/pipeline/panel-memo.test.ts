import { describe, expect, it } from 'vitest';
import { PanelMemo } from '../../src/pipeline/panel-memo.js';

describe('a panel\'s memo', () => {
  it('shares the layout kit\'s results (frame, ticks, band labels) with the chart', () => {
    const chart = new Map<string, unknown>();
    const a = new PanelMemo(chart);
    a.set('frame\u0000note', 1).set('ticks\u00000\u00001', 2).set('band-labels\u0000x', 3);
    const b = new PanelMemo(chart);
    expect([b.get('frame\u0000note'), b.get('ticks\u00000\u00001'), b.get('band-labels\u0000x')]).toEqual([1, 2, 3]);
    expect(chart.size).toBe(3);
  });

  it('keeps a form\'s own results (which depend on the panel\'s rows) to the panel', () => {
    const chart = new Map<string, unknown>([['bar\u0000groups\u0000k\u0000v', 'whole table']]);
    const a = new PanelMemo(chart);
    expect(a.has('bar\u0000groups\u0000k\u0000v')).toBe(false);
    a.set('bar\u0000groups\u0000k\u0000v', 'panel A');
    expect(new PanelMemo(chart).get('bar\u0000groups\u0000k\u0000v')).toBeUndefined();
    expect(chart.get('bar\u0000groups\u0000k\u0000v')).toBe('whole table');
  });
});
