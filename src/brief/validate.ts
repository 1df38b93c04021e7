import { diagnostic, type Diagnostic } from '../diagnostics/diagnostic.js';
import { suggestionHint } from '../diagnostics/suggest.js';
import { preview } from './preview.js';
import type { SchemaNode } from './schema.js';
import { article, count } from '../diagnostics/words.js';

/** Most problems reported for one brief; the rest are counted in one more line (common practice in compilers). */
export const MAX_BRIEF_PROBLEMS = 50;

/** A schema node's own property, never one inherited from Object.prototype (`constructor:`, `__proto__:`). */
function ownChild(map: Record<string, SchemaNode> | undefined, key: string): SchemaNode | undefined {
  return map && Object.hasOwn(map, key) ? map[key] : undefined;
}

/** Appends a key to a JSON-pointer path, escaping `~` and `/` as RFC 6901 asks. */
export function pointer(path: string, key: string | number): string {
  const text = String(key);
  // Most keys have neither: every row of inline data gets a path per cell, so skip the two passes.
  if (!text.includes('~') && !text.includes('/')) return `${path}/${text}`;
  return `${path}/${text.replace(/~/g, '~0').replace(/\//g, '~1')}`;
}

function typeName(value: unknown): string {
  if (value === null) return 'null';
  if (Array.isArray(value)) return 'array';
  if (typeof value === 'number' && Number.isInteger(value)) return 'integer';
  return typeof value;
}

function matchesType(value: unknown, type: SchemaNode['type']): boolean {
  const actual = typeName(value);
  if (type === 'number') return actual === 'number' || actual === 'integer';
  return actual === type;
}

function describeFound(value: unknown): string {
  return `${typeName(value)} ${preview(value)}`;
}

function describeExpected(schema: SchemaNode): string {
  if (schema.anyOf) return schema.anyOf.map(describeExpected).join(' or ');
  if (schema.enum) return `one of ${schema.enum.map((e) => JSON.stringify(e)).join(', ')}`;
  if (schema.type === 'array' && schema.items?.type) return `a list of ${schema.items.type}s`;
  return schema.type ? article(schema.type) : 'a value';
}

/**
 * Checks a value against the brief schema's subset of JSON Schema, collecting one diagnostic
 * per problem, each with the path of the offending value. At the top level (no path) at most
 * `MAX_BRIEF_PROBLEMS` are returned, and one `brief.too-many-problems` counts the rest.
 */
export function validateAgainstSchema(value: unknown, schema: SchemaNode, path = ''): Diagnostic[] {
  const problems = validateNode(value, schema, path);
  return path === '' ? capProblems(problems) : problems;
}

/** The first `MAX_BRIEF_PROBLEMS` problems, and one `brief.too-many-problems` counting the rest. */
export function capProblems(problems: Diagnostic[]): Diagnostic[] {
  if (problems.length <= MAX_BRIEF_PROBLEMS) return problems;
  const hidden = problems.length - MAX_BRIEF_PROBLEMS;
  return [...problems.slice(0, MAX_BRIEF_PROBLEMS), diagnostic('brief.too-many-problems', `the brief has ${count(hidden, 'more problem', 'more problems')}, not shown`, {
    found: `${problems.length} problems`, expected: `at most ${MAX_BRIEF_PROBLEMS} shown`, hint: 'fix the problems shown and check the brief again',
  })];
}

