import { describe, expect, it } from 'vitest';
import { chooseFacet } from '../../src/choose/facet.js';
import type { Candidate } from '../../src/choose/types.js';
import { resolveBrief } from '../../src/brief/resolve.js';
import type { Field, Fields } from '../../src/fields/types.js';
import { codes, renderRows } from '../helpers.js';

const rows = ['North', 'South', 'East'].flatMap((site, i) => ['a', 'b'].map((k, j) => ({ site, k, v: i + j + 1 })));
const brief = (extra: Record<string, unknown>) => ({ intent: 'compare', keys: 'k', values: 'v', fields: { v: { unit: 'units' } }, ...extra });

/** A field as chooseFacet reads it (name, label, type): the rest of a Field does not matter here. */
function field(name: string, type: Field['type'] = 'categorical'): Field {
  return { name, label: name, type, role: 'other', unit: undefined, format: undefined, levels: [], column: { name, type: 'text', values: [], text: [], missing: [] } } as unknown as Field;
}

describe('rules for small multiples', () => {
  it('`facet: col` gets one panel per level, and the rationale names the rule of each decision', async () => {
    const r = await renderRows(brief({ facet: 'site' }), rows);
    expect(r.ok).toBe(true);
    expect(r.choice!.facet).toMatchObject({ field: { name: 'site' }, context: false, order: 'value' });
    const rules = r.rationale.map((d) => d.rule.split(':')[0]);
    expect(rules).toEqual(expect.arrayContaining(['facet.brief', 'facet.order', 'facet.grid']));
    expect(r.scene!.panels).toHaveLength(3);
  });

  it('the long form `facet: { by, context }` is the same facet, with grey context stated', async () => {
    const r = await renderRows(brief({ facet: { by: 'site', context: true } }), rows);
    expect(r.choice!.facet).toMatchObject({ field: { name: 'site' }, context: true });
    expect(r.rationale.find((d) => d.rule.startsWith('facet.context'))).toBeDefined();
  });

  it('a facet column the data lacks is an unknown column at /facet, with a suggestion', async () => {
    const r = await renderRows(brief({ facet: 'sit' }), rows);
    expect(codes(r)).toEqual(['brief.unknown-column']);
    expect(r.diagnostics[0]).toMatchObject({ path: '/facet', hint: expect.stringContaining('site') });
  });

  it('faceting by a key of the chart is refused at /facet: each panel would hold one level', async () => {
    const r = await renderRows(brief({ facet: 'k' }), rows);
    expect(codes(r)).toEqual(['choice.facet-on-key']);
    expect(r.diagnostics[0]!.path).toBe('/facet');
  });

  it('a bad facet option is refused by the schema', async () => {
    expect(codes(await renderRows(brief({ facet: { context: true } }), rows))).toContain('brief.missing-option');
  });

  it('panels that do not fit are refused with a warning, which --strict makes an error', async () => {
    const many = Array.from({ length: 30 }, (_, i) => ['a', 'b'].map((k) => ({ site: `S${i}`, k, v: i + 1 }))).flat();
    const r = await renderRows(brief({ facet: 'site', size: { width: 320, height: 240 } }), many);
    expect(codes(r)).toContain('layout.panels-refused');
    expect(r.rationale.find((d) => d.rule.startsWith('facet.fit'))).toBeDefined();
    expect((await renderRows(brief({ facet: 'site', size: { width: 320, height: 240 } }), many, { strict: true })).ok).toBe(false);
  });

  it('a form that cannot be drawn in panels refuses a facet at /facet', () => {
    const fields: Fields = { keys: [field('k')], values: [field('v', 'quantitative')], all: [field('k'), field('v', 'quantitative'), field('site')] };
    const radial: Candidate = { name: 'radial-bar', noun: 'radial bar chart', traits: { lengthCoded: true, connectsKey: false, radial: true, coloursCategories: false, axisPerValue: false }, plan: () => { throw new Error('not planned'); } };
    const out = chooseFacet(fields, resolveBrief({ ...brief({ facet: 'site' }), rows: [] }), radial, undefined);
    expect(out.problems.map((p) => [p.code, p.path])).toEqual([['choice.facet-not-supported', '/facet']]);
  });

  it('a form\'s plan may ask for panels itself; the rationale gives its reason as rule facet.form, and a brief facet wins', () => {
    const fields: Fields = { keys: [field('k')], values: [field('v', 'quantitative')], all: [field('k'), field('v', 'quantitative'), field('site'), field('route')] };
    const form: Candidate = { name: 'bar', noun: 'bar chart', facets: { noun: 'total' }, traits: { lengthCoded: true, connectsKey: false, radial: false, coloursCategories: false, axisPerValue: false }, plan: () => { throw new Error('not planned'); } };
    const request = { by: 'route', context: true, why: 'too many series for one panel' };
    const asked = chooseFacet(fields, resolveBrief({ ...brief({}), rows: [] }), form, request);
    expect(asked.facet).toMatchObject({ field: { name: 'route' }, context: true, order: 'value' });
    expect(asked.decisions[0]!.rule).toBe('facet.form: too many series for one panel');
    const briefWins = chooseFacet(fields, resolveBrief({ ...brief({ facet: 'site' }), rows: [] }), form, request);
    expect(briefWins.facet).toMatchObject({ field: { name: 'site' }, context: false });
  });
});

