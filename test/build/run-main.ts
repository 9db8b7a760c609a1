/** One in-memory run of a build of the command line, shared by the bundle and code-cache tests. */
import { fileURLToPath } from 'node:url';

const root = fileURLToPath(new URL('../../', import.meta.url));

export type Main = (argv: string[], context: Record<string, unknown>) => Promise<number>;

/** Runs `main` with `argv` from the repository root, capturing what it writes. */
export async function run(main: Main, argv: string[]): Promise<{ code: number; stdout: string; stderr: string }> {
  let stdout = '';
  let stderr = '';
  const code = await main(argv, { cwd: root, env: {}, isTTY: false, stdout: (t: string) => void (stdout += t), stderr: (t: string) => void (stderr += t), readStdin: async () => '' });
  return { code, stdout, stderr };
}
