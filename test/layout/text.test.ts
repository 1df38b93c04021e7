import { describe, expect, it } from 'vitest';
import { fitLabel, truncateText, wrapText, textNode } from '../../src/layout/text.js';
import { layoutFrame } from '../../src/layout/frame.js';
import { env } from '../helpers.js';
import type { TextStyle } from '../../src/style/types.js';

const style: TextStyle = { size: 14, weight: 'regular', color: '#000000' };
const width = (s: string) => env.measure.width(s, 14, 'regular');

describe('text layout', () => {
  it('wraps to the width by measured text, keeping every word', () => {
    const text = 'Net inflow per month; below zero, the hut used more water than rain and snowmelt brought';
    const lines = wrapText(env.measure, text, style, 200);
    expect(lines.length).toBeGreaterThan(1);
    expect(lines.every((l) => width(l) <= 200)).toBe(true);
    expect(lines.join(' ')).toBe(text);
  });

  it('breaks a word longer than the line', () => {
    const lines = wrapText(env.measure, 'Supercalifragilisticexpialidocious', style, 60);
    expect(lines.every((l) => width(l) <= 60)).toBe(true);
    expect(lines.join('')).toBe('Supercalifragilisticexpialidocious');
  });

  it('truncates with an ellipsis to fit', () => {
    const t = truncateText(env.measure, 'Central Library and Reading Rooms', style, 100);
    expect(t.endsWith('…')).toBe(true);
    expect(width(t)).toBeLessThanOrEqual(100);
    expect(truncateText(env.measure, 'Short', style, 100)).toBe('Short');
  });

  it('fits a label in up to n lines, shortening only the last', () => {
    expect(fitLabel(env.measure, 'Short', style, 100, 2)).toEqual({ lines: ['Short'], shortened: false });
    const two = fitLabel(env.measure, 'Old Town Children\'s Library', style, 120, 2);
    expect(two.shortened).toBe(false);
    expect(two.lines.join(' ')).toBe('Old Town Children\'s Library');
    const cut = fitLabel(env.measure, 'Westfield Library and Archive of the Harbour District', style, 90, 2);
    expect(cut).toMatchObject({ shortened: true });
    expect(cut.lines).toHaveLength(2);
    expect(cut.lines[1]!.endsWith('…')).toBe(true);
    for (const l of cut.lines) expect(width(l)).toBeLessThanOrEqual(90);
    expect(fitLabel(env.measure, 'Westfield Library and Archive', style, 90, 1).lines).toHaveLength(1);
  });

  it('boxes text from ascender to descender around its anchor', () => {
    const n = textNode(env.measure, { id: 't', role: 'tick', text: 'Pier', style, x: 100, top: 10, anchor: 'end' });
    expect(n.box.x + n.box.width).toBeCloseTo(100, 9);
    expect(n.box.y).toBe(10);
    expect(n.y).toBeCloseTo(10 + 14, 9); // Source Sans 3 ascent is 1000/1000 em
  });

  it('stacks header and footer without overlap and leaves the rest to the body', () => {
    const s = env.style('report', undefined);
    if (!s.ok) throw new Error('style');
    const f = layoutFrame({ title: 'A title that is long enough to wrap onto a second line at this narrow width', subtitle: 'Sub', source: 'Source', notes: ['A note'] }, s.value, { width: 300, height: 400 }, env.measure);
    const boxes = f.texts.map((t) => t.box).sort((a, b) => a.y - b.y);
    for (let i = 1; i < boxes.length; i++) expect(boxes[i]!.y).toBeGreaterThanOrEqual(boxes[i - 1]!.y + boxes[i - 1]!.height - 1e-9);
    expect(f.texts.filter((t) => t.role === 'title').length).toBeGreaterThan(1);
    expect(f.body.y).toBeGreaterThan(boxes.filter((b) => b.y < 200).reduce((m, b) => Math.max(m, b.y + b.height), 0));
  });
});
