/**
 * A vague stretch of time told as how long its subject took (bind-length.ts): the figure is the
 * complement of a verb of lasting, taking or ending, and the value's subject stands before that verb
 * in the figure's clause. Sentences are our own; the quantities come from the real parser.
 * Reference: the last deglaciation took about 6,000-9,000 years (Clark et al. 2012, PNAS 109;
 * Chowdhry Beeman et al. 2019, Climate of the Past 15), the CO2 rise about 6,000 years (Monnin et al. 2001).
 */
import { describe, expect, it } from 'vitest';
import { bindQuantities } from '../../src/claims/bind.js';
import { framedAfter, toldAsLength } from '../../src/claims/bind-length.js';
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
  const value = { binding: { all: [['deglaciation']] } };
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

/**
 * A period named only after a figure, as the frame it is given for or the point of its course it is
 * set at (framedAfter): a finding for that period, not its length. The lag of CO2 behind Antarctic
 * temperature over Termination I is a few centuries at most (Pedro et al. 2012, Climate of the Past 8;
 * Parrenin et al. 2013, Science 339), the deglaciation's length about 7,000 years (Clark et al. 2012).
 */
const FRAMED: [string, string, string][] = [
  ['The Pellow group put it at under 300 years for the last deglaciation.', 'under 300 years', '-'],
  ['Their first estimate was about 900 years, plus or minus 500, at the onset of the last deglaciation.', 'about 900 years', '-'],
  // The period as subject, or a verb of length: still its length (and flagged).
  ['At Pellow Moss the last deglaciation lasted about 900 years.', 'about 900 years', 'termination-1-duration'],
  ['It took about 900 years for the last deglaciation to run its course at Pellow Moss.', 'about 900 years', 'termination-1-duration'],
  ['For the last deglaciation, Pellow Moss guides quote about 900 years.', 'about 900 years', 'termination-1-duration'],
];

describe('a period framed after a figure', () => {
  it.each(FRAMED)('%s [%s]', (sentence, text, expected) => {
    expect(boundTo(sentence, text)).toBe(expected);
  });
  it('reads only a value the period alone names', () => {
    const s = 'They put it near 300 years for the last deglaciation.';
    const q = { start: s.indexOf('near'), end: s.indexOf(' for'), dimension: 'duration' as const };
    const view = new Map([['deglaciation', [[s.indexOf('deglaciation'), s.indexOf('deglaciation') + 12]]]]) as Map<string, [number, number][]>;
    expect(framedAfter(s, q, { binding: { all: [['deglaciation']] } }, view)).toBe(true);
    expect(framedAfter(s, q, { binding: { all: [['deglaciation'], ['co2']] } }, view)).toBe(false);
  });
});
