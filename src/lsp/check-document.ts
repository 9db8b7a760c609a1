/**
 * One open document checked as the CLI checks a file: the same engine stage (`checkDraft`), the
 * settings' level overrides, claim ids relative to the project root, and the sign-off ledger
 * joined in so that flags on signed-off claims carry their sign-off.
 */
import { checkDraft, namesSubject } from '../engine.js';
import { createTopicMatcher, type TopicMatcher } from '../prose/index.js';
import { CHECKLIST_MARKER } from '../report/checklist-markdown.js';
import { reviewClaims } from '../review/review-claims.js';
import type { Ledger } from '../review/signoff-entry.js';
import type { LoadedPacks } from '../rulepack/types.js';
import { draftFromText } from '../source/index.js';
import type { Claim, Draft, Flag, Level } from '../types.js';

/** What a check needs from the workspace: loaded once, replaced when the settings change. */
export interface CheckSetup {
  packs: LoadedPacks;
  topic: TopicMatcher;
  levels: Record<string, Level | 'off'>;
  ledger: Ledger;
}

/** A setup from packs, level overrides and a ledger. */
export function createCheckSetup(packs: LoadedPacks, levels: Record<string, Level | 'off'>, ledger: Ledger): CheckSetup {
  return { packs, topic: createTopicMatcher(packs.topicWords), levels, ledger };
}

/** What one check of a document found. */
export interface DocumentCheck {
  draft: Draft;
  flags: Flag[];
}

/**
 * Checks `text` as a draft of `format`, whole. `path` is what reports show; `projectPath`
 * (relative to the project root) is what claim ids use. A sign-off checklist and an off-topic text
 * give no flags. (The server re-checks through incremental-check.ts, which gives the same result.)
 */
export function checkDocument(text: string, format: Exclude<Draft['format'], 'docx'>, path: string, projectPath: string, setup: CheckSetup): DocumentCheck {
  const draft = draftFromText(path, text, format);
  if (text.trimStart().startsWith(CHECKLIST_MARKER) || !namesSubject(text, setup.packs)) return { draft, flags: [] };
  const { claims } = checkDraft(draft, setup.packs, { topic: setup.topic, levels: setup.levels, projectPath });
  return { draft, flags: joinSignoffs(claims, setup.ledger) };
}

/** The flags of `claims`, those on signed-off claims carrying their sign-off (as `check --require-signoff` shows them). */
export function joinSignoffs(claims: Claim[], ledger: Ledger): Flag[] {
  const review = reviewClaims(claims, ledger);
  const signed = new Map(review.claims.filter((r) => r.status === 'signed off').map((r) => [r.claim.id, r.signoff]));
  return claims.flatMap((claim) => claim.flags).map((flag) => {
    const entry = flag.claimId === undefined ? undefined : signed.get(flag.claimId);
    return entry === undefined ? flag : { ...flag, signoff: { reviewer: entry.reviewer, date: entry.date, decision: entry.decision } };
  });
}
