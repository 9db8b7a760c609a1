import { spawnSync } from 'node:child_process';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { main } from '../../src/cli/main.js';
import { runCli } from './run-cli.js';

const ROOT = fileURLToPath(new URL('../..', import.meta.url));
const EXAMPLES = fileURLToPath(new URL('../../examples', import.meta.url));

interface JsonFlag {
  file: string;
  level: string;
  ruleId: string;
  span: { start: { line: number } };
}

describe('firnline.yaml in the demo folder', () => {
  it('is found by walking up, adds the house pack and raises a level', async () => {
    const run = await runCli(['check', '--format', 'json'], EXAMPLES);
    const flags = (JSON.parse(run.stdout) as { flags: JsonFlag[] }).flags;
    const at = (ruleId: string) => flags.find((f) => f.ruleId === ruleId);
    // levels: scope.regional-record-as-global is raised from warning to error by the settings.
    expect(at('scope.regional-record-as-global')?.level).toBe('error');
    // packs: the museum's own pattern rule fires on "Today CO2 makes up ..." (line 20).
    expect(at('house.date-present-day-co2')).toMatchObject({ file: 'winter-newsletter.md', level: 'note', span: { start: { line: 20 } } });
    expect(run.code).toBe(1);
  });

  it('is not used when --config names another file, and a missing one is a one-line error', async () => {
    const run = await runCli(['check', '--config', 'nowhere.yaml'], EXAMPLES);
    expect(run.code).toBe(2);
    expect(run.stderr.trim().split('\n')).toHaveLength(1);
    expect(run.stderr).toContain('nowhere.yaml');
  });
});

describe('colour', () => {
  async function colourRun(env: Record<string, string>, isTTY: boolean): Promise<string> {
    let out = '';
    await main(['check', 'examples/winter-newsletter.md'], {
      cwd: ROOT,
      env,
      isTTY,
      stdout: (t) => void (out += t),
      stderr: () => undefined,
      readStdin: async () => '',
    });
    return out;
  }
  // ANSI escape sequences begin with ESC (U+001B), ECMA-48 (common practice for terminal colour).
  const ESC = '\u001b[';

  it('is used on a terminal', async () => {
    expect(await colourRun({}, true)).toContain(ESC);
  });

  it('is never used with NO_COLOR set, nor when output is not a terminal', async () => {
    // NO_COLOR: any non-empty value turns colour off (the no-color.org convention).
    expect(await colourRun({ NO_COLOR: '1' }, true)).not.toContain(ESC);
    expect(await colourRun({}, false)).not.toContain(ESC);
  });
});

describe('the installed command', () => {
  it('runs through bin/firnline.js (the build from npm install) and sets the exit status', () => {
    const run = spawnSync(process.execPath, ['bin/firnline.js', 'check', 'examples/gallery-panels.md'], { cwd: ROOT, encoding: 'utf8' });
    expect(run.stdout).toContain('Checked 1 file');
    expect(run.status).toBe(0);
    const missing = spawnSync(process.execPath, ['bin/firnline.js', 'check', 'no-such-draft.md'], { cwd: ROOT, encoding: 'utf8' });
    expect(missing.status).toBe(2);
    expect(missing.stderr).toBe('no-such-draft.md: no such file or folder; check the path\n');
  });
});
