/**
 * The setting a passage carries. Writers name a period or a region once and give later figures of
 * it with no word for it:
 *
 *   "At the end of the last ice age, Antarctica warmed first. In the Antarctic cores carbon dioxide
 *    ^^^^^^^^^^^^^^^^^^^^^^^^^^^^^^^ the setting                  trails temperature by some 6,000 years."
 *                                                                 (the deglacial lag: [deglaciation] filled)
 *
 * A value's group is a **setting group** when every term of it is a member of one setting kind of
 * the pack's lexicon (`settings`: `time` names periods and events, `place` regions; a term that
 * also names a thing a value measures, listed under `settings.not`, is no setting: "Vostok" is an
 * Antarctic word but a core). A group that offers other words beside its setting terms is filled
 * as one when its setting terms are all of one kind and the sentence is told in the past
 * (told-in-past.ts; [lgm, glacial, below-present]: a glacial period named before fills it in "Sea
 * level was about 120 metres lower" as the sentence's own "lower than today" would, not in "sea
 * level stands 125 metres higher", told from today). Such a group may be filled from the passage's current setting of its
 * kind: the setting terms of the most recent text before the sentence that names one (the sentence
 * before, the earlier sentences of the block, its lead-in, its section heading), when:
 *
 * - the quantity's own words fill every other group of the value, and there is at least one other
 *   group: the sentence names the value's measure and subject;
 * - its sentence names no setting of that kind of its own (any term of the kind; for `time`, also
 *   no year, no other age or span of time, and the number itself is no date): it keeps its own;
 * - every subject its sentence names serves the value (bind-context.ts, ownSubjectsServe);
 * - no veto of the value stands in the sentence or in the text that named the setting.
 *
 * A group filled so counts `CONTEXT_PENALTY` as far; two values that tie bind nothing; a value that
 * vetoes a word that another candidate needs gives way to it (the more specific reading).
 *
 * A value may also declare a default setting (`binds_when.default_setting`, docs/rule-packs.md): the
 * terms a setting group of it is filled with when neither the sentence nor the passage names any
 * setting of that kind. It counts twice `CONTEXT_PENALTY`.
 */
import { compile, phraseWords } from '../propositions/lexicon.js';
import type { Lexicon, LoadedPacks, ReferenceValue } from '../rulepack/types.js';
import type { Quantity } from '../types.js';
import { findTerms } from './bind.js';
import { describedTimes } from './bind-descriptions.js';
import { lexiconWords } from '../prose/lexicon-words.js';
import { CONTEXT_PENALTY, opensOnOwnTime, ownSubjects, ownSubjectsServe } from './bind-context.js';
import { canState, nearness } from './bind-match.js';
import { withoutOthers } from './bind-others.js';
import { roleFits, type ReadRole } from './bind-role.js';
import { toldInPast } from './told-in-past.js';
import type { TermHits } from './bind-view.js';

