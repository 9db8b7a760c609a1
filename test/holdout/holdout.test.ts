/**
 * Hold-out measurement: a second blind set of drafts, written without reading the engine, its packs,
 * its tests or its docs. The answer key names, for every seeded error, the reference range and the
 * published source it breaks (REFERENCE-VALUES.md). The floors below are deliberately low: this set
 * measures the engine, it is not there to be tuned against.
 */
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { checkPaths } from '../../src/engine.js';
import type { CorrectClaim, ErrorKind, SeededError } from '../evaluation/answer-key.js';
import { assignFlags, countByKind, flagTouches, isSerious, locateClaim } from '../evaluation/score.js';
import { holdoutKey } from './answer-key.js';

const ROOT = fileURLToPath(new URL('../../', import.meta.url));
const KINDS: readonly ErrorKind[] = ['value', 'arith', 'unit', 'logic', 'scope', 'direction'];
const DETECTION_FLOOR = 0.4;
const FALSE_FLAG_CEILING = 12;

const errors: SeededError[] = holdoutKey.flatMap((draft) => draft.errors);
const correct: CorrectClaim[] = holdoutKey.flatMap((draft) => draft.correct);

function linesOf(file: string): string[] {
  return readFileSync(join(ROOT, file), 'utf8').split(/\r\n|\r|\n/);
}

describe('hold-out answer key matches its drafts', () => {
  it.each(holdoutKey.map((draft) => [draft.file, draft] as const))('%s is a 300-700 word draft', (file) => {
    const words = readFileSync(join(ROOT, file), 'utf8').split(/\s+/).filter((word) => word !== '');
    expect(words.length).toBeGreaterThanOrEqual(300);
    expect(words.length).toBeLessThanOrEqual(700);
  });

  it.each(errors.map((error) => [`${error.file}:${error.line}`, error] as const))(
    'seeded error at %s is on its line',
    (_, error) => {
      expect(linesOf(error.file)[error.line - 1]).toContain(error.text);
      expect(error.file.startsWith('test/holdout/drafts/')).toBe(true);
    },
  );

  it.each(correct.map((claim) => [`${claim.file}:${claim.line}`, claim] as const))(
    'correct claim at %s is on its line',
    (_, claim) => {
      expect(linesOf(claim.file)[claim.line - 1]).toContain(claim.text);
      expect(locateClaim(readFileSync(join(ROOT, claim.file), 'utf8'), claim)).toBeDefined();
    },
  );

  it('seeds about 30 errors, at least three of every kind, and about 50 correct claims', () => {
    expect(errors.length).toBeGreaterThanOrEqual(28);
    expect(correct.length).toBeGreaterThanOrEqual(45);
    for (const kind of KINDS) expect(errors.filter((error) => error.kind === kind).length).toBeGreaterThanOrEqual(3);
  });

  it('puts at most one seeded error on a line, and no error on a correct claim line', () => {
    const errorLines = errors.map((error) => `${error.file}:${error.line}`);
    expect(new Set(errorLines).size).toBe(errorLines.length);
    for (const claim of correct) expect(errorLines).not.toContain(`${claim.file}:${claim.line}`);
  });
});

describe('hold-out measurement', () => {
  it('detects at least 40% of the seeded errors with at most 12 false flags', async () => {
    const result = await checkPaths(['test/holdout/drafts'], { cwd: ROOT });
    expect([...result.files].sort()).toEqual(holdoutKey.map((draft) => draft.file).sort());

    const serious = result.flags.filter(isSerious);
    const credited = assignFlags(serious, errors);
    const detected = credited.map((flagIndex) => flagIndex !== -1);
    const found = detected.filter(Boolean).length;

    // A false flag is a correct claim touched by at least one error- or warning-level flag.
    const falseFlags = correct.flatMap((claim) => {
      const where = locateClaim(readFileSync(join(ROOT, claim.file), 'utf8'), claim);
      if (where === undefined) return [];
      const touching = serious.filter((flag) => flag.file === claim.file && flagTouches(flag, where));
      return touching.length === 0 ? [] : [{ claim, touching }];
    });

    const byKind = [...countByKind(errors, detected)]
      .map(([kind, [hit, total]]) => `${kind} ${hit}/${total}`)
      .join(', ');
    const percent = Math.round((100 * found) / errors.length);
    const lines = [
      `holdout: detected ${found}/${errors.length} seeded errors (${percent}%), ` +
        `${falseFlags.length} false flags on ${correct.length} correct claims; by kind: ${byKind}`,
      ...errors.flatMap((error, index) =>
        detected[index] === true
          ? []
          : [
              `  miss ${error.file}:${error.line} [${error.kind}] "${error.text}"; serious flags on the line: ` +
                (serious
                  .filter((flag) => flag.file === error.file && flag.span.start.line <= error.line && error.line <= flag.span.end.line)
                  .map((flag) => flag.ruleId)
                  .join(', ') || 'none'),
            ],
      ),
      ...falseFlags.map(
        ({ claim, touching }) =>
          `  false flag ${claim.file}:${claim.line} "${claim.text.slice(0, 70)}": ` +
          touching.map((flag) => `${flag.ruleId} (${flag.level}) on "${flag.excerpt ?? ''}"`).join('; '),
      ),
    ];
    console.log(lines.join('\n'));

    expect(found / errors.length).toBeGreaterThanOrEqual(DETECTION_FLOOR);
    expect(falseFlags.length).toBeLessThanOrEqual(FALSE_FLAG_CEILING);
  });
});
