import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { dumpScene } from '../../src/scene/dump.js';
import { bars } from '../contracts/bar-contracts.js';
import { codes, renderRows, runs } from '../helpers.js';

const SHORT = ['Jan', 'Feb', 'Mar', 'Apr', 'May', 'Jun', 'Jul', 'Aug', 'Sep', 'Oct', 'Nov', 'Dec'];
const LONG = ['January', 'February', 'March', 'April', 'May', 'June', 'July', 'August', 'September', 'October', 'November', 'December'];

/** The bar keys of a compare chart of rows { k, v }, in drawing order, with its rationale and codes. */
async function compare(keys: string[], brief: Record<string, unknown> = {}) {
  const r = await renderRows({ intent: 'compare', keys: 'k', values: 'v', fields: { v: { unit: 'kg' } }, ...brief }, keys.map((k, i) => ({ k, v: (i * 7) % 5 + 1 })));
  expect(r.scene, JSON.stringify(r.diagnostics)).toBeDefined();
  return { order: bars(dumpScene(r.scene!)).map((b) => String(b.datum!.k)), rules: r.rationale.map((d) => d.rule).join('\n'), codes: codes(r) };
}

/** A spelling of month m (0–11) of a year, and the label chartwright draws for it. */
const SPELLINGS: Record<string, { write: (y: number, m: number) => string; label: (y: number, m: number) => string; step: number }> = {
  'month names': { write: (y, m) => `${LONG[m]} ${y}`, label: (y, m) => `${SHORT[m]} ${y}`, step: 1 },
  'month abbreviations': { write: (y, m) => `${m === 8 ? 'Sept' : SHORT[m]} ${y}`, label: (y, m) => `${SHORT[m]} ${y}`, step: 1 },
  'year-quarter': { write: (y, m) => `${y}-Q${m / 3 + 1}`, label: (y, m) => `Q${m / 3 + 1} ${y}`, step: 3 },
  'quarter-year': { write: (y, m) => `Q${m / 3 + 1} ${y}`, label: (y, m) => `Q${m / 3 + 1} ${y}`, step: 3 },
  'tick format': { write: (y, m) => `1 ${SHORT[m]} ${y}`, label: (y, m) => `1 ${SHORT[m]} ${y}`, step: 1 },
};

describe('recognised periods are ordered keys', () => {
  it('shuffled rows of recognised periods come out in calendar order, in every spelling', async () => {
    await fc.assert(fc.asyncProperty(
      fc.constantFrom(...Object.keys(SPELLINGS)), fc.integer({ min: 1990, max: 2030 }), fc.integer({ min: 3, max: 10 }), fc.infiniteStream(fc.double({ min: 0, max: 1, noNaN: true })),
      async (kind, year, count, noise) => {
        const s = SPELLINGS[kind]!;
        const periods = Array.from({ length: count }, (_, i) => i * s.step).map((n) => ({ y: year + Math.floor(n / 12), m: n % 12 }));
        const shuffled = periods.map((p) => ({ p, r: noise.next().value })).sort((a, b) => a.r - b.r).map((x) => x.p);
        const { order, rules } = await compare(shuffled.map(({ y, m }) => s.write(y, m)));
        expect(order).toEqual(periods.map(({ y, m }) => s.label(y, m)));
        expect(rules).not.toContain('a categorical key has no order of its own');
      }), { numRuns: runs(25) });
  });

  it('quarters are named as quarters ("Q1 2025"), not by their first month', async () => {
    expect((await compare(['2025-Q2', '2025-Q1', '2024-Q4'])).order).toEqual(['Q4 2024', 'Q1 2025', 'Q2 2025']);
  });

  it('ISO weeks are drawn in week order', async () => {
    const { order } = await compare(['2026-W03', '2026-W01', '2026-W02', '2025-W52']);
    expect(order).toEqual(['22 Dec 2025', '29 Dec 2025', '5 Jan 2026', '12 Jan 2026']);
  });

  it('age bands are ordinal, ordered by their lower bound, open bands at the ends', async () => {
    const { order, rules } = await compare(['25–34', '65+', '18-24', 'under 5', '35-64', '5-17']);
    expect(order).toEqual(['under 5', '5-17', '18-24', '25–34', '35-64', '65+']);
    expect(rules).not.toContain('a categorical key has no order of its own');
    expect((await compare(['18-24', '<18', '25-34'])).order).toEqual(['<18', '18-24', '25-34']);
  });

  it('fiscal years are ordinal, in year order', async () => {
    const { order, rules } = await compare(['FY 2025/26', 'FY2023', 'FY 2024/25']);
    expect(order).toEqual(['FY2023', 'FY 2024/25', 'FY 2025/26']);
    expect(rules).not.toContain('a categorical key has no order of its own');
  });

  it('a key of ordinary names is still sorted by value (largest first), with no order warning', async () => {
    const r = await compare(['North', 'South', 'East']);
    expect(r.rules).toContain('a categorical key has no order of its own');
    expect(r.codes).not.toContain('fields.unrecognised-order');
  });
});

describe('slash dates and declared date formats', () => {
  it('slash dates without a format stay text, with a warning that says to give one', async () => {
    const r = await renderRows({ intent: 'compare', keys: 'k', values: 'v', fields: { v: { unit: 'kg' } } }, [{ k: '01/03/2026', v: 1 }, { k: '02/03/2026', v: 2 }]);
    expect(r.diagnostics.find((d) => d.code === 'table.slash-dates')).toMatchObject({ path: '/fields/k', severity: 'warning' });
  });

  it('`type: temporal` with a d3-time-format `format` reads slash dates in that order, as dates', async () => {
    const { order, codes: found } = await compare(['02/03/2026', '01/03/2026', '03/03/2026'], { fields: { v: { unit: 'kg' }, k: { type: 'temporal', format: '%d/%m/%Y' } } });
    expect(order).toEqual(['1 Mar 2026', '2 Mar 2026', '3 Mar 2026']);
    expect(found).not.toContain('table.slash-dates');
    expect(found).not.toContain('brief.bad-format');
  });

  it('a format the cells do not fit is refused as a type mismatch on the field', async () => {
    const r = await renderRows({ intent: 'compare', keys: 'k', values: 'v', fields: { k: { type: 'temporal', format: '%d/%m/%Y' } } }, [{ k: '2026-03-01', v: 1 }]);
    expect(r.diagnostics.find((d) => d.code === 'table.type-mismatch')).toMatchObject({ path: '/fields/k/type' });
  });
});

describe('keys that look ordered but are not read as such', () => {
  it('warns before sorting a digit-led key by value, naming how to declare its order', async () => {
    const r = await renderRows({ intent: 'compare', keys: 'k', values: 'v', fields: { v: { unit: 'kg' } } }, [{ k: '10-19 kg', v: 1 }, { k: '1-9 kg', v: 3 }, { k: '20+ kg', v: 2 }]);
    expect(r.diagnostics.find((d) => d.code === 'fields.unrecognised-order')).toMatchObject({ path: '/fields/k', field: 'k', severity: 'warning' });
  });

  it('says nothing when the brief chooses the order itself', async () => {
    const r = await renderRows({ intent: 'compare', keys: 'k', values: 'v', order: 'label', fields: { v: { unit: 'kg' } } }, [{ k: '10-19 kg', v: 1 }, { k: '1-9 kg', v: 3 }]);
    expect(codes(r)).not.toContain('fields.unrecognised-order');
  });
});
