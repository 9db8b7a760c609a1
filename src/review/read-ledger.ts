/**
 * Reads the sign-off ledger. A missing file is an empty ledger (nobody has signed off yet); broken
 * YAML or an entry that does not fit schemas/ledger.schema.json is a one-line error at its place.
 */
import { readRegularText } from '../guard/read-regular-file.js';
import { relative } from 'node:path';
import type { ErrorObject } from 'ajv/dist/2020.js';
import { FirnlineError, FirnlineErrors } from '../errors.js';
import { parseYamlText } from '../rulepack/yaml-file.js';
import { schemaValidator } from '../rulepack/validator-code.js';
import { entryFromYaml, type Ledger } from './signoff-entry.js';


/** How each schema keyword is put into words for the person editing the ledger. */
const MESSAGES: Record<string, (e: ErrorObject, key: string) => string> = {
  required: (e) => `sign-off is missing \`${String(e.params['missingProperty'])}\``,
  type: (e, key) => `\`${key}\` must be of type ${String(e.params['type'])}`,
  enum: (e, key) => `\`${key}\` must be one of: ${(e.params['allowedValues'] as unknown[]).join(', ')}`,
  pattern: (_e, key) => (key === 'date' ? '`date` must be ISO 8601, e.g. 2025-03-14 or 2025-03-14T09:30:00Z' : `\`${key}\` is not a claim id such as c0123456789`),
  minLength: (_e, key) => `\`${key}\` must not be empty`,
};

/** Reads `file` (absolute); messages name it relative to `cwd` when given. */
export async function readLedger(file: string, cwd?: string): Promise<Ledger> {
  const shown = cwd === undefined ? file : relative(cwd, file) || file;
  let text: string;
  try {
    text = await readRegularText(file, { shown, code: 'ledger-unreadable' });
  } catch (error) {
    if ((error as NodeJS.ErrnoException).code === 'ENOENT') return { file, signoffs: [] };
    if (error instanceof FirnlineError) throw error;
    throw new FirnlineError('ledger-unreadable', 'cannot read the sign-off ledger; check its permissions', { file: shown });
  }
  return parseLedger(text, file, shown);
}

/** Parses ledger text already read; `shown` is the name used in messages. */
export function parseLedger(text: string, file: string, shown = file): Ledger {
  let yaml;
  try {
    yaml = parseYamlText(text, shown);
  } catch (error) {
    // One line is enough: the first syntax error is where the editor must look.
    if (error instanceof FirnlineErrors && error.errors[0] !== undefined) throw error.errors[0];
    throw error;
  }
  const data = yaml.data ?? {};
  const validate = schemaValidator('ledger');
  if (!validate(data)) {
    const e = (validate.errors ?? [])[0] as ErrorObject;
    const path = e.instancePath.split('/').slice(1).map((s) => (/^\d+$/u.test(s) ? Number(s) : s));
    const key = String(path.findLast((p) => typeof p === 'string') ?? 'top level');
    const message = (MESSAGES[e.keyword] ?? ((x: ErrorObject) => x.message ?? 'is not valid'))(e, key);
    throw yaml.errorAt('ledger-schema', path, `${message} (see docs/sign-off.md)`);
  }
  const list = ((data as { signoffs?: unknown[] | null }).signoffs ?? []) as Record<string, unknown>[];
  return { file, signoffs: list.map(entryFromYaml) };
}
