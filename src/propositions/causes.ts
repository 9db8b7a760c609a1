/**
 * Cause propositions: who acts on what, asserted or denied, alone or not.
 *
 *   "Since CO2 came after the warming, it cannot have caused it."   agent co2 (it), denied
 *    "CO2 was an effect of the warming, not a cause."                temperature → co2 asserted; co2 → ? denied
 *    "The lag rules out carbon dioxide as a driver."                 agent co2, denied
 *    "Orbital changes alone ended the ice ages."                     agent orbit, exclusive
 */
import { answerCauses, choiceOf } from './answers.js';
import { phraseWords, type LexHit } from './lexicon.js';
import { appositionSubject, clauseSubject, kindOf, PREPOSITIONS, subjectBefore, subjectOf, thingAfter, thingBefore } from './resolve.js';
import { denialsBefore, isPartitiveOne, NEGATIONS, PARTICIPANTS, splicedClauseStart, type ReadSentence, type Thing } from './sentence.js';
import type { Cause, Polarity } from './types.js';

/** Words that make the next word a noun ("the end", "of warming"): no verb follows them. */
const DETERMINERS = new Set(['the', 'a', 'an', 'its', 'their', 'our', 'of', 'in', 'for', 'with', 'from', 'after', 'before', 'than']);
/** Articles and owners that open a noun phrase ("the resulting warming"). */
const ARTICLES = new Set(['the', 'a', 'an', 'its', 'their', 'our', 'this', 'that']);
const INFERENCE_VERBS = new Set(['mean', 'means', 'meant', 'show', 'shows', 'showed', 'prove', 'proves', 'proved', 'imply', 'implies', 'implied', 'follow', 'follows', 'suggest', 'suggests', 'tell', 'tells']);
// "no say over temperature", "control over the climate": "over" links a part to what it acts on.
const OBJECT_LINKS = new Set(['of', 'in', 'on', 'for', 'behind', 'to', 'over']);
const ROLE: Record<string, Cause['role']> = { follower: 'cause', verbs: 'cause', sufficient: 'cause', 'sufficient-verbs': 'cause', passage: 'cause', because: 'cause', 'because-only': 'cause', nouns: 'cause', roles: 'cause', effects: 'cause', start: 'start', amplify: 'amplify', feedback: 'feedback' };

/** The causes one sentence states or denies; `previous` resolves a pronoun that opens it. */
export function readCauses(s: ReadSentence, previous?: ReadSentence): Cause[] {
  // Only a participant's name hides the cause words inside it ("orbital forcing"): "climate
  // sensitivity" names a measure and is still a part CO2 plays ("reveal nothing about climate sensitivity").
  const entities = s.of('entities').filter((e) => PARTICIPANTS.has(e.key));
  const regions = s.of('regions');
  const hits = s
    .of('causes')
    .filter((h, _, all) => !all.some((o) => o !== h && o.first <= h.first && o.last >= h.last && o.last - o.first > h.last - h.first))
    // "orbital forcing" names the orbit: its "forcing" is no cause word of its own, and "within a few
    // centuries of each other" is a timing, not a feedback.
    // "end of story", "full stop": a restriction's own words cause nothing.
    // "temperature and CO2 moved together": the verb of a co-variation phrase (lexicon `correlation`)
    // says the two went together, not that one moved the other.
    .filter((h) => ![...entities, ...s.of('order'), ...s.of('correlation')].some((e) => e.first <= h.first && e.last >= h.last && e.last > e.first))
    .filter((h) => !s.of('exclusive').some((e) => e.first <= h.first && e.last >= h.last && e.last - e.first > h.last - h.first))
    // "tracked each other", "mirror one another": a reciprocal object right after a co-variation
    // word (lexicon `correlation`) says the two went together, not that each drove the other.
    .filter((h) => h.key !== 'feedback' || !s.of('correlation').some((c) => c.last + 1 === h.first));
  const causes: Cause[] = [];
  for (const h of [...hits, ...doingHits(s)].sort((a, b) => a.first - b.first)) {
    // `passive` only qualifies an `effects` word at the same place; it states nothing of its own;
    // `deeds` are read with their "do" (doingHits).
    if (h.key === 'reverse' || h.key === 'either-or' || h.key === 'passive' || h.key === 'deeds' || h.key === 'needed-without') continue;
    // "the resulting warming", "a forced response": a part noun's verb forms are no noun.
    if (NOUN_KEYS.has(h.key) && !asNoun(s, h)) continue;
    const verbLike = h.key === 'verbs' || h.key === 'start' || h.key === 'amplify' || h.key === 'sufficient-verbs';
    // "the end of the ice age" is a noun; "it was CO2 doing the pushing" is still a verb.
    if (verbLike && DETERMINERS.has(s.words[h.first - 1]?.text ?? '') && s.words[h.first - 2]?.text !== 'doing') continue;
    // "the resulting warming", "its initial cooling": an -ing form after an article and one modifier
    // (no thing of the lexicon) is a noun too.
    if (verbLike && s.words[h.first]?.text.endsWith('ing') && ARTICLES.has(s.words[h.first - 2]?.text ?? '') && !s.things.some((t) => t.first <= h.first - 1 && h.first - 1 <= t.last)) continue;
    // "global warming", "Antarctic cooling": a region word before it makes the -ing form a noun.
    if (verbLike && s.words[h.first]?.text.endsWith('ing') && regions.some((r) => r.last === h.first - 1)) continue;
    if (h.key === 'effects' && s.words[h.first - 1]?.text === 'in') continue;
    // "CO2 only started rising", "temperature began to climb": a verb of starting before a change
    // word (lexicon `changes`) tells when the change began, not what began it.
    if ((h.key === 'start' || h.key === 'verbs') && beginsChange(s, h)) continue;
    // "does not make CO2 a bystander", "turns it into a mere follower": a casting verb puts its object
    // in the part the noun after it names; the verb itself causes nothing.
    if (h.key === 'verbs' && CASTING.has(s.words[h.first]?.text ?? '') && s.of('causes').some((o) => ['effects', 'roles', 'nouns'].includes(o.key) && o.first > h.last && o.first - h.last <= 4)) continue;
    // "makes the cores a courtroom confession", "turned the debate into a shouting match": a casting verb
    // whose object is followed by a predicate noun (an article past the object) casts; it acts on nothing.
    if (h.key === 'verbs' && CASTING.has(s.words[h.first]?.text ?? '') && castsIntoNoun(s, h.last)) continue;
    // "CO2 rose enough to warm...": a degree, no sufficiency; "the orbit was enough to end...": one.
    if (h.key === 'sufficient' && !isSufficiency(s, h)) continue;
    // "out of", "into": a passage caused only when an ice age follows ("hauled the planet out of the last glaciation").
    if (h.key === 'passage' && passageTarget(s, h) === undefined) continue;
    if (h.key === 'without') {
      causes.push(...withoutAt(s, h, causes, previous));
      continue;
    }
    if (h.key === 'source-verbs') {
      causes.push(...sourceAt(s, h, previous));
      continue;
    }
    causes.push(...causeAt(s, h, previous));
  }
  const own = [...causes, ...identityCauses(s)];
  // "Whether the orbit or CO2 ended the ice ages ... It was the orbit, not CO2.": an answer with no
  // cause word of its own takes the predicate of the choice before it (answers.ts).
  if (own.length > 0 || previous === undefined) return own;
  return answerCauses(s, choiceOf(previous, readCauses(previous)));
}

/**
 * A verb of starting or ending whose object is a change told as a verb ("started rising", "began
 * to climb", "stopped falling"): the change word of lexicon `changes` opens right after it, or
 * after "to". The words of the hit are themselves a single verb ("start", "begin", "end").
 */
