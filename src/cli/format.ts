import type { Diagnostic } from '../diagnostics/diagnostic.js';

/** Whether people-facing output may use colour: a terminal, no NO_COLOR, not CI. */
export function colourAllowed(isTTY: boolean, env: Record<string, string | undefined>): boolean {
  return isTTY && env.NO_COLOR === undefined && env.CI !== 'true' && env.CI !== '1';
}

const COLOURS = { error: '\u001b[31m', warning: '\u001b[33m', info: '\u001b[36m' } as const;

/**
 * The one place diagnostics become text:
 * `file:line:col: error[code] message (at /path)`, then found/expected and the hint, indented.
 */
export function formatDiagnostic(d: Diagnostic, colour = false): string {
  const where = d.file ? `${d.file}${d.line ? `:${d.line}${d.column ? `:${d.column}` : ''}` : ''}: ` : '';
  const level = colour ? `${COLOURS[d.severity]}${d.severity}\u001b[0m` : d.severity;
  const at = d.path !== undefined && d.path !== '' ? ` (at ${d.path})` : '';
  const lines = [`${where}${level}[${d.code}] ${d.message}${at}`];
  if (d.found !== undefined || d.expected !== undefined) {
    lines.push(`  ${[d.found !== undefined ? `found: ${d.found}` : '', d.expected !== undefined ? `expected: ${d.expected}` : ''].filter(Boolean).join('; ')}`);
  }
  if (d.hint) lines.push(`  hint: ${d.hint}`);
  return lines.join('\n');
}
