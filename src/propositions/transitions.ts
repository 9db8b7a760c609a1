/**
 * CO2 changes set in a glacial transition: the end of an ice age (the ice melting back, the world
 * coming out of a glacial, "the deglaciation") or the start of one (the ice sheets advancing, the
 * world sliding into a glaciation). The transition is read from the sentence's structure, not from
 * a list of sentences: a period noun, an end phase of a glacial ("the end of the last ice age", "the
 * ice age let go"), a mass of ice with a verb of melting or advancing, or a movement out of or into
 * a glacial.
 *
 *   "As the ice sheets melted back, CO2 fell."      co2 amount -1 during deglaciation
 *   "CO2 climbed every time the ice advanced."      co2 amount +1 during glacial-inception
 *   "CO2 rose by 80 ppm as the world came out of the last ice age."   +1 during deglaciation
 *
 * A change takes the transition its own clause sets it in: the first one after it with no other
 * verb of change between ("fell as the ice melted"), else the nearest one before it ("As the ice
 * melted, CO2 fell"). A transition told as a time before or after ("after the ice had melted", "until
 * the ice age ended") sets no change in it.
 */
import { kindOf } from './resolve.js';
import { denialsBefore, type ReadSentence } from './sentence.js';
import type { Change } from './types.js';

/** The scene keys a CO2 change may be set in (direction facts' `during`). */
export const DEGLACIATION = 'deglaciation';
export const GLACIAL_INCEPTION = 'glacial-inception';

/** `at`: the word that names it; `from`: where its own words begin, when a verb of its own comes first ("climbed out of"). */
type Transition = { at: number; from?: number; during: typeof DEGLACIATION | typeof GLACIAL_INCEPTION };

/** Comparative words of the `changes` class: a state ("CO2 was lower"), not a verb of change. */
const COMPARATIVES = new Set(['more', 'less', 'higher', 'lower', 'greater', 'larger', 'bigger', 'smaller', 'fewer', 'increasingly']);
/** Nouns of how much CO2 there is, between the gas and its verb ("CO2 levels dropped"). */
const MEASURES = new Set(['level', 'levels', 'concentration', 'concentrations', 'content', 'amount', 'amounts', 'value', 'values', 'reading', 'readings', 'count']);
/** Words a subject search steps over on its way back from the verb. */
const STEP = new Set(['the', 'had', 'has', 'have', 'was', 'were', 'is', 'are', 'did', 'does', 'then', 'also', 'still', 'instead', 'in', 'of', 'air', 'atmosphere', 'atmospheric', 'only', 'just', 'even', 'all', 'promptly', 'to', 'began', 'begin', 'started', 'start', 'kept', 'continued', 'went', 'on', 'not', 'never', "didn't", "wasn't", "hasn't", "hadn't", 'do', 'would', 'could', 'will', 'can', 'should', 'might', 'may']);
/** Words that open a clause told as a time before or after the change, not the time it happened in. */
const OUTSIDE = new Set(['after', 'before', 'since', 'until', 'till', 'following', 'prior', 'once']);
/** Nouns after "glacial" that make it a measure, not the period ("back into the glacial range"). */
const GLACIAL_MEASURES = new Set(['range', 'level', 'levels', 'value', 'values', 'values', 'low', 'lows', 'state', 'conditions', 'concentration', 'concentrations']);

/** CO2 amount changes of `s` with the glacial transition each is set in. */
export function readTransitionChanges(s: ReadSentence, previous?: ReadSentence): Change[] {
  const transitions = transitionsOf(s);
  if (transitions.length === 0) return [];
  const verbs = s.of('changes').filter((h) => (h.key === 'up' || h.key === 'down') && !COMPARATIVES.has(s.words[h.first]?.text ?? ''));
  const out: Change[] = [];
  for (const h of verbs) {
    if (!co2Subject(s, h.first, previous)) continue;
    const between = (a: number, b: number) => verbs.some((v) => v !== h && v.first > a && v.first < b);
    const after = transitions.find((t) => t.at > h.last && !between(h.last, t.from ?? t.at));
    const before = transitions.filter((t) => t.at < h.first && !between(t.at, h.first)).at(-1);
    const scene = after ?? before;
    if (scene === undefined) continue;
    const dir = ((h.key === 'up' ? 1 : -1) * (denialsBefore(s, h.first, 5) % 2 === 1 ? -1 : 1)) as 1 | -1;
    out.push({ kind: 'change', of: 'co2', attribute: 'amount', dir, during: scene.during, start: s.words[h.first]?.start ?? 0, end: s.words[h.last]?.end ?? 0 });
  }
  return out;
}

/** True when the verb at `i` has CO2 (or a pronoun standing for it) as its subject. */
function co2Subject(s: ReadSentence, i: number, previous?: ReadSentence): boolean {
  const segment = s.words[i]?.segment;
  for (let k = i - 1; k >= 0 && s.words[k]?.segment === segment; k -= 1) {
    const thing = s.things.find((t) => t.last === k);
    const word = s.words[k]?.text ?? '';
    if (thing !== undefined && thing.kind === 'co2') return true;
    if (thing !== undefined && thing.kind === 'pronoun') return kindOf(s, thing, previous) === 'co2';
    // "CO2 in the air", "the CO2 of the atmosphere": the place the gas is in is no subject.
    if (thing !== undefined && thing.kind === 'trapped-air' && ['in', 'the', 'of'].includes(s.words[thing.first - 1]?.text ?? '')) {
      k = thing.first;
      continue;
    }
    if (thing !== undefined) return false;
    if (!(STEP.has(word) || MEASURES.has(word) || /^\p{L}{3,}ly$/u.test(word))) return false;
  }
  return false;
}

