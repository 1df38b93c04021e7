import { ticks } from 'd3-array';
import { deriveStream, type DerivedStream } from '../derive/stream.js';
import { rule } from '../layout/axes.js';
import { axisTitle } from '../layout/axis.js';
import type { BodyMarks } from '../layout/chart.js';
import type { LayoutContext } from '../layout/kit-types.js';
import type { LegendSpec } from '../layout/legend.js';
import { labelStyle, valueFormatter } from '../layout/number-format.js';
import { lineHeight, textBoxHeight, textNode } from '../layout/text.js';
import type { Box, SceneNode } from '../scene/types.js';
import { bottomAxisHeight, streamAxis } from './stream-axis.js';
import { layerCommands, streamBoundaries } from './stream-geometry.js';
import { layerLabels } from './stream-labels.js';
import { planStream, streamGroups, type StreamPlan } from './stream-plan.js';
import type { FormDef } from './types.js';
import { streamAlt } from './change-alt.js';
import { inSentence } from '../fields/labels.js';

type Derived = DerivedStream<StreamPlan>;

/** Each layer's fill: its own categorical colour, or (many series) a step of the sequential ramp by onset. */
function fillsOf(derived: Derived, ctx: LayoutContext): string[] {
  const { categorical, sequential } = ctx.style.palette;
  const n = derived.layers.length;
  if (derived.query.colourEach) return derived.layers.map((l) => categorical[l.rank % categorical.length]!);
  // The two lightest steps are skipped: they sit too close to the background.
  const from = Math.min(2, sequential.length - 1);
  return derived.layers.map((l) => sequential[from + Math.round(((sequential.length - 1 - from) * l.rank) / Math.max(1, n - 1))]!);
}

/** The scale bar's value: the largest round number within a third of the stream's span, and its text. */
function scaleBar(derived: Derived): { value: number; text: string } {
  const span = derived.extent[1] - derived.extent[0];
  const value = ticks(0, span / 3, 4).filter((t) => t > 0).at(-1) ?? span / 3;
  const { unit } = derived.query.value;
  return { value, text: `${valueFormatter([value], labelStyle(derived.query.value))(value)}${unit ? ` ${unit}` : ''}` };
}

/** A vertical bar at the right of the plot, as long as the scale bar's value, with its text beside it. */
function scaleBarNodes(derived: Derived, plot: Box, perUnit: number, ctx: LayoutContext): SceneNode[] {
  const { style, measure } = ctx;
  const { value, text } = scaleBar(derived);
  const x = plot.x + plot.width + style.spacing.labelGap;
  const [y1, y0] = [plot.y + plot.height, plot.y + plot.height - value * perUnit];
  const h = textBoxHeight(measure, style.text.tick);
  return [
    rule('scale-bar', 'reference', x, y0, x, y1, style.lines.axis, 2),
    textNode(measure, { id: 'scale-bar-label', role: 'tick', text, style: style.text.tick, x: x + style.spacing.labelGap, top: (y0 + y1) / 2 - h / 2, anchor: 'start' }),
  ];
}

/** The plot inside the body: room below for the key axis (and a note line with many series), at the right for the scale bar. */
function plotIn(derived: Derived, body: Box, ctx: LayoutContext): Box {
  const { style, measure } = ctx;
  const { tick, note } = style.text;
  const right = 2 * style.spacing.labelGap + measure.width(scaleBar(derived).text, tick.size, tick.weight);
  const noteRoom = derived.query.colourEach ? 0 : lineHeight(note, style.spacing.lineHeight);
  return { x: body.x, y: body.y, width: Math.max(0, body.width - right), height: Math.max(0, body.height - bottomAxisHeight(ctx) - noteRoom) };
}

