import { readFile } from 'node:fs/promises';
import { fileURLToPath } from 'node:url';
import { parse } from 'yaml';
import { describe, expect, it } from 'vitest';

const RECIPE = fileURLToPath(new URL('../../examples/ci/check-drafts.sh', import.meta.url));
const WORKFLOW = fileURLToPath(new URL('../../examples/ci/github-actions.yml', import.meta.url));

/** `firnline` commands as shapes: subcommand and options, with --changed-since's value left out. */
function shapes(lines: string[]): string[] {
  return lines
    .map((line) => line.replace(/^.*?(?:npx firnline|\$FIRNLINE) /u, '').replace(/"\$@"/u, '--changed-since BASE'))
    .map((line) => line.replace(/--changed-since (?:"[^"]*"|\S+)/u, '--changed-since').replace(/\s+/gu, ' ').trim());
}

describe('examples/ci/github-actions.yml', () => {
  it('calls the same firnline commands as the shell recipe', async () => {
    const workflow = parse(await readFile(WORKFLOW, 'utf8')) as { jobs: Record<string, { steps: { run?: string }[] }> };
    const runs = Object.values(workflow.jobs).flatMap((job) => job.steps.flatMap((s) => (s.run?.includes('firnline') ? [s.run] : [])));
    const script = (await readFile(RECIPE, 'utf8')).split('\n').filter((l) => /^\$FIRNLINE /u.test(l));
    const fromWorkflow = new Set(shapes(runs).map((s) => s.replace(' --changed-since', '')));
    const fromScript = new Set(shapes(script).map((s) => s.replace(' --changed-since', '')));
    expect([...fromWorkflow].sort()).toEqual([...fromScript].sort());
    expect([...fromScript].sort()).toEqual(['check --format sarif -o firnline.sarif', 'check --require-signoff']);
    // On pull requests both steps are scoped to the changed lines, as the recipe is with a base.
    expect(shapes(runs).filter((s) => s.includes('--changed-since'))).toEqual([
      'check --changed-since --format sarif -o firnline.sarif',
      'check --changed-since --require-signoff',
    ]);
  });
});
