import { deriveLines, type DerivedLines } from '../derive/lines.js';
import { periodChanges, type PeriodChange } from '../derive/period-change.js';
import { diagnostic, failure, success } from '../diagnostics/diagnostic.js';
import { refOf } from '../fields/types.js';
import type { CartesianDomains } from '../layout/kit-types.js';
import { labelStyle, valueFormatter } from '../layout/number-format.js';
import { asBand, asLinear } from '../layout/scales.js';
import type { SceneNode } from '../scene/types.js';
import { lineDecisions, type LinePlan } from './line-plan.js';
import { keyName } from './line-text.js';
import type { FormDef } from './types.js';
import { changeBarAlt } from './line-alt.js';
import { inSentence } from '../fields/labels.js';

/** The narrowest bar drawn, px (as for the bar chart). */
const MIN_BAND_PX = 3;

/** Period-over-period changes of one line, with the line they came from. */
interface DerivedChanges {
  query: LinePlan;
  lines: DerivedLines<LinePlan>;
  changes: PeriodChange[];
}

const title = (_d: DerivedChanges) => '% change from the previous period';

function domainsOf(d: DerivedChanges): CartesianDomains {
  let [lo, hi] = [0, 0];
  for (const c of d.changes) { lo = Math.min(lo, c.change); hi = Math.max(hi, c.change); }
  return {
    left: { kind: 'linear', name: 'value', field: 'change_percent', title: title(d), extent: [lo, hi] },
    bottom: { kind: 'band', name: 'key', field: d.query.key.name, title: d.query.key.label, domain: d.changes.map((c) => c.label) },
    first: 'left', zeroLine: 'left',
  };
}

/**
 * Period-over-period change (intent change, `index: { base: previous }`): one bar per period
 * from zero to its % change from the period before, in key order. Bars are length-coded, so the
 * zero-baseline hard rule binds. One series only: several would need grouped bars or panels.
 */
export const CHANGE_BAR: FormDef<LinePlan, DerivedChanges> = {
  name: 'change-bar',
  noun: 'bar chart of period-over-period change',
  traits: { lengthCoded: true, connectsKey: false, radial: false, coloursCategories: false, axisPerValue: false },
  plan(input) {
    const [key, series] = [input.fields.keys[0]!, input.fields.keys[1]];
    if (series) {
      return failure([diagnostic('choice.period-change-one-series', `period-over-period bars show one series, and \`${series.name}\` splits the rows into several`, {
        path: '/keys', field: series.name, found: series.name, expected: 'one key', hint: `drop \`${series.name}\` from \`keys:\` (or filter the table to one series), or compare the series as index lines with \`index: { base: first }\``,
      })]);
    }
    const value = input.fields.values[0];
    const { decisions, problems } = lineDecisions(input, key, undefined, value);
    decisions.push({ decision: 'each bar is the % change from the previous period, drawn from zero', rule: '`index.base: previous` asks for the change from one period to the next; a change is a length from no change, so bars on a zero baseline' });
    return success({ plan: { key: refOf(key), series: undefined, value: value && refOf(value), aggregate: input.brief.aggregate, zero: true }, decisions }, problems);
  },
  derive(table, plan, ctx) {
    const lines = deriveLines(table, plan);
    if (!lines.ok) return lines;
    const changes = periodChanges(lines.value, table, (x) => keyName(lines.value, x));
    if (!changes.ok) return failure([...lines.diagnostics, ...changes.diagnostics]);
    const fits = Math.floor((ctx.brief.size.width - 2 * ctx.style.spacing.padding) / MIN_BAND_PX);
    if (changes.value.length > fits) {
      return failure([...lines.diagnostics, diagnostic('derive.too-many-ordered-bars', `${changes.value.length} periods do not fit as bars of ${MIN_BAND_PX} px or more`, {
        field: plan.key.name, found: `${changes.value.length} bars`, expected: `at most ${fits}`, hint: 'aggregate to a coarser key (e.g. months instead of days), or use `index: { base: first }` for an index line',
      })]);
    }
    return success({ query: plan, lines: lines.value, changes: changes.value }, lines.diagnostics);
  },
  domains: domainsOf,
  alt: (d) => changeBarAlt(d.changes, `Bar chart of ${inSentence(title(d))} by ${inSentence(d.query.key.label)}`),
  layout(d, area, ctx) {
    const band = asBand(area.x);
    const value = asLinear(area.y);
    const { palette } = ctx.style;
    const marks: SceneNode[] = d.changes.map((c) => {
      const [v0, v1] = [value.map(0), value.map(c.change)];
      const datum = { [d.query.key.name]: c.label, change_percent: c.change, ...(d.query.value ? { [d.query.value.name]: c.value } : {}) };
      return { kind: 'rect', id: ctx.id('bar', c.label), role: 'bar', datum, x: band.start(c.label), y: Math.min(v0, v1), width: band.bandwidth, height: Math.abs(v1 - v0), fill: c.change < 0 ? palette.negative : palette.primary };
    });
    return { marks, labels: [], diagnostics: [] };
  },
  words(d) {
    const fmt = valueFormatter(d.changes.map((c) => c.change), labelStyle(undefined, d.query.key));
    const last = d.changes[d.changes.length - 1];
    const description = `Bar chart of ${inSentence(title(d))}, ${d.changes.length} bars${last ? `; the last, ${last.label}, ${fmt(last.change)} %` : ''}.`;
    return { title: title(d), description, notes: [] };
  },
};
