import type { Diagnostic } from '../diagnostics/diagnostic.js';

/** Exit codes of the chartwright CLI. */
export const EXIT = {
  /** Everything rendered or checked cleanly. */
  OK: 0,
  /** At least one brief had errors (or warnings, with --strict); the others were still done. */
  FAILED: 1,
  /** The command line itself was wrong. */
  USAGE: 2,
  /** A defect in chartwright (a `render.internal` diagnostic), even when other briefs also failed. */
  INTERNAL: 3,
} as const;

/** The exit code of briefs done: a defect wins over bad input, so CI can tell them apart. */
export function exitFor(briefs: { ok: boolean; diagnostics: Diagnostic[] }[]): number {
  if (briefs.some((b) => b.diagnostics.some((d) => d.code === 'render.internal'))) return EXIT.INTERNAL;
  return briefs.every((b) => b.ok) ? EXIT.OK : EXIT.FAILED;
}