function beginsChange(s: ReadSentence, h: LexHit): boolean {
  if (h.last !== h.first || !ASPECT_VERBS.has(h.base ?? '')) return false;
  const next = s.words[h.last + 1]?.text === 'to' ? h.last + 2 : h.last + 1;
  return s.of('changes').some((c) => c.first === next && c.key !== 'increment');
}

/** Verbs of a change's course: before a change word they tell when it began or ended (common practice of English grammar: aspectual verbs). */
const ASPECT_VERBS = new Set(['start', 'begin', 'end', 'kick off', 'set off']);

/** The forms of "do", the verb whose object names a part in a cause ("did the work", "does nothing"). */
const DO_FORMS = new Set(['do', 'does', 'did', 'done', 'doing']);
/** Words that may open the object of "do" before its deed ("the rest of the", "none of the", "any of its"). */
const DEED_LEAD = new Set(['the', 'a', 'an', 'its', 'their', 'of', 'any', 'none', 'all', 'most', 'much', 'some', 'more', 'rest', 'bulk', 'lot', 'whole', 'real', 'actual', 'hard', 'heavy', 'main', 'early', 'later', 'final', 'initial', 'share', 'part', 'half', 'little', 'plenty', 'lots']);
/** Objects of "do" that deny their subject any part: "CO2 itself does nothing". */
const NOTHING = new Set(['nothing', 'anything']);

/**
 * "did the rest of the work of ending the ice age", "wasn't doing any of the heating", "CO2 itself
 * does nothing": a form of "do" whose object, past determiners and quantifiers, is a deed of the
 * lexicon (`causes.deeds`) or a change told as a noun, read as a causal verb phrase from "do" to
 * the deed. A "do" inside a lexicon phrase already ("do the trick") adds nothing. A negation inside
 * the phrase ("none of", "nothing") denies it, as in "did none of the warming".
 */
function doingHits(s: ReadSentence): LexHit[] {
  const out: LexHit[] = [];
  const deeds = [...s.of('causes', 'deeds'), ...s.of('changes', 'warm'), ...s.of('changes', 'cool')];
  s.words.forEach((w, k) => {
    if (!DO_FORMS.has(w.text) || s.of('causes').some((h) => h.key !== 'deeds' && h.first <= k && k <= h.last)) return;
    const segment = w.segment;
    if (NOTHING.has(s.words[k + 1]?.text ?? '') && s.words[k + 1]?.segment === segment) {
      // "does nothing", "does nothing at all"; "did nothing to slow the thaw" says what it failed to do, and is read there.
      const next = s.words[k + 2];
      const closes = next === undefined || next.segment !== segment || (next.text === 'at' && s.words[k + 3]?.text === 'all');
      if (closes) out.push({ cls: 'causes', key: 'verbs', first: k, last: k + 1 });
      return;
    }
    for (let j = k + 1; j <= k + 7; j += 1) {
      const at = s.words[j];
      if (at === undefined || at.segment !== segment) return;
      const deed = deeds.find((d) => d.first === j);
      if (deed !== undefined) {
        out.push({ cls: 'causes', key: 'verbs', first: k, last: deed.last });
        return;
      }
      // "did all of it", "did most of that": a pronoun after a quantifier's "of" stands for the deed
      // the passage is about.
      const pronoun = s.words[j - 1]?.text === 'of' && j - 2 > k && s.things.some((t) => t.kind === 'pronoun' && t.first === j && t.last === j);
      // It closes the phrase: its segment ends, or a joining word and a new subject follow ("... and CO2 played no part").
      const closes = s.words[j + 1]?.segment !== segment || s.things.some((t) => t.first === j + 2);
      if (pronoun && closes) {
        out.push({ cls: 'causes', key: 'verbs', first: k, last: j });
        return;
      }
      // "did essentially all the work": an adverb of degree (an -ly word, English morphology) may stand before the object.
      if (j === k + 1 && at.text.endsWith('ly') && !s.things.some((t) => t.first <= j && j <= t.last)) continue;
      if (!DEED_LEAD.has(at.text)) return;
    }
  });
  return out;
}

/** Keys whose phrases are nouns: they match as written or in the plural, never as a verb form. */
const NOUN_KEYS = new Set(['effects', 'nouns', 'roles']);

/** True when the words of noun hit `h` are its phrase as written or its plural ("effect", "effects"; not "effected"). */
function asNoun(s: ReadSentence, h: LexHit): boolean {
  if (h.base === undefined) return true;
  const base = phraseWords(h.base);
  const words = s.words.slice(h.first, h.last + 1).map((w) => w.text);
  if (base.length !== words.length) return true;
  return words.every((w, k) => {
    const b = base[k] ?? '';
    return w === b || w === `${b}s` || w === `${b}es` || (b.endsWith('y') && w === `${b.slice(0, -1)}ies`);
  });
}

/** Agents an event can be said to be "all" of. */
const WHOLE_AGENTS = new Set(['co2', 'orbit', 'water']);

/**
 * "Termination I was 100% ocean carbon", "the last deglaciation was all the orbit": an ice age or a
 * deglaciation said to be wholly one thing names that thing its one cause.
 */
function identityCauses(s: ReadSentence): Cause[] {
  const out: Cause[] = [];
  s.words.forEach((w, k) => {
    if (!COPULAS.has(w.text)) return;
    const subject = s.things.find((t) => t.kind === 'ice-age' && t.last < k && k - t.last <= 2 && s.words[t.first]?.clause === w.clause);
    if (subject === undefined) return;
    const next = s.words[k + 1];
    const percent = next !== undefined && /^100$/u.test(next.text) && /^\s*(?:%|percent|per cent)/u.test(s.text.slice(next.end));
    const whole = s.of('exclusive').find((e) => e.first === k + 1) ?? (next?.text === 'all' || percent ? { first: k + 1, last: k + 1 } : undefined);
    if (whole === undefined) return;
    const things = s.things.filter((t) => t.first > whole.last && t.first - whole.last <= 4 && s.words[t.first]?.segment === s.words[whole.last + 1]?.segment);
    // "ocean carbon": the head of the noun phrase is its last thing.
    const head = things.filter((t, j) => j === 0 || t.first === (things[j - 1] as Thing).last + 1).at(-1);
    if (head === undefined || !WHOLE_AGENTS.has(head.kind)) return;
    const polarity = polarityAt(s, k);
    if (polarity === 'open') return;
    out.push({ kind: 'cause', agent: head.kind, patient: 'ice-age', role: 'cause', polarity, exclusive: true, start: s.words[subject.first]?.start ?? 0, end: s.words[head.last]?.end ?? 0 });
  });
  return out;
}

