/**
 * `firnline refs --format csl-json` against the CSL-JSON data format: the rules of the Citation
 * Style Language input schema, csl-data.json (citation-style-language/schema, schemas/input/
 * csl-data.json; https://resource.citationstyles.org/schema/latest/input/json/csl-data.json),
 * restated here as a JSON Schema for the fields Firnline writes and checked with ajv:
 * - the document is an array of items; every item has `type` (one of the CSL item types) and `id`;
 * - no property outside the schema's list (additionalProperties: false);
 * - names are objects of family/given/literal (and the other name parts), nothing else;
 * - dates are `{ "date-parts": [[year, month?, day?]] }` with one or two parts of one to three numbers;
 * - text variables are strings; number variables (volume, issue, page, number...) strings or numbers.
 */
import ajvModule from 'ajv';
import { describe, expect, it } from 'vitest';
import { Command } from 'commander';
import { registerRefs } from '../../src/cli/commands/refs.js';
import type { CliContext } from '../../src/cli/context.js';

// The CSL 1.0.2 item types (csl-data.json, properties.type.enum).
const TYPES = ['article', 'article-journal', 'article-magazine', 'article-newspaper', 'bill', 'book', 'broadcast', 'chapter', 'classic', 'collection', 'dataset', 'document', 'entry', 'entry-dictionary', 'entry-encyclopedia', 'event', 'figure', 'graphic', 'hearing', 'interview', 'legal_case', 'legislation', 'manuscript', 'map', 'motion_picture', 'musical_score', 'pamphlet', 'paper-conference', 'patent', 'performance', 'periodical', 'personal_communication', 'post', 'post-weblog', 'regulation', 'report', 'review', 'review-book', 'software', 'song', 'speech', 'standard', 'thesis', 'treaty', 'webpage'];
const NAME_VARIABLES = ['author', 'chair', 'collection-editor', 'compiler', 'composer', 'container-author', 'contributor', 'curator', 'director', 'editor', 'editorial-director', 'executive-producer', 'interviewer', 'illustrator', 'organizer', 'original-author', 'performer', 'producer', 'recipient', 'reviewed-author', 'translator'];
const DATE_VARIABLES = ['accessed', 'available-date', 'event-date', 'issued', 'original-date', 'submitted'];
const TEXT_VARIABLES = ['abstract', 'annote', 'archive', 'archive_collection', 'archive_location', 'archive-place', 'authority', 'call-number', 'citation-label', 'collection-title', 'container-title', 'container-title-short', 'dimensions', 'division', 'DOI', 'event', 'event-place', 'genre', 'ISBN', 'ISSN', 'jurisdiction', 'keyword', 'language', 'journalAbbreviation', 'shortTitle', 'medium', 'note', 'original-publisher', 'original-publisher-place', 'original-title', 'part-title', 'PMCID', 'PMID', 'publisher', 'publisher-place', 'references', 'reviewed-title', 'scale', 'section', 'source', 'status', 'title', 'title-short', 'URL', 'version', 'year-suffix'];
const NUMBER_VARIABLES = ['chapter-number', 'citation-number', 'collection-number', 'edition', 'first-reference-note-number', 'issue', 'locator', 'number', 'number-of-pages', 'number-of-volumes', 'page', 'page-first', 'part', 'printing', 'supplement', 'volume'];

const stringOrNumber = { type: ['string', 'number'] };
const CSL_DATA = {
  type: 'array',
  items: {
    type: 'object',
    required: ['type', 'id'],
    additionalProperties: false,
    properties: {
      type: { enum: TYPES },
      id: stringOrNumber,
      categories: { type: 'array', items: { type: 'string' } },
      custom: { type: 'object' },
      ...Object.fromEntries(NAME_VARIABLES.map((v) => [v, { type: 'array', items: { $ref: '#/$defs/name' } }])),
      ...Object.fromEntries(DATE_VARIABLES.map((v) => [v, { $ref: '#/$defs/date' }])),
      ...Object.fromEntries(TEXT_VARIABLES.map((v) => [v, { type: 'string' }])),
      ...Object.fromEntries(NUMBER_VARIABLES.map((v) => [v, stringOrNumber])),
    },
  },
  $defs: {
    name: {
      type: 'object',
      additionalProperties: false,
      properties: {
        family: { type: 'string' }, given: { type: 'string' }, 'dropping-particle': { type: 'string' }, 'non-dropping-particle': { type: 'string' },
        suffix: { type: 'string' }, 'comma-suffix': { type: ['string', 'number', 'boolean'] }, 'static-ordering': { type: ['string', 'number', 'boolean'] },
        literal: { type: 'string' }, 'parse-names': { type: ['string', 'number', 'boolean'] },
      },
    },
    date: {
      type: 'object',
      additionalProperties: false,
      properties: {
        'date-parts': { type: 'array', minItems: 1, maxItems: 2, items: { type: 'array', minItems: 1, maxItems: 3, items: stringOrNumber } },
        season: stringOrNumber, circa: { type: ['string', 'number', 'boolean'] }, literal: { type: 'string' }, raw: { type: 'string' }, edtf: { type: 'string' },
      },
    },
  },
};

async function refs(args: string[]): Promise<string> {
  let out = '';
  const ctx: CliContext = { cwd: process.cwd(), env: {}, stdout: (t) => void (out += t), stderr: () => undefined, readStdin: async () => '', isTTY: false, exitCode: 0 };
  const program = new Command().exitOverride();
  registerRefs(program, ctx);
  await program.parseAsync(['refs', ...args], { from: 'user' });
  return out;
}

describe('firnline refs --format csl-json', () => {
  // ajv is CommonJS: under Node's ESM loader the default import is the module object.
  const Ajv = (ajvModule as unknown as { default?: typeof ajvModule.default }).default ?? (ajvModule as unknown as typeof ajvModule.default);
  const validate = new Ajv({ allErrors: true, strict: false }).compile(CSL_DATA);

  it('writes a valid CSL-JSON array of every cited source', async () => {
    const items = JSON.parse(await refs(['--format', 'csl-json'])) as { id: string; type: string; author?: unknown[] }[];
    const valid = validate(items);
    expect(validate.errors ?? []).toEqual([]);
    expect(valid).toBe(true);
    expect(new Set(items.map((i) => i.id)).size).toBe(items.length);
    expect(items.length).toBeGreaterThanOrEqual(80);
    expect(items.every((i) => (i.author?.length ?? 0) > 0)).toBe(true);
  });

  it('rejects what the specification forbids (the schema above is not vacuous)', () => {
    expect(validate([{ id: 'x' }])).toBe(false); // no type
    expect(validate([{ id: 'x', type: 'journal-article' }])).toBe(false); // not a CSL type
    expect(validate([{ id: 'x', type: 'book', author: [{ name: 'X' }] }])).toBe(false); // not a name part
    expect(validate([{ id: 'x', type: 'book', issued: { 'date-parts': [[2007, 1, 2, 3]] } }])).toBe(false);
    expect(validate([{ id: 'x', type: 'book', doi: '10.1/x' }])).toBe(false); // the variable is DOI, upper case
  });

  it('exports only the sources of the values a query matches', async () => {
    const items = JSON.parse(await refs(['vostok-record-span', '--format', 'csl-json'])) as { id: string }[];
    expect(items.map((i) => i.id)).toEqual(['petit-1999', 'petit-noaa-vostok-data']);
  });
});
