import { min } from 'd3-array';
import type { Decision } from '../choose/types.js';
import { diagnostic, failure, success, type Outcome } from '../diagnostics/diagnostic.js';
import { AGGREGATORS } from '../derive/aggregate.js';
import { groupRows, type Grouped } from '../derive/group.js';
import type { StreamQuery } from '../derive/stream.js';
import { refOf, type FieldRef } from '../fields/types.js';
import { memoized, type LayoutContext } from '../layout/kit-types.js';
import type { Table } from '../table/types.js';
import type { Planned, PlanInput } from './types.js';

/** Most series that get a colour each (and a legend); beyond it, colours follow onset and labels tell layers apart. */
export const MAX_STREAM_COLOURS = 8;

/** A streamgraph's plan: its keys, value and how rows combine, and whether each series gets its own colour. */
export interface StreamPlan extends StreamQuery {
  colourEach: boolean;
}

/** The rows grouped by (time, series), once per render. */
export function streamGroups(table: Table, time: FieldRef, series: FieldRef, value: FieldRef, ctx: Pick<LayoutContext, 'memo'>): Grouped {
  return memoized(ctx, `stream\u0000${time.name}\u0000${series.name}\u0000${value.name}`, () => groupRows(table, { keys: [time, series], value }));
}

function streamDecisions(colourEach: boolean, seriesCount: number, maxColours: number): Decision[] {
  return [
    { decision: 'layers stacked around a baseline that minimises their weighted wiggle', rule: 'Byron & Wattenberg 2008: the baseline\'s slope at each key minimises the squared slopes of the layers\' midlines, weighted by thickness, so layers bend as little as they can' },
    { decision: 'layers in inside-out order: the earliest-starting series in the middle, later ones alternately above and below', rule: 'Byron & Wattenberg 2008: a series that starts late sits on the outside, where its onset does not shift the layers beside it' },
    { decision: 'smooth curves between keys that never overshoot', rule: 'monotone cubic interpolation (Steffen 1990) stays between the values at two keys, so no layer goes below zero thickness and layers never overlap' },
    { decision: 'no value axis; a scale bar shows what a thickness means', rule: 'in a streamgraph only thickness carries value: the baseline is placed for least wiggle, so a position on a value axis would mean nothing' },
    colourEach
      ? { decision: `each of the ${seriesCount} series its own colour, with a legend; names inside the layers wide enough to hold them`, rule: `at most ${maxColours} categorical colours can be told apart, and ${seriesCount} fit` }
      : { decision: `${seriesCount} series coloured by onset from the sequential ramp; names inside the layers wide enough, the rest counted in a note`, rule: `hard rule: at most ${maxColours} categorical colours can be told apart, so colour here orders the layers and names tell them apart` },
  ];
}

/** The streamgraph's plan; a negative combined value is refused (a layer's thickness cannot be negative). */
export function planStream(input: PlanInput): Outcome<Planned<StreamPlan>> {
  const { fields, brief, style } = input;
  const [time, series, value] = [refOf(fields.keys[0]!), refOf(fields.keys[1]!), refOf(fields.values[0]!)];
  const { groups } = streamGroups(input.table, time, series, value, input);
  const combine = AGGREGATORS[brief.aggregate].combine;
  const lowest = min(groups, (g) => combine(g.values)) ?? 0;
  if (lowest < 0) {
    return failure([diagnostic('choice.stream-negative', `\`${value.name}\` has negative values (down to ${lowest}), and a layer's thickness cannot be negative`, {
      path: '/values', field: value.name, found: String(lowest), expected: 'values of zero or more',
      hint: 'draw the series as lines on a common axis, which may go below zero (intent: trend), or chart positive and negative parts as two values',
    })]);
  }
  const seriesCount = new Set(groups.map((g) => g.labels[1])).size;
  const maxColours = Math.min(MAX_STREAM_COLOURS, style.palette.categorical.length);
  const colourEach = seriesCount <= maxColours;
  const decisions = streamDecisions(colourEach, seriesCount, maxColours);
  if (brief.aggregate !== 'sum') decisions.push({ decision: `rows with the same key and series combined by ${brief.aggregate}`, rule: 'the brief asks for it (`aggregate:`)' });
  return success({ plan: { time, series, value, aggregate: brief.aggregate, colourEach }, decisions });
}
