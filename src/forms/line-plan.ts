import type { Decision, FacetRequest } from '../choose/types.js';
import { diagnostic, failure, success, type Diagnostic, type Outcome } from '../diagnostics/diagnostic.js';
import type { Combined } from '../derive/group.js';
import type { LineQuery } from '../derive/lines.js';
import { refOf, type Field } from '../fields/types.js';
import { M4_COLUMNS_PER_PX, M4_MIN_POINTS_PER_GROUP } from './line-marks.js';
import { checkCombining, combiningDecision, repeatsOf } from './combining.js';
import type { Planned, PlanInput } from './types.js';

/** How a line chart is drawn. */
export interface LinePlan extends LineQuery {
  /** Whether the value axis must include zero. */
  zero: boolean;
}

/** Most series one panel of lines holds before they tangle (common practice, and the palette's 8 colours). */
export const MAX_SERIES = 8;

/** How many distinct series the series key splits the rows into. */
export function seriesCount(series: Field | undefined): number {
  if (!series) return 1;
  if (series.levels.length) return series.levels.length;
  return new Set(series.column.text.filter((t) => t !== null && t !== '')).size;
}

/** Whether the value axis keeps zero, and the decision that says why. */
export function zeroDecision(input: PlanInput, value: Field | undefined): { zero: boolean; decision: Decision } {
  const { brief } = input;
  const hint = value && Object.hasOwn(brief.fields, value.name) ? brief.fields[value.name] : undefined;
  const position = 'a line carries its value by position, not length, so a cut axis does not distort it (bars are refused one)';
  if (hint?.zero === 'arbitrary') return { zero: false, decision: { decision: 'the value axis is fitted to the data and leaves zero out', rule: `\`fields.${value!.name}.zero: arbitrary\`: zero is not "none" on this scale; ${position}` } };
  if (brief.baseline === 'fit') return { zero: false, decision: { decision: 'the value axis is fitted to the data and may leave zero out', rule: `the brief asks \`baseline: fit\`; ${position}` } };
  return { zero: true, decision: { decision: 'the value axis includes zero', rule: 'a line chart keeps zero unless told otherwise, so the size of a change is read against the whole; `baseline: fit` or `fields.<col>.zero: arbitrary` leave it out' } };
}

/** How a line chart's series are drawn: together (direct labels), or one per panel, asked for by the brief or by the plan. */
interface SeriesLayout {
  decision?: Decision;
  problem?: Diagnostic;
  /** Each series in a panel of its own. */
  onePerPanel: boolean;
  /** The plan's own request for panels (too many series for one). */
  facet?: FacetRequest;
}

/** The series' layout: by the brief's `facet:` on the series key, by the plan beyond MAX_SERIES, or in one panel with direct labels. */
function seriesLayout(input: PlanInput, series: Field | undefined): SeriesLayout {
  if (!series) return { onePerPanel: false };
  const n = seriesCount(series);
  const by = input.brief.facet?.by;
  const panels = { decision: `one panel per \`${series.name}\` (${n}), each titled with its name and holding its one line`, rule: 'small multiples: every line is read on its own against the same scales, without a tangle of lines or a legend (Tufte 1983)' };
  if (by === series.name) return { onePerPanel: true, decision: panels };
  if (n > MAX_SERIES && by === undefined) {
    const why = `\`${series.name}\` has ${n} series, more than the ${MAX_SERIES} one panel of lines shows apart (common practice: beyond that the lines tangle and the palette's colours repeat)`;
    return {
      onePerPanel: true, decision: panels, facet: { by: series.name, context: false, why },
      problem: diagnostic('choice.too-many-series', `\`${series.name}\` has ${n} series, more than the ${MAX_SERIES} one panel of lines shows apart, so the chart is drawn as ${n} panels (small multiples), one line each`, {
        path: '/keys', field: series.name, found: `${n} series`, expected: `at most ${MAX_SERIES} in one panel`, hint: `the panels are drawn for you; give \`facet: { by: ${series.name}, context: true }\` to show the other lines in grey behind each, or filter the table to the series that matter`,
      }),
    };
  }
  const decision = { decision: `one line per \`${series.name}\` (${n}), each named at its end; a legend only where the names cannot be placed`, rule: 'direct labels spare the reader matching colours to a legend (common practice); colours come from the style\'s categorical palette' };
  if (n <= MAX_SERIES) return { onePerPanel: false, decision };
  return {
    onePerPanel: false, decision,
    problem: diagnostic('choice.too-many-series', `\`${series.name}\` has ${n} series, more than the ${MAX_SERIES} one panel of lines shows apart; the lines will tangle and colours repeat`, {
      path: '/keys', field: series.name, found: `${n} series`, expected: `at most ${MAX_SERIES}`, hint: `show one panel per series with \`facet: ${series.name}\` (small multiples), or filter the table to the series that matter`,
    }),
  };
}

