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
}