function layoutStream(derived: Derived, body: Box, ctx: LayoutContext): BodyMarks {
  const { style, measure } = ctx;
  const plot = plotIn(derived, body, ctx);
  const { xs, axis } = streamAxis(derived, plot, body, ctx);
  const [lo, hi] = derived.extent;
  const perUnit = hi > lo ? plot.height / (hi - lo) : 0;
  const y = (v: number) => plot.y + plot.height - (v - lo) * perUnit;
  const bounds = streamBoundaries(xs, derived.baseline.map(y), derived.layers.map((l) => l.values.map((v) => -v * perUnit)));
  const fills = fillsOf(derived, ctx);
  const { time, series, value } = derived.query;
  const marks: SceneNode[] = derived.layers.map((layer, i) => ({
    kind: 'path', id: ctx.id('layer', layer.name), role: 'layer', datum: { [series.name]: layer.name }, series: { [series.name]: layer.name },
    commands: layerCommands(xs, bounds[i]!, bounds[i + 1]!), fill: fills[i]!, stroke: style.background, strokeWidth: 0.5,
    points: xs.map((x, k) => ({ x, y: bounds[i + 1]!.ys[k]!, datum: { [time.name]: derived.keys[k]!.label, [series.name]: layer.name, [value.name]: layer.values[k]! } })),
  }));
  const { labels, unlabelled } = layerLabels(derived, xs, bounds, fills, plot, ctx);
  const guides: SceneNode[] = [...axis.grid, ...axis.tickMarks, ...axis.labels, axis.title, ...scaleBarNodes(derived, plot, perUnit, ctx)];
  if (!derived.query.colourEach && unlabelled > 0) {
    const text = `${unlabelled} of ${derived.layers.length} layers are too thin to hold their names and are left unlabelled.`;
    guides.push(textNode(measure, { id: 'note-unlabelled', role: 'note', text, style: style.text.note, x: body.x, top: body.y + body.height - lineHeight(style.text.note, style.spacing.lineHeight), anchor: 'start' }));
  }
  return { marks, labels, guides, panels: [{ id: 'panel', plot, axes: [axis.info] }], diagnostics: axis.diagnostics };
}

function legendOf(derived: Derived, ctx: LayoutContext): LegendSpec | undefined {
  if (!derived.query.colourEach) return undefined;
  const fills = fillsOf(derived, ctx);
  const entries = derived.layers.map((l, i) => ({ label: l.name, fill: fills[i]! })).reverse();
  return { kind: 'categorical', field: derived.query.series.name, title: derived.query.series.label, entries };
}

const GAP_NAMES = 4;

/** A list of names, shortened to the first few and a count. */
const someOf = (names: readonly string[]) => `${names.slice(0, GAP_NAMES).join(', ')}${names.length > GAP_NAMES ? ` and ${names.length - GAP_NAMES} more` : ''}`;

/** The notes on gaps: periods with no rows at all, then the series and periods with no value; both drawn as zero thickness, not smoothed over. */
function streamNotes(derived: DerivedStream): string[] {
  const skipped = derived.skipped.length ? [`No rows for ${someOf(derived.skipped)}: every layer narrows to zero thickness there.`] : [];
  const empty = derived.empty.length ? [`No data for ${someOf(derived.empty.map((e) => `${e.series} in ${e.key}`))}: drawn as zero thickness, not smoothed over.`] : [];
  return [...skipped, ...empty];
}

/**
 * The streamgraph: one layer per series along an ordered key, stacked around the baseline of
 * least weighted wiggle in inside-out order, with smooth edges that never cross.
 */
export const STREAM: FormDef<StreamPlan, Derived> = {
  name: 'stream',
  noun: 'streamgraph',
  // Thickness is length-coded, but from a moving baseline, so no zero axis is drawn; the key is connected.
  traits: { lengthCoded: false, connectsKey: true, radial: false, coloursCategories: false, axisPerValue: false },
  plan: planStream,
  derive: (table, plan, ctx) => deriveStream(table, plan, streamGroups(table, plan.time, plan.series, plan.value, ctx)),
  legend: legendOf,
  layoutBody: layoutStream,
  alt: streamAlt,
  words(derived) {
    const { time, series, value } = derived.query;
    const valueTitle = axisTitle(value, value.label);
    const n = derived.layers.length;
    const totals = derived.layers.map((l) => ({ name: l.name, total: l.values.reduce((a, b) => a + b, 0) }));
    const top = totals.reduce((a, b) => (b.total > a.total ? b : a));
    const [first, last] = [derived.keys[0]!.label, derived.keys[derived.keys.length - 1]!.label];
    const notes = streamNotes(derived);
    return {
      title: `${valueTitle} by ${inSentence(series.label)} over ${inSentence(time.label)}`,
      description: `Streamgraph of ${inSentence(valueTitle)} for ${n} series of ${inSentence(series.label)}, from ${first} to ${last}; the largest in total is ${top.name}.`,
      notes,
    };
  },
};
