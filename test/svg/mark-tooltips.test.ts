import { describe, expect, it } from 'vitest';
import { render } from '../../src/index.js';
import { env } from '../helpers.js';

function titles(svg: string, tag: string): string[] {
  return [...svg.matchAll(new RegExp(`<${tag} class="bar"[^>]*><title>([^<]*)</title>`, 'g'))].map((m) => m[1]!);
}

// Issue 6: a bar's tooltip showed the raw column names and unformatted numbers ("revenue_eur: 4200000").
describe('per-mark tooltips', () => {
  it('a bar names its key and value by their labels and prints the value as its label does', async () => {
    const brief = { intent: 'compare', keys: 'shop', values: 'revenue_eur', fields: { revenue_eur: { label: 'Revenue', unit: '€' } } };
    const { svg } = await render(brief, [{ shop: 'North', revenue_eur: 4_200_000 }, { shop: 'South', revenue_eur: 350_000 }], { env });
    const [first] = titles(svg, 'rect');
    expect(first).toMatch(/^Shop: North, Revenue \(€\): /);
    expect(first).not.toContain('revenue_eur');
    expect(first).not.toContain('4200000');
    // The value label printed beside the bar is the same text as the tooltip's value.
    const printed = first!.split(': ').at(-1)!;
    expect(svg).toContain(`>${printed}</text>`);
  });

  it('a grouped bar names its key, its group and its value by their labels', async () => {
    const brief = { intent: 'compare', keys: ['shop', 'year'], values: 'sales', form: 'grouped-bar', fields: { sales: { unit: 'units' } } };
    const rows = [{ shop: 'North', year: 'Last', sales: 12_500 }, { shop: 'North', year: 'This', sales: 14_000 }, { shop: 'South', year: 'Last', sales: 9_000 }, { shop: 'South', year: 'This', sales: 8_000 }];
    const { svg } = await render(brief, rows, { env });
    expect(titles(svg, 'rect')).toHaveLength(4);
    for (const t of titles(svg, 'rect')) expect(t).toMatch(/^Shop: (North|South), Year: (Last|This), Sales \(units\): \d{1,2}(,\d{3}|k|\.\d+k)?/);
  });

  it('a stacked segment names its group, its part and its value by their labels', async () => {
    const brief = { intent: 'composition', keys: ['shop', 'kind'], values: 'sales', fields: { sales: { unit: 'units' } } };
    const rows = [{ shop: 'North', kind: 'Tea', sales: 1_200 }, { shop: 'North', kind: 'Cake', sales: 800 }, { shop: 'South', kind: 'Tea', sales: 900 }, { shop: 'South', kind: 'Cake', sales: 700 }];
    const { svg } = await render(brief, rows, { env });
    const segments = [...svg.matchAll(/<rect class="segment"[^>]*><title>([^<]*)<\/title>/g)].map((m) => m[1]!);
    expect(segments).toHaveLength(4);
    for (const t of segments) expect(t).toMatch(/^Shop: (North|South), Kind: (Tea|Cake), [^:]+: [\d,.k%]+$/);
  });

  it('a radial bar names its key and value by their labels', async () => {
    const months = ['Jan', 'Feb', 'Mar', 'Apr', 'May', 'Jun', 'Jul', 'Aug', 'Sep', 'Oct', 'Nov', 'Dec'];
    const brief = { intent: 'cycle', keys: 'month', values: 'rain_mm', fields: { rain_mm: { label: 'Rain', unit: 'mm' } } };
    const { svg } = await render(brief, months.map((month, i) => ({ month, rain_mm: 40 + i * 1.5 })), { env });
    const bars = [...svg.matchAll(/<path class="bar"[^>]*><title>([^<]*)<\/title>/g)].map((m) => m[1]!);
    expect(bars).toHaveLength(12);
    for (const t of bars) expect(t).toMatch(/^Month: [A-Z][a-z]{2}, Rain \(mm\): \d+(\.\d)?$/);
  });
});

describe('generated descriptions keep the case of labels', () => {
  it('a pH value keeps "pH" and its unit keeps its capitals', async () => {
    const brief = { intent: 'compare', keys: 'lab', values: 'ph', fields: { ph: { label: 'pH shift', unit: 'pH units' } } };
    const { scene } = await render(brief, [{ lab: 'A', ph: 0.4 }, { lab: 'B', ph: 0.7 }], { env });
    expect(scene.description).toContain('pH shift (pH units)');
  });

  it('a temperature in °C keeps its capital C', async () => {
    const brief = { intent: 'compare', keys: 'lake', values: 'temp', fields: { temp: { label: 'Water temperature', unit: '°C' } } };
    const { scene } = await render(brief, [{ lake: 'A', temp: 14 }, { lake: 'B', temp: 17 }], { env });
    expect(scene.description).toContain('water temperature (°C)');
  });
});
