import { readFileSync } from 'node:fs';
import type { BarPlan } from '../../src/forms/bar-plan.js';
import { describe, expect, it } from 'vitest';
import { bars, checkBarContracts } from './bar-contracts.js';
import { demoBriefs, renderDemo, renderRows, yaml } from '../helpers.js';
import { readDateText } from '../../src/table/date-format.js';

/** German month abbreviations (CLDR 48, de.xml, format context) as the English ones the date reader knows: a `locale: de` chart labels its date keys in German. */
const GERMAN_MONTHS: Record<string, string> = { 'Jan.': 'Jan', 'Feb.': 'Feb', 'März': 'Mar', 'Apr.': 'Apr', 'Mai': 'May', 'Juni': 'Jun', 'Juli': 'Jul', 'Aug.': 'Aug', 'Sept.': 'Sep', 'Okt.': 'Oct', 'Nov.': 'Nov', 'Dez.': 'Dec' };
const inEnglish = (label: string) => label.split(' ').map((w) => GERMAN_MONTHS[w] ?? w).join(' ');

/** Gallery briefs drawn as one plain bar chart: one key, no panels (grouped bars and small multiples have contracts of their own). */
const plainBars = (file: string) => { const b = yaml(readFileSync(file, 'utf8')); return typeof b.keys === 'string' && b.facet === undefined; };

describe('perceptual contracts on every gallery chart', () => {
  it('the gallery has bar charts to check', async () => {
    const forms = await Promise.all(demoBriefs().filter(plainBars).map(async (f) => (await renderDemo(f)).result.choice?.form));
    expect(forms.filter((f) => f === 'bar').length).toBeGreaterThanOrEqual(5);
  });

  for (const file of demoBriefs().filter(plainBars)) {
    it(`${file.split('/').pop()} keeps the bar chart contracts`, async () => {
      const { result, dump } = await renderDemo(file);
      // Other forms keep their own contracts (test/contracts/scatter.test.ts, …).
      if (result.choice!.form !== 'bar') return;
      const plan = (result.choice!.plan as BarPlan);
      checkBarContracts(dump, plan.value!.name, plan.key.name);
      const values = bars(dump).map((b) => b.datum![plan.value!.name] as number);
      if (plan.order === 'value') {
        for (let i = 1; i < values.length; i++) expect(values[i]!).toBeLessThanOrEqual(values[i - 1]!);
      } else if (plan.key.type === 'temporal') {
        // A date key has no levels: its bars, labelled at the data's grain, run in time order.
        const times = bars(dump).map((b) => readDateText(inEnglish(String(b.datum![plan.key.name])))!.time);
        for (let i = 1; i < times.length; i++) expect(times[i]!).toBeGreaterThan(times[i - 1]!);
      } else {
        expect(bars(dump).map((b) => b.datum![plan.key.name])).toEqual(plan.key.levels.filter((l) => bars(dump).some((b) => b.datum![plan.key.name] === l)));
      }
      // Bars are drawn in order along the key axis: top to bottom, or left to right.
      const along = bars(dump).map((b) => (plan.orientation === 'vertical' ? b.x! : b.y!));
      for (let i = 1; i < along.length; i++) expect(along[i]!).toBeGreaterThan(along[i - 1]!);
    });
  }
});