describe('rules for grouped bars', () => {
  const two = (groups: number) => ['North', 'South'].flatMap((k) => Array.from({ length: groups }, (_, g) => ({ k, g: `G${g}`, v: g + 1 })));
  const grouped = (extra: Record<string, unknown> = {}) => ({ intent: 'compare', keys: ['k', 'g'], values: 'v', fields: { v: { unit: 'units' } }, ...extra });

  it('two keys get grouped bars by rule compare.two-keys, with zero baseline, group order and legend stated', async () => {
    const r = await renderRows(grouped(), two(3));
    expect(r.choice!.form).toBe('grouped-bar');
    expect(r.rationale[0]!.rule).toMatch(/^compare\.two-keys/);
    expect(r.rationale.map((d) => d.decision)).toEqual(expect.arrayContaining(['the value axis starts at zero', 'a legend names the 3 groups of `g`', 'keys sorted by their overall value, largest first; ties by label']));
    expect(r.rationale.some((d) => d.decision.startsWith('bars sorted'))).toBe(false);
    expect(codes(r)).toEqual([]);
  });

  it('more than 6 groups draws with a warning that suggests small multiples (facet:)', async () => {
    const r = await renderRows(grouped(), two(7));
    expect(r.ok).toBe(true);
    const w = r.diagnostics.find((d) => d.code === 'choice.too-many-groups')!;
    expect(w.path).toBe('/keys');
    expect(w.hint).toContain('facet: g');
  });

  it('more groups than the palette tells apart are refused by the colour hard rule', async () => {
    expect(codes(await renderRows(grouped(), two(9)))).toContain('choice.too-many-colours');
  });

  it('more bars than the plot holds at 3 px each are refused with a way out, never folded', async () => {
    const rows = Array.from({ length: 120 }, (_, i) => ['x', 'y', 'z'].map((g) => ({ k: `K${i}`, g, v: i + 1 }))).flat();
    const r = await renderRows(grouped({ size: { width: 320, height: 240 } }), rows);
    expect(codes(r)).toContain('derive.too-many-grouped-bars');
    expect(r.diagnostics.find((d) => d.code === 'derive.too-many-grouped-bars')!.hint).toContain('facet: g');
  });

  it('`baseline: fit` is refused for grouped bars, as for bars', async () => {
    expect(codes(await renderRows(grouped({ baseline: 'fit' }), two(2)))).toContain('choice.baseline-fit-refused');
  });
});
