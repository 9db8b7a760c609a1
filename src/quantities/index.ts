/**
 * quantities/: numbers with units, read as intervals. The stage's public surface.
 */
export { parseQuantities } from './parse-quantities.js';
export { formatQuantity, formatNumber } from './format-quantity.js';
export { convert, toCanonical, fromCanonical, findUnit, dimensionOfCanonical } from './convert.js';
export { UNIT_TABLE, CANONICAL_UNIT, type UnitDef } from './unit-table.js';
export { INTERVAL_RULES, applyRule, intervalRule, hedgeRule, type IntervalRule, type Bound } from './interval-rules.js';
export { TEMPERATURE_CUES, DURATION_CUES, CALENDAR_CUES, LABEL_CUES, TEMPERATURE_DEFAULT, RESTATING_VERBS, RESTATING_VERB_PATTERN, namesChangeBefore } from './reading-cues.js';
export { renderIntervalTable } from './interval-table-markdown.js';
export { closeFigures, correctionFigures, derivedFigures, rewriteQuantity } from './rewrite-quantity.js';
export { rewriteEnds, writtenEnds } from './rewrite-ends.js';
export { writtenInterval, type WrittenInterval } from './written-interval.js';
