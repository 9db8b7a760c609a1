import { mkdtemp, readFile, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { DOMParser, type Document, type Element, type Node } from '@xmldom/xmldom';
import { strFromU8, unzipSync } from 'fflate';
import mammoth from 'mammoth';
import { describe, expect, it } from 'vitest';
import { runCli } from '../cli/run-cli.js';
import { buildDocx, heading, paragraph } from '../source/word/build-docx.js';
import type { JsonReport } from '../../src/report/json-report.js';
import { shortCitation } from '../../src/report/short-citation.js';

const W = 'http://schemas.openxmlformats.org/wordprocessingml/2006/main';

// Sentences of our own, each wrong against a published value:
// - the Vostok record spans about 420,000 years (Petit et al. 1999, Nature 399, 429-436, doi:10.1038/20859);
// - CO2 in 1750 was about 278 ppm (IPCC AR6 WGI, Gulev et al. 2021, section 2.2.3).
// The number of the first is bold in a run of its own inside a hyperlink-free paragraph; the
// second sits in one run with other words, so the comment must split the run.
const BODY = [
  heading('Ice cores'),
  '<w:p><w:r><w:t xml:space="preserve">The Vostok ice core spans </w:t></w:r><w:r><w:rPr><w:b/></w:rPr><w:t>800,000 years</w:t></w:r><w:r><w:t>.</w:t></w:r></w:p>',
  paragraph(['Before the industrial era, atmospheric CO2 stood near 350 ppm. Nothing else here.']),
].join('');

function parse(bytes: Uint8Array | undefined): Document {
  if (bytes === undefined) throw new Error('part missing');
  return new DOMParser().parseFromString(strFromU8(bytes), 'application/xml');
}

/** The text between each comment's range start and end, walking the document in order. */
function anchoredText(document: Document): Map<string, string> {
  const open = new Map<string, string>();
  const done = new Map<string, string>();
  const walk = (node: Node) => {
    for (let child = node.firstChild; child !== null; child = child.nextSibling) {
      if (child.nodeType !== 1) continue;
      const element = child as Element;
      const id = element.getAttributeNS(W, 'id') ?? '';
      if (element.localName === 'commentRangeStart') open.set(id, '');
      else if (element.localName === 'commentRangeEnd') {
        done.set(id, open.get(id) ?? '');
        open.delete(id);
      } else if (element.localName === 't' && element.namespaceURI === W) {
        for (const [key, text] of open) open.set(key, text + (element.textContent ?? ''));
      } else walk(element);
    }
  };
  walk(document);
  return done;
}

async function draftFolder(): Promise<string> {
  const dir = await mkdtemp(join(tmpdir(), 'firnline-annotate-'));
  await writeFile(join(dir, 'draft.docx'), buildDocx(BODY));
  return dir;
}

describe('firnline annotate', () => {
  it('writes a valid package whose comments part lists every flag, anchored on the flagged words', async () => {
    const dir = await draftFolder();
    const original = await readFile(join(dir, 'draft.docx'));
    const run = await runCli(['annotate', 'draft.docx', '-o', 'reviewed.docx'], dir);
    expect(run.stderr).toBe('');
    expect(run.stdout).toMatch(/^Wrote reviewed\.docx: 2 comments \(2 errors, 0 warnings, 0 notes\) on 2 claims of draft\.docx\./u);
    expect(run.code).toBe(1);
    expect(await readFile(join(dir, 'draft.docx'))).toEqual(original); // the draft is never written to

    const parts = unzipSync(await readFile(join(dir, 'reviewed.docx')));
    // ECMA-376 Part 1 §17.13.4.2: one w:comment per flag, its id matched by the document's markers.
    const comments = parse(parts['word/comments.xml']).getElementsByTagNameNS(W, 'comment');
    expect(comments.length).toBe(2);
    const texts = Array.from({ length: comments.length }, (_, i) => comments.item(i)?.textContent ?? '');
    expect(texts[0]).toContain('value.vostok-record-span');
    expect(texts[0]).toContain('Draft says: "800,000 years" (read as 795,000–805,000 years)');
    expect(texts[0]).toContain('Reference: 400,000–423,000 years');
    expect(texts[0]).toContain('Correction: about 420,000 years');
    expect(texts[0]).toContain('Source: Petit et al. 1999, https://doi.org/10.1038/20859');
    expect(texts[1]).toContain('Correction: about 278 ppm');

    const document = parse(parts['word/document.xml']);
    expect(Object.fromEntries(anchoredText(document))).toEqual({ '0': '800,000 years', '1': '350 ppm' });
    expect(document.getElementsByTagNameNS(W, 'commentReference').length).toBe(2);
    // The split run keeps its words: the paragraph still reads the same.
    expect(document.getElementsByTagNameNS(W, 'p').item(2)?.textContent).toBe('Before the industrial era, atmospheric CO2 stood near 350 ppm. Nothing else here.');

    // ECMA-376 Part 2: the part is named by a relationship and a content type override.
    expect(strFromU8(parts['word/_rels/document.xml.rels'] ?? new Uint8Array())).toContain(
      'Type="http://schemas.openxmlformats.org/officeDocument/2006/relationships/comments" Target="comments.xml"',
    );
    expect(strFromU8(parts['[Content_Types].xml'] ?? new Uint8Array())).toContain(
      '<Override PartName="/word/comments.xml" ContentType="application/vnd.openxmlformats-officedocument.wordprocessingml.comments+xml"/>',
    );
  });

  it('reads back with a converter (mammoth) as the same text, and checks the same', async () => {
    const dir = await draftFolder();
    await runCli(['annotate', 'draft.docx', '-o', 'reviewed.docx'], dir);
    const before = await mammoth.extractRawText({ path: join(dir, 'draft.docx') });
    const after = await mammoth.extractRawText({ path: join(dir, 'reviewed.docx') });
    expect(after.value).toBe(before.value);
    expect(after.value).toContain('The Vostok ice core spans 800,000 years.');
    const html = await mammoth.convertToHtml({ path: join(dir, 'reviewed.docx') });
    expect(html.messages.filter((m) => m.type === 'error')).toEqual([]);
    const check = async (file: string) => (JSON.parse((await runCli(['check', file, '--format', 'json'], dir)).stdout) as JsonReport).flags.map((f) => [f.ruleId, f.excerpt, f.paragraph]);
    expect(await check('reviewed.docx')).toEqual(await check('draft.docx'));
  });

  it('refuses to overwrite the draft, however the path is spelled, and leaves it as it was', async () => {
    const dir = await draftFolder();
    const original = await readFile(join(dir, 'draft.docx'));
    for (const output of ['draft.docx', './draft.docx', join(dir, 'draft.docx')]) {
      const run = await runCli(['annotate', 'draft.docx', '-o', output], dir);
      expect(run.code).toBe(2);
      expect(run.stderr).toBe(`${output}: the copy would overwrite the draft; name another file with -o\n`);
    }
    expect(await readFile(join(dir, 'draft.docx'))).toEqual(original);
  });

  it('takes only Word drafts', async () => {
    const dir = await draftFolder();
    await writeFile(join(dir, 'draft.md'), 'The Vostok ice core spans 800,000 years.\n');
    const run = await runCli(['annotate', 'draft.md', '-o', 'out.docx'], dir);
    expect(run.code).toBe(2);
    expect(run.stderr).toBe('draft.md: annotate writes comments into Word drafts only; give a .docx file\n');
  });

  it('cites a source in short: first author, et al., year and link', () => {
    // Petit et al. 1999, Nature 399, 429-436 (the built-in pack's citation form).
    expect(shortCitation({ id: 'p', cite: 'Petit, J. R., Jouzel, J. & Raynaud, D. (1999). Climate and atmospheric history. Nature 399, 429-436.', doi: '10.1038/20859', how: 'read in the source' })).toBe(
      'Petit et al. 1999, https://doi.org/10.1038/20859',
    );
    expect(shortCitation({ id: 'i', cite: 'IPCC (2021). Summary for Policymakers.', how: 'read in the source' })).toBe('IPCC 2021');
  });
});

describe('firnline annotate on a draft with links and comments of its own', () => {
  it('anchors inside a hyperlink, keeps the comments already there, and takes the next free ids', async () => {
    const dir = await mkdtemp(join(tmpdir(), 'firnline-annotate-'));
    const COMMENTS = `<?xml version="1.0" encoding="UTF-8"?><w:comments xmlns:w="${W}"><w:comment w:id="0" w:author="Editor"><w:p><w:r><w:t>Check the intro.</w:t></w:r></w:p></w:comment></w:comments>`;
    // The Vostok record spans about 420,000 years (Petit et al. 1999, Nature 399, 429-436).
    const body =
      heading('Ice cores') +
      '<w:p><w:commentRangeStart w:id="0"/><w:r><w:t xml:space="preserve">The Vostok ice core spans </w:t></w:r><w:commentRangeEnd w:id="0"/><w:r><w:commentReference w:id="0"/></w:r>' +
      '<w:hyperlink w:anchor="vostok"><w:r><w:t>800,000 years</w:t></w:r></w:hyperlink><w:r><w:t>.</w:t></w:r></w:p>';
    const extra = {
      'word/comments.xml': COMMENTS,
      'word/_rels/document.xml.rels':
        '<?xml version="1.0" encoding="UTF-8"?><Relationships xmlns="http://schemas.openxmlformats.org/package/2006/relationships">' +
        '<Relationship Id="rId1" Type="http://schemas.openxmlformats.org/officeDocument/2006/relationships/styles" Target="styles.xml"/>' +
        '<Relationship Id="rId2" Type="http://schemas.openxmlformats.org/officeDocument/2006/relationships/comments" Target="comments.xml"/></Relationships>',
    };
    await writeFile(join(dir, 'draft.docx'), buildDocx(body, extra));
    // The output folder does not exist: one line, exit 2, nothing half-written.
    const run = await runCli(['annotate', 'draft.docx', '-o', 'out/reviewed.docx'], dir);
    expect(run.code).toBe(2);
    expect(run.stderr).toMatch(/^\S*out\/reviewed\.docx: cannot write the annotated copy \(ENOENT\); check the folder exists and is writable\n$/u);

    const ok = await runCli(['annotate', 'draft.docx', '-o', 'reviewed.docx'], dir);
    expect(ok.code).toBe(1);
    const parts = unzipSync(await readFile(join(dir, 'reviewed.docx')));
    const comments = parse(parts['word/comments.xml']).getElementsByTagNameNS(W, 'comment');
    expect(Array.from({ length: comments.length }, (_, i) => comments.item(i)?.getAttributeNS(W, 'id'))).toEqual(['0', '1']);
    expect(comments.item(0)?.textContent).toBe('Check the intro.');
    const document = parse(parts['word/document.xml']);
    expect(Object.fromEntries(anchoredText(document))).toEqual({ '0': 'The Vostok ice core spans ', '1': '800,000 years' });
    expect(document.getElementsByTagNameNS(W, 'hyperlink').item(0)?.getElementsByTagNameNS(W, 'commentRangeStart').length).toBe(1);
    const after = await mammoth.extractRawText({ path: join(dir, 'reviewed.docx') });
    expect(after.value).toBe((await mammoth.extractRawText({ path: join(dir, 'draft.docx') })).value);
  });
});
