import { quantile } from 'd3-array';
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { dumpScene, type DumpMark, type SceneDump } from '../../src/scene/dump.js';
import { renderDemo, renderRows, root, yaml } from '../helpers.js';

/** A demo CSV's rows as records of text. */
function csv(name: string): Record<string, string>[] {
  const [head, ...lines] = readFileSync(join(root, 'demo-data', name), 'utf8').trim().split('\n');
  const cols = head!.split(',');
  return lines.map((l) => Object.fromEntries(l.split(',').map((c, i) => [cols[i]!, c])));
}

/** The px of a value on a linear axis of the dump. */
function axisPx(dump: SceneDump, orient: 'left' | 'bottom') {
  const a = dump.axes.find((x) => x.orient === orient)!;
  const [d0, d1] = a.domain as number[];
  const [r0, r1] = a.range;
  return (v: number) => r0 + ((v - d0!) * (r1 - r0)) / (d1! - d0!);
}

/** No text off the canvas, and no two texts overlapping. */
function checkTexts(dump: SceneDump) {
  for (const t of dump.texts) {
    expect(t.x).toBeGreaterThanOrEqual(0);
    expect(t.x + t.width).toBeLessThanOrEqual(dump.width);
  }
  for (let i = 0; i < dump.texts.length; i++) {
    for (let j = i + 1; j < dump.texts.length; j++) {
      const [a, b] = [dump.texts[i]!, dump.texts[j]!];
      const overlap = a.x < b.x + b.width - 0.01 && b.x < a.x + a.width - 0.01 && a.y < b.y + b.height - 0.01 && b.y < a.y + a.height - 0.01;
      expect(overlap, `${a.text} / ${b.text}`).toBe(false);
    }
  }
}

