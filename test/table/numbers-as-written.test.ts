import { describe, expect, it } from 'vitest';
import { splitAffix } from '../../src/table/affix.js';
import { parseNumberText } from '../../src/table/cells.js';
import { codes, renderRows } from '../helpers.js';

describe('numbers as people write them', () => {
  it('reads percent and currency signs, grouping commas and grouping spaces', () => {
    expect(['61.2%', '1,212', '$640', '€4.2', '1 050', '-$5', '$-5', '1\u202f050'].map((t) => parseNumberText(t))).toEqual([61.2, 1212, 640, 4.2, 1050, -5, -5, 1050]);
    expect(parseNumberText('4,2 €', ',')).toBe(4.2);
    expect(parseNumberText('1.050,5 €', ',')).toBe(1050.5);
  });

  it('keeps the sign as the unit, and leaves text that is not a number alone', () => {
    expect(splitAffix('61.2%')).toEqual({ core: '61.2', unit: '%' });
    expect(splitAffix('€ 1 234 567')).toEqual({ core: '1234567', unit: '€' });
    expect(['$5%', '--5', 'Q1 2025', '1 05', 'A$'].map((t) => parseNumberText(t))).toEqual([undefined, undefined, undefined, undefined, undefined]);
  });

  it('a column written "61.2%" is a quantitative value in %, with no unit warning', async () => {
    const r = await renderRows({ intent: 'compare', keys: 'k', values: 'share' }, [{ k: 'North', share: '61.2%' }, { k: 'South', share: '38.8%' }]);
    expect(r.ok).toBe(true);
    expect(r.scene!.axes.find((a) => a.scale === 'linear')!.title).toContain('%');
    expect(codes(r)).not.toContain('choice.unit-missing');
  });

  it('one column, one currency: "$640" beside "€4.2" is named, not added', async () => {
    const rows = [{ k: 'a', v: '$640' }, { k: 'b', v: '$12' }, { k: 'c', v: '$7' }, { k: 'd', v: '$9' }, { k: 'e', v: '€4.2' }];
    const r = await renderRows({ intent: 'compare', keys: 'k', values: 'v' }, rows);
    expect(r.diagnostics.find((d) => d.code === 'table.mixed-column')).toMatchObject({ found: '"€4.2"', rows: [5] });
  });

  it('a value column that cannot be read is never answered with "count rows"', async () => {
    const r = await renderRows({ intent: 'compare', keys: 'k', values: 'v' }, [{ k: 'a', v: 'many' }, { k: 'b', v: 'few' }]);
    const d = r.diagnostics.find((x) => x.code === 'choice.value-not-quantitative')!;
    expect(d.hint).not.toMatch(/count/);
    expect(d.hint).toMatch(/type: quantitative/);
  });

  it('a percent unit on fractions (0.05–0.34) is warned; a percent format needs no unit', async () => {
    const rows = [{ k: 'a', v: 0.05 }, { k: 'b', v: 0.34 }];
    const warned = await renderRows({ intent: 'compare', keys: 'k', values: 'v', fields: { v: { unit: '%' } } }, rows);
    expect(warned.diagnostics.find((d) => d.code === 'choice.percent-of-fractions')).toMatchObject({ path: '/fields/v/unit' });
    const formatted = await renderRows({ intent: 'compare', keys: 'k', values: 'v', fields: { v: { format: '.0%' } } }, rows);
    expect(codes(formatted)).not.toContain('choice.unit-missing');
    expect(codes(formatted)).not.toContain('choice.percent-of-fractions');
  });
});

describe('a declared decimal mark', () => {
  it('fields.<col>.decimal: "," reads "4,2" as 4.2 in a comma-separated file', async () => {
    const { renderBrief } = await import('../../src/pipeline/render.js');
    const { env, memoryFiles } = await import('../helpers.js');
    const files = memoryFiles({ 'd.csv': 'k,v\na,"4,2"\nb,"1.050,5"\n' });
    const r = await renderBrief({ brief: 'data: d.csv\nintent: compare\nkeys: k\nvalues: v\nfields: { v: { decimal: ",", unit: kg } }\n', file: 'b.yaml' }, { ...env, table: files });
    expect(r.ok).toBe(true);
    const bars = r.scene!.root.children.flatMap(function walk(n): { role: string; datum?: Record<string, unknown> }[] { return [n, ...('children' in n ? n.children.flatMap(walk) : [])]; }).filter((n) => n.role === 'bar');
    expect(bars.map((b) => b.datum!.v).sort()).toEqual([1050.5, 4.2]);
  });
});
