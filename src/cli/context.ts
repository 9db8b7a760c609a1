/**
 * What a CLI command may touch: its output streams, the working folder, the environment and the
 * exit status. Commands get this instead of `process`, so tests can run them in memory.
 */
export interface CliContext {
  cwd: string;
  env: Record<string, string | undefined>;
  stdout: (text: string) => void;
  stderr: (text: string) => void;
  /** Reads all of standard input (for the path `-`). */
  readStdin: () => Promise<string>;
  /** True when standard output is a terminal (colour is allowed unless NO_COLOR is set). */
  isTTY: boolean;
  /** True when standard error is a terminal (progress lines are allowed, outside CI). */
  stderrIsTTY?: boolean;
  /** The exit status the command asks for: 0 clean, 1 flags at or above the fail level, 2 user error. */
  exitCode: number;
}
