/**
 * The keyed evaluation corpus (test/corpus/<set>/answers.yaml), written by independent writers
 * who never read the engine; each keyed line names its published source in `why`. The sets to
 * tune on are measured here with floors that guard what was fixed; the blind hold-out sets are
 * never measured in the test run (`npm run eval -- --holdout` does that, and a hold-out whose
 * output someone has read is spent). Every key must still match its draft.
 */
import { readdirSync } from 'node:fs';
import { join } from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';
import { loadAnswerSet, scoreSet, summarizeScore, type AnswerSet } from '../../src/evaluate/index.js';
import { loadPacks } from '../../src/rulepack/index.js';
import type { LoadedPacks } from '../../src/rulepack/types.js';

const ROOT = new URL('.', import.meta.url).pathname;
const SETS = readdirSync(ROOT, { withFileTypes: true }).filter((d) => d.isDirectory()).map((d) => d.name).sort();
const TUNING = SETS.filter((name) => !name.startsWith('holdout'));

let packs: LoadedPacks;
const caught = { hit: 0, of: 0 };
/**
 * Per-set floors where a set stands apart: tuning-e and tuning-f were the blind hold-out until it was
 * measured twice with tuning between; spent, they became sets to tune on (47.9% and 62.5% caught,
 * 10.1% and 7.5% false flags when they joined). tuning-h-1..3 were the next hold-out (50.0%, 54.8%
 * and 51.3% caught, 10.8%, 5.7% and 4.8% false flags when they joined); tuning-g holds claims as
 * people write them in public (53.7% caught, 13.7% false flags when it joined).
 */
const FLOORS: Record<string, { recall: number; falseFlags: number }> = {
  'tuning-e': { recall: 0.45, falseFlags: 0.11 },
  'tuning-g': { recall: 0.6, falseFlags: 0.13 },
  'tuning-h-1': { recall: 0.6, falseFlags: 0.1 },
  'tuning-h-2': { recall: 0.55, falseFlags: 0.08 },
  'tuning-h-3': { recall: 0.6, falseFlags: 0.08 },
  // tuning-j-1..3 were the blind hold-out holdout-e (64.3%, 72.4%, 75.0% caught when they joined).
  'tuning-j-1': { recall: 0.6, falseFlags: 0.08 },
};
const DEFAULT_FLOOR = { recall: 0.65, falseFlags: 0.08 };
beforeAll(async () => {
  packs = await loadPacks([]);
});

describe('the evaluation corpus', () => {
  it('has at least 600 keyed lines in at least 30 drafts, hold-out sets included', async () => {
    const sets = await Promise.all(SETS.map((name) => loadAnswerSet(join(ROOT, name), name)));
    expect(sets.reduce((n, s) => n + s.lines.length, 0)).toBeGreaterThanOrEqual(600);
    expect(sets.reduce((n, s) => n + Object.keys(s.genres).length, 0)).toBeGreaterThanOrEqual(30);
    expect(SETS.some((name) => name.startsWith('holdout'))).toBe(true);
  });

  it.each(TUNING)('%s: every key matches its draft, and the engine stays above the floors', async (name) => {
    const set: AnswerSet = await loadAnswerSet(join(ROOT, name), name);
    const score = await scoreSet(set, packs);
    console.log(summarizeScore(score));
    expect(score.keyProblems).toEqual([]);
    // Floors from the figures measured (53.7-83.3% caught, 1.6-7.8% false flags per set; the
    // tuning-d sets were written after the others had been tuned on); they guard against
    // regressions, they are not targets.
    const floor = FLOORS[name] ?? DEFAULT_FLOOR;
    expect(score.recall.hit / score.recall.of).toBeGreaterThanOrEqual(floor.recall);
    expect(score.falseFlags.hit / score.falseFlags.of).toBeLessThanOrEqual(floor.falseFlags);
    caught.hit += score.recall.hit;
    caught.of += score.recall.of;
  });

  it('catches at least 80% of the seeded errors over all the sets to tune on (80.9% measured over 17 sets)', () => {
    expect(caught.of).toBeGreaterThan(0);
    expect(caught.hit / caught.of).toBeGreaterThanOrEqual(0.8);
  });
});