function causeAt(s: ReadSentence, h: LexHit, previous?: ReadSentence): Cause[] {
  const kind = (t: Thing | undefined) => kindOf(s, t, previous);
  // A pronoun that acts ("it could not have been a cause") stands for something that can act, not
  // for the record that shows it ("Since the ice shows CO2 trailing the warmth, it ...").
  const agentKind = (t: Thing | undefined) => kindOf(s, t, previous, RECORDS);
  const noun = h.key === 'nouns' || h.key === 'effects' || h.key === 'roles' || h.key === 'feedback';
  let polarity = polarityAt(s, h.first);
  // "It does not let CO2 off the hook, because the ocean released carbon...": a reason set off by a
  // comma explains the whole statement before it, denial included; the reason itself is asserted.
  const reasonAfterComma = (h.key === 'because' || h.key === 'because-only') && /,\s*$/u.test(s.text.slice(0, s.words[h.first]?.start ?? 0));
  if (reasonAfterComma && polarity === 'denied') polarity = 'asserted';
  // "the greenhouse effect of CO2 must be negligible": a role denied after the noun.
  if (noun && polarity !== 'open' && deniedAfter(s, h.last)) polarity = polarity === 'denied' ? 'asserted' : 'denied';
  // "the hypothesis that CO2 contributed to the warming will be rejected": the proposal is denied.
  if (polarity === 'asserted' && isRejectedProposal(s, h)) polarity = 'denied';
  // "did none of the warming": a denial inside the verb phrase itself.
  if (polarity !== 'open' && (h.key === 'verbs' || h.key === 'sufficient-verbs') && s.words.slice(h.first + 1, h.last + 1).some((w) => NEGATIONS.has(w.text))) polarity = polarity === 'denied' ? 'asserted' : 'denied';
  const next = s.words[h.last + 1]?.text ?? '';
  // "by itself", "by themselves" say the agent acted alone: no passive.
  const reflexive = /^(?:itself|themselves|its|their)$/u.test(s.words[(next === 'by' ? h.last + 2 : h.last + 3)]?.text ?? '');
  const passive = !noun && !reflexive && (next === 'by' || s.words[h.last + 2]?.text === 'by');
  let agentThing: Thing | undefined;
  let patientThing: Thing | undefined;
  if (passive) {
    const by = next === 'by' ? h.last + 1 : h.last + 2;
    agentThing = s.things.find((t) => t.first > by && t.first - by <= 7 && t.kind !== 'pronoun');
    patientThing = thingBefore(s, h.first, 'clause');
  } else if (h.key === 'because' || h.key === 'because-only') {
    // "The ice ages ended because of changes in Earth's orbit": the orbit acts on the clause's subject;
    // "ended for one reason: the orbit...": the cause may follow a colon or a dash.
    agentThing = s.things.find((t) => t.first > h.last && t.first - h.last <= 8 && t.kind !== 'pronoun');
    patientThing = subjectOf(s, h.first) ?? clauseSubject(s, h.first);
  } else if (noun && copulaAfter(s, h.last) !== undefined) {
    // "The real driver of the glacial cycles was temperature": the agent follows the copula.
    agentThing = thingAfter(s, copulaAfter(s, h.last) as number, 4);
    patientThing = OBJECT_LINKS.has(next) ? thingAfter(s, h.last, 4) : relativeSubject(s, h.last);
  } else if (noun && h.key !== 'effects' && effectAsSubject(s, h.first)) {
    // "a consequence cannot also be a cause": the subject is a role, not a thing; the agent is whatever
    // the sentence casts in that role, left unnamed here.
    agentThing = undefined;
  } else if (noun) {
    const asRole = ['as', 'be'].includes(s.words[h.first - 2]?.text ?? '') || s.words[h.first - 1]?.text === 'as';
    // "CO2 only the consequence": the subject stands just before; "CO2 ... was only a passenger": before
    // the copula, past any relative clause; "CO2 was an effect of the warming, not a cause": an
    // elliptic segment takes the clause's subject.
    // "CO2 was a response to the warming rather than a driver of it": a part noun joined to an
    // earlier one by a contrast or a coordinator shares that noun's subject, however long its phrase.
    const partner = coordinatedPart(s, h);
    agentThing = asRole
      ? thingBefore(s, h.first, 'clause')
      : (subjectBefore(s, h.first) ?? copulaSubject(s, h.first) ?? (partner === undefined ? undefined : (subjectBefore(s, partner.first) ?? copulaSubject(s, partner.first))) ?? subjectOf(s, h.first) ?? appositionSubject(s, h.first) ?? clauseSubject(s, h.first));
    const linked = OBJECT_LINKS.has(next) ? thingAfter(s, h.last, 4) : undefined;
    // "Only one cause ended the ice age: carbon dioxide": the agent named after a colon or dash.
    const named = s.things.find((t) => t.first > h.last && t.first - h.last <= 10 && t.kind !== 'pronoun' && s.words[t.first]?.clause !== s.words[h.first]?.clause);
    // "the role of CO2", "the greenhouse effect of CO2": what follows "of" is the one acting.
    if (h.key === 'roles' && next === 'of') agentThing = linked ?? agentThing;
    else patientThing = linked;
    agentThing ??= thingAfter(s, h.last, 3) ?? named;
  } else if (h.key === 'passage') {
    // "CO2 alone flipped the planet in and out of ice ages": the clause's subject moves it; the ice age is the patient.
    // The thing just before is the object moved ("the planet"), so the subject opens the clause.
    agentThing = clauseSubject(s, h.first) ?? subjectBefore(s, h.first);
    patientThing = passageTarget(s, h);
  } else if (s.words[h.first]?.text === 'out' && s.words[h.first + 1]?.text === 'of') {
    // "The orbit hauled the planet out of the ice age": the thing just before is the object moved.
    agentThing = clauseSubject(s, h.first) ?? subjectBefore(s, h.first);
    patientThing = thingAfter(s, h.last);
  } else {
    // "rising summer sunshine in the north was, by itself, sufficient to end it": a sufficiency
    // predicate's subject is its copula's, past the asides between them.
    const copula = h.key === 'sufficient' ? linkingVerbOf(s, h) : undefined;
    const predicated = copula === undefined ? undefined : (subjectOf(s, copula) ?? subjectBefore(s, copula));
    agentThing = predicated ?? subjectBefore(s, h.first) ?? setAgainstRival(s, h) ?? subjectOf(s, h.first) ?? clauseSubject(s, h.first) ?? thingBefore(s, h.first, 'clause');
    // "it's the sun doing it, not CO2": a phrase that holds its own object ("do it") takes no other.
    patientThing = s.words[h.last]?.text === 'it' && h.last > h.first ? undefined : thingAfter(s, h.last);
  }
  // "The lag makes CO2 a mere passenger": the part is its object's, not the subject's.
  if (h.key === 'effects') agentThing = madeInto(s, h) ?? agentThing;
  const cleft = cleftFocus(s, agentThing) ?? pseudoCleftFocus(s, h);
  if (cleft !== undefined) agentThing = cleft;
  let patient = kind(patientThing);
  // "it cannot have been a driver of that warmth": the pronoun is not the thing it acts on.
  let agent = patientThing !== undefined && patientThing.kind !== 'pronoun' ? kindOf(s, agentThing, previous, new Set([...RECORDS, patientThing.kind])) : agentKind(agentThing);
  // "Was CO2 a driver, or merely a passenger? The evidence points to passenger.": an effect noun
  // with no subject of its own answers the question before, and is said of that question's subject.
  if (agent === undefined && agentThing === undefined && h.key === 'effects' && previous?.question === true) {
    agent = previous.things.find((t) => t.kind !== 'pronoun' && !RECORDS.has(t.kind))?.kind;
  }
  // "dragged us out of the last ice age": a cause phrase that holds its own object names the patient.
  const inside = s.of('entities').find((e) => e.first >= h.first && e.last <= h.last && (h.key === 'verbs' || h.key === 'start'));
  if (inside !== undefined && inside.key !== agent) patient = inside.key;
  // "never a driver of it": a pronoun object is not its own subject; it is the other thing named.
  if (patientThing?.kind === 'pronoun' && patient === agent) {
    patient = s.things.filter((t) => t.last < patientThing.first && t.kind !== 'pronoun' && t.kind !== agent).at(-1)?.kind ?? patient;
  }
  // "CO2 is not a bystander", "a lag does not make CO2 a passenger": a passive part denied grants the
  // subject a part of its own; it denies nothing of what acts on the subject.
  if (h.key === 'effects' && polarity === 'denied' && s.of('causes', 'passive').some((p) => p.first === h.first)) {
    const holder = madeInto(s, h) ?? agentThing;
    const subject = kind(holder);
    if (subject === undefined) return [];
    return [{ kind: 'cause', role: 'cause', polarity: 'asserted', exclusive: false, start: s.words[h.first]?.start ?? 0, end: s.words[h.last]?.end ?? 0, agent: subject }];
  }
  if (h.key === 'effects') {
    // "CO2 was an effect of the warming": the warming acts on CO2.
    [agent, patient] = [patient ?? (agent === 'co2' ? 'temperature' : undefined), agent];
  }
  // Climate sensitivity, the greenhouse effect: CO2's own effect, whoever the sentence's subject is.
  if (h.key === 'roles' && agent !== 'co2' && agent !== 'orbit' && isCo2Effect(s, h)) agent = 'co2';
  const start = Math.min(s.words[h.first]?.start ?? 0, agentThing !== undefined && agentThing.first < h.first ? (s.words[agentThing.first]?.start ?? 0) : Infinity);
  const end = s.words[h.last]?.end ?? 0;
  // "It was CO2 that set the temperature": a cleft singles its focus out as the one agent.
  // "The orbit was enough to end the ice age", "CO2 alone sufficed": sufficiency makes its subject the one cause.
  // Only the ice ages' own making or ending: "four molecules in a thousand is enough to shift the
  // energy balance" says the gas is potent, not that it acted alone.
  // "the sun did it all": a verb of doing everything with no object named is said of the whole event.
  const sufficed = (SUFFICIENT_KEYS.has(h.key) || sufficientBefore(s, h, agentThing)) && (patient === 'ice-age' || (h.key === 'sufficient-verbs' && patient === undefined));
  const exclusive = isExclusive(s, h, agentThing) || (cleft !== undefined && h.key !== 'amplify') || h.key === 'because-only' || sufficed;
  // "the ice-age cooling can't be explained without it": a cause denied save for a thing the clause
  // names after it (lexicon `causes.needed-without`) grants that thing a part in what the subject did.
  const needed = polarity === 'denied' ? neededThing(s, h) : undefined;
  if (needed !== undefined) {
    const holder = kindOf(s, needed, previous, RECORDS);
    const subject = kind(agentThing);
    if (holder === undefined) return [];
    return [{ kind: 'cause', role: 'cause', polarity: 'asserted', exclusive: false, start, end: s.words[needed.last]?.end ?? end, agent: holder, ...(subject === undefined || subject === holder ? {} : { patient: subject }) }];
  }
  // "CO2 rides in the back", "CO2 merely reading the dial": a follower's part denies its subject a
  // cause; "CO2 is not just along for the ride" grants one.
  if (h.key === 'follower' && polarity !== 'open') {
    return [{ kind: 'cause', role: 'cause', polarity: polarity === 'asserted' ? 'denied' : 'asserted', exclusive: false, start, end, ...(agent === undefined ? {} : { agent }) }];
  }
  const cause: Cause = {
    kind: 'cause', role: ROLE[h.key] ?? 'cause', polarity, exclusive, start, end,
    ...(agent === undefined ? {} : { agent }), ...(patient === undefined ? {} : { patient }),
  };
  const out = [cause];
  // "Orbital changes, not CO2, caused the warming"; "temperature rather than CO2": the other one denied.
  const rival = contrastedThing(s, h);
  const rivalKind = kind(rival);
  if (rival !== undefined && rivalKind !== undefined && rivalKind !== agent && polarity === 'asserted' && h.key !== 'effects') {
    out.push({ kind: 'cause', agent: rivalKind, role: cause.role, polarity: 'denied', exclusive: false, start, end, ...(patient === undefined ? {} : { patient }) });
  }
  // "nothing but a consequence", "merely a response", "CO2 just came along as a passenger": the
  // subject is denied any causal role.
  // "a mere passenger": the adjective restricts the part as "merely" does.
  // "rather than a mere effect", "not just an effect": the restriction itself is set aside, and the part stays open.
  const restricted = !restrictionSetAside(s, h.first) && (hasExclusiveBefore(s, h.first, 3) || exclusiveAfterSubject(s, h.first, agentThing) || s.words[h.first - 1]?.text === 'mere' || restrictionAfter(s, h));
  if (h.key === 'effects' && polarity === 'asserted' && restricted && patient !== undefined) {
    out.push({ kind: 'cause', agent: patient, role: 'cause', polarity: 'denied', exclusive: false, start, end });
  }
  return out;
}

