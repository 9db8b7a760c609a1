import { execFile } from 'node:child_process';
import { dirname, join, relative, resolve } from 'node:path';
import { promisify } from 'node:util';
import { findSettingsFile, loadPacks, loadSettings } from '../rulepack/index.js';
import type { CheckOptions } from '../engine.js';
import type { LoadedPacks, Settings } from '../rulepack/types.js';
import { closeIds, knownRuleIds } from '../rulepack/known-rule-ids.js';
import { FirnlineError, FirnlineErrors } from '../errors.js';
import type { CliContext } from './context.js';
import type { Level } from '../types.js';

/** Everything a command needs from firnline.yaml and --pack, resolved once. */
export interface RunSettings {
  settingsFile: string | undefined;
  packs: LoadedPacks;
  include: string[];
  exclude: string[];
  levels: Record<string, Level | 'off'>;
  /** `strict`: the strict preset for publication (cli/strict-preset), failing on errors. */
  failOn: Level | 'never' | 'strict';
  /** Who may sign off (firnline.yaml `reviewers`); empty: anyone. */
  reviewers: { name: string; git?: string }[];
  /** The ledger path: from the settings, else `firnline-signoffs.yaml` in the project root. */
  ledger: string;
  /**
   * What claim ids are relative to: the settings file's folder, else the git work tree, else the
   * working folder; so a sign-off holds whichever folder the command runs in.
   */
  projectRoot: string;
}

/** Finds and loads the settings (or `--config`), then every pack they and `--pack` name. */
export async function loadRunSettings(cwd: string, config: string | undefined, extraPacks: string[]): Promise<RunSettings> {
  const settingsFile = config === undefined ? findSettingsFile(cwd) : resolve(cwd, config);
  // Without a settings file the project root is the git work tree's: git runs while the packs load.
  const gitRoot = settingsFile === undefined ? gitTopLevel(cwd) : undefined;
  const settings = settingsFile === undefined ? undefined : await loadSettings(settingsFile);
  const packFiles = [...(settings?.packs ?? []), ...extraPacks.map((p) => resolve(cwd, p))];
  const packs = await loadPacks(packFiles);
  if (settings !== undefined) checkLevelIds(settings, packs, cwd);
  const projectRoot = gitRoot === undefined ? dirname(settingsFile as string) : ((await gitRoot) ?? cwd);
  return {
    settingsFile,
    packs,
    include: settings?.include ?? [],
    exclude: settings?.exclude ?? [],
    levels: settings?.levels ?? {},
    failOn: settings?.failOn ?? 'error',
    ledger: settings?.ledger ?? join(projectRoot, 'firnline-signoffs.yaml'),
    projectRoot,
    reviewers: settings?.reviewers ?? [],
  };
}

/** A rule id in `levels` that no pack or check knows is a mistake (most often a misspelling). */
function checkLevelIds(settings: Settings, packs: LoadedPacks, cwd: string): void {
  const known = knownRuleIds(packs);
  const problems = Object.keys(settings.levels)
    .filter((id) => !known.includes(id))
    .map((id) => {
      const close = closeIds(id, known);
      const hint = close.length > 0 ? `did you mean ${close.map((c) => `\`${c}\``).join(' or ')}?` : 'run `firnline refs` to list the ids';
      const place = settings.levelPlaces?.[id] ?? { line: 1, column: 1 };
      return new FirnlineError('settings-unknown-rule', `unknown rule id \`${id}\` in \`levels\`; ${hint}`, { file: relative(cwd, settings.file) || settings.file, ...place });
    });
  if (problems.length > 0) throw new FirnlineErrors(problems);
}

/** The top folder of the git work tree around `cwd`, or undefined outside git (or without git). */
async function gitTopLevel(cwd: string): Promise<string | undefined> {
  try {
    // --show-cdup ("../../") rather than --show-toplevel, so a symlinked working folder stays comparable.
    const { stdout } = await promisify(execFile)('git', ['rev-parse', '--show-cdup'], { cwd });
    return resolve(cwd, stdout.trim());
  } catch {
    return undefined;
  }
}

/** The engine options of a run: settings, packs and the project root, as every scanning command uses them. */
export function checkOptionsOf(run: RunSettings, ctx: Pick<CliContext, 'cwd' | 'readStdin'>): CheckOptions {
  return {
    cwd: ctx.cwd,
    projectRoot: run.projectRoot,
    packs: run.packs,
    include: run.include,
    exclude: run.exclude,
    levels: run.levels,
    // The settings' include/exclude patterns are relative to the settings file, as it says.
    ...(run.settingsFile === undefined ? {} : { filterRoot: dirname(run.settingsFile) }),
    readStdin: ctx.readStdin,
  };
}
