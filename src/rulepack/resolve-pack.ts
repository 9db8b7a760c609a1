/**
 * Turns a schema-valid pack into its loaded shape: source ids resolved, values converted to
 * canonical units, defaults filled. Collects every mistake the schema cannot see (unknown source
 * or term id, unknown unit, low > high, an invalid regular expression, duplicate ids) so that the
 * user fixes them all in one pass; a pack with any mistake is never returned.
 */
import type { FirnlineError } from '../errors.js';
import type { Source } from '../types.js';
import type { RawPack } from './raw-pack.js';
import { resolveReference } from './resolve-reference.js';
import { resolveSource } from './resolve-source.js';
import type { DirectionFact, FactForm, Lexicon, PatternRule, ReasoningCheck, RulePack, Term } from './types.js';
import type { OneOrMany, RawDirectionFact, RawReferenceValue } from './raw-pack.js';
import { unitDef } from './units.js';
import type { YamlFile } from './yaml-file.js';
import { regexProblem } from './regex-problem.js';

/** What earlier packs already define, so a user pack may cite their sources and terms. */
export interface KnownIds {
  sources: ReadonlyMap<string, Source>;
  terms: ReadonlySet<string>;
  /** `section:id` of everything earlier packs define, to the id of the pack that defines it. */
  defined: ReadonlyMap<string, string>;
}

/** A resolver's view of one pack: its YAML (for positions) and a place to put errors. */
export interface PackScope {
  yaml: YamlFile;
  errors: FirnlineError[];
  sources: ReadonlyMap<string, Source>;
  terms: ReadonlySet<string>;
  /** Looks up source ids written at `path`; unknown ids are reported and left out. */
  sourcesAt(ids: readonly string[], path: (string | number)[]): Source[];
}