/**
 * The thing named just after a cause word by a phrase of lexicon `causes.needed-without` ("explained
 * without it", "ended but for the CO2"): within two words of the cause word, its thing within three
 * words of the phrase, in the same clause.
 */
function neededThing(s: ReadSentence, h: LexHit): Thing | undefined {
  const phrase = s.of('causes', 'needed-without').find((n) => n.first > h.last && n.first - h.last <= 3 && s.words[n.first]?.clause === s.words[h.last]?.clause);
  if (phrase === undefined) return undefined;
  return s.things.find((t) => t.first > phrase.last && t.first - phrase.last <= 3 && s.words[t.first]?.clause === s.words[phrase.first]?.clause);
}

/** Words that may stand between a verb of coming from and its "from" ("came largely from", "stems entirely from"). */
function fromAfter(s: ReadSentence, h: LexHit): number | undefined {
  for (let k = h.last + 1; k <= h.last + 3; k += 1) {
    const w = s.words[k];
    if (w === undefined || w.clause !== s.words[h.first]?.clause) return undefined;
    if (w.text === 'from') return k;
    const restrictor = s.of('exclusive').some((e) => e.first <= k && k <= e.last);
    if (!restrictor && !/^\p{L}{3,}ly$/u.test(w.text)) return undefined;
  }
  return undefined;
}

/**
 * "The whole rise came entirely from the oceans warming up", "the extra CO2 stemmed from the deep
 * sea": a verb of coming from (lexicon `causes.source-verbs`) makes the thing after its "from" the
 * cause of its subject, as "caused by" does; a restriction between ("entirely", "solely") makes it
 * the one cause. With no "from", the verb says nothing of a cause ("spring came early").
 */
function sourceAt(s: ReadSentence, h: LexHit, previous?: ReadSentence): Cause[] {
  const from = fromAfter(s, h);
  if (from === undefined) return [];
  let agentThing = thingAfter(s, from, 4);
  // "warming seawater": a change told as a modifier before a thing leaves that thing the head.
  const modifier = (t: Thing) => s.of('changes').some((c) => c.first <= t.first && t.last <= c.last);
  const headAfter = (t: Thing) => s.things.find((o) => o.first === t.last + 1 && o.kind !== 'pronoun');
  while (agentThing !== undefined && modifier(agentThing) && headAfter(agentThing) !== undefined) agentThing = headAfter(agentThing);
  const agent = kindOf(s, agentThing, previous);
  if (agent === undefined) return [];
  const patientThing = subjectBefore(s, h.first) ?? subjectOf(s, h.first);
  const patient = kindOf(s, patientThing, previous);
  const polarity = polarityAt(s, h.first);
  // "came only from", "stems entirely from": a restriction between the verb and its "from" restricts the source.
  const restricted = s.of('exclusive').some((e) => e.first > h.last && e.last < from && !['not', 'no'].includes(s.words[e.first - 1]?.text ?? ''));
  const exclusive = restricted || isExclusive(s, h, agentThing);
  return [{ kind: 'cause', role: 'cause', polarity, exclusive, start: s.words[h.first]?.start ?? 0, end: s.words[agentThing?.last ?? from]?.end ?? 0, agent, ...(patient === undefined || patient === agent ? {} : { patient }) }];
}

/**
 * "The orbit accounts for the ice ages, with no help needed from greenhouse gases": the thing after
 * the phrase is denied a part in what the cause before it does. A denied phrase ("not without help
 * from CO2") denies nothing.
 */
function withoutAt(s: ReadSentence, h: LexHit, before: readonly Cause[], previous?: ReadSentence): Cause[] {
  if (polarityAt(s, h.first) !== 'asserted') return [];
  const rival = s.things.find((t) => t.first > h.last && t.first - h.last <= 4 && t.kind !== 'pronoun');
  const agent = kindOf(s, rival, previous);
  if (agent === undefined) return [];
  const main = before.filter((c) => c.polarity === 'asserted' && c.agent !== agent && c.end <= (s.words[h.first]?.start ?? 0)).at(-1);
  const start = s.words[h.first]?.start ?? 0;
  const end = s.words[rival?.last ?? h.last]?.end ?? 0;
  return [{ kind: 'cause', agent, role: 'cause', polarity: 'denied', exclusive: false, start, end, ...(main?.patient === undefined ? {} : { patient: main.patient }) }];
}

