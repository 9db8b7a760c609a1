/** Rank and comparison claims checked against the reference values of one measure. */
export { checkRanks } from './check-ranks.js';
export { measureFamilies, type FamilyMember, type MeasureFamily } from './measure-families.js';
export { findRankWords, type FoundRankWord, type RankWord } from './rank-words.js';
