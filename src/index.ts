/**
 * Firnline as a library: the same engine the command line uses.
 *
 *   import { checkText } from 'firnline';
 *   const result = await checkText('The Vostok core spans 800,000 years.');
 *   for (const flag of result.flags) console.log(flag.ruleId, flag.reason);
 */
export { checkDraft, checkPaths, checkText, type CheckOptions, type DraftResult } from './engine.js';
export { FirnlineError, FirnlineErrors, isUserError } from './errors.js';
export { parseQuantities } from './quantities/index.js';
export { loadPacks, loadRulePack } from './rulepack/index.js';
export type { LoadedPacks, RulePack } from './rulepack/types.js';
export { renderReport, REPORT_FORMATS } from './report/index.js';
export { claimIdOf } from './review/claim-id.js';
export { annotateWord, type AnnotateOptions } from './report/word-comments/annotate-word.js';
export { readWordDraft } from './source/index.js';
export { VERSION } from './version.js';
export * from './types.js';
