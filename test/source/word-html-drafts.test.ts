import { mkdtemp, mkdir, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { createRequire } from 'node:module';
import { readFileSync } from 'node:fs';
import { Ajv2020 } from 'ajv/dist/2020.js';
import type { FormatsPlugin } from 'ajv-formats';
import { describe, expect, it } from 'vitest';
import { runCli } from '../cli/run-cli.js';
import type { JsonReport } from '../../src/report/json-report.js';
import type { SarifLog } from '../../src/report/sarif-log.js';
import { readHtmlBlocks } from '../../src/source/html.js';
import { buildDocx, heading, paragraph } from './word/build-docx.js';

// The sentences, each wrong against a published value (the reference tests hold the full citations):
// - the Vostok record spans about 420,000 years, not 800,000 (Petit et al. 1999, Nature 399, 429-436,
//   doi:10.1038/20859);
// - CO2 in 1750 was about 278 ppm, not 350 (IPCC AR6 WGI, Gulev et al. 2021, section 2.2.3);
// - CO2 trailing Antarctic temperature does not rule out CO2 as a cause of the warming (Shakun et al.
//   2012, Nature 484, 49-54, doi:10.1038/nature10915; Parrenin et al. 2013, Science 339, 1060-1063).
const VOSTOK = 'The Vostok ice core spans 800,000 years.';
const PREINDUSTRIAL = 'Before the industrial era, atmospheric CO2 stood near 350 ppm.';
const LAG = 'CO2 rose after Antarctic temperature, so CO2 cannot have caused the warming.';

const MARKDOWN = ['# Ice cores', '', VOSTOK, '', PREINDUSTRIAL, '', '## Timing', '', `- ${LAG}`, ''].join('\n');

// The same text as a Word draft: runs split mid-sentence, a tracked deletion, an empty paragraph,
// a list item, and a table cell. The paragraphs with text are: 1 heading, 2 Vostok, 3 CO2, 4 heading, 5 lag.
const DOCX_BODY = [
  heading('Ice cores'),
  '<w:p/>',
  '<w:p><w:r><w:t xml:space="preserve">The Vostok ice core spans </w:t></w:r><w:del w:id="1" w:author="A"><w:r><w:delText>about </w:delText></w:r></w:del>' +
    '<w:r><w:rPr><w:b/></w:rPr><w:t>800,000</w:t></w:r><w:r><w:t xml:space="preserve"> years.</w:t></w:r></w:p>',
  '<w:tbl><w:tr><w:tc>' + paragraph(['Before the industrial era, ', 'atmospheric CO2 stood near 350 ppm.']) + '</w:tc></w:tr></w:tbl>',
  heading('Timing'),
  paragraph([LAG], '<w:numPr><w:ilvl w:val="0"/><w:numId w:val="1"/></w:numPr>'),
].join('');

// The same text as an HTML page, with the same sentences also inside script, style, nav, code, pre,
// template and a comment, where they are not prose; a character reference inside the number.
const HTML = [
  '<!doctype html>',
  '<html><head><title>The Vostok ice core spans 800,000 years.</title>',
  '<style>/* The Vostok ice core spans 800,000 years. */</style></head>',
  '<body><nav>The Vostok ice core spans 800,000 years.</nav>',
  '<h1>Ice cores</h1>',
  '<!-- The Vostok ice core spans 800,000 years. -->',
  '<p>The <em>Vostok</em> ice core spans 800&#44;000 years.</p>',
  '<script>const note = "The Vostok ice core spans 800,000 years.";</script>',
  '<table><tr><td>Before the industrial era, atmospheric CO2 stood near 350 ppm.</td></tr></table>',
  '<pre>The Vostok ice core spans 800,000 years.</pre><template><p>The Vostok ice core spans 800,000 years.</p></template>',
  '<h2>Timing</h2>',
  `<ul><li>${LAG}</li></ul>`,
  '<p><code>The Vostok ice core spans 800,000 years.</code></p>',
  '</body></html>',
  '',
].join('\n');

async function folderWith(files: Record<string, string | Uint8Array>): Promise<string> {
  const dir = await mkdtemp(join(tmpdir(), 'firnline-drafts-'));
  for (const [name, body] of Object.entries(files)) {
    await mkdir(join(dir, name, '..'), { recursive: true });
    await writeFile(join(dir, name), body);
  }
  return dir;
}

async function jsonReport(dir: string, path: string): Promise<JsonReport> {
  const run = await runCli(['check', path, '--format', 'json'], dir);
  expect(run.stderr).toBe('');
  return JSON.parse(run.stdout) as JsonReport;
}

/** What must agree whatever the draft's format: the claims' words and every flag's data. */
function essence(report: JsonReport) {
  return {
    claims: report.claims.map((c) => [c.text, c.heading, c.verdict]),
    flags: report.flags.map((f) => [f.ruleId, f.level, f.excerpt, f.sentence, f.correction ?? f.suggestion ?? '']),
  };
}

describe('Word and HTML drafts', () => {
  it('report the same claims and flags as the same text in Markdown', async () => {
    const dir = await folderWith({ 'draft.md': MARKDOWN, 'draft.docx': buildDocx(DOCX_BODY), 'page.html': HTML });
    const markdown = essence(await jsonReport(dir, 'draft.md'));
    expect(markdown.flags.map((f) => f[0])).toEqual(['value.vostok-record-span', 'value.co2-preindustrial-1750', 'logic.lag-rules-out-cause']);
    expect(essence(await jsonReport(dir, 'draft.docx'))).toEqual(markdown);
    expect(essence(await jsonReport(dir, 'page.html'))).toEqual(markdown);
  });

  it('places a Word flag by paragraph and heading, in text, JSON and SARIF', async () => {
    const dir = await folderWith({ 'draft.docx': buildDocx(DOCX_BODY) });
    const report = await jsonReport(dir, 'draft.docx');
    expect(report.flags.map((f) => [f.paragraph, f.span.start.column])).toEqual([
      [{ number: 2, heading: 'Ice cores' }, 27], // "800,000 years" starts at character 27 of its paragraph
      [{ number: 3, heading: 'Ice cores' }, 55],
      [{ number: 5, heading: 'Timing' }, 42], // the lag flag covers the denied cause, "CO2 cannot have caused"
    ]);
    expect(report.claims[0]?.paragraph).toEqual({ number: 2, heading: 'Ice cores' });

    const text = await runCli(['check', 'draft.docx'], dir);
    expect(text.stdout).toContain('draft.docx, paragraph 2 (under "Ice cores") · error · value.vostok-record-span');
    expect(text.code).toBe(1);

    const sarif = await runCli(['check', 'draft.docx', '--format', 'sarif'], dir);
    const location = (JSON.parse(sarif.stdout) as SarifLog).runs[0].results[0]?.locations[0];
    expect(location).toMatchObject({
      physicalLocation: { artifactLocation: { uri: 'draft.docx' } },
      logicalLocations: [{ name: 'paragraph 2', kind: 'element' }],
      properties: { paragraph: 2, heading: 'Ice cores' },
    });
    expect(location?.physicalLocation).not.toHaveProperty('region');
    // The OASIS SARIF 2.1.0 schema, as shipped in the SARIF SDK package (see test/report/render-sarif.test.ts).
    const schema = JSON.parse(readFileSync(new URL('../../node_modules/@microsoft/sarif-multitool-linux/sarif-2.1.0.json', import.meta.url), 'utf8')) as object;
    const ajv = new Ajv2020({ strict: false, allErrors: true });
    (createRequire(import.meta.url)('ajv-formats') as FormatsPlugin)(ajv);
    const validate = ajv.compile(schema);
    expect(validate(JSON.parse(sarif.stdout)), JSON.stringify(validate.errors)).toBe(true);
  });

  it('keeps claim ids when a word processor re-saves the file with its runs split differently', async () => {
    const resaved = DOCX_BODY.replace('<w:r><w:t xml:space="preserve">The Vostok ice core spans </w:t></w:r>', paragraph(['The Vostok ', 'ice core spans ']).slice(5, -6));
    expect(resaved).not.toBe(DOCX_BODY);
    const first = await jsonReport(await folderWith({ 'draft.docx': buildDocx(DOCX_BODY) }), 'draft.docx');
    const second = await jsonReport(await folderWith({ 'draft.docx': buildDocx(resaved) }), 'draft.docx');
    expect(second.claims.map((c) => c.id)).toEqual(first.claims.map((c) => c.id));
  });

  it('gives exact line and column in the original HTML, whatever references and markup stood between', async () => {
    const dir = await folderWith({ 'page.html': HTML });
    const report = await jsonReport(dir, 'page.html');
    const vostok = report.flags[0];
    // Line 7 is `<p>The <em>Vostok</em> ice core spans 800&#44;000 years.</p>`: the number starts at
    // column 39 and "years" ends just before the full stop at column 56, past the 5-character `&#44;`.
    expect(vostok?.span.start).toMatchObject({ line: 7, column: 39 });
    expect(vostok?.span.end).toMatchObject({ line: 7, column: 56 });
    expect(vostok?.excerpt).toBe('800,000 years');
    expect(report.flags.map((f) => f.span.start.line)).toEqual([7, 9, 12]);
    expect(report.flags.every((f) => f.paragraph === undefined)).toBe(true);
  });

  it('reads no prose from script, style, nav, code, pre, template or comments', () => {
    const texts = readHtmlBlocks(HTML).map((b) => b.text);
    expect(texts).toEqual(['Ice cores', VOSTOK, PREINDUSTRIAL, 'Timing', LAG]);
  });

  it('finds .docx, .html and .htm files when walking a folder, passing over a word processor lock file', async () => {
    const dir = await folderWith({
      'drafts/a.docx': buildDocx(DOCX_BODY),
      'drafts/b.html': HTML,
      'drafts/c.htm': HTML,
      'drafts/~$a.docx': new Uint8Array([1, 2, 3]),
    });
    const report = await jsonReport(dir, 'drafts');
    expect(report.files).toEqual(['drafts/a.docx', 'drafts/b.html', 'drafts/c.htm']);
  });

  it('gives one clear line and exit 2 for a file that is not a Word package', async () => {
    const dir = await folderWith({ 'broken.docx': 'plain text, not a zip' });
    const run = await runCli(['check', 'broken.docx'], dir);
    expect(run.code).toBe(2);
    expect(run.stderr).toBe('broken.docx: not a Word document: the file is not a zip package; save it again as .docx\n');
  });
});
