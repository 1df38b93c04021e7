import { describe, expect, it } from 'vitest';
import { dumpScene } from '../../src/scene/dump.js';
import { codes, renderRows } from '../helpers.js';

const notes = (r: Awaited<ReturnType<typeof renderRows>>) => dumpScene(r.scene!).texts.filter((t) => t.role === 'note').map((t) => t.text).join(' ');
const replicates = ['North', 'South', 'East'].flatMap((lab, i) => [7.1, 7.3, 7.0].map((v) => ({ lab, shift: v + i / 10 })));

describe('what was combined or left out is said in the figure', () => {
  it('a sum of pH values is refused, and a mean offered', async () => {
    const r = await renderRows({ intent: 'compare', keys: 'lab', values: 'shift', fields: { shift: { unit: 'pH units' } } }, replicates);
    expect(r.ok).toBe(false);
    expect(r.diagnostics.find((d) => d.code === 'choice.sum-not-additive')).toMatchObject({ path: '/fields/shift' });
    expect(r.diagnostics.find((d) => d.code === 'choice.sum-not-additive')!.hint).toMatch(/aggregate: mean/);
  });

  it('a stated mean says so on the axis and in the note, without a warning', async () => {
    const r = await renderRows({ intent: 'compare', keys: 'lab', values: 'shift', aggregate: 'mean', fields: { shift: { unit: 'pH units' } } }, replicates);
    expect(r.ok).toBe(true);
    expect(notes(r)).toContain('3 rows per lab were averaged');
    expect(r.scene!.axes.find((a) => a.scale === 'linear')!.title).toMatch(/^Mean /);
    expect(codes(r)).not.toContain('choice.keys-repeat');
  });

  it('keys that repeat with no aggregate stated are summed with a warning, a note and a "Total" axis title', async () => {
    const rows = [{ k: 'a', v: 1 }, { k: 'a', v: 2 }, { k: 'b', v: 5 }];
    const r = await renderRows({ intent: 'compare', keys: 'k', values: 'v', fields: { v: { unit: 'boxes' } } }, rows);
    expect(codes(r)).toContain('choice.keys-repeat');
    expect(codes(r)).not.toContain('derive.aggregated');
    expect(notes(r)).toMatch(/were summed/);
    expect(r.scene!.axes.find((a) => a.scale === 'linear')!.title).toMatch(/^Total /);
  });

  it('a key with no value anywhere is named in the note ("No data: …"), shortened to a count when long', async () => {
    const schools = ['Alder', 'Birch', 'Cedar', 'Damson', 'Elm', 'Fir', 'Gorse', 'Hazel'];
    const some = await renderRows({ intent: 'compare', keys: 's', values: 'n', fields: { n: { unit: 'pupils' } } }, schools.map((s, i) => ({ s, n: i % 3 === 0 ? i + 1 : null })));
    expect(notes(some)).toContain('No data: Birch, Cedar, Elm, Fir, Hazel.');
    const many = await renderRows({ intent: 'compare', keys: 's', values: 'n', fields: { n: { unit: 'pupils' } } }, Array.from({ length: 30 }, (_, i) => ({ s: `School ${i}`, n: i < 3 ? i + 1 : null })));
    expect(notes(many)).toMatch(/No data: School 3, School 4, School 5, School 6, School 7, School 8 and 21 more s/);
  });
});

describe('repeated keys are counted where they repeat', () => {
  // Guards a false refusal found by a new user: grouped bars of a % value, one row per (region,
  // crop), were refused as a sum of a non-additive value, because the bars' key repeats per group.
  it('grouped bars of a % value with one row per pair are drawn, not refused', async () => {
    const rows = [{ region: 'N', crop: 'Rye', chg: 5 }, { region: 'N', crop: 'Oat', chg: -3 }, { region: 'S', crop: 'Rye', chg: 2 }, { region: 'S', crop: 'Oat', chg: 4 }];
    const r = await renderRows({ intent: 'compare', keys: ['region', 'crop'], values: 'chg', fields: { chg: { unit: '%' } } }, rows);
    expect(r.ok).toBe(true);
    expect(codes(r)).not.toContain('choice.sum-not-additive');
    expect(codes(r)).not.toContain('choice.keys-repeat');
    expect(r.scene!.axes.find((a) => a.scale === 'linear')!.title).not.toMatch(/^(Total|Mean) /);
  });
});
