import { COLUMN_OPTIONS, type FieldHint, type FieldType, type ResolvedBrief } from '../brief/types.js';
import { pointer } from '../brief/validate.js';
import { diagnostic, failure, hasErrors, success, type Diagnostic, type Outcome } from '../diagnostics/diagnostic.js';
import { suggestionHint } from '../diagnostics/suggest.js';
import type { Column, Table } from '../table/types.js';
import { cycleOrder } from './cyclic.js';
import { readableName } from './labels.js';
import { isAdditiveUnit } from './notation.js';
import { looksOrdered, orderedTextLevels } from './ordered-text.js';
import type { Field, FieldRole, Fields } from './types.js';

/** Re-exported: the readable name of a column lives with the other words of fields. */
export { readableName } from './labels.js';

function firstAppearance(column: Column): string[] {
  const seen = new Set<string>();
  for (const t of column.text) if (t !== null && t !== '' && !seen.has(t)) seen.add(t);
  return [...seen];
}

function typeOf(column: Column, hint: FieldHint | undefined): FieldType {
  if (hint?.type) return hint.type;
  if (column.type === 'number') return 'quantitative';
  if (column.type === 'date') return 'temporal';
  if (column.type === 'text' && cycleOrder(firstAppearance(column))) return 'cyclic';
  if (column.type === 'text' && orderedTextLevels(firstAppearance(column))) return 'ordinal';
  return 'categorical';
}

/** The first item that appeared before in the list, found with one pass and a set (an order may list 100,000 levels). */
export function firstDuplicate(list: readonly string[]): string | undefined {
  const seen = new Set<string>();
  for (const item of list) {
    if (seen.has(item)) return item;
    seen.add(item);
  }
  return undefined;
}

function levelsOf(column: Column, type: FieldType, hint: FieldHint | undefined, problems: Diagnostic[]): string[] {
  if (type === 'quantitative' || type === 'temporal') return [];
  const present = firstAppearance(column);
  if (!hint?.order) return type === 'cyclic' ? cycleOrder(present) ?? present : type === 'ordinal' ? orderedTextLevels(present)?.levels ?? present : present;
  const order = hint.order.map(String);
  const duplicate = firstDuplicate(order);
  if (duplicate !== undefined) {
    problems.push(diagnostic('fields.order-duplicate', `\`fields.${column.name}.order\` lists ${JSON.stringify(duplicate)} twice`, {
      path: pointer(pointer('/fields', column.name), 'order'), found: duplicate, hint: 'list each level once',
    }));
  }
  const listed = new Set(order);
  const unlisted = present.filter((v) => !listed.has(v));
  if (unlisted.length) {
    problems.push(diagnostic('fields.order-incomplete', `\`fields.${column.name}.order\` does not list ${unlisted.slice(0, 5).map((v) => JSON.stringify(v)).join(', ')}${unlisted.length > 5 ? ` and ${unlisted.length - 5} more` : ''}, found in the data`, {
      path: `/fields/${column.name}/order`, field: column.name, found: unlisted.slice(0, 5).join(', '), expected: 'every level of the column',
      hint: `add the missing level${unlisted.length > 1 ? 's' : ''} to the order, or fix the spelling in the data`,
    }));
  }
  const seen = new Set(present);
  return order.filter((v) => seen.has(v));
}

/**
 * A categorical key whose every level looks ordered (`10-19 kg`, `3rd`, `2+ rooms`) but is none
 * of the spellings read as ordered: it is about to be sorted by value, which scrambles an order
 * the reader expects, so say how to declare it.
 */
function unrecognisedOrder(field: Field): Diagnostic[] {
  if (field.type !== 'categorical' || field.column.type !== 'text' || !looksOrdered(field.levels)) return [];
  const sample = field.levels.slice(0, 3).map((l) => JSON.stringify(l)).join(', ');
  return [diagnostic('fields.unrecognised-order', `the key \`${field.name}\` looks ordered (${sample}) but its order is not one chartwright reads, so it is treated as categories and sorted by value`, {
    path: `/fields/${field.name}`, field: field.name, found: sample, expected: 'a declared order',
    hint: `list the levels in order with \`fields.${field.name}.order: [...]\`, or keep the data's order with \`fields.${field.name}.type: ordinal\``,
  })];
}

function checkNames(names: readonly string[], basePath: string, table: Table, listed: boolean): Diagnostic[] {
  const columns = table.columns.map((c) => c.name);
  return names.flatMap((name, i) => columns.includes(name) ? [] : [diagnostic('brief.unknown-column', `the data has no column \`${name}\``, {
    path: listed ? pointer(basePath, i) : basePath, found: name, expected: `a column of ${table.origin.file}`, hint: suggestionHint(name, columns),
  })]);
}

/**
 * The fields stage: a table and the brief → typed fields with key and value roles. Column names
 * in the brief that the table lacks are errors with a near-miss suggestion.
 */
export function inferFields(table: Table, brief: ResolvedBrief): Outcome<Fields> {
  const problems: Diagnostic[] = [
    ...checkNames(brief.keys, '/keys', table, brief.keys.length > 1),
    ...checkNames(brief.values, '/values', table, brief.values.length > 1),
    ...Object.keys(brief.fields).flatMap((name) => checkNames([name], pointer('/fields', name), table, false)),
    ...COLUMN_OPTIONS.flatMap((option) => (brief[option] === undefined ? [] : checkNames([brief[option]!], `/${option}`, table, false))),
    ...(brief.facet ? checkNames([brief.facet.by], '/facet', table, false) : []),
  ];
  if (hasErrors(problems)) return failure(problems);
  const all = table.columns.map((column): Field => {
    // Own properties only: a column named `constructor` has no hint unless the brief gives one.
    const hint = Object.hasOwn(brief.fields, column.name) ? brief.fields[column.name] : undefined;
    const type = typeOf(column, hint);
    const role: FieldRole = brief.keys.includes(column.name) ? 'key' : brief.values.includes(column.name) ? 'value' : 'other';
    return {
      name: column.name, label: hint?.label ?? readableName(column.name), type, role,
      unit: hint?.unit ?? column.unit, format: hint?.format, notation: brief.notation, additive: hint?.additive ?? isAdditiveUnit(hint?.unit ?? column.unit), levels: levelsOf(column, type, hint, problems), column,
      ...(hint?.zero === 'arbitrary' ? { zero: hint.zero } : {}),
      // Only a locale other than English is stated, so an English chart's plan reads as before.
      ...(brief.locale !== 'en' ? { locale: brief.locale } : {}),
    };
  });
  if (hasErrors(problems)) return failure(problems);
  if (brief.order === 'auto') problems.push(...all.filter((f) => f.role === 'key').flatMap(unrecognisedOrder));
  const byName = (n: string) => all.find((f) => f.name === n)!;
  return success({ keys: brief.keys.map(byName), values: brief.values.map(byName), all }, problems);
}
