import { LEVELS, type Flag, type Level } from '../types.js';

/** 1 when any flag is at or above the fail level, else 0. `never` never fails on flags. */
export function exitCodeFor(flags: readonly Flag[], failOn: Level | 'never'): 0 | 1 {
  if (failOn === 'never') return 0;
  const threshold = LEVELS.indexOf(failOn);
  return flags.some((flag) => LEVELS.indexOf(flag.level) <= threshold) ? 1 : 0;
}
