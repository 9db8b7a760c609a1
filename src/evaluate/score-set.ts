/**
 * Scores the engine on a keyed set: recall of seeded errors (a warning or error flag of the right
 * rule group whose span covers the keyed line), false flags on correct lines (any warning or error
 * covering the line), and how often a numeric flag's correction carries the reference number.
 */
import { readFile } from 'node:fs/promises';
import { join } from 'node:path';
import { checkPaths } from '../engine.js';
import type { LoadedPacks } from '../rulepack/types.js';
import type { Flag } from '../types.js';
import { ERROR_KINDS, type AnswerSet, type ErrorKind, type KeyedLine } from './answer-set.js';

/** A count out of a total. */
export interface Tally {
  hit: number;
  of: number;
}

/** The score of one set. */
export interface SetScore {
  name: string;
  drafts: number;
  recall: Tally;
  byKind: Record<ErrorKind, Tally>;
  /** Correct lines with a warning or error on them. */
  falseFlags: Tally;
  /** Detected numeric errors (with a key) whose correction or message carries the reference number. */
  correctionValue: Tally;
  /** Errors caught only by a flag of another rule group (not counted in recall). */
  otherKind: number;
  misses: KeyedLine[];
  /** For a missed error that a flag of another rule group covers: those flags' rule ids. */
  missedAs: Map<KeyedLine, string[]>;
  falses: { line: KeyedLine; flags: Flag[] }[];
  /** Caught numeric errors whose correction lacks every key form, with the flags that caught them. */
  keyless: { line: KeyedLine; flags: Flag[] }[];
  /** Keyed lines whose text is not on their line: the key needs fixing. */
  keyProblems: string[];
}

/** Runs the engine over the set's drafts and scores it. */
export async function scoreSet(set: AnswerSet, packs?: LoadedPacks): Promise<SetScore> {
  const files = Object.keys(set.genres).sort();
  const result = await checkPaths(files, { cwd: set.folder, ...(packs === undefined ? {} : { packs }) });
  const serious = result.flags.filter((f) => f.level === 'error' || f.level === 'warning');
  const texts = new Map<string, string[]>();
  for (const file of files) texts.set(file, (await readFile(join(set.folder, file), 'utf8')).split(/\r\n|\r|\n/u));

  const byKind = Object.fromEntries(ERROR_KINDS.map((k) => [k, { hit: 0, of: 0 }])) as Record<ErrorKind, Tally>;
  const score: SetScore = {
    name: set.name,
    drafts: files.length,
    recall: { hit: 0, of: 0 },
    byKind,
    falseFlags: { hit: 0, of: 0 },
    correctionValue: { hit: 0, of: 0 },
    otherKind: 0,
    misses: [],
    missedAs: new Map(),
    falses: [],
    keyless: [],
    keyProblems: [],
  };
  for (const line of set.lines) {
    const source = texts.get(line.file)?.[line.line - 1];
    if (source === undefined || !fold(source).includes(fold(line.text))) {
      score.keyProblems.push(`${set.name}/${line.file}:${line.line}: "${line.text}" is not on that line`);
    }
    const covering = serious.filter((f) => f.file === line.file && f.span.start.line <= line.line && line.line <= f.span.end.line);
    if (line.expect === 'clean') {
      score.falseFlags.of += 1;
      if (covering.length > 0) {
        score.falseFlags.hit += 1;
        score.falses.push({ line, flags: covering });
      }
      continue;
    }
    const kind = line.kind ?? 'value';
    score.recall.of += 1;
    byKind[kind].of += 1;
    const right = covering.filter((f) => f.ruleId.startsWith(`${kind}.`));
    if (right.length === 0) {
      if (covering.length > 0) {
        score.otherKind += 1;
        score.missedAs.set(line, [...new Set(covering.map((f) => f.ruleId))]);
      }
      score.misses.push(line);
      continue;
    }
    score.recall.hit += 1;
    byKind[kind].hit += 1;
    if (line.key.length > 0) {
      score.correctionValue.of += 1;
      if (right.some((f) => carriesKey(f, line.key))) score.correctionValue.hit += 1;
      else score.keyless.push({ line, flags: right });
    }
  }
  return score;
}

/** True when the flag's correction (or, failing that, its reference wording) holds one key form. */
function carriesKey(flag: Flag, key: string[]): boolean {
  const said = digitsFold(flag.correction ?? flag.reference?.text ?? '');
  return key.some((k) => said.includes(digitsFold(k)));
}

/** Lower case, one space, straight quotes: how keyed text is compared with a draft line. */
function fold(text: string): string {
  return text.replace(/[‘’]/gu, "'").replace(/[“”]/gu, '"').replace(/\s+/gu, ' ').trim().toLowerCase();
}

/** Drops digit-group separators and spaces so "420 000", "420,000" and "420000" compare equal. */
function digitsFold(text: string): string {
  return fold(text).replace(/(?<=\d)[,\u00a0\u202f\u2009 ](?=\d{3})/gu, '').replace(/\s+/gu, '');
}

/** "12/40 (30.0%)". */
export function formatTally(t: Tally): string {
  return `${t.hit}/${t.of} (${t.of === 0 ? '-' : ((100 * t.hit) / t.of).toFixed(1)}%)`;
}

/** The one-line summary of a set, as `npm run eval` and the tests print it. */
export function summarizeScore(s: SetScore): string {
  const kinds = ERROR_KINDS.filter((k) => s.byKind[k].of > 0).map((k) => `${k} ${s.byKind[k].hit}/${s.byKind[k].of}`);
  return (
    `${s.name}: ${s.drafts} drafts; errors caught ${formatTally(s.recall)} [${kinds.join(', ')}]; ` +
    `false flags ${formatTally(s.falseFlags)} of correct lines; correction carries the reference number ${formatTally(s.correctionValue)}`
  );
}
