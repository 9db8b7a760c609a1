/**
 * The grammar words that sentence frames are built from: which words state a cause, an order of
 * events, an inference, an either/or choice, a scope, certainty, or that a claim is someone else's.
 * This is grammar glue for `extractFrames` and for the stance of a sentence; the reasoning checks
 * read their own cue words from the rule packs (`cue_words`), never from here.
 *
 * Phrase syntax (shared with the packs' cue words): words separated by spaces; a word matches a
 * token's text or its root ("cause" matches "caused"); `word*` matches any word starting so;
 * `...` allows up to six other words in between, inside one clause.
 */
export interface FrameWords {
  causal: string[];
  /** The first-named thing came earlier: "X preceded Y", "X led Y". */
  before: string[];
  /** The first-named thing came later: "X lagged Y", "X followed Y". */
  after: string[];
  /** Neither came first. */
  together: string[];
  /** Words that give an order of events its size ("800 years"). */
  durations: string[];
  inference: string[];
  eitherOr: string[];
  certainty: string[];
  negation: string[];
  /** Scope words, by region. */
  scope: Record<'antarctic' | 'greenland' | 'core' | 'hemispheric' | 'global', string[]>;
  /** Things an order or causal frame is about, by kind. */
  subjects: Record<'co2' | 'temperature' | 'orbit', string[]>;
  /** Markers of a reported claim (somebody else's argument). */
  reported: string[];
  /** Markers that a paragraph answers a reported claim. */
  answered: string[];
  /** Words that end a clause. */
  clauseBreaks: string[];
}

/** The built-in grammar words (English). */
export const FRAME_WORDS: FrameWords = {
  causal: [
    'cause', 'caused', 'causes', 'drive', 'driven', 'drove', 'trigger', 'amplify', 'amplified', 'control',
    'force', 'set off', 'lead to', 'result in', 'responsible for', 'produce', 'explain', 'pace',
  ],
  before: ['before', 'ahead of', 'precede', 'preceded', 'lead', 'led', 'first', 'earlier than'],
  after: ['after', 'lag', 'lagged', 'lags', 'lagged behind', 'behind', 'follow', 'followed', 'trail', 'trailed', 'second', 'later than'],
  together: ['together', 'in step', 'lockstep', 'synchronous', 'at the same time', 'within a few centuries of'],
  durations: ['year', 'years', 'century', 'centuries', 'decade', 'decades', 'millennium', 'millennia', 'kyr'],
  inference: [
    'so', 'therefore', 'thus', 'hence', 'which means', 'means that', 'proving', 'proves', 'consequently',
    'it follows', 'shows that', 'demonstrates',
  ],
  eitherOr: [
    'either ... or', 'or the other way round', 'not the other way round', 'not the other way around', 'not the other way about',
    'never the other way around', 'not vice versa', 'vice versa', 'rather than', 'pick one', 'chicken and egg',
    'one or the other',
  ],
  certainty: [
    'prove', 'proves', 'proof', 'settle', 'settles', 'beyond doubt', 'no doubt', 'conclusively', 'definitive',
    'definitively', 'undeniably', 'irrefutable', 'without question',
  ],
  negation: ['not', 'no', 'never', 'nothing', 'none', 'neither', 'nor', 'without'],
  scope: {
    antarctic: ['antarctic', 'antarctica', 'vostok', 'epica', 'dome c', 'dome fuji', 'edml', 'talos dome'],
    greenland: ['greenland', "greenland's", 'grip', 'gisp2', 'ngrip', 'neem'],
    core: ['ice core', 'ice cores', 'the core', 'single core', 'one core'],
    hemispheric: ['southern hemisphere', 'northern hemisphere', 'hemispheric', 'hemisphere'],
    global: [
      'global', 'globally', 'worldwide', 'the planet', 'whole planet', 'the whole earth', "earth's temperature",
      'the world', 'across the globe', 'global mean', 'global average', 'around the globe', 'around the world',
      'all over the world', 'the globe', 'entire planet', 'earth as a whole', 'on a global scale',
    ],
  },
  subjects: {
    co2: ['co2', 'co₂', 'carbon dioxide', 'greenhouse gas'],
    temperature: ['temperature', 'temperatures', 'warming', 'warmed', 'warm', 'cooling', 'climate'],
    orbit: ['orbit', 'orbital', 'milankovitch', 'insolation', 'obliquity', 'precession', 'eccentricity'],
  },
  reported: [
    'some argue', 'some say', 'some people argue', 'some people say', 'critics say', 'critics argue',
    'sceptics', 'skeptics', 'the claim that', 'a common claim', 'a common myth', 'myth', 'it is often said',
    'is often claimed', 'you may hear', 'you will hear', 'you might hear', 'one reader', 'the argument goes',
    'argument holds', 'a popular argument', 'saying', 'claim that', 'claims that', 'they say',
  ],
  answered: [
    'but', 'however', 'in fact', 'actually', 'wrong', 'mistaken', 'misleading', 'not so', 'they do not',
    'it does not', 'nothing of the kind', 'confuse', 'confuses', 'mixes up', 'misreads', 'does not hold',
    'false', 'that argument', 'this argument', 'not true', 'untrue', 'the evidence shows', 'is a myth',
    'not right', 'not correct', 'incorrect',
  ],
  clauseBreaks: ['but', 'while', 'whereas', 'although', 'though', 'yet', 'however'],
};
