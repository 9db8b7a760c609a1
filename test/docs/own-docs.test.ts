/**
 * Firnline runs clean over its own README, DEVELOPERS.md and docs: the pages quote wrong sentences
 * on purpose, each such passage behind the deliberate-quotation marker, so a warning or an error
 * here is either an unmarked quotation or a false flag on the project's own prose.
 */
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { checkPaths } from '../../src/engine.js';

const ROOT = fileURLToPath(new URL('../..', import.meta.url));

describe("the project's own pages", () => {
  // The pages grow every round and the run reads all of them: a loaded 2-core CI machine needs more
  // than the default 30 s.
  it('raise no warning or error, and their quotations are counted as marked', { timeout: 120_000 }, async () => {
    const result = await checkPaths(['README.md', 'DEVELOPERS.md', 'docs'], { cwd: ROOT });
    const serious = result.flags.filter((f) => f.level !== 'note').map((f) => `${f.file}:${f.span.start.line} ${f.ruleId}`);
    expect(serious).toEqual([]);
    expect(result.claims.filter((c) => c.marked === true).length).toBeGreaterThan(0);
  });
});
