import { describe, expect, it } from 'vitest';
import { splitSentences } from '../../src/prose/index.js';
import { draftLineWidth } from '../../src/prose/line-width.js';

// A writer who opens sentences in lower case and breaks lines where a thought ends (chat logs,
// comment threads) ends a sentence at a line break without a mark. Sentences are our own; the
// figures in them are beside the point (the splitter reads no figure).
const split = (text: string, width = draftLineWidth(text)) => splitSentences(text, 0, width).map((s) => s.text);

/** A line as wide as a writer who never wraps may write, so the draft's width is well above the short lines. */
const LONG = 'some of us paste whole paragraphs on one line when we post here, long after the thread has moved on to other things\nok';

describe('line breaks of a writer who does not wrap', () => {
  it('ends a lower-case line with no mark where the next line opens in lower case', () => {
    expect(split(`${LONG}\n\nthe dome c ice goes back about 800k yrs\nis that right tho?`)).toEqual([LONG, 'the dome c ice goes back about 800k yrs', 'is that right tho?']);
  });

  it('ends every unmarked line of a lower-case message on its own', () => {
    expect(split(`${LONG}\n\nfunny how the tilt thing runs on 41k\nco2 just tags along i reckon\nsea level dropped heaps too`)).toEqual([
      LONG,
      'funny how the tilt thing runs on 41k',
      'co2 just tags along i reckon',
      'sea level dropped heaps too',
    ]);
  });

  it('reads the lower-case sentence after a full stop inside a capitalised line (the stop itself stays the old rule\'s)', () => {
    expect(split(`${LONG}\n\nFair point. the record at vostok stops near 420k\nprobably older ice elsewhere`)).toEqual([LONG, 'Fair point. the record at vostok stops near 420k', 'probably older ice elsewhere']);
  });

  it('keeps a line that ends in a word or mark carrying the sentence on', () => {
    expect(split(`${LONG}\n\nthe bubbles hold air from the\nlast glacial maximum\nthe core was drilled to about 3 km,\nthen they stopped`)).toEqual([
      LONG,
      'the bubbles hold air from the\nlast glacial maximum',
      'the core was drilled to about 3 km,\nthen they stopped',
    ]);
  });

  it('keeps a line whose next line opens with a relative pronoun or "of"', () => {
    expect(split(`${LONG}\n\nwe went to see the core samples\nwhich were kept at minus 50 in a freezer`)).toEqual([LONG, 'we went to see the core samples\nwhich were kept at minus 50 in a freezer']);
  });

  it('keeps capitalised prose that is wrapped, even beside a longer unwrapped line', () => {
    const wrapped = 'The drill team worked through three summers on the plateau before they reached about\n3,200 metres of ice and stopped short of the bed.';
    expect(split(`${LONG}\n\n${wrapped}`)).toEqual([LONG, wrapped]);
  });

  it('keeps a lower-case line that fills the width: a wrapped line, not a thought ended', () => {
    const text = 'the dust layers tell you how windy and dry the glacial world was compared with\nthe warm spells in between';
    expect(split(text)).toEqual([text]);
  });

  it('keeps the lines of edited prose whose one lower-case opening follows a quoted full stop', () => {
    // A wrapped paragraph that quotes a whole sentence: the word after the quotation's stop opens in
    // lower case, but the writer opens sentences with capitals, so its short lines are wrapped lines.
    const text = 'The guide quotes: "Snow turns to ice within a century." is the line\nthey chose. The panel beside it names the drill site.\nIt closes with the team\nin the summer of that year. Then the guide moves on.';
    expect(split(`${LONG}\n\n${text}`)).toEqual([LONG, ...splitSentences(text, 0).map((s) => s.text)]);
  });

  it('cuts nothing with no width given (a caller that knows no draft)', () => {
    expect(splitSentences('the ice is old\nthe air is older', 0).map((s) => s.text)).toEqual(['the ice is old\nthe air is older']);
  });
});

describe('draftLineWidth', () => {
  it('is the widest line that another line follows, table rows left out', () => {
    expect(draftLineWidth('short one\nlonger line here\nlast line that is the longest of all')).toBe(16);
    expect(draftLineWidth('| a | much wider table row than anything |\n| b | c |\nab\ncd')).toBe(2);
  });
});
