import type { Diagnostic } from '../diagnostics/diagnostic.js';

/** Whether people-facing output may use colour: a terminal, no NO_COLOR, not CI. */
export function colourAllowed(isTTY: boolean, env: Record<string, string | undefined>): boolean {
  return isTTY && env.NO_COLOR === undefined && env.CI !== 'true' && env.CI !== '1';
}

const COLOURS = { error: '\u001b[31m', warning: '\u001b[33m', info: '\u001b[36m' } as const;

/** Where a diagnostic points, for the end of its line: "at /values, line 4:9". */
function position(d: Diagnostic): string {
  const parts: string[] = [];
  if (d.path !== undefined && d.path !== '') parts.push(`at ${d.path}`);
  // Data messages often name their line already ("line 3 has …"); say it once.
  if (d.line !== undefined && !d.message.includes(`line ${d.line}`)) parts.push(`line ${d.line}${d.column !== undefined ? `:${d.column}` : ''}`);
  return parts.length ? ` (${parts.join(', ')})` : '';
}

/**
 * The one place diagnostics become text, in the documented form
 * `file: error[code] message (at /path, line L:C)`, then found/expected and the hint, indented.
 */
export function formatDiagnostic(d: Diagnostic, colour = false): string {
  const where = d.file ? `${d.file}: ` : '';
  const level = colour ? `${COLOURS[d.severity]}${d.severity}\u001b[0m` : d.severity;
  const lines = [`${where}${level}[${d.code}] ${d.message}${position(d)}`];
  if (d.found !== undefined || d.expected !== undefined) {
    lines.push(`  ${[d.found !== undefined ? `found: ${d.found}` : '', d.expected !== undefined ? `expected: ${d.expected}` : ''].filter(Boolean).join('; ')}`);
  }
  if (d.hint) lines.push(`  hint: ${d.hint}`);
  return lines.join('\n');
}
