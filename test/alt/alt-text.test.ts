import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { csvParse } from 'd3-dsv';
import { format } from 'd3-format';
import { sampleCorrelation } from 'simple-statistics';
import { describe, expect, it } from 'vitest';
import { FORMS } from '../../src/forms/registry.js';
import { MAX_ALT_CHARS } from '../../src/forms/alt-words.js';
import { demoBriefs, parseXml, renderDemo, root } from '../helpers.js';

/** The words each form's alt text must name it by. */
const FORM_WORDS: Record<string, string> = {
  'bar': 'Bar chart', 'grouped-bar': 'Grouped bar chart', 'line': 'Line chart', 'index-line': 'Index line chart', 'change-bar': 'Bar chart of % change',
  'slope': 'Slope chart', 'gantt': 'Gantt chart', 'scatter': 'Scatter plot', 'dot': 'plot of', 'stacked-bar': 'Stacked bar chart',
  'normalized-bar': 'Normalized stacked bar chart', 'donut': 'Donut chart', 'histogram': 'Histogram', 'strip': 'Strip chart', 'box': 'Box plot',
  'radial-bar': 'Radial bar chart', 'stream': 'Streamgraph', 'parallel': 'Parallel coordinates', 'scatter-matrix': 'Scatterplot matrix',
  'heatmap': 'Heat map', 'dense': 'Dense pixel layout',
};

const data = (name: string) => csvParse(readFileSync(join(root, 'demo-data', `${name}.csv`), 'utf8'));
const grouped = format(',');
const altOf = async (name: string) => (await renderDemo(join(root, 'demo-data', `${name}.yaml`))).result.scene!.alt!;

