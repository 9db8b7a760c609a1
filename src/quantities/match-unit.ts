/**
 * Reads the unit written right after a number: "420,000 years", "800 kyr", "5°C", "180 ppm",
 * "800,000-year record" (hyphenated), "0.01 ppm per year". The longest written form wins; when one
 * form belongs to two dimensions (°C as a temperature and as a change, ka as a date and as a
 * duration) every reading is returned and the cue tables decide.
 */
import { firstChars } from './first-chars.js';
import { readFirstChars } from './stored-first-chars.js';
import { NUMBER_UNIT_GAP, UNIT_END } from './unit-forms.js';
import { UNIT_TABLE, type UnitDef } from './unit-table.js';

/** The unit found after a number. */
export interface UnitMatch {
  /** Where the unit's written form starts and ends. */
  start: number;
  end: number;
  /** Every reading of the written form (one id, one or two dimensions). */
  defs: UnitDef[];
}

const GAP = new RegExp(NUMBER_UNIT_GAP, 'uy');

/** Each matcher's source: its unit's forms, then the unit's end. */
export function unitSource(def: UnitDef): string {
  return `(?:${def.forms.join('|')})${UNIT_END}`;
}

/** The unit table's units that have written forms, in table order: one matcher each. */
export const MATCHED_UNITS: readonly UnitDef[] = UNIT_TABLE.filter((d) => d.forms.length > 0);

/**
 * One sticky matcher per unit, with the characters its match can start with (undefined: any). V8
 * compiles a matcher on its first run, and parses it when it is made (some 60 ms for the 73 at
 * load), so matchUnit makes and runs only those that can match at the character found, and a run
 * compiles the few its drafts meet (first-chars.ts). The sets come from the build when it stored
 * them for these very sources (stored-first-chars.ts), else from the reader.
 */
const stored = readFirstChars(new URL('../generated/unit-first-chars.json', import.meta.url), import.meta.url);
const MATCHERS: { def: UnitDef; source: string; re: RegExp | undefined; first: ReadonlySet<number> | undefined }[] = MATCHED_UNITS.map((def) => {
  const source = unitSource(def);
  return { def, source, re: undefined, first: stored.has(source) ? stored.get(source) : firstChars(source) };
});

/** The unit starting at `from` (after an optional space or hyphen), or undefined. */
export function matchUnit(text: string, from: number): UnitMatch | undefined {
  GAP.lastIndex = from;
  const gap = GAP.exec(text);
  const start = from + (gap?.[0].length ?? 0);
  let best: UnitMatch | undefined;
  // No match is empty (an empty one is skipped below), so one at the text's end is none.
  const at = text.codePointAt(start);
  if (at === undefined) return undefined;
  for (const matcher of MATCHERS) {
    const { def, first } = matcher;
    if (first !== undefined && !first.has(at)) continue;
    const re = (matcher.re ??= new RegExp(matcher.source, 'uy'));
    re.lastIndex = start;
    const m = re.exec(text);
    if (m === null || m[0].length === 0) continue;
    const end = start + m[0].length;
    if (best === undefined || end > best.end) best = { start, end, defs: [def] };
    else if (end === best.end && best.defs[0]?.id === def.id) best.defs.push(def);
  }
  return best;
}