/** A proposal ("the hypothesis that ...") holding word `h`, rejected after it in its clause. */
function isRejectedProposal(s: ReadSentence, h: LexHit): boolean {
  const clause = s.words[h.first]?.clause;
  const proposal = s.of('stance', 'proposal').some((p) => s.words[p.last + 1]?.text === 'that' && p.last < h.first && h.first - p.last <= 10 && s.words[p.first]?.clause === clause);
  return proposal && s.of('stance', 'rejection').some((r) => r.first > h.last && s.words[r.first]?.clause === clause && denialsBefore(s, r.first, 3) % 2 === 0);
}

/** Things that hold a record and act on nothing. */
const RECORDS = new Set(['ice', 'ice-core', 'trapped-air', 'co2-station']);

const COPULAS = new Set(['is', 'was', 'are', 'were', 'be', 'been', 'being']);
/** The copula within six words after a predicate noun, in its clause ("the driver ... was"). */
function copulaAfter(s: ReadSentence, i: number): number | undefined {
  let inPhrase = false;
  const relative = relativeSubject(s, i);
  for (let k = i + 1; k <= i + 7; k += 1) {
    const w = s.words[k];
    if (w === undefined || w.clause !== s.words[i]?.clause) return undefined;
    if (COPULAS.has(w.text) && s.things.some((t) => t.first > k && t.first <= k + 4)) return k;
    if (PREPOSITIONS.has(w.text)) inPhrase = true;
    // A thing outside an "of ..." phrase is the subject: "the cause ... CO2 was" is no predicate noun,
    // unless it opens a relative clause on the noun ("the reason ice ages end is ...").
    if (s.things.some((t) => t.first === k) && !inPhrase && relative?.first !== k) return undefined;
  }
  return undefined;
}

/**
 * The subject of a relative clause on the cause noun at word `i`, told with "why" or "that" or
 * with nothing ("the one and only reason ice ages end is the orbit", "the reason why the glaciers
 * retreated was CO2"): a thing right after the noun (past the relative word and a determiner) with a
 * word other than a copula or an auxiliary after it, so its clause has a verb of its own. That thing
 * is what the cause acts on.
 */
function relativeSubject(s: ReadSentence, i: number): Thing | undefined {
  let k = i + 1;
  if (['why', 'that'].includes(s.words[k]?.text ?? '')) k += 1;
  while (ARTICLES.has(s.words[k]?.text ?? '')) k += 1;
  const thing = s.things.find((t) => t.first === k && t.kind !== 'pronoun');
  const after = s.words[(thing?.last ?? -2) + 1];
  if (thing === undefined || after === undefined || after.clause !== s.words[i]?.clause || COPULAS.has(after.text) || AUXILIARY.has(after.text)) return undefined;
  return thing;
}

/** "must be negligible", "is irrelevant": a role denied by what is said of it. */
function deniedAfter(s: ReadSentence, i: number): boolean {
  const clause = s.words[i]?.clause;
  // "a consequence and nothing more", "a by-product, nothing else": a restriction's "nothing" restricts the part, it denies none.
  const restriction = (k: number) => s.of('exclusive').some((e) => e.first <= k && k <= e.last);
  const after = s.words.slice(i + 1, i + 11).filter((w, j) => w.clause === clause && !restriction(i + 1 + j));
  if (after.some((w) => /^(?:negligible|irrelevant|unimportant|insignificant|immaterial|trivial|tiny|nil|zero|minimal|undetectable|imperceptible|nonexistent|non-existent|absent|faint|nothing|none)$/u.test(w.text))) return true;
  // "too faint to find", "too weak to matter": a degree that rules the role out.
  return after.some((w, k) => w.text === 'too' && after[k + 2]?.text === 'to');
}

/** The thing set against the agent in its clause: "not Y", "rather than Y", "instead of Y". */
function contrastedThing(s: ReadSentence, h: LexHit): Thing | undefined {
  const clause = s.words[h.first]?.clause;
  return s.things.find((t) => {
    if (s.words[t.first]?.clause !== clause || t.kind === 'pronoun') return false;
    const lead = s.words.slice(Math.max(0, t.first - 2), t.first).map((w) => w.text).join(' ');
    return /(?:^|\s)not$|rather than$|instead of$|and not$|but not$/u.test(lead) && !/^(?:only|just|merely)$/u.test(s.words[t.first - 1]?.text ?? '');
  });
}

/**
 * "..., the lag shows that orbital forcing, not CO2, explains the warming": the subject is the thing
 * just before the rival a "not" sets aside between it and the verb, whatever the clause opened with.
 */
function setAgainstRival(s: ReadSentence, h: LexHit): Thing | undefined {
  const rival = contrastedThing(s, h);
  if (rival === undefined || rival.last >= h.first) return undefined;
  // The rival is an aside closed by a comma before the verb ("X, not Y, explains"); "rather than CO2
  // controlling temperature" is a clause of its own whose subject is the rival.
  if (s.things.some((t) => t.first > rival.last && t.last < h.first)) return undefined;
  if (!s.text.slice(s.words[rival.last]?.end ?? 0, s.words[h.first]?.start ?? 0).includes(',')) return undefined;
  let k = rival.first - 1;
  while (k >= 0 && ['the', 'a', 'an'].includes(s.words[k]?.text ?? '')) k -= 1;
  const mark = s.words[k]?.text ?? '';
  if (mark === 'not') k -= 1;
  else if (mark === 'than' && s.words[k - 1]?.text === 'rather') k -= 2;
  else if (mark === 'of' && s.words[k - 1]?.text === 'instead') k -= 2;
  else return undefined;
  const before = s.things.find((t) => t.last === k && t.kind !== 'pronoun');
  return before;
}

/** The thing before the copula that links word `i` (a predicate noun) to its subject. */
function copulaSubject(s: ReadSentence, i: number): Thing | undefined {
  for (let k = i - 1; k >= Math.max(0, i - 8); k -= 1) {
    if (s.words[k]?.clause !== s.words[i]?.clause) return undefined;
    if (COPULAS.has(s.words[k]?.text ?? '')) return s.things.filter((t) => t.last < k && s.words[t.first]?.clause === s.words[i]?.clause).at(-1);
  }
  return undefined;
}

/** Verbs that cast their object in a part ("makes CO2 a passenger", "turns it into a bystander"). */
const CASTING = new Set(['make', 'makes', 'made', 'making', 'render', 'renders', 'rendered', 'turn', 'turns', 'turned', 'reduce', 'reduces', 'reduced']);

/**
 * A predicate noun after the object of a casting verb at `verb`: "makes [the cores] a confession",
 * "turned [it] into a match". The noun phrase states no change ("made the planet a warmer place" is
 * a cause, as its comparative shows).
 */
function castsIntoNoun(s: ReadSentence, verb: number): boolean {
  const segment = s.words[verb]?.segment;
  for (let k = verb + 2; k <= verb + 5; k += 1) {
    const w = s.words[k];
    if (w === undefined || w.segment !== segment) return false;
    if (w.text !== 'a' && w.text !== 'an') continue;
    const states = (cls: string) => s.of(cls).some((o) => o.first > k && o.first <= k + 3);
    return !states('changes') && !states('comparatives');
  }
  return false;
}

/** "does not make CO2 a bystander": the object the casting verb before the part noun names. */
function madeInto(s: ReadSentence, h: LexHit): Thing | undefined {
  for (let k = h.first - 1; k >= Math.max(0, h.first - 6); k -= 1) {
    if (!CASTING.has(s.words[k]?.text ?? '')) continue;
    return s.things.find((t) => t.first > k && t.last < h.first && t.kind !== 'pronoun') ?? s.things.find((t) => t.first > k && t.last < h.first);
  }
  return undefined;
}

