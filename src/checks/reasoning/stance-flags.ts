/**
 * What stance does to a flag: a claim the draft holds as its own keeps its flag; one it reports,
 * quotes, labels a myth, asks about, supposes or gives as an old view becomes a note that says so,
 * so an editor still sees it but a debunking piece does not fail for the myths it answers.
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
  return flags.map((f) => (premise(f) && !inNamed(f) ? f : asNote(f, inNamed(f) ? WORDS.quoted : said)));
}

function asNote(f: FlagDraft, said: string): FlagDraft {
  return { ...f, level: 'note', reason: `${said}, so it is not flagged as the draft's own claim; check that the draft answers it. ${f.reason}` };
}
