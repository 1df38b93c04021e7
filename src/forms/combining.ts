import type { Aggregate } from '../brief/types.js';
import { diagnostic, type Diagnostic } from '../diagnostics/diagnostic.js';
import { AGGREGATORS } from '../derive/aggregate.js';
import { combinedFromCounts, repeatedKeys, type Combined, type Grouped } from '../derive/group.js';
import { refOf, type Field, type FieldRef } from '../fields/types.js';
import { inSentence } from '../fields/labels.js';
import type { PlanInput } from './types.js';

/** What combining rows by key does to the chart: which keys repeat, and how many rows the most repeated has. */
export function combinedOf(grouped: Grouped): Combined | undefined {
  return combinedFromCounts(grouped.groups.map((g) => g.values.length));
}

/**
 * The keys whose rows are combined, for the given key fields (a line's key and series). In
 * small multiples a key repeats once per panel, so repeats are counted within each panel;
 * faceting by a key itself is refused by the facet rules. `grouped` is the rows already grouped
 * by `keys`, when the form has them.
 */
export function repeatsOf(input: PlanInput, keys: Field[], value: Field | undefined, grouped?: Grouped): Combined | undefined {
  const by = input.brief.facet?.by;
  const repeats = (fields: Field[]) => repeatedKeys(input.table, { keys: fields.map(refOf), value: value && refOf(value) });
  if (by === undefined) return grouped ? combinedOf(grouped) : repeats(keys);
  const facet = input.fields.all.find((f) => f.name === by);
  if (!facet || input.brief.keys.includes(by)) return undefined;
  return repeats([...keys, facet]);
}

/** Whether a sum of the value means nothing: its unit does not add up (%, °C, pH), or its zero is arbitrary. */
function notAdditive(value: Field): boolean {
  return !value.additive || value.zero === 'arbitrary';
}

/**
 * Rows sharing a key are combined by the aggregate: a sum of a value that does not add up
 * (shares, pH, temperatures, any value whose zero is arbitrary) is refused with a mean offered;
 * combining when the brief states no `aggregate:` is warned about, so it is never a surprise.
 */
export function checkCombining(input: PlanInput, key: Field, value: Field | undefined, combined: Combined | undefined): Diagnostic[] {
  const { brief } = input;
  if (!combined || !value) return [];
  const rows = `${combined.keys} ${inSentence(key.label)} value${combined.keys === 1 ? ' has' : 's have'} several rows (up to ${combined.most})`;
  if (brief.aggregate === 'sum' && notAdditive(value)) {
    const why = value.additive ? `its zero is arbitrary (\`fields.${value.name}.zero: arbitrary\`)` : 'it does not add up';
    return [diagnostic('choice.sum-not-additive', `${rows}, and \`${value.name}\`${value.unit ? ` in ${value.unit}` : ''}: ${why}, so a sum of it means nothing`, {
      path: brief.aggregateStated ? '/aggregate' : `/fields/${value.name}`, field: value.name, found: 'aggregate: sum', expected: 'mean, max or min',
      hint: value.additive ? 'use `aggregate: mean` (or max, min)' : `use \`aggregate: mean\`, or set \`fields.${value.name}.additive: true\` if its values do add up`,
    })];
  }
  if (brief.aggregateStated) return [];
  return [diagnostic('choice.keys-repeat', `${rows}; they are ${AGGREGATORS[brief.aggregate].verb}, and the chart's note says so`, {
    field: key.name, found: `${combined.keys} repeated keys`, expected: 'one row per key, or a stated `aggregate:`',
    hint: `state how to combine them with \`aggregate: sum\` (or mean, max, min, count)`,
  })];
}

/** The decision that says how rows sharing a key were combined, or undefined when nothing was and the brief asked for nothing. */
export function combiningDecision(key: Field, value: Field | undefined, aggregate: Aggregate, stated: boolean, combined: Combined | undefined): { decision: string; rule: string } | undefined {
  if (combined && value) return { decision: `rows with the same ${inSentence(key.label)} ${AGGREGATORS[aggregate].verb}`, rule: stated ? 'the brief asks for it (`aggregate:`)' : 'sum is the default for rows sharing a key; the note and the axis title say so' };
  if (aggregate !== 'sum' || !value) return { decision: `rows with the same key combined by ${aggregate}`, rule: 'the brief asks for it (`aggregate:`)' };
  return undefined;
}

/** The value axis title of combined rows: "Mean …" for a mean, "Total …" (largest, smallest) only when rows were combined. */
export function combinedTitle(title: string, aggregate: Aggregate, combined: Combined | undefined): string {
  const lower = inSentence(title);
  if (aggregate === 'mean') return `Mean ${lower}`;
  // Only a combination that happened is named: one row per key is its own value.
  if (!combined) return title;
  return { sum: `Total ${lower}`, max: `Largest ${lower}`, min: `Smallest ${lower}`, count: title }[aggregate];
}

/** The note saying how rows sharing a key were combined ("3 rows per lab were averaged."); none when nothing was. */
export function combineNote(key: FieldRef, value: FieldRef | undefined, aggregate: Aggregate, combined: Combined | undefined): string[] {
  if (!combined || !value) return [];
  const name = inSentence(key.label);
  const verb = AGGREGATORS[aggregate].verb;
  return [combined.every ? `${combined.most} rows per ${name} were ${verb}.` : `Rows sharing a ${name} were ${verb} (${combined.keys} ${name} values had several rows, up to ${combined.most}).`];
}
