import { createHash } from 'node:crypto';
import { parse, type DefaultTreeAdapterTypes } from 'parse5';
import { beforeAll, describe, expect, it } from 'vitest';
import { escapeHtml, safeHref } from '../../../src/report/review-page/escape-html.js';
import { HOSTILE, reviewPage } from './review-drafts.js';

type Element = DefaultTreeAdapterTypes.Element;
type Node = DefaultTreeAdapterTypes.ChildNode | DefaultTreeAdapterTypes.Document;

function elements(node: Node, out: Element[] = []): Element[] {
  if ('tagName' in node) out.push(node);
  if ('childNodes' in node) for (const child of node.childNodes) elements(child, out);
  if ('content' in node) elements(node.content as unknown as Node, out);
  return out;
}
const attr = (e: Element, name: string) => e.attrs.find((a) => a.name === name)?.value;
const classes = (e: Element) => (attr(e, 'class') ?? '').split(/\s+/u);
function text(node: Node): string {
  if (node.nodeName === '#text') return (node as DefaultTreeAdapterTypes.TextNode).value;
  return 'childNodes' in node ? node.childNodes.map((c) => text(c)).join('') : '';
}

let html = '';
let all: Element[] = [];
beforeAll(async () => {
  html = (await reviewPage()).html;
  // Parsed as a browser would (parse5 follows the WHATWG HTML parsing algorithm).
  all = elements(parse(html));
});

describe('the review page (--format html), parsed', () => {
  it('is one self-contained file: no external resource, a policy that forbids any fetch, one inline script whose hash it names', () => {
    expect(all.filter((e) => attr(e, 'src') !== undefined)).toEqual([]);
    expect(all.filter((e) => e.tagName === 'link')).toEqual([]);
    for (const a of all.filter((e) => e.tagName === 'a')) expect(attr(a, 'href')).toMatch(/^(#file-\d+|https?:\/\/)/u);
    const scripts = all.filter((e) => e.tagName === 'script');
    expect(scripts).toHaveLength(1);
    const policy = attr(all.find((e) => attr(e, 'http-equiv') === 'Content-Security-Policy')!, 'content') ?? '';
    const hash = createHash('sha256').update(text(scripts[0]!)).digest('base64');
    // CSP Level 3 §2.3.1: a hash source matches an inline script whose text digests to it.
    expect(policy).toBe(`default-src 'none'; style-src 'unsafe-inline'; script-src 'sha256-${hash}'`);
  });

  it('shows draft text as text: markup-like words in a draft never become elements', () => {
    expect(all.filter((e) => e.attrs.some((a) => a.name.startsWith('on')))).toEqual([]);
    const sentences = all.filter((e) => classes(e).includes('sentence')).map((e) => text(e));
    expect(sentences).toContain(`The Vostok ice core spans 800,000 years ${HOSTILE}.`);
    expect(html).toContain('Cores &amp; &lt;CO2&gt;');
    expect(escapeHtml(`a<b>"c"&'d'`)).toBe('a&lt;b&gt;&quot;c&quot;&amp;&#39;d&#39;');
    expect(safeHref('javascript:alert(1)')).toBeUndefined();
  });

  it('sums up, then lists each file with each claim and its flags', () => {
    const summary = text(all.find((e) => classes(e).includes('summary'))!);
    expect(summary).toContain('3files checked');
    expect(summary).toContain('3errors1warning0notes');
    const files = all.filter((e) => e.tagName === 'section' && classes(e).includes('file'));
    expect(files.map((f) => text(f.childNodes.find((c) => 'tagName' in c && c.tagName === 'h2') as Node))).toEqual([
      'drafts/cores.md',
      'drafts/letter.docx',
      'drafts/page.html',
    ]);
    const flags = all.filter((e) => classes(e).includes('flag'));
    expect(flags.map((f) => [attr(f, 'data-level'), attr(f, 'data-rule')])).toEqual([
      ['error', 'value.edc-record-span'],
      ['warning', 'logic.lag-rules-out-cause'],
      ['error', 'value.co2-preindustrial-1750'],
      ['error', 'value.vostok-record-span'],
    ]);
    // A Word draft's claim is placed by paragraph and heading.
    expect(all.filter((e) => classes(e).includes('place')).map((e) => text(e))).toContain('drafts/letter.docx, paragraph 2 (under "Before industry")');
  });

  it('draws a number line for every numeric flag, with both ranges, their ends and the unit written out', () => {
    const numeric = all.filter((e) => classes(e).includes('flag') && attr(e, 'data-rule')?.startsWith('value.'));
    expect(numeric).toHaveLength(3);
    for (const flag of numeric) expect(elements(flag).filter((e) => e.tagName === 'svg' && classes(e).includes('number-line'))).toHaveLength(1);
    const vostok = numeric.find((f) => attr(f, 'data-rule') === 'value.vostok-record-span')!;
    const labels = elements(vostok).filter((e) => e.tagName === 'text').map((e) => text(e));
    // Petit et al. 1999: the pack's range for the Vostok record is 400,000 to 423,000 years.
    expect(labels).toEqual(expect.arrayContaining(['reference 400,000–423,000 years', 'draft 795,000–805,000 years']));
    expect(elements(vostok).find((e) => e.tagName === 'title') && text(elements(vostok).find((e) => e.tagName === 'title')!)).toBe(
      "Number line: the draft's 795,000–805,000 years against the reference 400,000–423,000 years.",
    );
  });

  it('gives a reasoning flag its suggested rewording, and every source as a link', () => {
    const lag = all.find((e) => attr(e, 'data-rule') === 'logic.lag-rules-out-cause')!;
    const terms = elements(lag).filter((e) => e.tagName === 'dt').map((e) => text(e));
    expect(terms).toContain('suggested rewording');
    expect(elements(lag).some((e) => e.tagName === 'svg' && classes(e).includes('number-line'))).toBe(false);
    const links = elements(lag).filter((e) => e.tagName === 'a').map((e) => attr(e, 'href'));
    // Shakun et al. 2012, Nature 484, 49-54.
    expect(links).toContain('https://doi.org/10.1038/nature10915');
  });

  it('marks each level by a shape and a written label as well as by colour, and has print rules', () => {
    const badges = all.filter((e) => classes(e).includes('badge'));
    for (const badge of badges) {
      expect(elements(badge).some((e) => e.tagName === 'svg')).toBe(true);
      expect(['error', 'warning', 'note']).toContain(text(badge));
    }
    expect(html).toContain('@media print');
  });
});
