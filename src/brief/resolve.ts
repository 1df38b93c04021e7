import { diagnostic, failure, hasErrors, success, type Diagnostic, type Outcome } from '../diagnostics/diagnostic.js';
import { checkFormats } from './format.js';
import { parseBriefText, type ParsedBrief } from './parse.js';
import { briefSchema } from './schema.js';
import { tableLike, TABLE_AS_BRIEF_HINT } from './table-like.js';
import { FORM_NAMES, INTENTS, type BriefVocabulary, type DataSource, type FieldHint, type ResolvedBrief } from './types.js';
import { validateAgainstSchema } from './validate.js';

/** Frame size when the brief gives none, in CSS pixels. */
export const DEFAULT_SIZE = { width: 720, height: 440 } as const;

function asList(value: unknown): string[] {
  if (value === undefined) return [];
  return Array.isArray(value) ? value.map(String) : [String(value)];
}

function dataSource(raw: Record<string, unknown>): DataSource {
  if (Array.isArray(raw.rows)) return { kind: 'rows', rows: raw.rows as Record<string, unknown>[] };
  if (raw.data === '-') return { kind: 'stdin' };
  return { kind: 'file', path: String(raw.data) };
}

/** `facet: col` or `facet: { by, context }`, with its default. */
function facetOption(value: unknown): ResolvedBrief['facet'] {
  if (value === undefined) return undefined;
  if (typeof value === 'string') return { by: value, context: false };
  const { by, context } = value as { by: string; context?: boolean };
  return { by, context: context ?? false };
}

/** Applies defaults to a schema-valid brief object. */
export function resolveBrief(raw: Record<string, unknown>): ResolvedBrief {
  const size = (raw.size ?? {}) as { width?: number; height?: number };
  return {
    data: dataSource(raw),
    intent: raw.intent as ResolvedBrief['intent'],
    keys: asList(raw.keys),
    values: asList(raw.values),
    title: raw.title as string | undefined,
    subtitle: raw.subtitle as string | undefined,
    source: raw.source as string | undefined,
    description: raw.description as string | undefined,
    fields: (raw.fields ?? {}) as Record<string, FieldHint>,
    form: raw.form as ResolvedBrief['form'],
    order: (raw.order ?? 'auto') as ResolvedBrief['order'],
    baseline: (raw.baseline ?? 'zero') as ResolvedBrief['baseline'],
    notation: (raw.notation ?? 'auto') as ResolvedBrief['notation'],
    accept: (raw.accept as string[] | undefined) ?? [],
    aggregate: (raw.aggregate ?? 'sum') as ResolvedBrief['aggregate'],
    aggregateStated: raw.aggregate !== undefined,
    style: (raw.style ?? 'report') as string,
    size: { width: size.width ?? DEFAULT_SIZE.width, height: size.height ?? DEFAULT_SIZE.height },
    sizeFixed: { width: size.width !== undefined, height: size.height !== undefined },
    output: asList(raw.output),
    index: raw.index as ResolvedBrief['index'],
    start: raw.start as string | undefined,
    end: raw.end as string | undefined,
    color: raw.color as string | undefined,
    shape: raw.shape as string | undefined,
    area: raw.area as string | undefined,
    after: raw.after as string | undefined,
    fit: raw.fit as ResolvedBrief['fit'],
    facet: facetOption(raw.facet),
    linkage: raw.linkage as ResolvedBrief['linkage'],
    distance: raw.distance as ResolvedBrief['distance'],
    standardize: raw.standardize as boolean | undefined,
    locale: (raw.locale ?? 'en') as ResolvedBrief['locale'],
  };
}

/** Every intent and form of chartwright's design: what a brief may name, drawn or not. */
export const BRIEF_LANGUAGE: BriefVocabulary = { intents: INTENTS, forms: FORM_NAMES };

/**
 * An intent or form of the design that this build does not answer or draw yet is told so
 * (choice.*-not-supported), rather than called "not an option"; what it offers instead is only
 * what the vocabulary holds.
 */
