/**
 * The words of rank and comparison claims: a superlative ("the longest", "the second-deepest"), a
 * comparative ("older than", "a longer record than", "reaches further back than") or a multiple ("twice as long as", "three
 * times older than"), each with the dimensions it can measure and which way it points.
 */
import type { Dimension } from '../../types.js';

const TIME: Dimension[] = ['duration', 'age'];
const TIME_OR_LENGTH: Dimension[] = ['duration', 'age', 'length'];
const LENGTH: Dimension[] = ['length'];

/** What one rank or comparison word says: which dimensions, and whether it points up (+1) or down (-1). */
export interface RankWord {
  dimensions: Dimension[];
  sign: 1 | -1;
}

/** Adjective stems: "long" gives longest, longer, as long as. */
const STEMS: Record<string, RankWord> = {
  long: { dimensions: TIME_OR_LENGTH, sign: 1 },
  old: { dimensions: TIME, sign: 1 },
  deep: { dimensions: LENGTH, sign: 1 },
  thick: { dimensions: LENGTH, sign: 1 },
  short: { dimensions: TIME_OR_LENGTH, sign: -1 },
  young: { dimensions: TIME, sign: -1 },
  shallow: { dimensions: LENGTH, sign: -1 },
  'far back': { dimensions: TIME, sign: 1 },
};
const STEM_NAMES = Object.keys(STEMS).filter((s) => !s.includes(' ')).join('|');
const ORDINALS: Record<string, number> = { second: 2, third: 3, fourth: 4, fifth: 5 };
const MULTIPLES: Record<string, number> = { twice: 2, half: 0.5, two: 2, three: 3, four: 4, five: 5 };

/** A word found in a sentence. `rank` for a superlative, `ratio` for a multiple, neither for "longer than". */
export interface FoundRankWord extends RankWord {
  start: number;
  end: number;
  kind: 'superlative' | 'comparative';
  /** The adjective as a stem: "long", "deep", "far back". */
  stem: string;
  rank?: number;
  ratio?: number;
}

const SUPERLATIVE = new RegExp(String.raw`(?<![\p{L}])(?:(second|third|fourth|fifth)[\s-]+)?(${STEM_NAMES})est(?![\p{L}-])`, 'giu');
const COMPARATIVE = new RegExp(String.raw`(?<![\p{L}])(?:(\d+(?:\.\d+)?|two|three|four|five)\s+times\s+)?(?:(${STEM_NAMES})er|(?:further|farther)\s+back)(?:\s+(?!than(?![\p{L}]))[\p{L}-]+){0,2}\s+than(?![\p{L}])`, 'giu');
const MULTIPLE = new RegExp(String.raw`(?<![\p{L}])(?:(twice|half|(?:\d+(?:\.\d+)?|two|three|four|five)\s+times)\s+)?as\s+(${STEM_NAMES}|far\s+back)\s+as(?![\p{L}])`, 'giu');

/** Every rank or comparison word of `sentence`, in order. */
export function findRankWords(sentence: string): FoundRankWord[] {
  const found: FoundRankWord[] = [];
  for (const m of sentence.matchAll(SUPERLATIVE)) {
    const stem = (m[2] ?? '').toLowerCase();
    const word = STEMS[stem] as RankWord;
    found.push({ ...word, stem, start: m.index, end: m.index + m[0].length, kind: 'superlative', rank: ORDINALS[(m[1] ?? '').toLowerCase()] ?? 1 });
  }
  for (const m of sentence.matchAll(COMPARATIVE)) {
    const stem = m[2] === undefined ? 'far back' : m[2].toLowerCase();
    const word = STEMS[stem] as RankWord;
    const times = multipleOf(m[1]);
    found.push({ ...word, stem, start: m.index, end: m.index + m[0].length, kind: 'comparative', ...(times === undefined ? {} : { ratio: times }) });
  }
  for (const m of sentence.matchAll(MULTIPLE)) {
    const stem = (m[2] ?? '').toLowerCase().replace(/\s+/gu, ' ');
    const word = STEMS[stem] as RankWord;
    found.push({ ...word, stem, start: m.index, end: m.index + m[0].length, kind: 'comparative', ratio: multipleOf(m[1]) ?? 1 });
  }
  return found.sort((a, b) => a.start - b.start);
}

/** The adjective of the other direction: long ↔ short, old ↔ young, deep ↔ shallow. */
export const OPPOSITE: Record<string, string> = { long: 'short', short: 'long', old: 'young', young: 'old', deep: 'shallow', shallow: 'deep', thick: 'thin', 'far back': 'less far back' };

/** The comparative of a stem: "longer", "further back", "less far back". */
export function comparativeOf(stem: string): string {
  if (stem === 'far back') return 'further back';
  if (stem.includes(' ')) return stem;
  return stem === 'thin' ? 'thinner' : `${stem}er`;
}

function multipleOf(text: string | undefined): number | undefined {
  if (text === undefined) return undefined;
  const first = text.toLowerCase().split(/\s+/u)[0] ?? '';
  return MULTIPLES[first] ?? (Number.isFinite(Number(first)) ? Number(first) : undefined);
}