/** Decisions about the key, series and data every line plan states, and the plan's own request for panels. */
export function lineDecisions(input: PlanInput, key: Field, series: Field | undefined, value: Field | undefined): { decisions: Decision[]; problems: Diagnostic[]; onePerPanel: boolean; facet?: FacetRequest } {
  const decisions: Decision[] = [];
  const problems: Diagnostic[] = [];
  if (key.type === 'temporal') decisions.push({ decision: 'x is a UTC time scale with calendar ticks at the data\'s grain', rule: 'the key is drawn to scale, so an irregular gap in time shows as a gap (evenly spaced bars could not show it)' });
  else if (key.type === 'quantitative') decisions.push({ decision: 'x is a linear scale', rule: 'the key is drawn to scale, so uneven steps show as uneven' });
  else decisions.push({ decision: `x keeps the order of \`${key.name}\`'s levels, evenly spaced`, rule: `the key is ${key.type}: its order is declared, its distances are not` });
  const n = seriesCount(series);
  const layout = seriesLayout(input, series);
  if (layout.decision) decisions.push(layout.decision);
  if (layout.problem) problems.push(layout.problem);
  const missing = value?.column.missing.length ?? 0;
  if (missing) decisions.push({ decision: 'a missing value leaves a gap in its line; a point alone between gaps is a dot', rule: 'a line is never drawn through data that is not there: no silent interpolation, no zeros' });
  const perPx = input.table.rowCount / Math.max(1, n) / Math.max(1, input.brief.size.width);
  if (perPx > M4_MIN_POINTS_PER_GROUP * M4_COLUMNS_PER_PX) decisions.push({ decision: 'dense runs of the line are reduced to the first, last, lowest and highest point per quarter pixel (M4)', rule: 'M4 (Jugel et al. 2014) keeps exactly the points that decide which pixels a line lights, so the picture is unchanged and the file small' });
  return { decisions, problems, onePerPanel: layout.onePerPanel, ...(layout.facet ? { facet: layout.facet } : {}) };
}

/**
 * Rows sharing a key (within a series) are combined as the bar's are: a sum of a value that does
 * not add up is refused, combining with no `aggregate:` stated is warned about, and the plan
 * keeps what was combined for the note and the axis title.
 */
export function lineCombining(input: PlanInput, key: Field, series: Field | undefined, value: Field | undefined): { combined: Combined | undefined; problems: Diagnostic[]; decision: Decision | undefined } {
  const combined = repeatsOf(input, series ? [key, series] : [key], value);
  const { brief } = input;
  return { combined, problems: checkCombining(input, key, value, combined), decision: combiningDecision(key, value, brief.aggregate, brief.aggregateStated === true, combined) };
}

/** The line form's plan: the key along x, the series, the value along y, and whether zero is kept, each with its rule. */
export function planLine(input: PlanInput): Outcome<Planned<LinePlan>> {
  const { fields, brief } = input;
  const [key, series] = [fields.keys[0]!, fields.keys[1]];
  const value = fields.values[0];
  const { decisions, problems, onePerPanel, facet } = lineDecisions(input, key, series, value);
  const zero = zeroDecision(input, value);
  decisions.push(zero.decision);
  const combining = lineCombining(input, key, series, value);
  problems.push(...combining.problems);
  if (combining.problems.some((p) => p.severity === 'error')) return failure(problems);
  if (combining.decision) decisions.push(combining.decision);
  const combined = combining.combined ? { combined: combining.combined } : {};
  return success({ plan: { key: refOf(key), series: series && refOf(series), value: value && refOf(value), aggregate: brief.aggregate, aggregateStated: brief.aggregateStated === true, ...combined, zero: zero.zero, ...(onePerPanel ? { onePerPanel } : {}) }, decisions, ...(facet ? { facet } : {}) }, problems);
}
