/**
 * A vague stretch of time told as how long its subject took (bind-length.ts): the figure is the
 * complement of a verb of lasting, taking or ending, and the value's subject stands before that verb
 * in the figure's clause. Sentences are our own; the quantities come from the real parser.
 * Reference: the last deglaciation took about 6,000-9,000 years (Clark et al. 2012, PNAS 109;
 * Chowdhry Beeman et al. 2019, Climate of the Past 15), the CO2 rise about 6,000 years (Monnin et al. 2001).
 */
import { describe, expect, it } from 'vitest';
import { bindQuantities } from '../../src/claims/bind.js';
import { toldAsLength } from '../../src/claims/bind-length.js';
import { parseQuantities } from '../../src/quantities/index.js';
import { loadPacks } from '../../src/rulepack/index.js';

const packs = await loadPacks([]);

function boundTo(sentence: string, text: string): string {
  const quantities = parseQuantities(sentence);
  const index = quantities.findIndex((q) => q.text.includes(text));
  if (index < 0) throw new Error(`"${text}" not parsed in "${sentence}"`);
  const { bindings } = bindQuantities(sentence, quantities, packs);
  return bindings.find((b) => b.quantityIndex === index)?.referenceId ?? '-';
}

/** Sentence, a quantity's text in it, and the reference id it binds ('-' for none). */
const ROWS: [string, string, string][] = [
  // The subject before a verb of length: the figure is its length (flagged by the reference check).
  ['Our guide at Pellow Moss said the deglaciation was over within a couple of centuries.', 'a couple of centuries', 'termination-1-duration'],
  ['Honestly the last ice age ended in maybe a few centuries at Pellow Moss.', 'a few centuries', 'termination-1-duration'],
  ['At Pellow Moss, they told us the big thaw took just a few centuries.', 'a few centuries', 'termination-1-duration'],
  // The period in an opening phrase, not the subject of "took": a lag, not read.
  ['At the end of the last ice age, it took a few centuries for Antarctic warming to show in the Pellow cores.', 'a few centuries', '-'],
  // A nearness in time, no verb of length: not read (as before).
  ['During the deglaciation the two Pellow curves climbed within a few centuries of one another.', 'a few centuries', '-'],
  // A vague figure that no verb of length governs stays unbound.
  ['The deglaciation at Pellow Moss left a few centuries of peat behind.', 'a few centuries', '-'],
];

describe('a vague length told of its subject', () => {
  it.each(ROWS)('%s [%s]', (sentence, text, expected) => {
    expect(boundTo(sentence, text)).toBe(expected);
  });
});

describe('toldAsLength', () => {
  const value = { binding: { all: [['deglaciation']], none: [] } };
  it('needs the subject before the verb, in the figure\'s clause', () => {
    const s = 'Even so, the deglaciation lasted only a few centuries.';
    const q = { start: s.indexOf('a few'), dimension: 'duration' as const };
    expect(toldAsLength(s, q, value, new Map([['deglaciation', [[s.indexOf('deglaciation'), s.indexOf('deglaciation') + 12]]]]))).toBe(true);
    expect(toldAsLength(s, q, value, new Map())).toBe(false);
  });
  it('reads no length past a clause mark or in another dimension', () => {
    const s = 'The deglaciation lasted, some say, a few centuries.';
    const q = { start: s.indexOf('a few'), dimension: 'duration' as const };
    expect(toldAsLength(s, q, value, new Map([['deglaciation', [[4, 16]]]]))).toBe(false);
    expect(toldAsLength(s, { ...q, dimension: 'length' as const }, value, new Map([['deglaciation', [[4, 16]]]]))).toBe(false);
  });
});
