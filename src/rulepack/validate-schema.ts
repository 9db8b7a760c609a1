/**
 * Validates YAML data against one of our JSON Schemas (draft 2020-12) with ajv, and turns each ajv
 * error into a FirnlineError placed at the YAML node it is about. Validators come from
 * validator-code.ts (generated at build time, or compiled once per run).
 */
import type { ErrorObject } from 'ajv/dist/2020.js';
import type { FirnlineError } from '../errors.js';
import { schemaValidator } from './validator-code.js';
import type { YamlFile } from './yaml-file.js';

/** The schemas shipped in the package's `schemas/` folder. */
export type SchemaName = 'rulepack' | 'settings';

/** How each ajv keyword is put into words (the `at` part is added by the caller). */
const MESSAGES: Record<string, (e: ErrorObject, key: string) => string> = {
  required: (e) => `missing required key \`${String(e.params['missingProperty'])}\``,
  additionalProperties: (e) => `unknown key \`${String(e.params['additionalProperty'])}\`; see docs/rule-packs.md for the keys`,
  type: (e, key) => `\`${key}\` must be ${article(String(e.params['type']))}`,
  enum: (e, key) => `\`${key}\` must be one of: ${(e.params['allowedValues'] as unknown[]).join(', ')}`,
  pattern: (_e, key) => `\`${key}\` ${PATTERN_WORDS[key] ?? 'has the wrong form'}`,
  minItems: (_e, key) => `\`${key}\` must not be empty`,
  minLength: (_e, key) => `\`${key}\` must not be empty`,
  maxLength: (e, key) => `\`${key}\` is too long (at most ${String(e.params['limit'])} characters)`,
  minimum: (e, key) => `\`${key}\` must be at least ${String(e.params['limit'])}`,
  minProperties: (_e, key) => `\`${key}\` must not be empty`,
  propertyNames: (_e, key) => `\`${key}\` has a key that is not a rule id`,
};

const PATTERN_WORDS: Record<string, string> = {
  as_of: 'must be an ISO date such as 2024-06-30',
  doi: 'must be a bare DOI such as 10.1038/nature06949',
  url: 'must start with http:// or https://',
};

function article(type: string): string {
  return /^[aeiou]/u.test(type) ? `an ${type}` : `a ${type}`;
}

/** Every schema problem in `yaml`, one FirnlineError each, in file order; empty when valid. */
export function schemaErrors(yaml: YamlFile, name: SchemaName): FirnlineError[] {
  const validate = schemaValidator(name);
  if (validate(yaml.data ?? {})) return [];
  const seen = new Set<string>();
  const errors: FirnlineError[] = [];
  for (const e of validate.errors ?? []) {
    if (e.keyword === 'propertyNames' || e.keyword === 'if') continue;
    const path = e.instancePath.split('/').slice(1).map(unescape);
    const part = e.keyword === 'additionalProperties' ? 'key' : 'value';
    if (e.keyword === 'additionalProperties') path.push(String(e.params['additionalProperty']));
    const key = String(path.findLast((p) => typeof p === 'string') ?? 'top level');
    const message = (MESSAGES[e.keyword] ?? ((x: ErrorObject) => x.message ?? 'is not valid'))(e, key);
    const error = yaml.errorAt(name === 'rulepack' ? 'pack-schema' : 'settings-schema', path, message, part);
    if (seen.has(error.toLine())) continue;
    seen.add(error.toLine());
    errors.push(error);
  }
  return errors.sort(byPlace);
}

function unescape(step: string): string | number {
  return /^\d+$/u.test(step) ? Number(step) : step.replaceAll('~1', '/').replaceAll('~0', '~');
}

/** Orders errors by line, then column. */
export function byPlace(a: FirnlineError, b: FirnlineError): number {
  return (a.where?.line ?? 0) - (b.where?.line ?? 0) || (a.where?.column ?? 0) - (b.where?.column ?? 0);
}