describe('perceptual contracts on edge cases', () => {
  it('a folded chart keeps every bar at least 3 px thick, "Others" last, and its note in the chart', async () => {
    // A few large keys and a long tail of small ones, whose total stays below the largest bar.
    const rows = [...Array.from({ length: 5 }, (_, i) => ({ k: `Big ${i}`, v: 10000 - i })), ...Array.from({ length: 395 }, (_, i) => ({ k: `Key ${i}`, v: (i % 3) + 1 }))];
    const r = await renderRows({ intent: 'compare', keys: 'k', values: 'v' }, rows);
    const { dumpScene } = await import('../../src/scene/dump.js');
    const dump = dumpScene(r.scene!);
    checkBarContracts(dump, 'v', 'k');
    const marks = bars(dump);
    // Thickness across the key axis: the band step is at least 3 px, less the band padding.
    const vertical = dump.axes[0]!.orient === 'left';
    for (const b of marks) expect(vertical ? b.width! : b.height!).toBeGreaterThanOrEqual(3 * (1 - 0.22) - 1e-9);
    expect(String(marks[marks.length - 1]!.datum!.k)).toMatch(/^Others \(\d+\)$/);
    const total = rows.reduce((s, x) => s + x.v, 0);
    expect(marks.reduce((s, b) => s + (b.datum!.v as number), 0)).toBe(total);
    expect(dump.texts.some((t) => t.role === 'note' && t.text.includes('Others'))).toBe(true);
  });

  it('a heavy tail is stated in the note rather than drawn as an "Others" bar that squashes the rest', async () => {
    const rows = Array.from({ length: 400 }, (_, i) => ({ k: `Key ${i}`, v: (i * 37) % 101 + 1 }));
    const r = await renderRows({ intent: 'compare', keys: 'k', values: 'v' }, rows);
    const { dumpScene } = await import('../../src/scene/dump.js');
    const dump = dumpScene(r.scene!);
    checkBarContracts(dump, 'v', 'k');
    const marks = bars(dump);
    expect(marks.some((b) => String(b.datum!.k).startsWith('Others'))).toBe(false);
    const shownTotal = marks.reduce((s, b) => s + (b.datum!.v as number), 0);
    const rest = rows.reduce((s, x) => s + x.v, 0) - shownTotal;
    expect(rest).toBeGreaterThan(Math.max(...marks.map((b) => b.datum!.v as number)));
    const note = dump.texts.filter((t) => t.role === 'note').map((t) => t.text).join(' ');
    expect(note).toContain(rest.toLocaleString('en-US'));
  });

  it('negative values extend from the drawn zero line on both sides', async () => {
    const r = await renderRows({ intent: 'compare', keys: 'k', values: 'v' }, [{ k: 'a', v: -5 }, { k: 'b', v: 3 }, { k: 'c', v: -1 }]);
    const { dumpScene } = await import('../../src/scene/dump.js');
    checkBarContracts(dumpScene(r.scene!), 'v', 'k');
  });

  it('a zero value keeps its label on the canvas, upright and lying (found by the property test)', async () => {
    const { dumpScene } = await import('../../src/scene/dump.js');
    for (const size of [{ width: 204, height: 209 }, { width: 720, height: 440 }]) {
      const lying = await renderRows({ intent: 'compare', keys: 'k', values: 'v', size }, [{ k: 'a'.repeat(80), v: -0.000001 }, { k: 'b', v: 0 }]);
      checkBarContracts(dumpScene(lying.scene!), 'v', 'k');
      const upright = await renderRows({ intent: 'compare', keys: 'k', values: 'v', size }, [{ k: 'a', v: -5 }, { k: 'b', v: 0 }]);
      checkBarContracts(dumpScene(upright.scene!), 'v', 'k');
    }
  });

  it('an all-negative chart still includes zero', async () => {
    const r = await renderRows({ intent: 'compare', keys: 'k', values: 'v' }, [{ k: 'a', v: -5 }, { k: 'b', v: -3 }]);
    const { dumpScene } = await import('../../src/scene/dump.js');
    const dump = dumpScene(r.scene!);
    checkBarContracts(dump, 'v', 'k');
    expect((dump.axes[0]!.domain as number[])[1]).toBe(0);
  });

  it('a long label wraps onto two lines where the band has room, keeping every word', async () => {
    const long = 'Mobile Library (north routes across the moor and the upper valleys beyond the pass)';
    const r = await renderRows({ intent: 'compare', keys: 'k', values: 'v' }, [{ k: long, v: 5 }, { k: 'Short', v: 3 }]);
    const { dumpScene } = await import('../../src/scene/dump.js');
    const dump = dumpScene(r.scene!);
    checkBarContracts(dump, 'v', 'k');
    const lines = dump.texts.filter((t) => t.role === 'tick' && !/^[\d,]+$/.test(t.text) && t.text !== 'Short');
    expect(lines).toHaveLength(2);
    expect(lines.map((t) => t.text).join(' ')).toBe(long);
    expect(r.diagnostics.map((d) => d.code)).not.toContain('layout.label-truncated');
  });

  it('labels too long even for two lines are shortened to fit and said so', async () => {
    const long = 'A branch name so long that no chart of this width could ever show it whole, not even on two full lines of text';
    const r = await renderRows({ intent: 'compare', keys: 'k', values: 'v' }, [{ k: long, v: 5 }, { k: 'Short', v: 3 }]);
    const { dumpScene } = await import('../../src/scene/dump.js');
    checkBarContracts(dumpScene(r.scene!), 'v', 'k');
    expect(r.diagnostics.map((d) => d.code)).toContain('layout.label-truncated');
  });

  it('crowded date labels are thinned, never overlapped', async () => {
    const rows = Array.from({ length: 90 }, (_, i) => ({ d: new Date(Date.UTC(2026, 0, 1 + i)).toISOString().slice(0, 10), v: (i % 7) + 1 }));
    const r = await renderRows({ intent: 'compare', keys: 'd', values: 'v' }, rows);
    const { dumpScene } = await import('../../src/scene/dump.js');
    checkBarContracts(dumpScene(r.scene!), 'v', 'd');
    expect(r.diagnostics.map((d) => d.code)).toContain('layout.labels-thinned');
  });
});
