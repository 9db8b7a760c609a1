/**
 * The reasoning detectors by check id. A pack's reasoning check runs the detector registered
 * under its id, with the pack's cue words; the engine never branches on an id itself. A check id
 * with no detector here is reported by `unknownReasoningChecks`.
 */
import { correlationAsProof } from './detect-correlation.js';
import { eitherOrCausation } from './detect-either-or.js';
import { iceCoreCertainty } from './detect-certainty.js';
import { lagRulesOutCause } from './detect-lag.js';
import { regionalEventAsGlobal } from './detect-regional-event.js';
import { antarcticLagAsGlobal, regionalRecordAsGlobal } from './detect-scope.js';
import { figureAcrossScales } from './detect-scales.js';
import { shortRecordStretched } from './detect-stretched-record.js';
import { singleCause } from './detect-single-cause.js';
import type { DetectorEntry } from './detector.js';

/** Check id → detector. */
export const DETECTORS: Readonly<Record<string, DetectorEntry>> = {
  'logic.lag-rules-out-cause': lagRulesOutCause,
  'logic.either-or-causation': eitherOrCausation,
  'logic.correlation-as-proof': correlationAsProof,
  'logic.single-cause': singleCause,
  'logic.ice-core-certainty': iceCoreCertainty,
  'scope.regional-record-as-global': regionalRecordAsGlobal,
  'scope.antarctic-lag-as-global': antarcticLagAsGlobal,
  'scope.regional-event-as-global': regionalEventAsGlobal,
  'scope.figure-across-scales': figureAcrossScales,
  'scope.short-record-stretched': shortRecordStretched,
};
