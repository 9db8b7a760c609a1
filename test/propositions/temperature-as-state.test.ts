/**
 * A cold or warmth told as a state a place is in ("Europe was stuck in the cold"), read as that
 * place's temperature (src/propositions/changes.ts, stateSubject), in sentences of our own.
 * The science: during the Antarctic Cold Reversal (about 14,700 to 13,000 years ago) the south
 * cooled while the north was warm (the Bølling–Allerød); during the Younger Dryas the North
 * Atlantic region was cold while Antarctica warmed (Pedro et al. 2016, Nature Geoscience 9, 51-55,
 * doi 10.1038/ngeo2580; the bipolar seesaw).
 */
import { beforeAll, describe, expect, it } from 'vitest';
import { checkText } from '../../src/engine.js';
import { loadPacks } from '../../src/rulepack/index.js';
import type { LoadedPacks } from '../../src/rulepack/types.js';

let packs: LoadedPacks;
beforeAll(async () => {
  packs = await loadPacks([]);
});

const RULE = 'direction.bipolar-seesaw-younger-dryas';
const lead = 'Ice cores from Dome C and GRIP record the last deglaciation. ';
const rules = async (text: string) => (await checkText(lead + text, { packs, format: 'markdown' })).flags.map((f) => f.ruleId);

describe('a temperature told as a state its place is in', () => {
  it.each([
    'During the Antarctic Cold Reversal, Europe was stuck in the cold as well.',
    'Throughout the Antarctic Cold Reversal the northern hemisphere stayed in deep cold.',
  ])('flags %s', async (text) => {
    expect(await rules(text)).toContain(RULE);
  });

  it.each([
    'During the Antarctic Cold Reversal, Europe basked in warmth.',
    'During the Younger Dryas, Greenland sat in bitter cold while Antarctica warmed.',
  ])('leaves %s alone', async (text) => {
    expect(await rules(text)).not.toContain(RULE);
  });
});
