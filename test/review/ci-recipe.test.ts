import { execFile } from 'node:child_process';
import { readFile, writeFile } from 'node:fs/promises';
import { fileURLToPath } from 'node:url';
import { join } from 'node:path';
import { promisify } from 'node:util';
import { describe, expect, it } from 'vitest';
import { draftRepository, firnline, ICE_HALL } from './workflow-helpers.js';

const run = promisify(execFile);
const here = (name: string) => fileURLToPath(new URL(name, import.meta.url));
const RECIPE = fileURLToPath(new URL('../../examples/ci/check-drafts.sh', import.meta.url));
// The real command line, run from the TypeScript sources in a child process (see ts-hooks.mjs).
const FIRNLINE = `${process.execPath} --import ${here('./ts-register.mjs')} ${here('./firnline-from-source.mjs')}`;

async function recipe(cwd: string, base: string): Promise<{ code: number; stderr: string }> {
  try {
    const { stderr } = await run('sh', [RECIPE], { cwd, env: { ...process.env, FIRNLINE, FIRNLINE_BASE: base, NO_COLOR: '1' } });
    return { code: 0, stderr };
  } catch (error) {
    const e = error as { code?: number; stderr?: string };
    return { code: e.code ?? -1, stderr: e.stderr ?? '' };
  }
}

describe('examples/ci/check-drafts.sh', () => {
  it('fails a change with unsigned claims, writes SARIF 2.1.0, and passes once the new claim is signed off', async () => {
    const dir = await draftRepository(ICE_HALL);
    // A pull request adds one paragraph (an invented panel caption; the value is the accepted one,
    // the 800,000-year EPICA Dome C record: Jouzel et al. 2007, Science 317, 793).
    await writeFile(join(dir, 'drafts', 'ice-hall.md'), `${ICE_HALL}\nThe Dome C record covers eight glacial cycles over about 800,000 years.\n`);

    const before = await recipe(dir, 'HEAD');
    expect(before.code).toBe(1);
    expect(before.stderr).toContain('To sign off:');
    const sarif = JSON.parse(await readFile(join(dir, 'firnline.sarif'), 'utf8')) as { version: string; runs: unknown[] };
    // SARIF 2.1.0 (OASIS standard): a log states version "2.1.0" and holds runs.
    expect(sarif.version).toBe('2.1.0');
    expect(sarif.runs).toHaveLength(1);

    // Only the changed paragraph needs signing: the checklist of that file, its one new box ticked.
    const json = JSON.parse((await firnline(dir, 'checklist', '--format', 'json')).out) as { claims: { id: string; line: number }[] };
    const added = json.claims.filter((c) => c.line === 11);
    expect(added).toHaveLength(1);
    expect((await firnline(dir, 'signoff', added[0]?.id ?? '', '--by', 'R. Okafor')).code).toBe(0);
    expect(await recipe(dir, 'HEAD')).toMatchObject({ code: 0 });

    // Without a base, every claim must be signed off, and the committed ones are not.
    expect((await recipe(dir, '')).code).toBe(1);
  }, 240_000); // seven runs of the command line from source: room for a loaded shared machine (main timed out at 60 s there too)
});