/** A year or a decade in a sentence: a date of its own ("in 2019", "the 1990s"). */
const YEAR = /(?<!\d)\d{4}(?:s|'s)?(?!\d)/u;

/** The setting kind of the gas a passage speaks of (the lexicon's `settings.gas`): filled only alone. */
const LONE_KIND = 'gas';

/** Per setting kind, the pack terms that are its members. */
type SettingKinds = Map<string, Set<string>>;

const settingKinds = new WeakMap<LoadedPacks, SettingKinds>();

/** `entities.ice-core` → [entities, ice-core]; `periods` → [periods]. */
function splitReference(ref: string): [string, string | undefined] {
  const dot = ref.indexOf('.');
  return dot < 0 ? [ref, undefined] : [ref.slice(0, dot), ref.slice(dot + 1)];
}

/** The terms a list of lexicon references names: `terms.<id>` as written, a class or a class's key by its phrases. */
function termsNamed(packs: LoadedPacks, refs: readonly string[]): Set<string> {
  const ids = new Set<string>();
  const phrases: Lexicon = { named: {} };
  const named = phrases['named'] as Record<string, string[]>;
  for (const ref of refs) {
    const [cls, key] = splitReference(ref);
    if (cls === 'terms') {
      if (key !== undefined) ids.add(key);
      continue;
    }
    const keys = key === undefined ? Object.keys(packs.lexicon[cls] ?? {}) : [key];
    for (const k of keys) named[`${cls}.${k}`] = packs.lexicon[cls]?.[k] ?? [];
  }
  // A term is named by its first phrase (as a subject is, bind-implied.ts): "Antarctic Cold Reversal"
  // is a period, not a region, though it holds a region's word; the whole phrase must be the class's.
  const found = compile(phrases);
  for (const term of packs.terms) {
    const words = phraseWords(term.words[0] ?? '');
    if (words.length > 0 && found.find(words).some((h) => h.first === 0 && h.last === words.length - 1) && !YEAR.test(term.words[0] ?? '')) ids.add(term.id);
  }
  return ids;
}

/**
 * The pack's setting kinds and their member terms, made once per packs from the lexicon's
 * `settings` class. A term named with a year ("1750") is a date, no setting, unless listed by id.
 */
export function settingKindsOf(packs: LoadedPacks): SettingKinds {
  let kinds = settingKinds.get(packs);
  if (kinds === undefined) {
    kinds = new Map();
    const declared = packs.lexicon['settings'] ?? {};
    const not = termsNamed(packs, declared['not'] ?? []);
    for (const [kind, refs] of Object.entries(declared)) {
      if (kind === 'not') continue;
      kinds.set(kind, new Set([...termsNamed(packs, refs)].filter((id) => !not.has(id))));
    }
    settingKinds.set(packs, kinds);
  }
  return kinds;
}

const changeTerms = new WeakMap<LoadedPacks, Set<string>>();

/** The pack terms named by a word of the lexicon's `changes` class ("rise", "fall", "warm"). */
function changeTermsOf(packs: LoadedPacks): Set<string> {
  let ids = changeTerms.get(packs);
  if (ids === undefined) {
    ids = termsNamed(packs, ['changes']);
    changeTerms.set(packs, ids);
  }
  return ids;
}

/** The kind a group is a setting of: every term of it a member of that one kind; else undefined. */
function settingOf(group: readonly string[], kinds: SettingKinds): string | undefined {
  if (group.length === 0) return undefined;
  for (const [kind, members] of kinds) if (group.every((id) => members.has(id))) return kind;
  return undefined;
}

/**
 * The kind a missing group may be filled from: a setting group's, or, for a group that offers a
 * setting or another word for the same thing ([lgm, glacial, below-present]: the glacial low, or a
 * level told against today's), the kind of its setting terms when they are all of one kind. The
 * other words are alternatives the sentence did not use; the setting fills the group as one of its
 * own setting terms would.
 */
function fillableKind(group: readonly string[], kinds: SettingKinds): string | undefined {
  const whole = settingOf(group, kinds);
  if (whole !== undefined) return whole;
  const inSome = group.filter((id) => [...kinds.values()].some((m) => m.has(id)));
  return inSome.length === 0 ? undefined : settingOf(inSome, kinds);
}

/** The passage's current setting of one kind: the setting terms of the latest text that names one, and all its terms. */
interface Setting {
  terms: Set<string>;
  /** The terms of the text that named it and of every text after it up to the sentence. */
  hits: TermHits;
}

/** What a sentence and its passage give the setting reader. */
export interface SettingFrame {
  /** The sentence's own terms, all of them (the quantity's view is narrower). */
  hits: TermHits;
  /** Texts before the sentence, oldest first: heading subjects, lead-in, earlier sentences of the block. */
  history: readonly string[];
  /** The sentence states another age or stretch of time of its own. */
  ownTime: boolean;
  /** The sentence's other quantities. */
  others: readonly Quantity[];
  /** The sentence it reads on from, when it refers back to it ("it", "the level"): that sentence's vetoes hold too. */
  referredTo?: string;
}

/**
 * What a comparison is set against: "than" with the subject and verb it may repeat ("colder than it
 * is today", "lower than now", "higher than at present").
 */
const STANDARD_BEFORE = /(?:^|[^\p{L}])than(?:\s+(?:it|they|we|there|that|those|this|he|she)(?:\s+(?:is|are|was|were|does|do|did|has|have|stands?|sits?))?)?(?:\s+(?:at|in|during))?(?:\s+the)?\s+$/iu;

/**
 * The terms of `text` less those that name only what a comparison is set against: in "Back then the
 * world was some 6 °C colder than it is today" the scene is "back then", not today, so a later
 * figure takes no setting from "today" (a sentence's own terms are read as before: this is for the
 * passage's setting only).
 */
function withoutStandards(text: string, hits: TermHits): TermHits {
  let kept: TermHits | undefined;
  for (const [id, spans] of hits) {
    const left = spans.filter(([start]) => !STANDARD_BEFORE.test(text.slice(Math.max(0, start - 30), start)));
    if (left.length === spans.length) continue;
    kept ??= new Map(hits);
    if (left.length > 0) kept.set(id, left);
    else kept.delete(id);
  }
  return kept ?? hits;
}

/** The latest setting of `kind` named in `history`, read most recent first; undefined when none is. */
function currentSetting(history: readonly string[], kind: string, kinds: SettingKinds, packs: LoadedPacks): Setting | undefined {
  const members = kinds.get(kind) ?? new Set<string>();
  for (let k = history.length - 1; k >= 0; k -= 1) {
    const text = history[k] ?? '';
    // "Termination III, not the end of the last ice age": a denied or compared subject sets no scene.
    const hits = withoutStandards(text, withoutOthers(text, findTerms(text, packs)));
    // Where each setting of the kind is named; a period described but dated by no value ("the start
    // of the last glaciation", "the penultimate deglaciation") is a setting too, of no value's.
    const named: [string | undefined, number, number][] = [...hits].flatMap(([id, spans]) => (members.has(id) ? spans.map(([a, b]): [string, number, number] => [id, a, b]) : []));
    if (kind === 'time') for (const d of describedTimes(text, packs.lexicon)) if (!d.terms.some((id) => members.has(id))) named.push([undefined, d.start, d.end]);
    if (named.length === 0) {
      if (kind === 'time' && YEAR.test(text)) return { terms: new Set(), hits: since(history, k, hits, packs) };
      continue;
    }
    // The latest named is the setting: the terms over its words (a description names two: the deglaciation, its end).
    const [, from, to] = named.reduce((a, b) => (b[2] > a[2] ? b : a));
    const terms = new Set(named.filter(([id, a, b]) => id !== undefined && a < to && b > from).map(([id]) => id as string));
    return { terms, hits: since(history, k, hits, packs) };
  }
  return undefined;
}

/**
 * Whether the sentence opens with a clause set before a time (a word of the lexicon's
 * `time-parts.before`: "Before the mills and the railways, the air held about 280 ppm"): a time of
 * its own, even when the pack names no period for it.
 */
function opensBefore(sentence: string, packs: LoadedPacks): boolean {
  const words = lexiconWords(sentence).map((w) => w.text);
  return (packs.lexicon['time-parts']?.['before'] ?? []).some((phrase) => {
    const p = phraseWords(phrase);
    return p.every((w, k) => words[k] === w);
  });
}

/**
 * The terms of `history[k]` (its `hits`) and of every later text: a setting carries to the sentence
 * with the vetoes of all it passed ("... the last glacial. Each doubling of CO2 adds ... The IPCC
 * gives about 1.5 degrees for such a doubling": the doubling is the sensitivity's, no glacial cooling).
 */
function since(history: readonly string[], k: number, hits: TermHits, packs: LoadedPacks): TermHits {
  const all: TermHits = new Map(hits);
  for (const text of history.slice(k + 1)) for (const [id, spans] of findTerms(text, packs)) all.set(id, [...(all.get(id) ?? []), ...spans]);
  return all;
}

/** Whether the sentence names a setting of `kind` of its own. */
function ownsSetting(sentence: string, q: Quantity, kind: string, kinds: SettingKinds, frame: SettingFrame, packs: LoadedPacks): boolean {
  const members = kinds.get(kind) ?? new Set<string>();
  // "colder than today": what the sentence compares with is no setting of its own.
  if ([...withoutStandards(sentence, frame.hits).keys()].some((id) => members.has(id))) return true;
  // A date of its own (a year, another age or stretch of time, or the number itself a date), or a
  // period described that no value dates: "At the start of the last glaciation, CO2 trailed ...".
  return kind === 'time' && (YEAR.test(sentence) || frame.ownTime || q.dimension === 'age' || describedTimes(sentence, packs.lexicon).length > 0 || opensBefore(sentence, packs) || opensOnOwnTime(sentence, packs));
}

/**
 * The value a quantity binds when the passage's setting fills the value's setting groups,
 * `ambiguous` when two tie, undefined when none fits.
 */
export function bindFromSetting(
  sentence: string,
  q: Quantity,
  role: ReadRole,
  view: TermHits,
  vetoes: TermHits,
  packs: LoadedPacks,
  breaks: number[],
  frame: SettingFrame,
): string | 'ambiguous' | undefined {
  const kinds = settingKindsOf(packs);
  if (kinds.size === 0) return undefined;
  const settings = new Map<string, Setting | null>();
  const settingFor = (kind: string): Setting | null => {
    if (!settings.has(kind)) settings.set(kind, currentSetting(frame.history, kind, kinds, packs) ?? null);
    return settings.get(kind) ?? null;
  };
  let own: ReturnType<typeof ownSubjects> | undefined;
  const candidates: { r: ReferenceValue; filled: number; from: TermHits[] }[] = [];
  for (const r of packs.references) {
    if (!r.dimensions.includes(q.dimension) || !roleFits(r.binding.role, role, q) || !canState(r, q)) continue;
    if (r.binding.none.some((id) => vetoes.has(id))) continue;
    // "420 ppm is 0.042 percent", "from 190 to 280 ppm": figures of one another, not of a setting.
    if (frame.others.some((o) => o.dimension !== 'number' && o.statedUnit !== 'CE')) continue;
    const missing = r.binding.all.filter((g) => !g.some((id) => view.has(id)));
    if (missing.length === 0 || missing.length === r.binding.all.length) continue;
    // Every missing group a setting group, and at least one group of the value's own not a setting: its measure or subject.
    const missingKinds = missing.map((g) => fillableKind(g, kinds));
    if (missingKinds.some((k) => k === undefined)) continue;
    // The gas a passage speaks of fills a value's gas only when that is all the sentence lacks ("A
    // 2013 study found a lag of about 1,500 years" after a paragraph on CO2): taken with a period or
    // a region of the passage as well, the figure's own words would name only what it measures.
    if (missingKinds.includes(LONE_KIND) && missing.length > 1) continue;
    // A group that offers other words beside its settings ("lower than today") is filled only in a
    // sentence told in the past: "At the time of writing, sea level stands some 125 metres higher"
    // and "sea level has risen some 60 metres since" speak from today, whatever period came before.
    if (missing.some((g) => settingOf(g, kinds) === undefined) && !toldInPast(sentence)) continue;
    // The gas, when the sentence names it, is its subject ("Carbon dioxide took about 2,000 years to climb").
    if (!r.binding.all.some((g) => !missing.includes(g) && [undefined, LONE_KIND].includes(settingOf(g, kinds)))) continue;
    const from: TermHits[] = [];
    let filled = 0;
    let fits = true;
    missing.forEach((g, n) => {
      const kind = missingKinds[n] as string;
      if (!fits || ownsSetting(sentence, q, kind, kinds, frame, packs)) {
        fits = false;
        return;
      }
      const setting = settingFor(kind);
      if (setting !== null) {
        if (!g.some((id) => setting.terms.has(id))) fits = false;
        else {
          from.push(setting.hits);
          filled += CONTEXT_PENALTY;
        }
        return;
      }
      // No setting of the kind in the passage: the value's declared default, if it is of this group,
      // with the vetoes of the whole passage ("Caillon studied Termination III" names a setting of its own).
      const defaults = r.binding.defaultSetting ?? [];
      if (g.some((id) => defaults.includes(id))) {
        from.push(since(frame.history, -1, new Map(), packs));
        filled += 2 * CONTEXT_PENALTY;
      } else fits = false;
    });
    if (!fits) continue;
    // The setting comes with the vetoes of the text that named it, and a sentence that refers back
    // with those of the one it refers to ("The IPCC puts it between 2.5 and 4 °C" after climate sensitivity).
    if (from.some((hits) => r.binding.none.some((id) => hits.has(id)))) continue;
    if (frame.referredTo !== undefined) {
      const before = findTerms(frame.referredTo, packs);
      if (r.binding.none.some((id) => before.has(id))) continue;
    }
    // A word of change ("climbed", "the rise") says what the subject did, not which subject: the
    // duration of a rise is stated with one. Only subjects proper keep the sentence its own.
    own ??= ownSubjects(sentence, vetoes, packs, q.dimension).filter(([id]) => !changeTermsOf(packs).has(id));
    if (!ownSubjectsServe(sentence, r, view, own, packs)) continue;
    candidates.push({ r, filled, from });
  }
  const present = (id: string, c: { from: TermHits[] }): boolean => view.has(id) || c.from.some((hits) => hits.has(id));
  // The more specific reading: a value that vetoes a word another candidate needs gives way to it.
  const specific = candidates.filter((c) => !candidates.some((o) => o !== c && c.r.binding.none.some((id) => present(id, c) && o.r.binding.all.some((g) => g.includes(id)))));
  const scored = specific
    .map(({ r, filled }) => ({ r, score: nearness({ ...r, binding: { ...r.binding, all: r.binding.all.filter((g) => g.some((id) => view.has(id))) } }, view, q, breaks) + filled }))
    .sort((a, b) => a.score - b.score);
  const [best, next] = scored;
  if (best === undefined) return undefined;
  return next !== undefined && next.score === best.score ? 'ambiguous' : best.r.id;
}