function notSupportedYet(d: Diagnostic, vocabulary: BriefVocabulary): Diagnostic {
  if (d.code !== 'brief.bad-value' || (d.path !== '/intent' && d.path !== '/form')) return d;
  const found = d.found === undefined ? undefined : (JSON.parse(d.found) as unknown);
  if (d.path === '/intent' && (INTENTS as readonly unknown[]).includes(found)) {
    return diagnostic('choice.intent-not-supported', `the intent \`${found}\` is not supported yet`, {
      path: d.path, line: d.line, column: d.column, found: String(found), expected: vocabulary.intents.join(', '), hint: `use one of the intents answered today: ${vocabulary.intents.join(', ')}`,
    });
  }
  if (d.path === '/form' && (FORM_NAMES as readonly unknown[]).includes(found)) {
    return diagnostic('choice.form-not-supported', `the form \`${found}\` is not drawn yet`, {
      path: d.path, line: d.line, column: d.column, found: String(found), expected: vocabulary.forms.join(', '), hint: `remove \`form:\` to let the rules choose, or pin one of: ${vocabulary.forms.join(', ')}`,
    });
  }
  return d;
}

/**
 * Adds the brief's line and column to diagnostics that carry a brief path but no position.
 * Diagnostics about another file (a data or style file) keep their own positions.
 */
export function withPositions(diagnostics: Diagnostic[], parsed: ParsedBrief): Diagnostic[] {
  return diagnostics.map((d) => {
    if (d.path === undefined || d.line !== undefined || d.file) return d;
    const pos = parsed.locate(d.path);
    return pos ? { ...d, line: pos.line, column: pos.column } : d;
  });
}

/** Checks the parts of a brief that one schema keyword cannot: data and rows together or neither. */
function checkDataSource(raw: Record<string, unknown>): Diagnostic[] {
  if (raw.data !== undefined && raw.rows !== undefined) {
    return [diagnostic('brief.data-and-rows', 'the brief gives both `data` and `rows`', { path: '/rows', hint: 'keep one: `data` for a file, `rows` for inline rows' })];
  }
  if (raw.data === undefined && raw.rows === undefined) {
    return [diagnostic('brief.missing-option', 'the brief names no data', { path: '/data', expected: 'a file path, "-" for stdin, or inline `rows`', hint: 'add `data: my-table.csv`' })];
  }
  return [];
}

/**
 * The brief stage: text of a JSON or YAML brief → a `ResolvedBrief`, or diagnostics with paths
 * into the document (and line/column where the text has them).
 */
export function readBrief(text: string, parsedBrief?: ParsedBrief, vocabulary: BriefVocabulary = BRIEF_LANGUAGE): Outcome<{ brief: ResolvedBrief; parsed: ParsedBrief }> {
  const parsedOutcome = parsedBrief ? success(parsedBrief) : parseBriefText(text);
  if (!parsedOutcome.ok) return failure(parsedOutcome.diagnostics);
  const parsed = parsedOutcome.value;
  return checkBriefValue(parsed.value, parsed, vocabulary);
}

/**
 * The same checks for a brief that is already a JavaScript value (the library API). The
 * vocabulary is what may be named; by default every intent and form of the design.
 */
export function checkBriefValue(value: unknown, parsed?: ParsedBrief, vocabulary: BriefVocabulary = BRIEF_LANGUAGE): Outcome<{ brief: ResolvedBrief; parsed: ParsedBrief }> {
  const located: ParsedBrief = parsed ?? { value, locate: () => undefined };
  if (value === null || typeof value !== 'object' || Array.isArray(value)) {
    const table = tableLike(value);
    return failure([diagnostic('brief.not-an-object', `a brief must be a mapping of options${table ? '; this looks like a table' : ''}`, {
      path: '', found: Array.isArray(value) ? (table ? 'a list of row objects' : 'a list') : String(value), expected: 'a mapping such as `intent: compare`',
      hint: table ? TABLE_AS_BRIEF_HINT : 'start the brief with `data:` and `intent:` lines',
    })]);
  }
  const raw = value as Record<string, unknown>;
  const problems = [...validateAgainstSchema(raw, vocabulary.schema ?? briefSchema(vocabulary)).map((d) => notSupportedYet(d, vocabulary)), ...checkDataSource(raw), ...checkFormats(raw)];
  const diagnostics = withPositions(problems, located);
  if (hasErrors(diagnostics)) return failure(diagnostics);
  return success({ brief: resolveBrief(raw), parsed: located }, diagnostics);
}
