import { LEVELS } from '../types.js';
import type { CheckResult, Level } from '../types.js';

/** What every reporter is told besides the result. The CLI decides these once, per run. */
export interface ReportOptions {
  /** Colour the text report (the CLI sets it for a terminal without NO_COLOR). Other formats ignore it. */
  color: boolean;
  /** Firnline's version, stated in the JSON and SARIF tool sections. */
  toolVersion: string;
  /** The lowest level that fails a run; JUnit marks failures from this level up. */
  failOn: Level | 'never';
  /**
   * Absolute path of the folder the flag paths are relative to. When given, SARIF states it as the
   * `%SRCROOT%` base URI; when absent, the base is described but left for the viewer to resolve.
   */
  srcRoot?: string;
}

/** A reporter: a pure function from one run's result to the text written out. */
export type Reporter = (result: CheckResult, options: ReportOptions) => string;

/** True when a flag of `level` is at or above the fail level (`never` fails nothing). */
export function reachesFailLevel(level: Level, failOn: Level | 'never'): boolean {
  if (failOn === 'never') return false;
  // LEVELS runs from most to least severe, so a smaller index is more severe.
  return LEVELS.indexOf(level) <= LEVELS.indexOf(failOn);
}