function validateNode(value: unknown, schema: SchemaNode, path: string): Diagnostic[] {
  if (schema.anyOf) {
    const branches = schema.anyOf.map((s) => validateNode(value, s, path));
    if (branches.some((b) => b.length === 0)) return [];
    const typed = schema.anyOf.findIndex((s) => !s.type || matchesType(value, s.type));
    if (typed >= 0) return branches[typed]!;
    return [wrongType(value, schema, path)];
  }
  if (schema.type && !matchesType(value, schema.type)) return [wrongType(value, schema, path)];
  if (schema.enum && !schema.enum.includes(value as string | number)) {
    const options = schema.enum.map(String);
    // `found` stays the value's JSON (callers parse it back); only the message is shortened.
    return [diagnostic('brief.bad-value', `${path || 'the brief'} is ${preview(value)}, which is not an option here`, {
      path, found: typeof value === 'string' ? JSON.stringify(value) : preview(value), expected: describeExpected(schema), hint: suggestionHint(String(value), options, 'option'),
    })];
  }
  const problems: Diagnostic[] = [];
  if (typeof value === 'string' && schema.minLength !== undefined && value.length < schema.minLength) {
    problems.push(diagnostic('brief.bad-value', `${path} is empty`, { path, found: '""', expected: 'a non-empty string', hint: 'give a value or remove the option' }));
  }
  if (typeof value === 'number') problems.push(...checkRange(value, schema, path));
  if (Array.isArray(value)) problems.push(...checkArray(value, schema, path));
  if (typeName(value) === 'object') problems.push(...checkObject(value as Record<string, unknown>, schema, path));
  return problems;
}

function wrongType(value: unknown, schema: SchemaNode, path: string): Diagnostic {
  return diagnostic('brief.wrong-type', `${path || 'the brief'} has the wrong type`, {
    path, found: describeFound(value), expected: describeExpected(schema), hint: `write ${describeExpected(schema)} at ${path || 'the top level'}`,
  });
}

function checkRange(value: number, schema: SchemaNode, path: string): Diagnostic[] {
  const low = schema.minimum !== undefined && value < schema.minimum;
  const high = schema.maximum !== undefined && value > schema.maximum;
  if (!low && !high) return [];
  const expected = `a number from ${schema.minimum ?? '-∞'} to ${schema.maximum ?? '∞'}`;
  return [diagnostic('brief.out-of-range', `${path} is ${value}, outside the allowed range`, {
    path, found: String(value), expected, hint: `use ${expected}`,
  })];
}

function checkArray(value: unknown[], schema: SchemaNode, path: string): Diagnostic[] {
  const problems: Diagnostic[] = [];
  if (schema.minItems !== undefined && value.length < schema.minItems) {
    problems.push(diagnostic('brief.bad-value', `${path} is an empty list`, { path, found: '[]', expected: `at least ${count(schema.minItems ?? 1, 'item')}`, hint: 'list at least one item or remove the option' }));
  }
  if (schema.items) value.forEach((item, i) => problems.push(...validateNode(item, schema.items!, pointer(path, i))));
  return problems;
}

function checkObject(value: Record<string, unknown>, schema: SchemaNode, path: string): Diagnostic[] {
  const problems: Diagnostic[] = [];
  for (const name of schema.required ?? []) {
    if (!Object.hasOwn(value, name)) {
      const child = ownChild(schema.properties, name) ?? {};
      const hint = child.enum ? `add \`${name}:\` with ${describeExpected(child)}` : `add \`${name}:\``;
      problems.push(diagnostic('brief.missing-option', `${path || 'the brief'} has no \`${name}\``, { path: pointer(path, name), expected: describeExpected(child), hint }));
    }
  }
  let unknown = 0;
  for (const [key, item] of Object.entries(value)) {
    const child = ownChild(schema.properties, key);
    if (child) {
      problems.push(...validateNode(item, child, pointer(path, key)));
    } else if (schema.additionalProperties === false) {
      // Past the number shown, a suggestion would be computed only to be dropped.
      const known = Object.keys(schema.properties ?? {});
      const hint = ++unknown <= MAX_BRIEF_PROBLEMS ? suggestionHint(key, known, 'option') : 'remove it';
      problems.push(diagnostic('brief.unknown-option', `\`${key}\` is not a brief option${path ? ` under ${path}` : ''}`, {
        path: pointer(path, key), found: key, expected: `one of ${known.join(', ')}`, hint,
      }));
    } else if (typeof schema.additionalProperties === 'object') {
      problems.push(...validateNode(item, schema.additionalProperties, pointer(path, key)));
    }
  }
  return problems;
}
