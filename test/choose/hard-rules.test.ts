import { describe, expect, it } from 'vitest';
import { resolveBrief } from '../../src/brief/resolve.js';
import { choose } from '../../src/choose/choose.js';
import { applyHardRules, HARD_RULES, MAX_CATEGORICAL_COLOURS } from '../../src/choose/hard-rules.js';
import type { FormTraits } from '../../src/choose/types.js';
import { inferFields } from '../../src/fields/infer.js';
import { FORMS } from '../../src/forms/registry.js';
import { readTable } from '../../src/table/load.js';
import { codes, env, memoryFiles, renderRows } from '../helpers.js';

const NONE: FormTraits = { lengthCoded: false, connectsKey: false, radial: false, coloursCategories: false, axisPerValue: false };

async function fieldsOf(brief: Record<string, unknown>) {
  const resolved = resolveBrief({ intent: 'compare', ...brief });
  const table = await readTable(resolved.data, resolved.fields, undefined, memoryFiles({}));
  if (!table.ok) throw new Error('table');
  const fields = inferFields(table.value, resolved);
  if (!fields.ok) throw new Error(JSON.stringify(fields.diagnostics));
  return { brief: resolved, fields: fields.value, table: table.value };
}

describe('hard rules are values checked against a form\'s traits', () => {
  it('a form that connects its key is refused a categorical key, and offered bars', async () => {
    const { brief, fields } = await fieldsOf({ rows: [{ pier: 'North', n: 1 }, { pier: 'South', n: 2 }], keys: 'pier', values: 'n' });
    const r = applyHardRules({ traits: { ...NONE, connectsKey: true }, form: 'line', brief, fields }, false);
    expect(r.problems).toMatchObject([{ code: 'choice.line-on-categorical', path: '/keys', field: 'pier' }]);
    expect(r.problems[0]!.hint).toMatch(/bars/);
  });

  it('the same form over a date key connects it, and states the decision', async () => {
    const { brief, fields } = await fieldsOf({ rows: [{ day: '2026-01-01', n: 1 }, { day: '2026-01-02', n: 2 }], keys: 'day', values: 'n' });
    const r = applyHardRules({ traits: { ...NONE, connectsKey: true }, form: 'line', brief, fields }, false);
    expect(r.problems).toEqual([]);
    expect(r.decisions.map((d) => d.rule).join(' ')).toMatch(/hard rule: a line implies an order/);
  });

  it('a radial form is refused a key that is not cyclic, and accepted for months', async () => {
    const radial = { ...NONE, radial: true };
    const piers = await fieldsOf({ rows: [{ pier: 'North', n: 1 }, { pier: 'South', n: 2 }, { pier: 'East', n: 3 }], keys: 'pier', values: 'n' });
    expect(applyHardRules({ traits: radial, form: 'radial-bar', ...piers }, false).problems).toMatchObject([{ code: 'choice.radial-not-cyclic', path: '/form' }]);
    const months = await fieldsOf({ rows: [{ m: 'Jan', n: 1 }, { m: 'Feb', n: 2 }, { m: 'Mar', n: 3 }], keys: 'm', values: 'n' });
    expect(applyHardRules({ traits: radial, form: 'radial-bar', ...months }, false).problems).toEqual([]);
  });

  it(`a form that colours categories is refused more than ${MAX_CATEGORICAL_COLOURS} of them`, async () => {
    const rows = Array.from({ length: 10 }, (_, i) => ({ k: 'a', g: `group ${i}`, n: i }));
    const { brief, fields } = await fieldsOf({ rows, keys: ['k', 'g'], values: 'n' });
    const r = applyHardRules({ traits: { ...NONE, coloursCategories: true }, form: 'grouped-bar', brief, fields }, false);
    expect(r.problems).toMatchObject([{ code: 'choice.too-many-colours', field: 'g' }]);
  });

  it('the colour limit is the style\'s own: a palette of 3 colours refuses a fourth level', async () => {
    const rows = Array.from({ length: 4 }, (_, i) => ({ k: 'a', g: `group ${i}`, n: i }));
    const { brief, fields } = await fieldsOf({ rows, keys: ['k', 'g'], values: 'n' });
    const traits = { ...NONE, coloursCategories: true };
    expect(applyHardRules({ traits, form: 'grouped bars', brief, fields, maxColours: 3 }, false).problems).toMatchObject([{ code: 'choice.too-many-colours', expected: 'at most 3' }]);
    expect(applyHardRules({ traits, form: 'grouped bars', brief, fields }, false).problems).toEqual([]);
  });

  it('a form that gives each value its own axis may show several values; others may not', async () => {
    const { brief, fields } = await fieldsOf({ rows: [{ k: 'a', x: 1, y: 2 }], keys: 'k', values: ['x', 'y'] });
    expect(applyHardRules({ traits: { ...NONE, axisPerValue: true }, form: 'parallel', brief, fields }, false).problems).toEqual([]);
    expect(applyHardRules({ traits: NONE, form: 'bar', brief, fields }, false).problems).toMatchObject([{ code: 'choice.too-many-values' }]);
  });

  it('only the zero-baseline rule has a lenient way out; the others always refuse', () => {
    expect(HARD_RULES.filter((r) => r.lenientFix).map((r) => r.id)).toEqual(['zero-baseline']);
  });
});

describe('the choice stage dispatches through the forms it is given', () => {
  it('with no form to draw it, a brief gets choice.no-rule rather than a crash', async () => {
    const { brief, fields, table } = await fieldsOf({ rows: [{ pier: 'North', n: 1 }], keys: 'pier', values: 'n', fields: { n: { unit: 'u' } } });
    const style = env.style('report', undefined);
    if (!style.ok) throw new Error('the report style must load');
    const r = choose(fields, brief, { style: style.value, measure: env.measure, lenient: false, forms: [] }, table);
    expect(r.ok).toBe(false);
    expect(codes(r)).toEqual(['choice.no-rule']);
  });

  it('every rule row leads to a registered form', async () => {
    const { RULES } = await import('../../src/choose/rules.js');
    for (const rule of RULES) expect(FORMS.map((f) => f.name)).toContain(rule.form);
  });
});

describe('intent options are kept and checked', () => {
  const piers = [{ pier: 'North', n: 3, t0: 1 }, { pier: 'South', n: 2, t0: 2 }];

  it('an option the intent does not use is refused, not silently dropped', async () => {
    const r = await renderRows({ intent: 'compare', keys: 'pier', values: 'n', start: 't0' }, piers);
    expect(r.ok).toBe(false);
    expect(r.diagnostics).toMatchObject([{ code: 'brief.option-not-used', path: '/start' }]);
    expect(r.diagnostics[0]!.hint).toMatch(/intent: schedule/);
  });

  it('an option naming a missing column is an error with a did-you-mean hint', async () => {
    const r = await renderRows({ intent: 'compare', keys: 'pier', values: 'n', start: 't9' }, piers);
    expect(codes(r)).toEqual(['brief.unknown-column', 'brief.option-not-used']);
    expect(r.diagnostics[0]).toMatchObject({ path: '/start', hint: 'did you mean `t0`?' });
  });

  it('the size-encoding option is called area, since size is the frame', async () => {
    const r = await renderRows({ intent: 'compare', keys: 'pier', values: 'n', area: 'n' }, piers);
    expect(r.diagnostics).toMatchObject([{ code: 'brief.option-not-used', path: '/area' }]);
  });
});
