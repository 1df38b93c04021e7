/** What the CLI may touch: output streams, the working folder and environment. Only bin/ fills it from `process`. */
export interface CliIo {
  stdout(text: string): void;
  stderr(text: string): void;
  cwd: string;
  env: Record<string, string | undefined>;
  /** Whether stderr is a terminal (colour only then). */
  isTTY: boolean;
  /** This process's id, to name temporary files. */
  pid: number;
  /** A clock in ms for --timings; never read by rendering itself. */
  clock: () => number;
  /**
   * Whether a process id is running on this machine, to tell a stale temporary left by a
   * killed run from one being written. Default: every process counts as running (then only
   * age makes a temporary stale).
   */
  alive?: (pid: number) => boolean;
  /** Wall-clock time in ms, to age temporaries. Default: Date.now. */
  now?: () => number;
}