/** The loaded pack, or the list of its mistakes. */
export function resolvePack(yaml: YamlFile, file: string, known: KnownIds): RulePack | FirnlineError[] {
  const raw = yaml.data as RawPack;
  const errors: FirnlineError[] = [];
  const own = (raw.sources ?? []).map(resolveSource);
  (raw.sources ?? []).forEach((s, i) => {
    if (s.cite === undefined && (s.kind === undefined || s.title === undefined)) {
      errors.push(yaml.errorAt('pack-schema', ['sources', i], 'a source needs `cite`, or `kind` and `title` (with author, issued, container-title... as in CSL-JSON)'));
    }
  });
  const sources = new Map(known.sources);
  for (const s of own) sources.set(s.id, s);
  const terms = new Set([...known.terms, ...(raw.terms ?? []).map((t) => t.id)]);
  const scope: PackScope = {
    yaml, errors, sources, terms,
    sourcesAt: (ids, path) => ids.flatMap((id, i) => {
      const source = sources.get(id);
      if (source === undefined) errors.push(yaml.errorAt('pack-unknown-source', [...path, i], `unknown source id \`${id}\`; add it under \`sources\``));
      return source === undefined ? [] : [source];
    }),
  };
  const sections = ['sources', 'terms', 'reference_values', 'direction_facts', 'patterns', 'reasoning_checks'] as const;
  for (const section of sections) reportDuplicates(scope, section, (raw[section] ?? []).map((x) => x.id), known.defined);

  const termList: Term[] = (raw.terms ?? []).map((t) => ({ id: t.id, words: t.words, ...(t.units === undefined ? {} : { units: t.units }), ...(t.unless === undefined ? {} : { unless: t.unless }) }));
  const references = (raw.reference_values ?? []).flatMap((r, i) => resolveReference(scope, r, ['reference_values', i]) ?? []);
  const valueIds = new Set((raw.reference_values ?? []).map((r) => r.id));
  (raw.reference_values ?? []).forEach((r, i) => {
    const newer = r.superseded_by;
    if (newer !== undefined && !valueIds.has(newer) && !known.defined.has(`reference_values:${newer}`)) {
      errors.push(yaml.errorAt('pack-unknown-value', ['reference_values', i, 'superseded_by'], `unknown reference value id \`${newer}\`; superseded_by names the value that replaced this one`));
    }
    const global = r.regional_version_of;
    if (global !== undefined && !valueIds.has(global) && !known.defined.has(`reference_values:${global}`)) {
      errors.push(yaml.errorAt('pack-unknown-value', ['reference_values', i, 'regional_version_of'], `unknown reference value id \`${global}\`; regional_version_of names the global value this one is the regional size of`));
    }
    checkEnds(scope, r, i, valueIds, known, raw.reference_values ?? []);
  });
  const directions: DirectionFact[] = (raw.direction_facts ?? []).map((d, i) => {
    const path = ['direction_facts', i];
    checkRegexes(scope, d.wrong ?? [], [...path, 'wrong']);
    if (d.wrong === undefined && factForms(d).length === 0) {
      errors.push(yaml.errorAt('pack-schema', path, 'a direction fact needs `relation`, `comparison`, `order`, `change` or `wrong`'));
    }
    checkRegexes(scope, d.right ?? [], [...path, 'right']);
    return {
      id: d.id, statement: d.statement, says: factForms(d), wrong: d.wrong ?? [], level: d.level ?? 'warning',
      sources: scope.sourcesAt(d.sources, [...path, 'sources']),
      ...(d.right === undefined ? {} : { right: d.right }),
    };
  });
  const patterns: PatternRule[] = (raw.patterns ?? []).map((p, i) => {
    const path = ['patterns', i];
    // A pattern's id is its rule id in every report, so it takes the reports' form (schemas/report.schema.json).
    if (!RULE_ID.test(p.id)) errors.push(yaml.errorAt('pack-rule-id', [...path, 'id'], `a pattern id is a rule id: lower-case and dotted, group first (e.g. \`house.${p.id.replace(/[^a-z0-9-]/gu, '') || 'rule'}\`)`));
    if (p.match === undefined && p.regex === undefined) errors.push(yaml.errorAt('pack-schema', path, 'a pattern needs `match` or `regex`'));
    if (p.regex !== undefined) checkRegexes(scope, [p.regex], [...path, 'regex'], true);
    return {
      id: p.id, level: p.level ?? 'warning', reason: p.reason,
      sources: scope.sourcesAt(p.sources ?? [], [...path, 'sources']),
      ...(p.suggestion === undefined ? {} : { suggestion: p.suggestion }),
      ...(p.match === undefined ? {} : { match: p.match }),
      ...(p.regex === undefined ? {} : { regex: p.regex }),
    };
  });
  const reasoning: ReasoningCheck[] = (raw.reasoning_checks ?? []).map((c, i) => ({
    id: c.id, level: c.level ?? 'warning', summary: c.summary, reason: c.reason, suggestion: c.suggestion,
    sources: scope.sourcesAt(c.sources, ['reasoning_checks', i, 'sources']),
    words: c.cue_words ?? {}, enabled: c.enabled ?? true,
  }));
  if (errors.length > 0) return errors;
  return {
    id: raw.pack, version: raw.version, asOf: raw.as_of, file,
    sources: own, terms: termList, references, directions, reasoning, patterns, lexicon: lexiconOf(raw),
  };
}

/** The form of a rule id in reports: dotted, lower-case, group first (schemas/report.schema.json, flags.ruleId). */
const RULE_ID = /^[a-z][a-z0-9-]*(\.[a-z0-9][a-z0-9-]*)+$/u;

