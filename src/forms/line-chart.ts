import type { DerivedLines } from '../derive/lines.js';
import { keyText, inSentence } from '../fields/labels.js';
import type { CartesianForm } from '../layout/compose.js';
import { plotFor } from '../layout/compose.js';
import { memoized, type CartesianDomains, type Channel, type FormWords, type LayoutContext, type PlotArea } from '../layout/kit-types.js';
import type { LegendSpec } from '../layout/legend.js';
import { asLinear } from '../layout/scales.js';
import { labelStyle, valueFormatter } from '../layout/number-format.js';
import type { Datum, SceneNode, TextNode } from '../scene/types.js';
import { combineNote } from './combining.js';
import { directLabels, labelGutter, labelsFit, type LineEnd } from './line-labels.js';
import { keyToPx, seriesMarks, type SeriesPaint } from './line-marks.js';
import { lastPresent, lineDescription } from './line-text.js';

/** What differs between the plain line chart and the index chart drawn on the same frame. */
export interface LineView<D extends DerivedLines> {
  /** The form's words in a description ("Line chart"). */
  noun: string;
  valueTitle(derived: D): string;
  /** [lo, hi] the value axis must cover. */
  valueExtent(derived: D): [number, number];
  /** Extra fields of a point's datum (the raw value beside an index). */
  datumExtra?(derived: D, series: number, i: number): Datum;
  /** Guides drawn under the lines (a reference line) and their labels. */
  guides?(derived: D, area: PlotArea, ctx: LayoutContext): { marks: SceneNode[]; labels: TextNode[] };
  notes?(derived: D): string[];
  /** Draw every point, without M4 (tests compare the two). Default: false. */
  undecimated?: boolean;
}

/** Each series' colour: the style's categorical palette in series order (repeating beyond its length, which the plan warns about). */
export function seriesColours(derived: DerivedLines, ctx: LayoutContext): string[] {
  const { palette } = ctx.style;
  if (derived.series.length === 1) return [palette.primary];
  return derived.series.map((_, i) => palette.categorical[i % palette.categorical.length]!);
}

/** The key's channel along x: time for dates, linear for numbers, bands (their centres) for ordered levels. */
function keyChannel(derived: DerivedLines): Channel {
  const { key } = derived.query;
  const base = { name: 'key', field: key.name, title: key.label };
  if (derived.keyColumn.type === 'date') {
    const grain = derived.quarterly ? 'quarter' : derived.keyColumn.grain;
    return { ...base, kind: 'time', extent: derived.keyExtent, ...(grain ? { grain } : {}) };
  }
  if (derived.keyColumn.type === 'number') return { ...base, kind: 'linear', extent: derived.keyExtent, format: key.format };
  return { ...base, kind: 'band', domain: key.levels };
}

/** The chart's notes: how rows sharing a key were combined, then the view's own. */
function notesOf<D extends DerivedLines>(view: LineView<D>, derived: D): string[] {
  const { key, value, aggregate, combined } = derived.query;
  return [...combineNote(key, value, aggregate, combined), ...(view.notes?.(derived) ?? [])];
}

/** Direct labels, a legend (when the names cannot be stacked in the plot's height), or neither (one line, or one line per panel titled with its name). */
function labelMode<D extends DerivedLines>(view: LineView<D>, derived: D, base: CartesianDomains, ctx: LayoutContext): 'direct' | 'legend' | 'none' {
  if (derived.query.series === undefined || derived.query.onePerPanel) return 'none';
  return memoized(ctx, 'line\u0000label-mode', () => {
    const probe = plotFor(base, notesOf(view, derived), ctx).box.plot;
    return labelsFit(derived.series.length, probe.height, ctx) ? 'direct' : 'legend';
  });
}