describe('alt text', () => {
  it('every registered form has an alt text hook', () => {
    expect(FORMS.filter((f) => typeof f.alt !== 'function').map((f) => f.name)).toEqual([]);
    expect(Object.keys(FORM_WORDS).sort()).toEqual(FORMS.map((f) => f.name).sort());
  });

  it('every gallery chart has alt text naming its form, at most 600 characters, in the SVG <desc> and the scene dump', async () => {
    for (const file of demoBriefs()) {
      const { result, dump } = await renderDemo(file);
      const alt = result.scene!.alt!;
      expect(alt, file).toContain(FORM_WORDS[result.scene!.form]!);
      expect(alt.length, file).toBeLessThanOrEqual(MAX_ALT_CHARS);
      expect(dump.alt).toBe(alt);
      const doc = parseXml(result.svg!);
      const svg = doc.documentElement;
      expect(svg.getAttribute('role')).toBe('img');
      const ids = svg.getAttribute('aria-labelledby')!.split(' ');
      const [title, desc] = ids.map((id) => Array.from(doc.getElementsByTagName('*')).find((e) => e.getAttribute('id') === id));
      expect(title?.tagName, file).toBe('title');
      expect(desc?.tagName, file).toBe('desc');
      expect(desc!.textContent).toBe(alt);
    }
  });

  it('bar chart: names the largest and smallest bar with the values its labels print', async () => {
    const rows = data('ferry-crossings');
    const byValue = [...rows].sort((a, b) => Number(b.crossings) - Number(a.crossings));
    const [top, low] = [byValue[0]!, byValue[byValue.length - 1]!];
    expect(await altOf('ferry-crossings')).toContain(`largest ${top.pier} (${grouped(Number(top.crossings))}), smallest ${low.pier} (${grouped(Number(low.crossings))})`);
  });

  it('line chart: each line rose or fell by the sign of last − first, with the percent change between them', async () => {
    const alt = await altOf('tram-riders');
    for (const line of ['Harbour', 'Hill', 'University']) {
      const values = data('tram-riders').filter((r) => r.line === line && r.riders !== '').map((r) => Number(r.riders));
      const [first, last] = [values[0]!, values[values.length - 1]!];
      const pct = Math.abs((last - first) / first) * 100;
      const verb = last > first ? 'rose' : 'fell';
      expect(alt).toContain(`${line} ${verb} ${format('.2~r')(pct)}% from ${grouped(first)} in Jan 2024 to ${grouped(last)} in Jun 2025`);
    }
  });

  it('histogram: the median and quartiles of the values (Hyndman–Fan type 7, as R and d3-array compute them)', async () => {
    const values = data('ferry-waits').map((r) => Number(r.wait)).sort((a, b) => a - b);
    // R-7 quantile by hand: h = (n − 1)p, interpolate between the values around h.
    const q = (p: number) => { const h = (values.length - 1) * p; const lo = Math.floor(h); return values[lo]! + (h - lo) * (values[lo + 1]! - values[lo]!); };
    const two = (n: number) => format('.2~f')(n);
    expect(await altOf('ferry-waits')).toContain(`median ${two(q(0.5))} minutes, middle half from ${two(q(0.25))} to ${two(q(0.75))} minutes (IQR ${two(q(0.75) - q(0.25))})`);
  });

  it('scatter plot: Pearson r and n (simple-statistics sampleCorrelation)', async () => {
    const rows = data('orchard-plots');
    const r = sampleCorrelation(rows.map((p) => Number(p.rainfall)), rows.map((p) => Number(p.yield)));
    expect(await altOf('orchard-plots')).toContain(`(Pearson r = ${r.toFixed(2)}, n = ${rows.length})`);
  });

  it('slope chart: the biggest riser and faller by the change between the two seasons', async () => {
    const rows = data('hut-occupancy-shift');
    const huts = [...new Set(rows.map((r) => r.hut!))].map((hut) => {
      const [a, b] = ['2025', '2026'].map((s) => Number(rows.find((r) => r.hut === hut && r.season === s)!.occupancy));
      return { hut, a: a!, b: b!, change: b! - a! };
    }).sort((x, y) => y.change - x.change);
    const up = huts[0]!;
    const fallers = huts.filter((h) => h.change === huts[huts.length - 1]!.change);
    const alt = await altOf('hut-occupancy-shift');
    expect(alt).toContain(`the biggest riser is ${up.hut} (from ${up.a} to ${up.b}`);
    // Two huts fell by the same most: both are named.
    expect(fallers.length).toBe(2);
    for (const f of fallers) expect(alt).toContain(`${f.hut} (from ${f.a} to ${f.b}`);
    expect(alt).toContain('the biggest fallers, tied, are');
  });

  it('donut: the largest and smallest parts as the whole percents the wedges print', async () => {
    const rows = data('market-payments');
    const total = rows.reduce((s, r) => s + Number(r.payments), 0);
    const pct = (m: string) => `${Math.round((Number(rows.find((r) => r.method === m)!.payments) / total) * 100)}%`;
    expect(await altOf('market-payments')).toContain(`largest part Card (${pct('Card')}), smallest Phone (${pct('Phone')})`);
  });

  it('Gantt chart: the whole span in days, from the first start to the last end', async () => {
    const rows = data('pier-refit');
    const starts = rows.map((r) => r.start!).sort();
    const ends = rows.map((r) => r.end!).sort();
    const days = (Date.parse(ends[ends.length - 1]!) - Date.parse(starts[0]!)) / 86_400_000;
    expect(await altOf('pier-refit')).toContain(`from ${starts[0]} (Survey the old pier) to ${ends[ends.length - 1]} (Reopen the north berth), ${days} days in all`);
  });

  it('heat map: the highest and lowest cells, and clusters that together hold every row once', async () => {
    const rows = data('marsh-birds');
    const byValue = [...rows].sort((a, b) => Number(b.birds) - Number(a.birds));
    const top = byValue[0]!;
    // Five cells share the lowest value, 0: three are named in the heat map's drawing order, two counted.
    const lowest = byValue.filter((r) => r.birds === byValue[byValue.length - 1]!.birds);
    const alt = await altOf('marsh-birds');
    expect(lowest.length).toBe(5);
    expect(alt).toContain(`highest ${top.species} at ${top.plot} (${top.birds}), lowest `);
    expect(alt).toMatch(/lowest [^(]* and 2 more \(0 each\)/);
    expect(lowest.filter((r) => alt.includes(`${r.species} at ${r.plot}`)).length).toBe(3);
    const clusters = /form (\d+) clusters: ([^.]*)\./.exec(alt)!;
    const groups = clusters[2]!.split('; ');
    expect(groups.length).toBe(Number(clusters[1]));
    // Each group is named in full or counted ("and 1 more"): the named and counted rows add up to the species drawn.
    const size = (g: string) => g.split(/, | and /).filter((n) => !/^\d+ more$/.test(n)).length + Number(/and (\d+) more$/.exec(g)?.[1] ?? 0);
    expect(groups.reduce((s, g) => s + size(g), 0)).toBe(new Set(rows.map((r) => r.species)).size);
  });

  it('small multiples: one sentence per panel at most, capped, ending with what was left out', async () => {
    const alt = await altOf('dock-rentals');
    expect(alt.length).toBeLessThanOrEqual(MAX_ALT_CHARS);
    expect(alt).toMatch(/Drawn as 10 panels, one per dock\./);
    expect(alt).toMatch(/\(\d+ more sentences left out\.\)$/);
    const season = await altOf('hut-season');
    for (const hut of new Set(data('hut-season').map((r) => r.hut!))) expect(season.split(`${hut}: `).length - 1).toBe(1);
  });

  it('says what the chart combined: rows sharing a key summed', async () => {
    expect(await altOf('market-stalls')).toContain('2 rows per weekday were summed.');
  });
});
