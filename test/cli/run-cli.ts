import { main } from '../../src/cli/main.js';

/** What one in-memory run of the command line printed and returned. */
export interface CliRun {
  code: number;
  stdout: string;
  stderr: string;
}

/** Runs `firnline <argv>` in memory, in `cwd`, with no terminal (so no colour) and optional stdin. */
export async function runCli(argv: string[], cwd: string, stdin = ''): Promise<CliRun> {
  let stdout = '';
  let stderr = '';
  const code = await main(argv, {
    cwd,
    env: {},
    isTTY: false,
    stdout: (t) => void (stdout += t),
    stderr: (t) => void (stderr += t),
    readStdin: async () => stdin,
  });
  return { code, stdout, stderr };
}