/** "it was X that...", "it is X doing...": the focused thing X, when `agent` is that "it". */
function cleftFocus(s: ReadSentence, agent: Thing | undefined): Thing | undefined {
  if (agent?.kind !== 'pronoun' || s.words[agent.first]?.text !== 'it') return undefined;
  let k = agent.first + 1;
  if (!COPULAS.has(s.words[k]?.text ?? '')) return undefined;
  k += 1;
  while (/^(?:always|really|just|only|actually|all|ever|in|fact|clearly|simply)$/u.test(s.words[k]?.text ?? '')) k += 1;
  // "It was the Earth's orbit that...": the focus may stand past a determiner and an owner.
  const focus = s.things.find((t) => t.first >= k && t.first <= k + 2 && t.kind !== 'pronoun');
  if (focus === undefined) return undefined;
  // "It was the orbit, and nothing else, that warmed...": the relative word may follow an aside.
  const rest = s.words.slice(focus.last + 1, focus.last + 9).map((w) => w.text);
  if (rest.some((w) => /^(?:that|which|who|doing|driving|setting|making)$/u.test(w))) return focus;
  // "it's the orbit, full stop, the wobble dragged us out": the focus restricted right after it
  // (lexicon `exclusive`) is singled out as a cleft's is, whatever clause follows.
  return s.of('exclusive').some((h) => h.first > focus.last && h.first <= focus.last + 2) ? focus : undefined;
}

/**
 * A pseudo-cleft singles its focus out as the one agent, like a cleft:
 *   "What ended the ice age was carbon dioxide."          focus after the copula that follows
 *   "Carbon from the deep ocean was what ended the ice age." focus before the copula that precedes
 */
function pseudoCleftFocus(s: ReadSentence, h: LexHit): Thing | undefined {
  // "what ended", "what finally ended": "what" is the verb's subject ("what a feedback produces" is its object).
  const adverb = /^(?:\p{L}+ly|then|just|really)$/u.test(s.words[h.first - 1]?.text ?? '');
  const what = s.words[h.first - 1]?.text === 'what' ? h.first - 1 : adverb && s.words[h.first - 2]?.text === 'what' ? h.first - 2 : -1;
  if (what < 0) return undefined;
  // "X was, by itself, what brought…": the copula may stand before an aside.
  for (let k = what - 1; k >= Math.max(0, what - 5); k -= 1) {
    if (!COPULAS.has(s.words[k]?.text ?? '')) continue;
    const clause = s.words[k]?.clause;
    // "The physics of absorption, plus the order of events, is what makes the case": a focus of two.
    const subject = s.words.slice(0, k).filter((w) => w.clause === clause).map((w) => w.text);
    if (subject.some((w, j) => COORDINATORS.has(w) || (['along', 'together', 'combined'].includes(w) && subject[j + 1] === 'with') || (w === 'as' && subject[j + 1] === 'well'))) return undefined;
    // "since the warming came first, the gas cannot have been what ended it": the copula's own
    // subject, past its auxiliaries and negation, is the focus, not a thing of the clause before it.
    const own = s.things.filter((t) => t.last < k && t.kind !== 'pronoun');
    const near = subjectBefore(s, k);
    if (near !== undefined) return near;
    return own.find((t) => s.words[t.first]?.clause === clause) ?? own.at(-1);
  }
  for (let k = h.last + 1; k < s.words.length; k += 1) {
    if (!COPULAS.has(s.words[k]?.text ?? '')) continue;
    // "What ended the ice ages was the orbit together with CO2": a focus of two is no single agent.
    const kinds = new Set(s.things.filter((t) => t.first > k && t.kind !== 'pronoun').map((t) => t.kind));
    return kinds.size > 1 ? undefined : thingAfter(s, k, 4);
  }
  return undefined;
}

/** Words that may stand between a subject and its predicate noun ("cannot also be a"). */
const PREDICATE_LINK = new Set(['can', 'cannot', 'could', 'not', 'never', 'also', 'at', 'the', 'same', 'time', 'be', 'is', 'was', 'are', 'were', 'a', 'an', 'ever', 'simultaneously', 'must', 'might', 'may', 'then', 'still']);

/** An effect noun is the subject of the predicate noun at `i` ("a consequence cannot also be a cause"). */
function effectAsSubject(s: ReadSentence, i: number): boolean {
  return s.of('causes', 'effects').some((e) => e.last < i && i - e.last <= 7 && s.words.slice(e.last + 1, i).every((w) => PREDICATE_LINK.has(w.text)) && s.words.slice(e.last + 1, i).some((w) => COPULAS.has(w.text)));
}

/** Words that join a part noun to the one before it: "rather than", "instead of", "not", "and", "or", "nor". */
const PART_JOINS = new Set(['not', 'and', 'or', 'nor', 'than', 'of', 'but']);

/**
 * The part noun that the part noun of `h` is coordinated with, in its clause: "a response to the
 * warming rather than a driver of it", "an effect of the warming and not a cause", "a by-product,
 * never a cause". Only determiners and restrictors may stand between the joining word and `h`, and
 * the joining word "than" counts only after "rather", "of" only after "instead".
 */
function coordinatedPart(s: ReadSentence, h: LexHit): LexHit | undefined {
  let k = h.first - 1;
  // "rather than one of its drivers": a partitive "one of" stands between as a determiner does.
  while (k >= 0 && (ARTICLES.has(s.words[k]?.text ?? '') || RESTRICTORS.has(s.words[k]?.text ?? '') || isPartitiveOne(s, k) || isPartitiveOne(s, k - 1))) k -= 1;
  const join = s.words[k]?.text ?? '';
  if (!PART_JOINS.has(join)) return undefined;
  if (join === 'than' && s.words[k - 1]?.text !== 'rather') return undefined;
  if (join === 'of' && s.words[k - 1]?.text !== 'instead') return undefined;
  const clause = s.words[h.first]?.clause;
  const parts = [...s.of('causes', 'effects'), ...s.of('causes', 'nouns')];
  return parts.filter((e) => e.last < k && s.words[e.first]?.clause === clause).sort((a, b) => b.last - a.last)[0];
}

/** Words that join two subjects into one ("the physics, plus the timing, is what..."). */
const COORDINATORS = new Set(['plus', 'and']);

/** Denied when an odd number of denials precede; open under a denied inference or "whether". */
export function polarityAt(s: ReadSentence, i: number): Polarity {
  const seg = s.words[i]?.segment;
  for (let k = 0; k < i; k += 1) {
    const w = s.words[k]?.text ?? '';
    if (w === 'whether' && s.words[k]?.segment === seg) return 'open';
    if (INFERENCE_VERBS.has(w) && denialsBefore(s, k, 3) % 2 === 1) return 'open';
  }
  const polarity = denialsBefore(s, i) % 2 === 1 ? 'denied' : 'asserted';
  // "a lag would be no evidence that CO2 cannot warm the climate": a denial inside what a denied
  // ground ("no evidence that", "no reason to think") introduces is left open, not asserted.
  if (polarity === 'denied' && s.words.some((w, k) => k < i && GROUNDS.has(w.text) && denialsBefore(s, k, 3) % 2 === 1 && s.words.slice(k + 1, i).some((x) => NEGATIONS.has(x.text)))) return 'open';
  return polarity;
}

/** Nouns that give grounds for a claim ("evidence that", "reason to think"). */
const GROUNDS = new Set(['evidence', 'proof', 'sign', 'indication', 'reason', 'grounds', 'basis', 'case']);

