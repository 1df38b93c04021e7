import { describe, expect, it } from 'vitest';
import { outlineSvg } from '../../src/pipeline/render.js';
import { escapeXml } from '../../src/svg/escape.js';
import { fmt, fmtPath } from '../../src/svg/fmt.js';
import { env, parseXml, renderRows } from '../helpers.js';

describe('numbers in SVG', () => {
  it('are rounded to a fixed precision with trailing zeros dropped', () => {
    expect([fmt(1), fmt(1.5), fmt(1.234567), fmt(100.999), fmt(0.004)]).toEqual(['1', '1.5', '1.23', '101', '0']);
  });

  it('are never -0 and never in exponent form', () => {
    expect(fmt(-0)).toBe('0');
    expect(fmt(-0.001)).toBe('0');
    expect(fmt(1e-9)).toBe('0');
    expect(fmt(123456789.123)).toBe('123456789.12');
  });

  it('refuse non-finite values, which are defects upstream', () => {
    expect(() => fmt(Number.NaN)).toThrow(RangeError);
    expect(() => fmt(Infinity)).toThrow(RangeError);
    expect(() => fmt(1e300)).toThrow(RangeError);
  });

  it('are rewritten in path data too', () => {
    expect(fmtPath('M1.23456 -0.0001L10 2e-7')).toBe('M1.23 0L10 0');
  });
});

describe('escaping', () => {
  it('escapes markup characters and drops characters XML forbids', () => {
    expect(escapeXml('<a href="x">Tom & Jerry\'s</a>')).toBe('&lt;a href=&quot;x&quot;&gt;Tom &amp; Jerry&apos;s&lt;/a&gt;');
    expect(escapeXml('bell\u0007 and lone \ud800 surrogate')).toBe('bell and lone  surrogate');
  });
});

describe('SVG writer', () => {
  const rows = [{ k: 'Pier <1> & "2"', v: 5 }, { k: 'Quay', v: 3 }];

  it('writes well-formed, accessible SVG with title and a generated description', async () => {
    const r = await renderRows({ intent: 'compare', keys: 'k', values: 'v', title: 'Piers & quays' }, rows);
    const doc = parseXml(r.svg!);
    const svg = doc.documentElement;
    expect(svg.getAttribute('role')).toBe('img');
    expect(doc.getElementsByTagName('title')[0]!.textContent).toBe('Piers & quays');
    const desc = doc.getElementsByTagName('desc')[0]!.textContent!;
    expect(desc).toContain('largest Pier <1> & "2" (5)');
    expect(desc).toContain('smallest Quay (3)');
    expect(svg.getAttribute('aria-labelledby')).toMatch(/^cw[0-9a-f]{8}-title cw[0-9a-f]{8}-desc$/);
  });

  it('quotes the font family, which CSS would drop unquoted because of the bare "3"', async () => {
    const r = await renderRows({ intent: 'compare', keys: 'k', values: 'v' }, rows, { textMode: 'live' });
    expect(parseXml(r.svg!).documentElement.getAttribute('font-family')).toBe("'Source Sans 3', sans-serif");
  });

  it('uses the brief description instead of the generated one when given', async () => {
    const r = await renderRows({ intent: 'compare', keys: 'k', values: 'v', description: 'Custom words' }, rows);
    expect(parseXml(r.svg!).getElementsByTagName('desc')[0]!.textContent).toBe('Custom words');
  });

  it('gives each bar a title with its datum', async () => {
    const r = await renderRows({ intent: 'compare', keys: 'k', values: 'v' }, rows);
    const titles = [...parseXml(r.svg!).getElementsByTagName('rect')].map((e) => e.getElementsByTagName('title')[0]?.textContent).filter(Boolean);
    expect(titles).toEqual(['k: Pier <1> & "2", v: 5', 'k: Quay, v: 3']);
  });

  it('prefixes ids with a hash of the chart, so two charts differ and one chart never changes', async () => {
    const a = await renderRows({ intent: 'compare', keys: 'k', values: 'v' }, rows);
    const b = await renderRows({ intent: 'compare', keys: 'k', values: 'v' }, [...rows, { k: 'Slip', v: 1 }]);
    const again = await renderRows({ intent: 'compare', keys: 'k', values: 'v' }, rows);
    const prefix = (svg: string) => /aria-labelledby="(cw[0-9a-f]{8})-title/.exec(svg)![1];
    expect(prefix(a.svg!)).not.toBe(prefix(b.svg!));
    expect(again.svg).toBe(a.svg);
  });

  it('derives the prefix from title, description and font, the content its ids point at', async () => {
    const r = await renderRows({ intent: 'compare', keys: 'k', values: 'v' }, rows);
    const { writeSvg } = await import('../../src/svg/write.js');
    const prefix = (svg: string) => /aria-labelledby="(cw[0-9a-f]{8})-title/.exec(svg)![1];
    const a = writeSvg(r.scene!, { kind: 'live', family: 'Source Sans 3' });
    expect(prefix(writeSvg({ ...r.scene!, background: '#000000' }, { kind: 'live', family: 'Source Sans 3' }))).toBe(prefix(a));
    expect(prefix(writeSvg(r.scene!, { kind: 'live', family: 'Another Sans' }))).not.toBe(prefix(a));
    expect(prefix(writeSvg({ ...r.scene!, title: 'Other' }, { kind: 'live', family: 'Source Sans 3' }))).not.toBe(prefix(a));
  });

  it('draws text as glyph outlines on the raster path, each glyph defined once', async () => {
    const r = await renderRows({ intent: 'compare', keys: 'k', values: 'v', title: 'Aaaa' }, rows);
    const svg = outlineSvg(r.scene!, env);
    const doc = parseXml(svg);
    expect(doc.getElementsByTagName('text')).toHaveLength(0);
    const ids = [...doc.getElementsByTagName('path')].map((p) => p.getAttribute('id')).filter(Boolean);
    expect(new Set(ids).size).toBe(ids.length);
    expect(doc.getElementsByTagName('use').length).toBeGreaterThan(10);
  });
});
