/**
 * The propositions of a paragraph's sentences, read once and shared by every reasoning check and
 * direction fact: a check about one sentence may need the one before ("CO2 lagged by 800 years.
 * So it cannot have caused the warming.") or the one after (an answer to a question).
 */
import { compileLexicon, readPropositions, readSentence, stanceOf, type Propositions, type ReadSentence, type SentenceStance } from '../../propositions/index.js';
import type { LoadedPacks } from '../../rulepack/types.js';
import type { BlockKind } from '../../types.js';

/** One sentence read: its words, how it holds its claims, and what it asserts. */
export interface SentenceReading {
  s: ReadSentence;
  stance: SentenceStance;
  props: Propositions;
}

/** What the engine knows about the block a paragraph comes from. */
export interface ParagraphContext {
  blockKind?: BlockKind;
  heading?: string;
  /** The block carries the deliberate-quotation marker. */
  marked?: boolean;
  /**
   * A block quote that holds a passage of its own (two sentences or more: a reader's letter, a
   * comment, a speaker's lines), repeating nothing said earlier in the draft, or a post under its byline (prose/reply-quote.ts isVoicedQuote):
   * a voice of the draft. One sentence pulled out to be answered, or a reply quoting the post it
   * answers, quotes what it holds.
   */
  voiced?: boolean;
  /**
   * The block's sentences (as the stance reader reads them) that are lines a plain-text reply quotes
   * from the post it answers ("> so the core goes back 800,000 yrs": prose/reply-quote.ts
   * quotesEarlierLine): each quotes what it holds.
   */
  quotedLines?: readonly string[];
  /** The period (lexicon `periods` key) the block before named, under the same heading. */
  scene?: string;
  /**
   * The sentences a block's first sentence reads on from (prose/lead-in.ts): a list item or a post
   * that leans on the one before ("- This shows the planet warmed first."). They stand before the
   * paragraph as context only; no flag falls on them.
   */
  leadIn?: readonly string[];
}

/** Reads sentence `i` of a paragraph (undefined past its ends). */
export type Reader = (i: number) => SentenceReading | undefined;

const cache = new WeakMap<readonly string[], { packs: LoadedPacks; read: Reader }>();

/** A reader over `paragraph`, cached per paragraph array and packs. */
export function paragraphReader(paragraph: readonly string[], packs: LoadedPacks, context: ParagraphContext = {}): Reader {
  const known = cache.get(paragraph);
  if (known !== undefined && known.packs === packs) return known.read;
  const lexicon = compileLexicon(packs);
  const sentences = new Map<number, ReadSentence>();
  const readings = new Map<number, SentenceReading>();
  const sentenceAt = (i: number): ReadSentence | undefined => {
    const text = paragraph[i];
    if (text === undefined) return undefined;
    let s = sentences.get(i);
    if (s === undefined) {
      s = readSentence(text, lexicon);
      sentences.set(i, s);
    }
    return s;
  };
  const read: Reader = (i) => {
    const hit = readings.get(i);
    if (hit !== undefined) return hit;
    const s = sentenceAt(i);
    if (s === undefined) return undefined;
    const next = sentenceAt(i + 1);
    // The block's own first sentence (a block quote's label), not a lead-in's.
    const own = context.leadIn?.length ?? 0;
    const first = i > own ? sentenceAt(own) : undefined;
    const previous = i > 0 ? sentenceAt(i - 1) : undefined;
    const stance = stanceOf(s, { ...context, ...(next === undefined ? {} : { next }), ...(first === undefined ? {} : { first }), ...(previous === undefined ? {} : { previous }) });
    // The two sentences before the previous one, nearest first: the scene a paragraph has set.
    const earlier = [sentenceAt(i - 2), sentenceAt(i - 3)].filter((e): e is ReadSentence => e !== undefined);
    // The block before sets the scene only for the first sentences, all of which `earlier` sees.
    const scene = i <= 3 ? context.scene : undefined;
    const reading = { s, stance, props: readPropositions(s, antecedentSentence(sentenceAt, i), stance, earlier, scene) };
    readings.set(i, reading);
    return reading;
  };
  cache.set(paragraph, { packs, read });
  return read;
}

/** Words of a fragment that names nothing and may stand between a sentence and what it refers back to. */
const FRAGMENT_WORDS = 6;

/**
 * The sentence a pronoun or a conclusion of sentence `i` reads back to: the one before, or the one
 * before that when the one between is a short fragment that names nothing ("Q12: was CO2 a cause? A:
 * False. It was an effect, not a cause."; "CO2 went up after temperature. Always has. So ...").
 */
export function antecedentSentence(sentenceAt: (i: number) => ReadSentence | undefined, i: number): ReadSentence | undefined {
  const previous = i > 0 ? sentenceAt(i - 1) : undefined;
  if (previous === undefined || i < 2 || !isBareFragment(previous)) return previous;
  return sentenceAt(i - 2) ?? previous;
}

/** A short sentence that names no thing: "False.", "Always has.", "Exactly." */
export function isBareFragment(s: ReadSentence): boolean {
  return s.words.length > 0 && s.words.length <= FRAGMENT_WORDS && s.things.length === 0 && s.hits.every((h) => h.cls !== 'entities' && h.cls !== 'regions' && h.cls !== 'order');
}
