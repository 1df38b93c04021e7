import { describe, expect, it } from 'vitest';
import { resolveBrief } from '../../src/brief/resolve.js';
import { applyHardRules } from '../../src/choose/hard-rules.js';
import type { FormTraits } from '../../src/choose/types.js';
import { inferFields } from '../../src/fields/infer.js';
import { readTable } from '../../src/table/load.js';
import { memoryFiles } from '../helpers.js';

const NONE: FormTraits = { lengthCoded: false, connectsKey: false, radial: false, coloursCategories: false, axisPerValue: false };

async function fieldsOf(brief: Record<string, unknown>) {
  const resolved = resolveBrief({ intent: 'part-to-whole', values: 'n', ...brief });
  const table = await readTable(resolved.data, resolved.fields, undefined, memoryFiles({}));
  if (!table.ok) throw new Error('table');
  const fields = inferFields(table.value, resolved);
  if (!fields.ok) throw new Error(JSON.stringify(fields.diagnostics));
  return { brief: resolved, fields: fields.value };
}
const parts = (n: number) => Array.from({ length: n }, (_, i) => ({ kind: `K${i}`, n: i + 1 }));

describe('the radial rule\'s one exception: the parts of one whole', () => {
  const donut = { ...NONE, radial: true, partsOfWhole: true };

  it('allows 2 or 3 parts of a categorical key, and says why in its decision', async () => {
    for (const n of [2, 3]) {
      const r = applyHardRules({ traits: donut, form: 'donut chart', ...(await fieldsOf({ rows: parts(n), keys: 'kind', form: 'donut' })) }, false);
      expect(r.problems).toEqual([]);
      expect(r.decisions.find((d) => d.decision.startsWith('laid out around a circle'))!.rule).toMatch(/except a donut the brief pins with 2 or 3 parts/);
    }
  });

  it('refuses 1 or 4 parts with its own code, explaining angles against aligned lengths', async () => {
    for (const n of [1, 4]) {
      const r = applyHardRules({ traits: donut, form: 'donut chart', ...(await fieldsOf({ rows: parts(n), keys: 'kind', form: 'donut' })) }, false);
      expect(r.problems).toMatchObject([{ code: 'choice.donut-too-many-parts', path: '/form', field: 'kind', found: `${n} part${n === 1 ? '' : 's'}` }]);
    }
  });

  it('keeps the rule for every other radial form: 3 categories are still refused', async () => {
    const r = applyHardRules({ traits: { ...NONE, radial: true }, form: 'radial bars', ...(await fieldsOf({ rows: parts(3), keys: 'kind' })) }, false);
    expect(r.problems).toMatchObject([{ code: 'choice.radial-not-cyclic' }]);
  });
});

describe('the colour rule, kept by folding', () => {
  const rows = Array.from({ length: 10 }, (_, i) => ({ site: 'A', kind: `K${i}`, n: 1 }));

  it('a form that folds extra categories into "Other" is not refused, and says what colour tells apart', async () => {
    const f = await fieldsOf({ rows, keys: ['site', 'kind'] });
    const r = applyHardRules({ traits: { ...NONE, coloursCategories: true, foldsColours: true }, form: 'normalized bar chart', ...f }, false);
    expect(r.problems).toEqual([]);
    expect(r.decisions.map((d) => d.decision)).toContain('colour tells the 8 largest levels of `kind` apart; the other 2 share one neutral "Other"');
  });

  it('a form that does not fold is refused the same 10 levels', async () => {
    const f = await fieldsOf({ rows, keys: ['site', 'kind'] });
    expect(applyHardRules({ traits: { ...NONE, coloursCategories: true }, form: 'stacked bar chart', ...f }, false).problems).toMatchObject([{ code: 'choice.too-many-colours' }]);
  });
});
