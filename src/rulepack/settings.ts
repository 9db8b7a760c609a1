/**
 * Project settings: `firnline.yaml` in a docs repository, found by walking up from the working
 * folder, validated against schemas/settings.schema.json, with paths resolved against the file.
 */
import { existsSync, realpathSync } from 'node:fs';
import { dirname, isAbsolute, join, relative, resolve } from 'node:path';
import { FirnlineErrors } from '../errors.js';
import type { Level } from '../types.js';
import type { Settings } from './types.js';
import { schemaErrors } from './validate-schema.js';
import { readYamlFile } from './yaml-file.js';

/** The settings file's name. */
export const SETTINGS_FILE = 'firnline.yaml';

/** The nearest `firnline.yaml` in `cwd` or a folder above it, or undefined when there is none. */
export function findSettingsFile(cwd: string): string | undefined {
  let folder = resolve(cwd);
  for (;;) {
    const candidate = join(folder, SETTINGS_FILE);
    if (existsSync(candidate)) return candidate;
    const parent = dirname(folder);
    if (parent === folder) return undefined;
    folder = parent;
  }
}

interface RawSettings {
  include?: string[];
  exclude?: string[];
  packs?: string[];
  levels?: Record<string, Level | 'off'>;
  fail_on?: Level | 'never' | 'strict';
  ledger?: string;
  reviewers?: { name: string; git?: string }[];
}

/** Reads and checks a settings file; every mistake is thrown together as FirnlineErrors. */
export async function loadSettings(file: string): Promise<Settings> {
  const yaml = await readYamlFile(resolve(file), file);
  const problems = schemaErrors(yaml, 'settings');
  if (problems.length > 0) throw new FirnlineErrors(problems);
  const raw = (yaml.data ?? {}) as RawSettings;
  const folder = dirname(resolve(file));
  const outside = (raw.packs ?? []).flatMap((p, i) =>
    isInside(folder, resolve(folder, p))
      ? []
      : [yaml.errorAt('settings-pack-outside', ['packs', i], 'this pack is outside the project folder (the folder of this settings file); settings may only name packs inside it: copy the pack in, or name it on the command line with --pack')],
  );
  if (outside.length > 0) throw new FirnlineErrors(outside);
  return {
    file: resolve(file),
    include: raw.include ?? [],
    exclude: raw.exclude ?? [],
    packs: (raw.packs ?? []).map((p) => resolve(folder, p)),
    levels: raw.levels ?? {},
    ...(raw.fail_on === undefined ? {} : { failOn: raw.fail_on }),
    ...(raw.ledger === undefined ? {} : { ledger: resolve(folder, raw.ledger) }),
    ...(raw.reviewers === undefined ? {} : { reviewers: raw.reviewers }),
    levelPlaces: Object.fromEntries(Object.keys(raw.levels ?? {}).map((id) => [id, yaml.locate(['levels', id], 'key')])),
  };
}

/** True when `path` (after following links) lies in `folder` (after following links). */
function isInside(folder: string, path: string): boolean {
  const real = (p: string): string => {
    try {
      return realpathSync(p);
    } catch {
      return p;
    }
  };
  const rel = relative(real(folder), real(path));
  return rel !== '' && !rel.startsWith('..') && !isAbsolute(rel);
}

/** The commented starter file `firnline init` writes; every line of it is valid settings. */
export function starterSettings(): string {
  return `# Firnline settings for this docs repository.
# Firnline finds this file by walking up from the folder it runs in; --config names another one.
# Paths below are relative to this file. Schema: schemas/settings.schema.json in the firnline package.

# Drafts to check (gitignore-style patterns). Empty: every Markdown and text file.
include:
  - "**/*.md"
  - "**/*.txt"

# Files and folders to leave out.
exclude:
  - node_modules/
  - "drafts/archive/"

# Extra rule packs: your own reference values, terms and house rules (see docs/rule-packs.md).
# The built-in pack rules/paleoclimate.yaml is always loaded; ids must not repeat across packs.
packs: []
#  - rules/house-style.yaml

# Level per rule id: error, warning, note, or off.
levels: {}
#  value.co2-lgm: error
#  logic.lag-rules-out-cause: note

# Lowest level that makes the exit status 1: error, warning, note or never; or strict, the preset
# for publication (every conflicting value and every reasoning error is an error).
fail_on: error

# Where expert sign-offs are kept.
ledger: firnline-signoffs.yaml

# Who may sign off claims (firnline signoff --by NAME). Empty: anyone. With \`git\`, the reviewer may
# sign only from a git work tree whose user.email is that address.
reviewers: []
#  - name: Dr A. Rahman
#    git: a.rahman@example.org
`;
}
