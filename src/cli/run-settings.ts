import { dirname, join, resolve } from 'node:path';
import { findSettingsFile, loadPacks, loadSettings } from '../rulepack/index.js';
import type { LoadedPacks } from '../rulepack/types.js';
import type { Level } from '../types.js';

/** Everything a command needs from firnline.yaml and --pack, resolved once. */
export interface RunSettings {
  settingsFile: string | undefined;
  packs: LoadedPacks;
  include: string[];
  exclude: string[];
  levels: Record<string, Level | 'off'>;
  failOn: Level | 'never';
  /** The ledger path: from the settings, else beside the settings file, else in the working folder. */
  ledger: string;
}

/** Finds and loads the settings (or `--config`), then every pack they and `--pack` name. */
export async function loadRunSettings(cwd: string, config: string | undefined, extraPacks: string[]): Promise<RunSettings> {
  const settingsFile = config === undefined ? findSettingsFile(cwd) : resolve(cwd, config);
  const settings = settingsFile === undefined ? undefined : await loadSettings(settingsFile);
  const packFiles = [...(settings?.packs ?? []), ...extraPacks.map((p) => resolve(cwd, p))];
  const packs = await loadPacks(packFiles);
  return {
    settingsFile,
    packs,
    include: settings?.include ?? [],
    exclude: settings?.exclude ?? [],
    levels: settings?.levels ?? {},
    failOn: settings?.failOn ?? 'error',
    ledger: settings?.ledger ?? join(settingsFile === undefined ? cwd : dirname(settingsFile), 'firnline-signoffs.yaml'),
  };
}
