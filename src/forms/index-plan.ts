import { failure, success, type Outcome } from '../diagnostics/diagnostic.js';
import type { IndexAs, IndexBase } from '../derive/index.js';
import { refOf } from '../fields/types.js';
import { lineCombining, lineDecisions, type LinePlan } from './line-plan.js';
import type { Planned, PlanInput } from './types.js';

/** How an index line chart is drawn: a line plan, its base, and how the index is shown. */
export interface IndexPlan extends LinePlan {
  base: IndexBase;
  as: IndexAs;
}

/** The base the brief names (`index.base`): the first key unless it names a key value. */
export function baseOf(input: PlanInput): IndexBase {
  const base = input.brief.index?.base;
  return base === undefined || base === 'first' ? { kind: 'first' } : { kind: 'key', value: base };
}

/** The index line's plan: the line's decisions, the base and the form of the index, each with its rule. */
export function planIndex(input: PlanInput): Outcome<Planned<IndexPlan>> {
  const { fields, brief } = input;
  const [key, series] = [fields.keys[0]!, fields.keys[1]];
  const value = fields.values[0];
  const { decisions, problems, onePerPanel, facet } = lineDecisions(input, key, series, value);
  const base = baseOf(input);
  const as: IndexAs = brief.index?.as ?? 'index';
  const which = base.kind === 'first' ? 'the first key' : `\`${String(base.value)}\``;
  decisions.push({
    decision: `each line divided by its value at ${which}, shown ${as === 'index' ? 'as an index, base = 100' : 'as % change since the base'}`,
    rule: `intent change: an index puts series of different sizes on one scale, so their growth is compared rather than their level${brief.index?.base === undefined ? ' (no `index.base` given: the first key)' : ''}`,
  });
  decisions.push({ decision: `the value axis may leave zero out; a reference line marks the base at ${as === 'index' ? '100' : '0 %'}`, rule: 'an index is read against its base, not against zero, and a line carries it by position, not length, so a cut axis does not distort it' });
  const combining = lineCombining(input, key, series, value);
  problems.push(...combining.problems);
  if (combining.problems.some((p) => p.severity === 'error')) return failure(problems);
  if (combining.decision) decisions.push(combining.decision);
  const combined = combining.combined ? { combined: combining.combined } : {};
  return success({ plan: { key: refOf(key), series: series && refOf(series), value: value && refOf(value), aggregate: brief.aggregate, aggregateStated: brief.aggregateStated === true, ...combined, zero: false, base, as, ...(onePerPanel ? { onePerPanel } : {}) }, decisions, ...(facet ? { facet } : {}) }, problems);
}
