import type { ResolvedBrief } from '../brief/types.js';
import { diagnostic, type Diagnostic } from '../diagnostics/diagnostic.js';
import type { Fields } from '../fields/types.js';

/** The value's checks, as the compare intent makes them (a value, numeric, or a count of rows). */
type ValueCheck = (fields: Fields, brief: ResolvedBrief) => Diagnostic[];

function keyCount(fields: Fields, min: number, max: number, what: string, hint: string): Diagnostic[] {
  const n = fields.keys.length;
  if (n < min) {
    return [diagnostic('choice.no-key', `${what} needs ${min === max ? 'two keys' : 'a key'}: ${hint}`, {
      path: '/keys', found: n ? fields.keys.map((k) => k.name).join(', ') : undefined, expected: min === max ? 'two key columns: [group, part]' : 'one or two key columns', hint: 'add `keys: [group, part]` naming the column of groups (one bar each) and the column of parts',
    })];
  }
  if (n > max) {
    return [diagnostic('choice.too-many-keys', `${what} takes at most ${max} keys (group and part), not ${n}`, {
      path: '/keys', found: fields.keys.map((k) => k.name).join(', '), expected: `at most ${max} key columns`, hint: 'sum the table over the other keys first, or write one brief per level of the extra key',
    })];
  }
  return [];
}

/** The data-shape checks of composition (group, part, value) and part-to-whole (part, or group and part, and value). */
export function partsShapeChecks(values: ValueCheck) {
  const valueOnly = (fields: Fields, brief: ResolvedBrief) => values(fields, brief).filter((d) => d.path !== '/keys');
  return {
    composition: (fields: Fields, brief: ResolvedBrief) => [
      ...keyCount(fields, 2, 2, 'a composition', 'the column of groups (one bar each) and the column of parts stacked in them'), ...valueOnly(fields, brief),
    ],
    'part-to-whole': (fields: Fields, brief: ResolvedBrief) => [
      ...keyCount(fields, 1, 2, 'a part-to-whole chart', 'the column of parts (and, before it, a column of groups for one bar each)'), ...valueOnly(fields, brief),
    ],
  };
}
