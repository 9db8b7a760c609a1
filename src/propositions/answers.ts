/**
 * A choice between two agents in one sentence, answered in the next by naming one and setting the
 * other aside, with no verb of its own: the answer borrows the choice's predicate.
 *
 *   "Geologists argued over whether the orbit or CO2 ended the ice ages."   open: orbit | co2 → ice-age
 *   "The cores settled it: it was the orbit, not CO2."                      orbit → ice-age; co2 → ice-age denied
 *
 * Only an answer that both names one alternative and denies another is read: a sentence after the
 * choice that merely names a thing ("CO2 is at 420 ppm today") answers nothing, and one that grants
 * both ("the orbit and CO2 together") denies neither.
 */
import type { Cause } from './types.js';
import type { ReadSentence, Thing } from './sentence.js';

/** What a choice of agents offers: the alternatives, and the predicate they compete for. */
interface Choice {
  agents: ReadonlySet<string>;
  patient?: string;
  role: Cause['role'];
  /** A question that asks for the agent ("What ended the last ice age?") and offers no alternatives of its own. */
  asked?: boolean;
}

/** How many words before a cause's span its alternatives may stand. */
const CHOICE_REACH = 8;
/** Things that can act, and so be offered as alternatives (not the records that show them). */
const AGENTS = new Set(['co2', 'temperature', 'orbit', 'water']);
/** Words that set the thing after them aside ("not CO2", "rather than CO2", "instead of the gas"). */
const SET_ASIDE = new Set(['not', 'never', 'than', 'instead']);
/** Words a setting-aside may reach over to its thing: "not the CO2", "rather than changes in CO2". */
const LEAD = new Set(['the', 'a', 'an', 'of', 'changes', 'change', 'in', 'rising', 'falling']);

/**
 * The choice an open cause of `previous` offers: its agent and the other agents joined to it by
 * "or" before its cause word ("whether changes in Earth's orbit or changes in CO2 ended ...").
 */
export function choiceOf(previous: ReadSentence, causes: readonly Cause[]): Choice | undefined {
  for (const c of causes) {
    // A choice is offered by an open cause ("whether ... or ... ended") or a question ("Was it X or Y that ended ...?").
    if (c.polarity !== 'open' && !previous.question) continue;
    const from = previous.words.findIndex((w) => w.start >= c.start);
    const to = previous.words.findLastIndex((w) => w.end <= c.end);
    if (from < 0 || to < from) continue;
    // The alternatives may stand before the cause's own span ("whether CO2 or the orbit ended": the
    // span opens at its agent), within its clause.
    const clause = previous.words[from]?.clause;
    let begin = from;
    while (begin > 0 && from - begin < CHOICE_REACH && previous.words[begin - 1]?.clause === clause) begin -= 1;
    const inSpan = previous.things.filter((t) => t.first >= begin && t.last <= to && t.kind !== c.patient && t.kind !== 'pronoun' && AGENTS.has(t.kind));
    const kinds = new Set(inSpan.map((t) => t.kind));
    const joined = previous.words.slice(begin, to + 1).some((w) => w.text === 'or');
    if (kinds.size >= 2 && (c.agent === undefined || kinds.has(c.agent)) && joined) return { agents: kinds, ...(c.patient === undefined ? {} : { patient: c.patient }), role: c.role };
    // "What ended the last ice age?": a question whose asking word stands as the cause's subject asks
    // for its agent; every thing that can act is an answer it offers.
    if (previous.question && c.agent === undefined && c.patient !== undefined && kinds.size === 0 && asksForAgent(previous, from)) return { agents: AGENTS, patient: c.patient, role: c.role, asked: true };
  }
  return undefined;
}

/** Question words that ask for a thing ("what", "which"): as a cause's subject they ask for its agent. */
const ASKING = new Set(['what', 'which']);

/** The cause whose span opens at word `from` of question `s` has an asking word as its subject: it opens the question, or the cause's span. */
function asksForAgent(s: ReadSentence, from: number): boolean {
  const clause = s.words[from]?.clause;
  const opening = s.words.findIndex((w) => w.clause === clause);
  return [s.words[opening], s.words[from], s.words[from - 1]].some((w) => w !== undefined && ASKING.has(w.text));
}

/** Whether thing `t` of `s` is set aside by a word just before it. */
function setAside(s: ReadSentence, t: Thing): boolean {
  // "not the orbit alone", "not just CO2": what is set aside is the restriction, not the thing.
  const restricted = s.of('exclusive').some((e) => (e.first > t.last && e.first - t.last <= 2) || (e.last < t.first && t.first - e.last <= 2));
  if (restricted) return false;
  for (let k = t.first - 1; k >= 0 && k >= t.first - 4; k -= 1) {
    const w = s.words[k]?.text ?? '';
    if (SET_ASIDE.has(w)) return w !== 'than' || s.words[k - 1]?.text === 'rather';
    if (!LEAD.has(w)) return false;
  }
  return false;
}

/**
 * The causes an answer with no cause word of its own asserts and denies, read against the choice
 * of the sentence before. Empty unless it names one alternative and sets another aside.
 */
export function answerCauses(s: ReadSentence, choice: Choice | undefined): Cause[] {
  if (choice === undefined) return [];
  // "both", "together", a loop: the answer grants every alternative a part.
  if (s.words.some((w) => w.text === 'both') || s.of('order', 'together').length > 0 || s.of('causes', 'feedback').length > 0) return [];
  const named = s.things.filter((t) => choice.agents.has(t.kind));
  const aside = named.filter((t) => setAside(s, t));
  const kept = named.filter((t) => !aside.includes(t) && !aside.some((a) => a.kind === t.kind));
  // "What ended the last ice age? Rising carbon dioxide, on its own.": an answer to a question that
  // asks for the agent, naming one thing and restricting it ("on its own", "alone", "nothing else was
  // needed"), names that thing the one cause. Naming two things, or none restricted, answers with no one cause.
  if (choice.asked === true && aside.length === 0) {
    const kinds = new Set(named.map((t) => t.kind));
    const first = named[0];
    if (first === undefined || kinds.size !== 1 || s.of('exclusive').length === 0) return [];
    return [{ kind: 'cause', agent: first.kind, patient: choice.patient as string, role: choice.role, polarity: 'asserted', exclusive: true, start: s.words[first.first]?.start ?? 0, end: s.words[first.last]?.end ?? 0 }];
  }
  if (aside.length === 0 || kept.length === 0) return [];
  const cause = (t: Thing, polarity: Cause['polarity']): Cause => ({
    kind: 'cause',
    agent: t.kind,
    ...(choice.patient === undefined ? {} : { patient: choice.patient }),
    role: choice.role,
    polarity,
    exclusive: false,
    start: s.words[t.first]?.start ?? 0,
    end: s.words[t.last]?.end ?? 0,
  });
  const first = kept[0] as Thing;
  return [cause(first, 'asserted'), ...aside.filter((t) => t.kind !== first.kind).map((t) => cause(t, 'denied'))];
}
