/**
 * review/: claims and flags joined with the sign-off ledger. The only stage besides source/ that
 * touches the file system (the ledger, and git for changed lines). See docs/sign-off.md.
 */
export { claimIdOf, foldClaimText } from './claim-id.js';
export { DECISIONS, DECISIONS_NEEDING_REASON, entryFromYaml, entryToYaml, ledgerDate } from './signoff-entry.js';
export type { Decision, Ledger, SignoffEntry } from './signoff-entry.js';
export { parseLedger, readLedger } from './read-ledger.js';
export { appendSignoffs, appendToLedgerText, LEDGER_HEADER } from './append-signoffs.js';
export { withFileLock, type LockTiming } from './with-file-lock.js';
export { REVIEW_STATUSES, reviewClaims } from './review-claims.js';
export type { ReviewedClaim, ReviewStatus, ReviewSummary } from './review-claims.js';
export { SAME_CLAIM_THRESHOLD, wordingSimilarity } from './wording-similarity.js';
export { describeReview, signedBy } from './describe-review.js';
export { changedLines, parseUnifiedDiff } from './changed-lines.js';
export { packVersionOf, planSignoffs } from './plan-signoffs.js';
export type { SignoffContext, SignoffPlan, SignoffRequest } from './plan-signoffs.js';
