/**
 * A worker of the file pool (src/speed/run-files.ts): loads the run's packs once, then checks one
 * file per task exactly as the main thread would (engine.checkFileText) and sends back its outcome.
 */
import { checkFileText, subjectPattern } from '../engine.js';
import { createTopicMatcher } from '../prose/index.js';
import { loadPacks } from '../rulepack/index.js';
import type { LoadedPacks } from '../rulepack/types.js';
import type { Draft, Level } from '../types.js';
import type { FileOutcome } from './cache.js';

/** What the main thread sends for one file. */
export interface PoolTask {
  path: string;
  projectPath: string;
  format: Draft['format'];
  text: string;
  levels: Record<string, Level | 'off'>;
  /** The run's extra pack files, in order, and whether the built-in pack comes first. */
  packFiles: string[];
  builtin: boolean;
}

let loaded: { key: string; packs: Promise<LoadedPacks> } | undefined;

export default async function checkInWorker(task: PoolTask): Promise<FileOutcome> {
  const key = JSON.stringify([task.builtin, task.packFiles]);
  if (loaded?.key !== key) loaded = { key, packs: loadPacks(task.packFiles, { builtin: task.builtin }) };
  const packs = await loaded.packs;
  const subjects = subjectPattern(packs);
  return checkFileText({ path: task.path, text: task.text, format: task.format }, packs, {
    topic: createTopicMatcher(packs.topicWords),
    levels: task.levels,
    ...(subjects === undefined ? {} : { subjects }),
    ...(task.projectPath === task.path ? {} : { projectPath: task.projectPath }),
  });
}
