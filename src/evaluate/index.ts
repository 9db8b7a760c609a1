/** Measuring the engine on keyed evaluation sets (test/corpus): used by `npm run eval` and the tests. */
export { ERROR_KINDS, loadAnswerSet, type AnswerSet, type ErrorKind, type KeyedLine } from './answer-set.js';
export { formatTally, scoreSet, summarizeScore, type SetScore, type Tally } from './score-set.js';
