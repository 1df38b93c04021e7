import { formatSpecifier } from 'd3-format';
import { diagnostic, type Diagnostic } from '../diagnostics/diagnostic.js';
import { preview } from './preview.js';
import { capProblems, pointer } from './validate.js';

/** Widest padding a format may ask for, in characters: wider than any axis label (common practice). */
export const MAX_FORMAT_WIDTH = 100;
/** Most digits after the point a format may ask for: the most `Number.prototype.toFixed` gives (ECMAScript) and d3-format uses. */
export const MAX_FORMAT_PRECISION = 20;

/** The types d3-format documents; any other letter it silently reads as "g". (d3-format 3 README, "Locale formatting".) */
const FORMAT_TYPES = new Set(['', 'e', 'f', 'g', 'r', 's', '%', 'p', 'b', 'o', 'd', 'x', 'X', 'c', 'n']);

const EXAMPLE = 'e.g. ",d" for 1,234, ".1f" for 1234.5, ".0%" for 12%';

/** What is wrong with a d3-format specifier, or undefined when it is usable. */
export function formatProblem(specifier: string): string | undefined {
  let parsed: ReturnType<typeof formatSpecifier>;
  try {
    parsed = formatSpecifier(specifier);
  } catch {
    return 'it is not a d3-format specifier';
  }
  if (!FORMAT_TYPES.has(parsed.type)) return `\`${parsed.type}\` is not a d3-format type`;
  if (parsed.width !== undefined && parsed.width > MAX_FORMAT_WIDTH) return `its width ${parsed.width} is more than ${MAX_FORMAT_WIDTH}`;
  if (parsed.precision !== undefined && parsed.precision > MAX_FORMAT_PRECISION) return `its precision ${parsed.precision} is more than ${MAX_FORMAT_PRECISION}`;
  return undefined;
}

/**
 * Checks every `fields.<col>.format` of a brief value with d3-format's own specifier parser,
 * with caps on width and precision, so that a bad format is a brief error with its path and
 * line rather than an exception while the chart is drawn. Other shapes are left to the schema.
 * At most `MAX_BRIEF_PROBLEMS` are reported, and one line counts the rest.
 */
export function checkFormats(raw: Record<string, unknown>): Diagnostic[] {
  const fields = Object.hasOwn(raw, 'fields') ? raw.fields : undefined;
  if (fields === null || typeof fields !== 'object' || Array.isArray(fields)) return [];
  const problems: Diagnostic[] = [];
  for (const [name, hint] of Object.entries(fields)) {
    if (hint === null || typeof hint !== 'object' || !Object.hasOwn(hint, 'format')) continue;
    const format: unknown = (hint as Record<string, unknown>).format;
    // A temporal field's format is a d3-time-format pattern, read by the table stage.
    if (typeof format !== 'string' || (hint as Record<string, unknown>).type === 'temporal') continue;
    const problem = formatProblem(format);
    if (problem === undefined) continue;
    problems.push(diagnostic('brief.bad-format', `\`fields.${name}.format\` is ${preview(format)}: ${problem}`, {
      path: pointer(pointer('/fields', name), 'format'), found: preview(format),
      expected: `a d3-format specifier with width up to ${MAX_FORMAT_WIDTH} and precision up to ${MAX_FORMAT_PRECISION}`, hint: `write a d3-format specifier, ${EXAMPLE}`,
    }));
  }
  return capProblems(problems);
}
