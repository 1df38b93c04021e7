import type { Diagnostic } from '../diagnostics/diagnostic.js';

/** Whether people-facing output may use colour: a terminal, no NO_COLOR, not CI. */
export function colourAllowed(isTTY: boolean, env: Record<string, string | undefined>): boolean {
  return isTTY && env.NO_COLOR === undefined && env.CI !== 'true' && env.CI !== '1';
}

const COLOURS = { error: '\u001b[31m', warning: '\u001b[33m', info: '\u001b[36m' } as const;

// C0 controls, DEL and C1 controls: ESC and BEL in a column name could retitle the window or
// clear the screen, and a C1 CSI (U+009B) does the same on 8-bit terminals.
// Bidirectional overrides and isolates (U+202A–U+202E, U+2066–U+2069) reorder what follows them,
// so a file name could show as another ("Trojan Source"); they are escaped too.
const CONTROLS = /[\u0000-\u001f\u007f-\u009f\u202a-\u202e\u2066-\u2069]/g;
const CONTROLS_BUT_NEWLINE = /[\u0000-\u0009\u000b-\u001f\u007f-\u009f\u202a-\u202e\u2066-\u2069]/g;

/**
 * Text made safe for a terminal: every control character (C0, DEL, C1) is shown as a `\u001b`
 * style escape, so data and file names can never drive the terminal. Every line chartwright
 * prints passes through here before its own colour codes are added. With `keepNewlines`, line
 * breaks stay (multi-line text chartwright composes itself, and pretty-printed JSON, where the
 * escape is also valid JSON for the same character).
 */
export function printable(text: string, keepNewlines = false): string {
  return text.replace(keepNewlines ? CONTROLS_BUT_NEWLINE : CONTROLS, (c) => `\\u${c.charCodeAt(0).toString(16).padStart(4, '0')}`);
}

/** Where a diagnostic points, for the end of its line: "at /values, line 4:9". */
function position(d: Diagnostic): string {
  const parts: string[] = [];
  if (d.path !== undefined && d.path !== '') parts.push(`at ${printable(d.path)}`);
  // Data messages often name their line already ("line 3 has …"); say it once.
  if (d.line !== undefined && !d.message.includes(`line ${d.line}`)) parts.push(`line ${d.line}${d.column !== undefined ? `:${d.column}` : ''}`);
  return parts.length ? ` (${parts.join(', ')})` : '';
}

/**
 * The one place diagnostics become text, in the documented form
 * `file: error[code] message (at /path, line L:C)`, then found/expected and the hint, indented.
 * Every part that may carry user text is passed through `printable`; the message keeps its
 * line breaks (a --debug stack trace).
 */
export function formatDiagnostic(d: Diagnostic, colour = false): string {
  const where = d.file ? `${printable(d.file)}: ` : '';
  const level = colour ? `${COLOURS[d.severity]}${d.severity}\u001b[0m` : d.severity;
  const lines = [`${where}${level}[${d.code}] ${printable(d.message, true)}${position(d)}`];
  if (d.found !== undefined || d.expected !== undefined) {
    lines.push(`  ${[d.found !== undefined ? `found: ${printable(d.found)}` : '', d.expected !== undefined ? `expected: ${printable(d.expected)}` : ''].filter(Boolean).join('; ')}`);
  }
  if (d.hint) lines.push(`  hint: ${printable(d.hint)}`);
  return lines.join('\n');
}