function reportDuplicates(scope: PackScope, section: string, ids: string[], defined: ReadonlyMap<string, string>): void {
  const first = new Map<string, number>();
  ids.forEach((id, i) => {
    const otherPack = defined.get(`${section}:${id}`);
    if (otherPack !== undefined) {
      scope.errors.push(scope.yaml.errorAt('pack-duplicate-id', [section, i, 'id'], `id \`${id}\` is already defined in pack \`${otherPack}\`; ids must be unique across packs`));
      return;
    }
    const earlier = first.get(id);
    if (earlier === undefined) first.set(id, i);
    else {
      const at = scope.yaml.locate([section, earlier, 'id']);
      scope.errors.push(scope.yaml.errorAt('pack-duplicate-id', [section, i, 'id'], `duplicate id \`${id}\` (first defined at line ${at.line}); ids must be unique`));
    }
  });
}

function checkRegexes(scope: PackScope, sources: string[], path: (string | number)[], single = false): void {
  sources.forEach((source, i) => {
    const problem = regexProblem(source);
    if (problem !== undefined) scope.errors.push(scope.yaml.errorAt('pack-regex', single ? path : [...path, i], problem));
  });
}

const list = <T>(x: OneOrMany<T> | undefined): T[] => (x === undefined ? [] : Array.isArray(x) ? x : [x]);

/** A fact's `relation`, `comparison`, `order` and `change` entries as one list of forms. */
function factForms(d: RawDirectionFact): FactForm[] {
  const variable = (v: string) => {
    const [key = v, attribute = 'amount'] = v.split(':');
    return { key, attribute };
  };
  return [
    ...list(d.relation).map((r): FactForm => ({ kind: 'relation', x: variable(r.x), y: variable(r.y), sign: r.sign === 'same' ? 1 : -1 })),
    ...list(d.comparison).map((c): FactForm => ({ kind: 'comparison', a: list(c.a), b: list(c.b), attribute: c.attribute, sign: c.sign === 'higher' ? 1 : -1 })),
    ...list(d.order).map((o): FactForm => ({ kind: 'order', first: o.first, then: o.then, regions: list(o.regions), during: list(o.during) })),
    ...list(d.change).map((c): FactForm => ({
      kind: 'change', of: list(c.of), attribute: c.attribute ?? 'temperature', during: list(c.during), sign: c.sign === 'up' ? 1 : -1,
    })),
  ];
}

/** The pack's lexicon with every class as key → phrases (a flat list becomes the key `all`). */
function lexiconOf(raw: { lexicon?: Record<string, string[] | Record<string, string[]>> }): Lexicon {
  const out: Lexicon = {};
  for (const [cls, value] of Object.entries(raw.lexicon ?? {})) out[cls] = Array.isArray(value) ? { all: value } : { ...value };
  return out;
}

/**
 * The `ends` of a span value name values that exist (in this pack or an earlier one); an end of
 * this pack states the span's unit dimension, and is no span itself.
 */
function checkEnds(scope: PackScope, r: RawReferenceValue, i: number, valueIds: ReadonlySet<string>, known: KnownIds, values: readonly RawReferenceValue[]): void {
  if (r.ends === undefined) return;
  for (const side of ['low', 'high'] as const) {
    [r.ends[side]].flat().forEach((id, k) => {
      const path = ['reference_values', i, 'ends', side, ...(Array.isArray(r.ends?.[side]) ? [k] : [])];
      if (!valueIds.has(id) && !known.defined.has(`reference_values:${id}`)) {
        scope.errors.push(scope.yaml.errorAt('pack-unknown-value', path, `unknown reference value id \`${id}\`; ends names the values at the ${side} end of this span`));
        return;
      }
      const end = values.find((v) => v.id === id);
      if (end === undefined) return;
      if (end.ends !== undefined || id === r.id) {
        scope.errors.push(scope.yaml.errorAt('pack-schema', path, `\`${id}\` is a span itself; an end of a span is a value with no \`ends\``));
      } else if (unitDef(end.unit)?.dimension !== unitDef(r.unit)?.dimension) {
        scope.errors.push(scope.yaml.errorAt('pack-schema', path, `\`${id}\` is stated in ${end.unit} and this span in ${r.unit}; an end must measure the same dimension`));
      }
    });
  }
}