function isCo2Effect(s: ReadSentence, h: LexHit): boolean {
  const phrase = s.words.slice(h.first, h.last + 1).map((w) => w.text).join(' ');
  return /sensitivity|greenhouse|warming (?:effect|power)|heat-?trapping|trapping/u.test(phrase) || s.of('entities', 'co2').length > 0 || s.of('order').length > 0;
}

/** A restricting word between the subject and word `i`, in the subject's clause ("CO2 just came along ... as a passenger"). */
function exclusiveAfterSubject(s: ReadSentence, i: number, subject: Thing | undefined): boolean {
  if (subject === undefined || subject.kind === 'pronoun' || subject.last >= i || i - subject.last > 10) return false;
  const clause = s.words[i]?.clause;
  // "CO2 merely followed the temperature, a bystander": the restriction belongs to the order word between.
  const restricted = (e: LexHit) => e.first > subject.last && e.last < i && s.words[e.first]?.clause === clause && !['not', 'no'].includes(s.words[e.first - 1]?.text ?? '');
  const orderWithObject = (e: LexHit) => s.of('order').some((o) => o.first > e.last && o.last < i && s.things.some((t) => t.first > o.last && t.first - o.last <= 3 && t.first < i));
  return s.of('exclusive').some((e) => restricted(e) && !orderWithObject(e));
}

/**
 * "a consequence and nothing more", "a by-product of the warming, nothing more", "an effect, full
 * stop": a restriction that closes the noun's clause after it restricts the part the noun names,
 * as "merely" before it does. Only words of the noun's own "of" phrase may stand between.
 */
function restrictionAfter(s: ReadSentence, h: LexHit): boolean {
  const clause = s.words[h.first]?.clause;
  return s.of('exclusive').some((e) => {
    if (e.first <= h.last || e.first - h.last > 8 || s.words[e.first]?.clause !== clause) return false;
    // The restriction ends its clause: nothing of its own clause follows ("nothing more was added" is no restriction of the noun).
    const next = s.words[e.last + 1];
    if (next !== undefined && next.segment === s.words[e.last]?.segment && next.clause === clause) return false;
    const between = s.words.slice(h.last + 1, e.first);
    // "a consequence of the deglacial warming and nothing else": the noun's own "of" phrase, with no verb of its own.
    if (between[0]?.text === 'of') return between.length <= 7 && between.every((w) => !AUXILIARY.has(w.text));
    return between.every((w) => ['and', 'the', 'a', 'an'].includes(w.text));
  });
}

const AUXILIARY = new Set(['is', 'was', 'are', 'were', 'be', 'been', 'has', 'had', 'have', 'does', 'did', 'do', 'can', 'could', 'will', 'would', 'may', 'might', 'must', 'should']);

/** A contrast just before a restricted part noun: "rather than just", "instead of a mere", "not merely". */
function restrictionSetAside(s: ReadSentence, i: number): boolean {
  for (let k = i - 1; k >= Math.max(0, i - 4); k -= 1) {
    const w = s.words[k]?.text ?? '';
    const before = s.words[k - 1]?.text ?? '';
    if (w === 'not' || (w === 'than' && before === 'rather') || (w === 'of' && before === 'instead')) return s.words.slice(k + 1, i).some((x) => RESTRICTORS.has(x.text));
    if (!RESTRICTORS.has(w) && !['a', 'an', 'the'].includes(w)) return false;
  }
  return false;
}

/** Words that restrict a part to nothing more ("just an effect", "a mere passenger"). */
const RESTRICTORS = new Set(['just', 'merely', 'mere', 'only', 'simply', 'purely']);

function hasExclusiveBefore(s: ReadSentence, i: number, window: number): boolean {
  return s.of('exclusive').some((e) => e.last < i && i - e.last <= window && s.words[e.first]?.segment === s.words[i]?.segment);
}

/** A share or an amount after "only": "only part", "only a fraction", "only ~20 ppm", "only some". */
const PARTIAL = /^(?:part|partly|partially|some|half|a|fraction|portion|share|couple|few|little|about|around|roughly|~?\d.*)$/u;

/** "X alone", "solely X", "the sole cause", "nothing but X"; "not alone" and "not only" are not. */
function isExclusive(s: ReadSentence, h: LexHit, agent: Thing | undefined): boolean {
  // "Ocean warming alone explains only part of the rise": what the agent did is said to be partial.
  const clause = s.words[h.first]?.clause;
  const partial =
    s.words.some((w, i) => w.clause === clause && /^(?:only|just|merely)$/u.test(w.text) && PARTIAL.test(s.words[i + 1]?.text ?? '')) ||
    // "Ocean warming alone accounts for perhaps 20 to 30 ppm of the 80 to 100 ppm rise": a share of a whole.
    s.words.some((w, i) => i > h.last && w.clause === clause && w.text === 'of' && s.words.slice(h.last + 1, i).some((x) => /^\d/u.test(x.text)) && s.words.slice(i + 1, i + 5).some((x) => /^\d/u.test(x.text))) ||
    // "Ocean warming alone raised CO2 by about 20 ppm": the amount the cause word's own effect moved
    // by, told right after it, measures what the agent did on its own, not that it was the one cause.
    s.words.some((w, i) => i > h.last && i <= h.last + 4 && w.clause === clause && w.text === 'by' && s.words.slice(i + 1, i + 4).some((x) => /^\d/u.test(x.text)));
  if (partial || shareAfter(s, h)) return false;
  return s.of('exclusive').some((e) => {
    if (s.words[e.first]?.segment !== s.words[h.first]?.segment && s.words[e.first]?.clause !== s.words[h.first]?.clause) return false;
    // "The orbit did not end it on its own, the CO2 feedback did much of it": a restriction of the clause before a spliced one.
    const spliced = splicedClauseStart(s, h.first);
    if (spliced >= 0 && e.last < spliced) return false;
    if (['not', 'no'].includes(s.words[e.first - 1]?.text ?? '')) return false;
    if (isPronounOne(s, e)) return false;
    // "switched off by the orbit and by nothing else": a restriction joined to the agent by linking words only.
    // "Nothing but the Earth's orbit": only the agent's own noun phrase stands between.
    const joined = agent !== undefined && ((e.first > agent.last && linksOnly(s, agent.last, e.first)) || (e.last < agent.first && linksOnly(s, e.last, agent.first)));
    const nearAgent = agent !== undefined && (Math.abs(e.first - agent.last) <= 2 || Math.abs(e.last - agent.first) <= 2 || joined);
    // "melted those ice sheets all by itself": a reflexive focus that closes the clause after the cause.
    const closing = e.first > h.last && s.words[e.first]?.clause === s.words[h.first]?.clause && s.words[e.last + 1]?.segment !== s.words[e.last]?.segment && /by (?:itself|themselves)|on (?:its|their) own|alone|single-handedly/u.test(s.words.slice(e.first, e.last + 1).map((w) => w.text).join(' '));
    if (closing) return true;
    const nearCue = Math.abs(e.last - h.first) <= 2 || (e.first > h.last && e.first - h.last <= 2);
    // "The change in sunshine, on its own, is what brought...": between the agent and the cue word.
    const between = agent !== undefined && e.first > agent.last && e.last < h.first;
    // "the orbit ended the ice age, full stop, and ...": a restriction set off on its own after the cause.
    const tail = e.first > h.last && s.words[e.first]?.clause === s.words[h.first]?.clause && s.words[e.first - 1]?.segment !== s.words[e.first]?.segment && s.words[e.last + 1]?.segment !== s.words[e.last]?.segment;
    if (tail) return true;
    // "happened only because of the wobbles", "solely due to the orbit": a restriction just before a
    // reason cue restricts the reason it names. "just because" opens an idiom of denied inference
    // ("Just because CO2 lagged doesn't mean ...") and restricts nothing.
    if (h.key === 'because' && e.last === h.first - 1) return !SOFT_RESTRICTORS.has(s.words[e.first]?.text ?? '');
    const strong = /sole|single|only one|one thing|nothing but|all down|no other|nothing else|by (?:itself|themselves)|in (?:itself|themselves)|on (?:its|their) own|alone|solely|entirely|exclusively|wholly|purely|the only|the one|one and only/u.test(s.words.slice(e.first, e.last + 1).map((w) => w.text).join(' '));
    return nearAgent || ((nearCue || between) && strong);
  });
}