function checkHistogram(dump: SceneDump, values: number[]) {
  const bins = dump.marks.filter((m) => m.role === 'bin').sort((a, b) => a.x! - b.x!);
  const [x, y] = [axisPx(dump, 'bottom'), axisPx(dump, 'left')];
  const perCount = Math.abs(y(1) - y(0));
  for (let i = 0; i < bins.length; i++) {
    const b = bins[i]!;
    const { x0, x1, count } = b.datum as { x0: number; x1: number; count: number };
    // Bars touch: each starts where the one before ends (the dump rounds to 1/1000 px).
    if (i > 0) expect(Math.abs(b.x! - (bins[i - 1]!.x! + bins[i - 1]!.width!))).toBeLessThanOrEqual(0.002);
    if (i > 0) expect(x0).toBe((bins[i - 1]!.datum as { x1: number }).x1);
    // Edges where the value axis puts them; height ∝ count from one zero baseline, within 0.5 px.
    expect(Math.abs(b.x! - x(x0))).toBeLessThanOrEqual(0.5);
    expect(Math.abs(b.x! + b.width! - x(x1))).toBeLessThanOrEqual(0.5);
    expect(Math.abs(b.height! - count * perCount)).toBeLessThanOrEqual(0.5);
    expect(Math.abs(b.y! + b.height! - y(0))).toBeLessThanOrEqual(0.5);
    // The count is the number of values in [x0, x1) (the last bin closed), counted here independently.
    const last = i === bins.length - 1;
    expect(count).toBe(values.filter((v) => v >= x0 && (v < x1 || (last && v === x1))).length);
  }
  // Every value lies in exactly one bin.
  for (const v of values) {
    const holding = bins.filter((b, i) => { const d = b.datum as { x0: number; x1: number }; return v >= d.x0 && (v < d.x1 || (i === bins.length - 1 && v === d.x1)); });
    expect(holding).toHaveLength(1);
  }
  expect(bins.reduce((s, b) => s + (b.datum!.count as number), 0)).toBe(values.length);
  expect(dump.axes.find((a) => a.orient === 'left')!.title).toMatch(/^Number of rows \(bins of /);
  checkTexts(dump);
}

/** The centre of each group's row on the left band axis, and the step between rows. */
function bands(dump: SceneDump) {
  const a = dump.axes.find((x) => x.orient === 'left')!;
  const centre = new Map((a.ticks as string[]).map((t, i) => [t, a.tickPositions[i]!]));
  const step = Math.abs(a.range[1] - a.range[0]) / a.ticks.length;
  return { centre, step, order: a.ticks as string[] };
}

function groupsOf(rows: Record<string, string>[], key: string, value: string): Map<string, number[]> {
  const out = new Map<string, number[]>();
  for (const r of rows) out.set(r[key]!, [...(out.get(r[key]!) ?? []), Number(r[value])]);
  return out;
}

describe('histogram contracts', () => {
  it('ferry-waits: bars touch, heights ∝ counts from zero, every value in exactly one bin', async () => {
    const { dump } = await renderDemo(join(root, 'demo-data', 'ferry-waits.yaml'));
    checkHistogram(dump, csv('ferry-waits.csv').map((r) => Number(r.wait)));
  });

  it('the count axis ticks whole numbers only, at every height (no "2.5 rows")', async () => {
    for (const height of [200, 300, 440, 900]) {
      const r = await renderRows({ intent: 'distribution', values: 'v', fields: { v: { unit: 'u' } }, size: { width: 600, height } }, [7, 7, 7, 2].map((v) => ({ v })));
      const ticks = dumpScene(r.scene!).axes.find((a) => a.orient === 'left')!.ticks as number[];
      expect(ticks.every(Number.isInteger), `${height}: ${ticks}`).toBe(true);
    }
  });

  it('edge cases keep the contracts: one repeated value, an IQR of zero, negative values, values on edges', async () => {
    const cases = [[7, 7, 7], [...Array(20).fill(5), 1, 9], [-3.5, -2, -2, 0, 1.25, 4, 4, 4.5], [0, 10, 20, 30, 40, 50, 60, 70, 80, 90, 100]];
    for (const values of cases) {
      const r = await renderRows({ intent: 'distribution', values: 'v', fields: { v: { unit: 'u' } } }, values.map((v) => ({ v })));
      checkHistogram(dumpScene(r.scene!), values);
    }
  });
});

/** Box contracts: quartiles, median and whiskers at their type-7 values (d3-array, independently) and at their pixels; outliers drawn. */
function checkBoxes(dump: SceneDump, groups: Map<string, number[]>, key: string) {
  const x = axisPx(dump, 'bottom');
  const { centre, step } = bands(dump);
  const boxes = dump.marks.filter((m): m is DumpMark & { datum: Record<string, number> } => m.role === 'box' && m.kind === 'rect');
  expect(boxes).toHaveLength(groups.size);
  for (const b of boxes) {
    const label = b.datum[key] as unknown as string;
    const values = groups.get(label)!;
    // Independent quartiles: d3-array's quantile.
    const [q1, med, q3] = [0.25, 0.5, 0.75].map((p) => quantile(values, p)!) as [number, number, number];
    expect(b.datum.q1).toBeCloseTo(q1, 9);
    expect(b.datum.median).toBeCloseTo(med, 9);
    expect(b.datum.q3).toBeCloseTo(q3, 9);
    const inside = values.filter((v) => v >= q1 - 1.5 * (q3 - q1) && v <= q3 + 1.5 * (q3 - q1));
    expect(b.datum.low).toBe(Math.min(...inside));
    expect(b.datum.high).toBe(Math.max(...inside));
    expect(b.datum.outliers).toBe(values.length - inside.length);
    // The box spans q1 to q3 in px and sits in its group's row.
    expect(Math.abs(b.x! - x(q1))).toBeLessThanOrEqual(0.5);
    expect(Math.abs(b.x! + b.width! - x(q3))).toBeLessThanOrEqual(0.5);
    expect(Math.abs(b.y! + b.height! / 2 - centre.get(label)!)).toBeLessThanOrEqual(0.5);
    // The whiskers' path reaches the whisker ends; the median line sits at the median.
    const whisker = dump.marks.find((m) => m.role === 'box' && m.datum?.part === 'whiskers' && m.datum[key] === label)!;
    const xs = whisker.d!.match(/[ML](-?[\d.]+)/g)!.map((t) => Number(t.slice(1)));
    expect(Math.abs(Math.min(...xs) - x(b.datum.low!))).toBeLessThanOrEqual(0.5);
    expect(Math.abs(Math.max(...xs) - x(b.datum.high!))).toBeLessThanOrEqual(0.5);
    const median = dump.marks.find((m) => m.role === 'box' && m.datum?.part === 'median' && m.datum[key] === label)!;
    expect(Math.abs(Number(median.d!.match(/^M(-?[\d.]+)/)![1]) - x(med))).toBeLessThanOrEqual(0.5);
    const outliers = dump.marks.filter((m) => m.role === 'point' && m.datum?.[key] === label);
    expect(outliers).toHaveLength(values.length - inside.length);
    for (const o of outliers) expect(Math.abs(o.cy! - centre.get(label)!)).toBeLessThanOrEqual(step / 2);
  }
  checkTexts(dump);
}

describe('box plot contracts', () => {
  it('ferry-delays (boxes by the rule): quartiles, whiskers and outliers at their values and pixels', async () => {
    const { result, dump } = await renderDemo(join(root, 'demo-data', 'ferry-delays.yaml'));
    expect(result.choice!.form).toBe('box');
    checkBoxes(dump, groupsOf(csv('ferry-delays.csv'), 'route', 'delay'), 'route');
  });

  it('hut-walks pinned to boxes keeps the same contracts', async () => {
    const { data: _data, ...brief } = yaml(readFileSync(join(root, 'demo-data', 'hut-walks.yaml'), 'utf8'));
    const rows = csv('hut-walks.csv').map((r) => ({ route: r.route!, minutes: Number(r.minutes) }));
    const r = await renderRows({ ...brief, form: 'box' }, rows);
    expect(r.ok).toBe(true);
    checkBoxes(dumpScene(r.scene!), groupsOf(csv('hut-walks.csv'), 'route', 'minutes'), 'route');
  });
});

describe('strip contracts', () => {
  it('hut-walks: one dot per value at its value, inside its group\'s row; groups sorted by median', async () => {
    const { dump } = await renderDemo(join(root, 'demo-data', 'hut-walks.yaml'));
    const groups = groupsOf(csv('hut-walks.csv'), 'route', 'minutes');
    const x = axisPx(dump, 'bottom');
    const { centre, step, order } = bands(dump);
    const dots = dump.marks.filter((m) => m.role === 'point');
    expect(dots).toHaveLength([...groups.values()].reduce((s, v) => s + v.length, 0));
    for (const d of dots) {
      const label = d.datum!.route as string;
      expect(Math.abs(d.cx! - x(d.datum!.minutes as number))).toBeLessThanOrEqual(0.5);
      // Inside the group's row: the dot's whole disc within half a step of the row's centre.
      expect(Math.abs(d.cy! - centre.get(label)!) + d.r!).toBeLessThanOrEqual(step / 2);
    }
    const medians = order.map((g) => quantile(groups.get(g)!, 0.5)!);
    for (let i = 1; i < medians.length; i++) expect(medians[i]!).toBeLessThanOrEqual(medians[i - 1]!);
    checkTexts(dump);
  });

  it('jitter is deterministic: the same rows, or the rows shuffled, give the same dots', async () => {
    const rows = csv('hut-walks.csv').map((r) => ({ route: r.route, minutes: Number(r.minutes) }));
    const brief = { intent: 'distribution', keys: 'route', values: 'minutes', fields: { minutes: { unit: 'min' } } };
    const dots = async (rs: typeof rows) => dumpScene((await renderRows(brief, rs)).scene!).marks.filter((m) => m.role === 'point').map((m) => `${m.datum!.route} ${m.datum!.minutes} ${m.cx} ${m.cy}`).sort();
    const first = await dots(rows);
    expect(await dots(rows)).toEqual(first);
    const shuffled = rows.map((r, i) => ({ r, k: (i * 7919) % rows.length })).sort((a, b) => a.k - b.k).map((o) => o.r);
    expect(shuffled).not.toEqual(rows);
    expect(await dots(shuffled)).toEqual(first);
    // And the dots do spread: a strip of 30 values uses more than a third of its row's height.
    const spread = dumpScene((await renderRows(brief, rows)).scene!).marks.filter((m) => m.role === 'point' && m.datum!.route === 'Valley path').map((m) => m.cy!);
    expect(Math.max(...spread) - Math.min(...spread)).toBeGreaterThan(bands(dumpScene((await renderRows(brief, rows)).scene!)).step / 3);
  });
});