/** The glacial transitions the sentence names, at the word that names each. */
function transitionsOf(s: ReadSentence): Transition[] {
  const out: Transition[] = [];
  const add = (at: number, during: Transition['during'], from?: number) => {
    if (!toldAsOtherTime(s, at)) out.push({ at, during, ...(from === undefined ? {} : { from }) });
  };
  // "through the deglaciation", "during that whole thaw", "at the end of the last ice age".
  for (const h of [...s.of('periods', 'deglaciation'), ...s.of('time-parts', 'deglaciation')]) add(h.first, DEGLACIATION);
  const glacials = glacialNouns(s);
  // "the close of the most recent glaciation", "the start of the last glacial".
  for (const g of glacials) {
    const phase = [...s.of('time-parts', 'end'), ...s.of('time-parts', 'start'), ...s.of('time-parts', 'run-up')].find((p) => p.last < g.first && g.first - p.last <= 4);
    if (phase !== undefined) add(phase.first, phase.key === 'end' ? DEGLACIATION : GLACIAL_INCEPTION);
    // "the last ice age finally let go", "as the glacial waned".
    const course = [...s.of('time-parts', 'end-verb'), ...s.of('time-parts', 'fade-verb')].find((v) => v.first > g.last && v.first - g.last <= 3);
    if (course !== undefined) add(course.first, DEGLACIATION);
    // "came out of the last ice age", "slid into each glaciation".
    // The verb before "out of" or "into" is the movement's own ("climbed out of"), no change of CO2.
    const lead = s.words.slice(Math.max(0, g.first - 4), g.first).map((w) => w.text);
    const at = (k: number) => g.first - lead.length + k - 1;
    const measure = GLACIAL_MEASURES.has(s.words[g.last + 1]?.text ?? '');
    const out = lead.findIndex((w, k) => w === 'out' && lead[k + 1] === 'of');
    if (!measure && out >= 0) add(g.first, DEGLACIATION, at(out));
    else if (!measure && lead.includes('into')) add(g.first, GLACIAL_INCEPTION, at(lead.indexOf('into')));
  }
  // "as the ice sheets melted back", "every time the glaciers advanced", "whenever they shrank".
  for (const m of iceMasses(s)) {
    const verb = iceVerb(s, m.last);
    if (verb !== undefined) add(verb.at, verb.during);
  }
  for (const t of s.things.filter((x) => x.kind === 'pronoun')) {
    const antecedent = iceMasses(s).filter((m) => m.last < t.first).at(-1);
    if (antecedent === undefined || s.things.some((x) => x.kind !== 'pronoun' && x.first > antecedent.last && x.last < t.first && !s.inside(x.first, 'time-parts', 'ice-mass'))) continue;
    const verb = iceVerb(s, t.last);
    if (verb !== undefined) add(verb.at, verb.during);
  }
  return out.sort((a, b) => a.at - b.at);
}

/** Masses of ice ("the ice sheets", "glaciers"), not the ice of a longer name ("ice age", "ice core"). */
function iceMasses(s: ReadSentence) {
  return s.of('time-parts', 'ice-mass').filter((m) => !s.hits.some((h) => h.first <= m.first && h.last > m.last && h.cls !== 'time-parts'));
}

/** "ice age", "glaciation", "the last glacial": period nouns of a glacial (no interglacial, no ice sheet). */
function glacialNouns(s: ReadSentence) {
  return s.of('time-parts', 'glacial').filter((g) => !(s.words[g.first - 1]?.text ?? '').startsWith('inter'));
}

/** The verb of melting or advancing that a mass of ice ending at word `last` is the subject of. */
function iceVerb(s: ReadSentence, last: number): Transition | undefined {
  const segment = s.words[last]?.segment;
  for (let k = last + 1; k <= last + 4 && s.words[k]?.segment === segment; k += 1) {
    const comparative = COMPARATIVES.has(s.words[k]?.text ?? '');
    if (s.inside(k, 'time-parts', 'melt-verb') || s.inside(k, 'time-parts', 'retreat-verb') || (s.inside(k, 'changes', 'down') && !comparative)) return { at: k, during: DEGLACIATION };
    if (s.inside(k, 'time-parts', 'advance-verb') || (s.inside(k, 'changes', 'up') && !comparative)) return { at: k, during: GLACIAL_INCEPTION };
    if (!STEP.has(s.words[k]?.text ?? '') && !/^(?:were|was|being|been|had|have|began|begin|started|start|continued|kept|to|slowly|rapidly|steadily|gradually|finally|all)$/u.test(s.words[k]?.text ?? '') && !/ly$/u.test(s.words[k]?.text ?? '')) return undefined;
  }
  return undefined;
}

/** True when the transition at `at` opens a clause of a time before or after ("after the ice melted"). */
function toldAsOtherTime(s: ReadSentence, at: number): boolean {
  const segment = s.words[at]?.segment;
  for (let k = at - 1; k >= 0 && k >= at - 7 && s.words[k]?.segment === segment; k -= 1) {
    if (OUTSIDE.has(s.words[k]?.text ?? '')) return true;
  }
  // "once", "until", "after" open a segment of their own: look at the word that opened it.
  const opener = s.words.find((w) => w.segment === segment);
  return opener !== undefined && OUTSIDE.has(opener.text);
}
