/**
 * Rule packs and settings: loading with file:line:column errors, JSON Schema validation, merging,
 * and lookups. See docs/rule-packs.md for the YAML format.
 */
export type * from './types.js';
export { BUILTIN_PACK_FILE, loadBuiltinPack, loadPacks, loadRulePack, mergePacks } from './load-packs.js';
export { describeRule } from './describe-rule.js';
export { describeRange, formatNumber, formatRange, midSentence, unitLabel } from './describe-range.js';
export { findSettingsFile, loadSettings, SETTINGS_FILE, starterSettings } from './settings.js';
export { CANONICAL_UNITS, fromCanonical, toCanonical, unitDef, UNITS, type UnitDef } from './units.js';
export { DEFAULT_LEVELS, levelAt } from './resolve-reference.js';
export { compileRegex, regexProblem } from './regex-problem.js';