/**
 * "the one" that stands for a noun ("a bigger punch than the one before it", "the one that rose
 * later") rather than counting one before its noun ("the one driver"): nothing of its own segment
 * follows it, or a function word does (English grammar, common practice).
 */
function isPronounOne(s: ReadSentence, e: LexHit): boolean {
  if (s.words.slice(e.first, e.last + 1).map((w) => w.text).join(' ') !== 'the one') return false;
  const next = s.words[e.last + 1];
  return next === undefined || next.segment !== s.words[e.last]?.segment || !/^\p{L}/u.test(next.text) || AFTER_PRONOUN_ONE.has(next.text);
}

/** Words after "the one" that show it stands for a noun: prepositions, relatives, verbs of being, pronouns. */
const AFTER_PRONOUN_ONE = new Set(['before', 'after', 'that', 'which', 'who', 'whose', 'where', 'when', 'of', 'in', 'on', 'at', 'to', 'from', 'with', 'by', 'for', 'than', 'and', 'or', 'but', 'is', 'was', 'are', 'were', 'be', 'we', 'you', 'i', 'they', 'it', 'he', 'she', 'people', 'most', 'everyone', 'behind', 'ahead', 'below', 'above', 'here', 'there', 'now', 'then', 'today']);

/** Restrictions that before a reason cue make an idiom, not a restriction ("just because", "simply because"). */
const SOFT_RESTRICTORS = new Set(['just', 'simply', 'merely']);

/** Keys whose phrases say their subject sufficed on its own. */
const SUFFICIENT_KEYS = new Set(['sufficient', 'sufficient-verbs']);
/** Verbs that link a subject to a predicate as the copula does ("proved enough", "seemed sufficient"). */
const LINKING = new Set([...COPULAS, 'prove', 'proves', 'proved', 'proven', 'seem', 'seems', 'seemed', 'become', 'becomes', 'became', 'remain', 'remains', 'remained']);

/**
 * A sufficiency predicate: its word stands after a copula or a linking verb in its clause, past
 * adverbs and asides ("was, by itself, sufficient", "was more than enough", "would have been enough").
 * "CO2 rose enough to warm..." has no copula and is a degree.
 */
function isSufficiency(s: ReadSentence, h: LexHit): boolean {
  return linkingVerbOf(s, h) !== undefined;
}

/** The copula or linking verb a sufficiency predicate stands after, in its clause; undefined when it is a degree. */
function linkingVerbOf(s: ReadSentence, h: LexHit): number | undefined {
  const clause = s.words[h.first]?.clause;
  for (let k = h.first - 1; k >= Math.max(0, h.first - 6); k -= 1) {
    const w = s.words[k];
    if (w === undefined || w.clause !== clause) return undefined;
    if (LINKING.has(w.text)) return k;
    // "it is buried deep enough to seal": a participle between makes "enough" a degree of that verb.
    if (/(?:ed|en)$/u.test(w.text) && w.text.length > 4) return undefined;
    // A thing between the copula and the predicate is its subject ("was the orbit enough?" aside): stop at it.
    if (s.things.some((t) => t.last === k)) return undefined;
  }
  return undefined;
}

/** A sufficiency predicate between the agent and cause word `h` ("the orbit was enough to end..."), in its clause. */
function sufficientBefore(s: ReadSentence, h: LexHit, agent: Thing | undefined): boolean {
  const clause = s.words[h.first]?.clause;
  return s.of('causes', 'sufficient').some((e) => e.last < h.first && h.first - e.last <= 3 && s.words[e.first]?.clause === clause && (agent === undefined || agent.last < e.first) && isSufficiency(s, e));
}

/** The ice age a passage word leads into or out of, within four words in its segment ("out of the last glaciation"). */
function passageTarget(s: ReadSentence, h: LexHit): Thing | undefined {
  const segment = s.words[h.first]?.segment;
  return s.things.find((t) => t.kind === 'ice-age' && t.first > h.last && t.first - h.last <= 4 && s.words[t.first]?.segment === segment);
}

/** Words that name a part of a whole before "of" ("a third of", "half of", "some of"); "all" and "the whole" are no part. */
const SHARES = new Set(['half', 'third', 'thirds', 'quarter', 'quarters', 'fifth', 'fifths', 'tenth', 'fraction', 'part', 'portion', 'share', 'some', 'much', 'most', 'bit', 'chunk', 'percent', 'cent', '%']);

/**
 * "CO2 alone explains about a third of the glacial cooling", "the orbit by itself accounts for 40
 * percent of it": what the agent is said to do is a share of the effect, so "alone" measures its
 * part, and says nothing of its being the one cause. "100 percent of" is the whole.
 */
function shareAfter(s: ReadSentence, h: LexHit): boolean {
  const clause = s.words[h.first]?.clause;
  for (let k = h.last + 1; k <= h.last + 6; k += 1) {
    const w = s.words[k];
    if (w === undefined || w.clause !== clause) return false;
    if (s.words[k + 1]?.text !== 'of') continue;
    const whole = s.words.slice(h.last + 1, k + 1).some((x) => x.text === '100' || x.text === 'all' || x.text === 'whole');
    if (whole) return false;
    const percent = /^\s*%/u.test(s.text.slice(w.end));
    // "accounts for 20 to 30 ppm of the rise": a figure with its unit before "of" is a share too.
    if (SHARES.has(w.text) || percent || /^\d/u.test(w.text) || /^\d/u.test(s.words[k - 1]?.text ?? '')) return true;
  }
  return false;
}

/** Words that join a restriction to the agent before it ("the orbit, and by nothing else"). */
const JOINERS = new Set(['and', 'or', 'by', 'from', 'through', 'via', 'with']);

/** Words that make a quotation after them a name ("the 'CO2 did it all' line", "that 'orbit alone' story"). */
const NAMING = new Set(['the', 'a', 'an', 'this', 'that', 'these', 'those', 'your', 'his', 'her', 'their', 'our', 'my', 'old', 'usual', 'familiar']);

/**
 * Word `i` stands in a quotation inside the sentence that an article or owner names as a thing:
 * "the 'CO2 did it all' line comes up every time" mentions the claim and does not make it.
 */
export function isMention(s: ReadSentence, i: number): boolean {
  if (s.words[i]?.quoted !== true) return false;
  let k = i;
  while (k > 0 && s.words[k - 1]?.quoted === true) k -= 1;
  // A sentence that is all quotation is read by its stance (quoted), not here.
  if (k === 0) return false;
  return NAMING.has(s.words[k - 1]?.text ?? '');
}

/**
 * Only linking words, articles and owners, "of", and the words of named things stand strictly
 * between words `from` and `to`: "the wobbles of Earth's orbit and by nothing else", "nothing but
 * the Earth's orbit".
 */
function linksOnly(s: ReadSentence, from: number, to: number): boolean {
  if (to - from > 7) return false;
  const named = (k: number) => s.things.some((t) => t.first <= k && k <= t.last) || s.of('regions').some((r) => r.first <= k && k <= r.last);
  // "the tilt of the Earth's axis": the words of an "of" phrase belong to the agent's noun phrase.
  let ofPhrase = false;
  return s.words.slice(from + 1, to).every((w, j) => {
    if (w.text === 'of') ofPhrase = true;
    else if (JOINERS.has(w.text)) ofPhrase = false;
    return JOINERS.has(w.text) || ARTICLES.has(w.text) || w.text === 'of' || ofPhrase || named(from + 1 + j);
  });
}
