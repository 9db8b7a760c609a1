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
const corrected = { hit: 0, of: 0 };
/**
 * Per-set floors where a set stands apart. Measured per set in December 2026: 76.3-97.5%
 * caught, 0-5.5% false flags. tuning-h-1 (76.3% caught) was a blind hold-out written before most of
 * the engine; tuning-g holds claims as people write them in public (5.5% false flags).
 */
const FLOORS: Record<string, { recall: number; falseFlags: number }> = {
  'tuning-g': { recall: 0.75, falseFlags: 0.08 },
  'tuning-h-1': { recall: 0.7, falseFlags: 0.06 },
  // tuning-k-1..3 were the blind hold-out holdout-f, spent this round (72.5%, 74.4%, 85.0% caught
  // at its second reading).
  'tuning-k-1': { recall: 0.68, falseFlags: 0.08 },
  'tuning-k-2': { recall: 0.68, falseFlags: 0.06 },
  // tuning-l-1..2 were written fresh at the start of December 2026's seventh round and first read
  // on the engine as it stood (70.0% caught, 6.6% false flags; 57.8% caught, 3.2% false flags);
  // tuned on from then on (85.0% and 68.9% caught, 1.6% false flags each at the round's end).
  'tuning-l-1': { recall: 0.8, falseFlags: 0.06 },
  'tuning-l-2': { recall: 0.65, falseFlags: 0.06 },
  // tuning-m-1..4 were the blind hold-out holdout-g, tuning-n-1..4 the blind hold-out holdout-h,
  // both spent in December 2026's seventh round (read on its first and last code); floors a few
  // points under their figures at the round's end, the day they became sets to tune on.
  'tuning-m-1': { recall: 0.7, falseFlags: 0.04 },
  'tuning-m-2': { recall: 0.7, falseFlags: 0.14 },
  'tuning-m-3': { recall: 0.69, falseFlags: 0.08 },
  'tuning-m-4': { recall: 0.48, falseFlags: 0.08 },
  'tuning-n-1': { recall: 0.74, falseFlags: 0.08 },
  'tuning-n-2': { recall: 0.75, falseFlags: 0.1 },
  'tuning-n-3': { recall: 0.64, falseFlags: 0.05 },
  'tuning-n-4': { recall: 0.6, falseFlags: 0.05 },
  // tuning-o-1..2 were written fresh at the start of December 2026's eighth round by two new writers
  // and measured, totals only, to judge each branch before it was merged (30/38 and 23/37 caught at
  // the start, 30/38 with 7/64 false flags and 25/37 with 5/66 at the end). tuning-p-1..4 were the
  // blind hold-out holdout-i, spent that round (read on its first and last code: 104/123 and 26/46
  // caught at the end).
  'tuning-o-1': { recall: 0.74, falseFlags: 0.13 },
  'tuning-o-2': { recall: 0.62, falseFlags: 0.1 },
  'tuning-p-1': { recall: 0.8, falseFlags: 0.05 },
  'tuning-p-2': { recall: 0.73, falseFlags: 0.06 },
  'tuning-p-3': { recall: 0.85, falseFlags: 0.05 },
  'tuning-p-4': { recall: 0.5, falseFlags: 0.06 },
  // tuning-q-1..4 were the blind hold-out holdout-j, spent in December 2026's ninth round (read on its
  // first and last code: 98/124 and 28/39 caught at the start, 97/124 and 29/39 at the end).
  // tuning-r-1..2 were written fresh at that round's start and read, totals only, to judge each branch
  // before merging (36/42 and 32/41 caught at the start and at the end). tuning-s-1..2 are two
  // paraphrase grids (many wordings of the same claims) by two new writers: the engineers read s-1,
  // nobody changing the engine read s-2 (s-1: 77 -> 92/112 caught; s-2: 83 -> 84/117).
  'tuning-q-1': { recall: 0.74, falseFlags: 0.09 },
  'tuning-q-2': { recall: 0.85, falseFlags: 0.06 },
  'tuning-q-3': { recall: 0.64, falseFlags: 0.08 },
  'tuning-q-4': { recall: 0.7, falseFlags: 0.05 },
  'tuning-r-1': { recall: 0.8, falseFlags: 0.03 },
  'tuning-r-2': { recall: 0.74, falseFlags: 0.1 },
  'tuning-s-1': { recall: 0.78, falseFlags: 0.04 },
  'tuning-s-2': { recall: 0.68, falseFlags: 0.04 },
  // tuning-t-1..4 were the blind hold-out holdout-k, spent in December 2026's tenth round (read on its
  // first and last code: 87/123 and 35/41 caught at the start, 88/123 and 35/41 at the end, with
  // 10/194 and 2/65 false flags). tuning-u-1..2 were written fresh at that round's start and read,
  // totals only, to judge each branch before merging (35/53 and 30/41 caught at the start, 37/53 and
  // 30/41 at the end, false flags 5/93 and 3/82 throughout).
  'tuning-t-1': { recall: 0.66, falseFlags: 0.06 },
  'tuning-t-2': { recall: 0.69, falseFlags: 0.09 },
  'tuning-t-3': { recall: 0.65, falseFlags: 0.09 },
  'tuning-t-4': { recall: 0.8, falseFlags: 0.06 },
  'tuning-u-1': { recall: 0.65, falseFlags: 0.08 },
  'tuning-u-2': { recall: 0.68, falseFlags: 0.06 },
  // tuning-v-1..4 were the blind hold-out holdout-l, spent in December 2026's eleventh round (read on its
  // first and last code: 84/125 and 27/42 caught at the start, 86/125 and 29/42 at the end, with 8/236
  // and 6/84 false flags both times). tuning-w-1..2 were written fresh at that round's start and read,
  // totals only, to judge each branch before merging (29/40 and 22/40 caught at the start, 31/40 and
  // 24/40 at the end, false flags 4/65 and 2/70 throughout).
  'tuning-v-1': { recall: 0.83, falseFlags: 0.06 },
  'tuning-v-2': { recall: 0.6, falseFlags: 0.08 },
  'tuning-v-3': { recall: 0.5, falseFlags: 0.04 },
  'tuning-v-4': { recall: 0.64, falseFlags: 0.1 },
  'tuning-w-1': { recall: 0.72, falseFlags: 0.08 },
  'tuning-w-2': { recall: 0.55, falseFlags: 0.05 },
  // tuning-x-1..4 were the blind hold-out holdout-m, spent in December 2026's twelfth round (read on its
  // first and last code: 90/124 and 31/43 caught at the start, 95/124 and 31/43 at the end, with 5/213
  // then 7/213 and 3/70 false flags). tuning-y-1..2 were written fresh at that round's start and read,
  // totals only, to judge each branch before merging (25/43 and 23/41 caught at the start, 26/43 and
  // 23/41 at the end, false flags 1/77 and 3/71 throughout).
  'tuning-x-1': { recall: 0.66, falseFlags: 0.06 },
  'tuning-x-2': { recall: 0.75, falseFlags: 0.1 },
  'tuning-x-3': { recall: 0.75, falseFlags: 0.04 },
  'tuning-x-4': { recall: 0.67, falseFlags: 0.08 },
  'tuning-y-1': { recall: 0.55, falseFlags: 0.04 },
  'tuning-y-2': { recall: 0.5, falseFlags: 0.07 },
  // tuning-z-1..4 were the blind hold-out holdout-n, spent at the start of December 2026's thirteenth
  // round (read once, on that round's first code: 80/126 and 30/41 caught, false flags 3/230 and 3/80).
  'tuning-z-1': { recall: 0.65, falseFlags: 0.04 },
  'tuning-z-2': { recall: 0.56, falseFlags: 0.05 },
  'tuning-z-3': { recall: 0.57, falseFlags: 0.06 },
  'tuning-z-4': { recall: 0.68, falseFlags: 0.08 },
  // tuning-aa-1..4 were the blind hold-out holdout-p, spent at the end of the thirteenth round (read
  // on its first and last code: 93/126 and 25/44 caught at the start, 101/126 and 28/44 at the end,
  // false flags 7/234 then 6/234 and 3/85). tuning-ab-1..2 were written fresh at that round's start
  // and read, totals only, to judge each branch before merging (34/41 and 28/42 caught at the start,
  // 35/41 and 30/42 at the end, false flags 1/72 and 2/75 throughout).
  'tuning-aa-1': { recall: 0.7, falseFlags: 0.04 },
  'tuning-aa-2': { recall: 0.78, falseFlags: 0.05 },
  'tuning-aa-3': { recall: 0.8, falseFlags: 0.06 },
  'tuning-aa-4': { recall: 0.59, falseFlags: 0.06 },
  'tuning-ab-1': { recall: 0.8, falseFlags: 0.04 },
  'tuning-ab-2': { recall: 0.66, falseFlags: 0.05 },
  // tuning-ac-1..4 were the blind hold-out holdout-q, spent at the start of the fourteenth round (read
  // once, on that round's first code: 90/122 and 29/43 caught, false flags 9/231 and 3/74).
  'tuning-ac-1': { recall: 0.76, falseFlags: 0.05 },
  'tuning-ac-2': { recall: 0.68, falseFlags: 0.05 },
  'tuning-ac-3': { recall: 0.64, falseFlags: 0.08 },
  'tuning-ac-4': { recall: 0.63, falseFlags: 0.06 },
  // tuning-ad-1..2 were written fresh at that round's start and read to judge each branch before
  // merging (32/40 and 23/41 caught at the start, 33/40 and 24/41 at the end, false flags 3/80 and
  // 3/85 throughout). tuning-ae-1..4 were the blind hold-out holdout-r, written at that round's start
  // and read, totals only, on its first and last code (100/133 and 27/43 caught at the start,
  // 101/133 and 28/43 at the end; false flags 11/229 then 10/229, and 3/82).
  'tuning-ad-1': { recall: 0.78, falseFlags: 0.05 },
  'tuning-ad-2': { recall: 0.54, falseFlags: 0.05 },
  'tuning-ae-1': { recall: 0.77, falseFlags: 0.05 },
  'tuning-ae-2': { recall: 0.64, falseFlags: 0.04 },
  'tuning-ae-3': { recall: 0.73, falseFlags: 0.08 },
  'tuning-ae-4': { recall: 0.6, falseFlags: 0.05 },
  // tuning-af-1..4 were written fresh at the fifteenth round's start and read, totals only, to judge
  // each branch before merging (124/171 caught, false flags 22/327, at the start and through all five
  // merges), then read in full at the end; three false flags they showed were fixed (19/327).
  // tuning-ag-1..4 were the blind hold-out holdout-s, written in the fourteenth round and read, totals
  // only, on the fifteenth round's first and last code (89/121 and 28/42 caught at the start, 90/121
  // and 30/42 at the end; false flags 5/230 and 3/83 throughout).
  'tuning-af-1': { recall: 0.8, falseFlags: 0.12 },
  'tuning-af-2': { recall: 0.55, falseFlags: 0.06 },
  'tuning-af-3': { recall: 0.8, falseFlags: 0.04 },
  'tuning-af-4': { recall: 0.55, falseFlags: 0.1 },
  'tuning-ag-1': { recall: 0.65, falseFlags: 0.03 },
  'tuning-ag-2': { recall: 0.78, falseFlags: 0.05 },
  'tuning-ag-3': { recall: 0.65, falseFlags: 0.07 },
  'tuning-ag-4': { recall: 0.66, falseFlags: 0.06 },
  // tuning-ah-1..4 were written fresh at the sixteenth round's start and read, totals only, to judge
  // each branch before merging (94/121 and 33/40 caught at the start, 94/121 and 34/40 at the end;
  // false flags 10/246 and 9/82 throughout). tuning-ai-1..4 were the blind hold-out holdout-u, written
  // in the fifteenth round and read, totals only, on the sixteenth round's first and last code (95/126
  // and 31/40 caught at the start, 97/126 and 31/40 at the end; false flags 8/242 and 5/81 throughout).
  'tuning-ah-1': { recall: 0.75, falseFlags: 0.07 },
  'tuning-ah-2': { recall: 0.68, falseFlags: 0.07 },
  'tuning-ah-3': { recall: 0.75, falseFlags: 0.05 },
  'tuning-ah-4': { recall: 0.8, falseFlags: 0.13 },
  'tuning-ai-1': { recall: 0.7, falseFlags: 0.07 },
  'tuning-ai-3': { recall: 0.6, falseFlags: 0.04 },
  'tuning-ai-4': { recall: 0.72, falseFlags: 0.08 },
  // tuning-ak-1..4 were the blind hold-out holdout-w, written in the sixteenth round and read, totals
  // only, on the seventeenth round's first and last code (97/123 and 26/40 caught at the start,
  // 98/123 and 26/40 at the end; false flags 12/241 and 4/92 throughout).
  'tuning-ak-1': { recall: 0.75, falseFlags: 0.1 },
  'tuning-ak-2': { recall: 0.72, falseFlags: 0.07 },
  'tuning-ak-3': { recall: 0.75, falseFlags: 0.05 },
  'tuning-ak-4': { recall: 0.6, falseFlags: 0.07 },
  // tuning-al-1..4 were the blind hold-out holdout-y, written in the seventeenth round and read, totals
  // only, on the eighteenth round's first and last code (102/122 and 28/41 caught at the start,
  // 103/122 and 28/41 at the end; false flags 14/260 throughout, 4/89 then 3/89).
  'tuning-al-1': { recall: 0.75, falseFlags: 0.1 },
  'tuning-al-2': { recall: 0.78, falseFlags: 0.1 },
  'tuning-al-3': { recall: 0.8, falseFlags: 0.06 },
  'tuning-al-4': { recall: 0.62, falseFlags: 0.07 },
  // tuning-ao-1..4 were written at the start of the nineteenth round by four new independent writers,
  // weighted toward reasoning errors (logic, scope, direction), to give the engineers fresh phrasings to
  // read; on the round's first code they caught 25/42, 27/42, 27/41 and 27/41, with false flags 3/83,
  // 3/91, 9/98 and 8/105 (ao-3 and ao-4 are in public phrasing).
  // tuning-am-1..4 were the blind hold-out holdout-z, written in the eighteenth round and read, totals
  // only, on the nineteenth round's first and last code (89/120 and 30/42 caught both times; false
  // flags 3/258 and 6/85 both times).
  'tuning-am-1': { recall: 0.68, falseFlags: 0.05 },
  'tuning-am-2': { recall: 0.65, falseFlags: 0.05 },
  'tuning-am-3': { recall: 0.75, falseFlags: 0.05 },
  'tuning-am-4': { recall: 0.66, falseFlags: 0.1 },
  // tuning-an-1..4 were the blind hold-out holdout-an, written in the nineteenth round and read, totals
  // only, once on the twentieth round's first code (92/123 and 30/40 caught; false flags 12/251 and
  // 8/92), then opened for tuning at that round's start; per set 32/43, 31/40, 29/40, 30/40 caught,
  // false flags 7/84, 2/85, 3/82, 8/92.
  'tuning-an-1': { recall: 0.7, falseFlags: 0.1 },
  'tuning-an-3': { recall: 0.7, falseFlags: 0.06 },
  'tuning-an-4': { recall: 0.7, falseFlags: 0.1 },
  // tuning-ap-1..4 were the blind hold-out holdout-ap, written at the twentieth round's start by four
  // new writers and read, totals only, on that round's first and last code (93/121 then 99/121, and
  // 31/40 both times; false flags 11/287 and 4/113 both times); per set on the last code 34/41, 33/40,
  // 32/40, 31/40 caught, false flags 3/98, 4/90, 4/99, 4/113: the default floors hold.
  // tuning-aq-1..4 were the blind hold-out holdout-aq, written at the end of the twentieth round by four
  // new writers and read once, totals only, on the twenty-first round's first code (33/40, 36/41, 35/42
  // and 27/40 caught; false flags 2/90, 1/82, 2/88, 5/96), then opened for tuning.
  'tuning-aq-4': { recall: 0.65, falseFlags: 0.06 },
  // tuning-ar-1..4 were the blind hold-out holdout-ar, written at the twenty-first round's start by four
  // new writers and read, totals only, on that round's first and last code (102/122 and 34/41 caught
  // both times; false flags 9/269 and 5/89 both times); per set on the last code 38/42, 33/40, 31/40,
  // 34/41 caught, false flags 1/95, 3/88, 5/86, 5/89: the default floors hold.
  'tuning-ao-1': { recall: 0.55, falseFlags: 0.06 },
  'tuning-ao-2': { recall: 0.6, falseFlags: 0.06 },
  'tuning-ao-3': { recall: 0.6, falseFlags: 0.12 },
  'tuning-ao-4': { recall: 0.6, falseFlags: 0.1 },
};
const DEFAULT_FLOOR = { recall: 0.75, falseFlags: 0.06 };
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
    // Floors a few points under the figures measured (see FLOORS); they guard against regressions,
    // they are not targets.
    const floor = FLOORS[name] ?? DEFAULT_FLOOR;
    expect(score.recall.hit / score.recall.of).toBeGreaterThanOrEqual(floor.recall);
    expect(score.falseFlags.hit / score.falseFlags.of).toBeLessThanOrEqual(floor.falseFlags);
    caught.hit += score.recall.hit;
    caught.of += score.recall.of;
    corrected.hit += score.correctionValue.hit;
    corrected.of += score.correctionValue.of;
  });

  it('catches at least 83% of the seeded errors over all the sets to tune on (88.2% measured over 130 sets)', () => {
    expect(caught.of).toBeGreaterThan(0);
    expect(caught.hit / caught.of).toBeGreaterThanOrEqual(0.83);
  });

  it('gives the reference number in at least 90% of the corrections of caught numeric errors (93.7% measured over 130 sets)', () => {
    expect(corrected.of).toBeGreaterThan(0);
    expect(corrected.hit / corrected.of).toBeGreaterThanOrEqual(0.9);
  });
});
