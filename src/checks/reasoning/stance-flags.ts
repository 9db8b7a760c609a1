/**
 * What stance does to a flag: a claim the draft holds as its own keeps its flag; one it reports,
 * quotes, labels a myth, asks about, supposes or gives as an old view becomes a note that says so,
 * so an editor still sees it but a debunking piece does not fail for the myths it answers. A slip in
 * the sentence's own sums and conversions is the exception where it asks, quotes or reports.
 */
import type { SentenceStance, StanceKind } from '../../propositions/index.js';
import { isOwnClaim } from '../../propositions/index.js';
import type { FlagDraft } from '../../types.js';

const WORDS: Record<StanceKind, string> = {
  asserted: '',
  rhetorical: '',
  reported: 'This sentence reports what others say',
  quoted: 'This sentence is a quotation',
  myth: 'This sentence states a myth as a myth',
  asked: 'This sentence asks a question',
  hypothetical: 'This sentence supposes a case',
  superseded: 'This sentence gives an earlier view',
  marked: 'The draft marks this passage as reported',
};

/**
 * A sum or a conversion that the sentence carries is wrong whoever says it: "that's a jump of 130
 * ppm, right?" after 190 and 280, a listener's email that turns 6 °C of cooling into 43 °F, a
 * script's quoted line that calls 190 ppm 0.19 per cent. The arithmetic and unit groups of rule
 * ids (GLOSSARY.md, Rule ids) keep their level in a sentence that asks, quotes or reports; a myth
 * labelled as one, a supposed case, an earlier view or a passage the draft marks still make notes,
 * and so does a quotation the sentence names as a saying.
 */
const OWN_WORKING_GROUPS: readonly string[] = ['arith', 'unit'];
const OWN_WORKING_STANCES: readonly StanceKind[] = ['asked', 'quoted', 'reported'];
const isOwnWorking = (f: FlagDraft, kind: StanceKind): boolean => OWN_WORKING_STANCES.includes(kind) && OWN_WORKING_GROUPS.includes(f.ruleId.split('.')[0] ?? '');

/** The flags as they stand under the sentence's stance. */
export function judgeByStance(flags: readonly FlagDraft[], stance: SentenceStance): FlagDraft[] {
  // A flag on words inside a quotation the sentence names ('His "CO2 follows" line ...') is the
  // quoted speaker's claim, whatever the sentence holds around it.
  const named = stance.named ?? [];
  const inNamed = (f: FlagDraft) => !stance.endorsed && named.some((q) => f.start >= q.start && f.end <= q.end + 1);
  if (isOwnClaim(stance)) return flags.map((f) => (inNamed(f) ? asNote(f, WORDS.quoted) : f));
  const said = WORDS[stance.kind];
  // The statement before a question ("The air is older than the ice, so how can you trust it?") is the
  // draft's own, and so is what follows an earlier view (", a deglaciation that ended ...").
  const premise = (f: FlagDraft) => (stance.questionFrom !== undefined && f.end <= stance.questionFrom) || (stance.viewEnd !== undefined && f.start >= stance.viewEnd);
  return flags.map((f) => ((premise(f) || isOwnWorking(f, stance.kind)) && !inNamed(f) ? f : asNote(f, inNamed(f) ? WORDS.quoted : said)));
}

function asNote(f: FlagDraft, said: string): FlagDraft {
  return { ...f, level: 'note', reason: `${said}, so it is not flagged as the draft's own claim; check that the draft answers it. ${f.reason}` };
}
