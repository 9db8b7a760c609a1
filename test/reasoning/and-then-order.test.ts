/**
 * "X rose and then Y rose": "and then" between two events orders them as "before" does (pack
 * lexicon `order.before`), so the lag conclusion drawn from it is read like any other.
 *
 * The science: CO2 trailing Antarctic temperature at the start of a deglaciation does not show it
 * had no warming effect; CO2 led global temperature over the last deglaciation (Shakun, J. D. et al.
 * 2012, Nature 484, 49-54; IPCC AR6 WG1 ch. 5). That "and then" marks a sequence is common practice
 * in English grammar.
 */
import { describe, expect, it } from 'vitest';
import { checkReasoning } from '../../src/checks/reasoning/index.js';
import { loadPacks } from '../../src/rulepack/index.js';

const packs = await loadPacks([]);
const LAG = 'logic.lag-rules-out-cause';

/** The rule ids of the flags on the paragraph's last sentence. */
const idsOnLast = (paragraph: string[]): string[] => checkReasoning(paragraph, paragraph.length - 1, packs).map((f) => f.ruleId);

describe('a lag told with "and then", used to rule CO2 out', () => {
  it.each([
    ['In the ice cores the temperature goes up and then the CO2 goes up.', 'So CO2 obviously does not cause warming.'],
    ['In the Antarctic record temperature rises and then carbon dioxide rises.', 'So carbon dioxide cannot be what drives the warming.'],
    ['At each termination the Antarctic warmed and only then did CO2 climb.', 'That means CO2 did not cause the warming.'],
  ])('%s %s', (first, second) => {
    expect(idsOnLast([first, second])).toContain(LAG);
  });

  it.each([
    ['In the ice cores the temperature goes up and then the CO2 goes up.', 'The CO2 then amplified the warming as a feedback.'],
    ['The orbit nudged the climate, and then CO2 amplified the warming.', 'Both played a part.'],
  ])('stays clean when the lag is told without ruling CO2 out: %s %s', (first, second) => {
    expect(idsOnLast([first, second])).not.toContain(LAG);
  });
});
