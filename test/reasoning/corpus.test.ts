/**
 * The reasoning checks measured on the labelled corpus (test/reasoning/corpus.ts): recall over the
 * labelled errors and the false-flag rate over the correct items. Targets from issue 5: recall at
 * least 90%, false flags (a warning or error on a correct item) at most 5%.
 * The labels follow the sources named in corpus.ts (Shakun et al. 2012; Pedro et al. 2012;
 * Parrenin et al. 2013; Caillon et al. 2003; Hays et al. 1976).
 */
import { beforeAll, describe, expect, it } from 'vitest';
import { checkReasoning } from '../../src/checks/reasoning/index.js';
import { loadPacks } from '../../src/rulepack/index.js';
import type { LoadedPacks } from '../../src/rulepack/types.js';
import type { FlagDraft } from '../../src/types.js';
import { CORPUS, type CorpusItem } from './corpus.js';
import { HELD_OUT } from './held-out.js';

let packs: LoadedPacks;
beforeAll(async () => {
  packs = await loadPacks([]);
});

function flagsOf(item: CorpusItem): FlagDraft[] {
  return item.paragraph.flatMap((_, i) => checkReasoning(item.paragraph, i, packs));
}

/** Recall over labelled rule ids, and correct items with any warning or error flag. */
function measure(items: CorpusItem[]) {
  let labelled = 0;
  let caught = 0;
  let correct = 0;
  let flagged = 0;
  const misses: string[] = [];
  for (const item of items) {
    const flags = flagsOf(item);
    if (item.expect.length === 0) {
      correct += 1;
      const serious = flags.filter((f) => f.level !== 'note');
      if (serious.length > 0) {
        flagged += 1;
        misses.push(`false flag ${item.id}: ${serious.map((f) => f.ruleId).join(', ')}`);
      }
      continue;
    }
    for (const ruleId of item.expect) {
      labelled += 1;
      if (flags.some((f) => f.ruleId === ruleId)) caught += 1;
      else misses.push(`missed ${item.id}: ${ruleId}`);
    }
  }
  const pct = (a: number, b: number) => `${((100 * a) / b).toFixed(1)}%`;
  return {
    labelled, caught, correct, flagged, misses,
    recall: `${pct(caught, labelled)} (${caught}/${labelled})`,
    falseFlags: `${pct(flagged, correct)} (${flagged}/${correct} correct items)`,
  };
}

describe('the labelled corpus', () => {
  it('has at least 120 items and at least 40 correct ones', () => {
    expect(CORPUS.length).toBeGreaterThanOrEqual(120);
    expect(CORPUS.filter((c) => c.expect.length === 0).length).toBeGreaterThanOrEqual(40);
  });

  it('reaches recall >= 90% with false flags <= 5% of correct items', () => {
    const m = measure(CORPUS);
    console.log(`reasoning: recall ${m.recall}, false flags ${m.falseFlags}`);
    if (m.misses.length > 0) console.log(m.misses.join('\n'));
    expect(m.caught / m.labelled).toBeGreaterThanOrEqual(0.9);
    expect(m.flagged / m.correct).toBeLessThanOrEqual(0.05);
  });

  it('stays useful on the held-out set written after tuning (recall >= 80%, false flags <= 10%)', () => {
    // Looser bounds: this set was never tuned against, so it estimates unseen wording.
    const m = measure(HELD_OUT);
    console.log(`reasoning, held-out: recall ${m.recall}, false flags ${m.falseFlags}`);
    if (m.misses.length > 0) console.log(m.misses.join('\n'));
    expect(m.caught / m.labelled).toBeGreaterThanOrEqual(0.8);
    expect(m.flagged / m.correct).toBeLessThanOrEqual(0.1);
  });

  it('gives every flag a reason, a rewording to adapt and sources, and no exact correction', () => {
    const flags = CORPUS.filter((c) => c.expect.length > 0).flatMap(flagsOf);
    expect(flags.length).toBeGreaterThan(0);
    for (const flag of flags) {
      expect(flag.reason.length, flag.ruleId).toBeGreaterThan(20);
      expect(flag.suggestion?.length ?? 0, flag.ruleId).toBeGreaterThan(20);
      expect(flag.sources.length, flag.ruleId).toBeGreaterThan(0);
      expect(flag.correction).toBeUndefined();
    }
  });

  // DESIGN.md (stance): a myth that is reported is not the writer's error; the editor still sees it.
  it('levels a reported argument as a note that says it is reported', () => {
    const item = CORPUS.find((c) => c.paragraph[0]?.startsWith('Some argue that CO2 rose after the warming'));
    const flags = item === undefined ? [] : flagsOf(item);
    expect(flags.map((f) => [f.ruleId, f.level])).toEqual([['logic.lag-rules-out-cause', 'note']]);
    expect(flags[0]?.reason).toMatch(/^This sentence reports what others say, so it is not flagged as the draft's own claim/u);
  });
});
