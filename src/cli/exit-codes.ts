/** Exit codes of the chartwright CLI. */
export const EXIT = {
  /** Everything rendered or checked cleanly. */
  OK: 0,
  /** At least one brief had errors (or warnings, with --strict); the others were still done. */
  FAILED: 1,
  /** The command line itself was wrong. */
  USAGE: 2,
  /** A defect in chartwright. */
  INTERNAL: 3,
} as const;
