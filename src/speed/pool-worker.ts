/**
 * A worker of the file pool (src/speed/run-files.ts): loads the run's packs once, then checks one
 * file per task exactly as the main thread would (engine.checkFileText) and sends back its outcome.
 */
import { checkFileText } from '../engine.js';
import { createTopicMatcher, type TopicMatcher } from '../prose/index.js';
import { loadPacks } from '../rulepack/index.js';
import type { LoadedPacks } from '../rulepack/types.js';
import { loadHtmlReader } from '../source/index.js';
import type { Draft, Level } from '../types.js';
import type { FileOutcome } from './cache.js';

/** What the main thread sends for one file (never a Word draft: those are checked in the main thread). */
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

let loaded: { key: string; packs: Promise<LoadedPacks>; topic?: TopicMatcher } | undefined;

export default async function checkInWorker(task: PoolTask): Promise<FileOutcome> {
  const key = JSON.stringify([task.builtin, task.packFiles]);
  if (loaded?.key !== key) loaded = { key, packs: loadPacks(task.packFiles, { builtin: task.builtin, validated: true }) };
  const packs = await loaded.packs;
  loaded.topic ??= createTopicMatcher(packs.topicWords);
  if (task.format === 'html') await loadHtmlReader();
  return checkFileText({ path: task.path, text: task.text, format: task.format }, packs, {
    topic: loaded.topic,
    levels: task.levels,
    reuseSentences: false,
    ...(task.projectPath === task.path ? {} : { projectPath: task.projectPath }),
  });
}