function domainsOf<D extends DerivedLines>(view: LineView<D>, derived: D, ctx: LayoutContext): CartesianDomains {
  const value = { kind: 'linear' as const, name: 'value', field: derived.valueName, title: view.valueTitle(derived), extent: view.valueExtent(derived), format: derived.query.value?.format };
  const base: CartesianDomains = { left: value, bottom: keyChannel(derived), first: 'left' };
  const names = derived.series.map((s) => s.label ?? '');
  const mode = labelMode(view, derived, { ...base, rightGutter: labelGutter(names, ctx) }, ctx);
  if (mode === 'direct') return { ...base, rightGutter: labelGutter(names, ctx) };
  if (mode === 'none') return base;
  const colours = seriesColours(derived, ctx);
  const legend: LegendSpec = { kind: 'categorical', field: derived.query.series!.name, title: derived.query.series!.label, entries: names.map((label, i) => ({ label, fill: colours[i]! })) };
  return { ...base, legend };
}

/** The datum of one drawn point: its key as the data writes it, its series, and its value. */
function pointDatum<D extends DerivedLines>(view: LineView<D>, derived: D, si: number, i: number): Datum {
  const s = derived.series[si]!;
  const { key, series } = derived.query;
  return {
    [key.name]: keyText(derived.keyColumn, s.rows[i]!),
    ...(series && s.label !== undefined ? { [series.name]: s.label } : {}),
    [derived.valueName]: s.ys[i]!,
    ...(view.datumExtra?.(derived, si, i) ?? {}),
  };
}

function layoutLines<D extends DerivedLines>(view: LineView<D>, derived: D, area: PlotArea, ctx: LayoutContext) {
  const colours = seriesColours(derived, ctx);
  const toX = keyToPx(area.x, derived.query.key.levels);
  const y = asLinear(area.y);
  const toY = (v: number) => y.map(v);
  const marks: SceneNode[] = [];
  const ends: LineEnd[] = [];
  derived.series.forEach((s, si) => {
    const id = ctx.id('line', s.label ?? derived.valueName);
    const paint: SeriesPaint = { id, stroke: colours[si]!, series: derived.query.series && s.label !== undefined ? { [derived.query.series.name]: s.label } : undefined, datum: (i) => pointDatum(view, derived, si, i) };
    marks.push(...seriesMarks(s, toX, toY, paint, !view.undecimated));
    const last = lastPresent(s);
    if (last !== undefined && s.label !== undefined) ends.push({ id, text: s.label, x: toX(s.xs[last]!), y: toY(s.ys[last]!), stroke: colours[si]! });
  });
  return { marks, ends };
}

/** A panel's rank among small multiples: its latest value (the highest line end when a panel holds several series). */
export function latestValue(derived: DerivedLines): number {
  let latest = -Number.MAX_VALUE;
  for (const s of derived.series) { const i = lastPresent(s); if (i !== undefined) latest = Math.max(latest, s.ys[i]!); }
  return latest;
}

/**
 * A line chart on a left value axis and a bottom key axis, as a CartesianForm: the lines (gaps
 * kept, lone points as dots, dense runs reduced by M4), each series named at its end (dodged,
 * with leaders) or in a legend, and the view's own guides (an index chart's reference line).
 * Drawn as small multiples too: panels ranked by their latest value, and the series key may be
 * the facet (one line per panel, named by the panel's title).
 */
export function lineChart<D extends DerivedLines>(name: string, view: LineView<D>): CartesianForm<D> {
  return {
    name,
    facets: { noun: 'latest value', value: latestValue, keyIndex: 1 },
    domains: (derived, ctx) => domainsOf(view, derived, ctx),
    layout(derived, area, ctx) {
      const guides = view.guides?.(derived, area, ctx) ?? { marks: [], labels: [] };
      const { marks, ends } = layoutLines(view, derived, area, ctx);
      const mode = labelMode(view, derived, domainsOf(view, derived, ctx), ctx);
      const direct = mode === 'direct' ? directLabels(ends, area.plot, ctx) : { labels: [], leaders: [] };
      return { marks: [...guides.marks, ...marks, ...direct.leaders], labels: [...guides.labels, ...direct.labels], diagnostics: [] };
    },
    words(derived): FormWords {
      const title = view.valueTitle(derived);
      const fmt = valueFormatter(derived.series.flatMap((s) => { const i = lastPresent(s); return i === undefined ? [] : [s.ys[i]!]; }), labelStyle(derived.query.value, derived.query.key));
      return { title: `${title} by ${inSentence(derived.query.key.label)}`, description: lineDescription(derived, view.noun, title, fmt), notes: notesOf(view, derived) };
    },
  };
}
