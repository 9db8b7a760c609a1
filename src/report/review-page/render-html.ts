import { createHash } from 'node:crypto';
import { LEVELS, type CheckResult, type Claim, type Flag, type Level } from '../../types.js';
import { formatReference } from '../describe-flag.js';
import { formatPlace } from '../format-place.js';
import { formatSource, isFromMemory, sourceLink } from '../format-source.js';
import { asSentence, formatClaimed } from '../format-value.js';
import type { ReportOptions } from '../report-options.js';
import { sortByPlace } from '../sort.js';
import { countOf, summarize } from '../summarize.js';
import { escapeHtml as esc, safeHref } from './escape-html.js';
import { canPlot, numberLine } from './number-line.js';
import { PAGE_SCRIPT } from './page-script.js';
import { PAGE_STYLE } from './page-style.js';

/** Each level's shape (a 16×16 SVG path): a diamond, a triangle, a circle; the colour comes on top. */
const LEVEL_SHAPE: Record<Level, string> = {
  error: '<path d="M8 0 16 8 8 16 0 8z"/>',
  warning: '<path d="M8 1 16 15H0z"/>',
  note: '<circle cx="8" cy="8" r="6"/>',
};

const CAUTION =
  'Firnline supports, and does not replace, expert review. Reference values carry uncertainty and dates, and new ' +
  'literature can move them. Flags are suggestions for an editor to judge; the sources are what to read.';

/**
 * `--format html`: the review page, one self-contained file (inline style and script, no network:
 * its Content-Security-Policy forbids any fetch). A summary; a filter by level and rule; per file,
 * each claim with its flags, a number line for each numeric flag, the suggested rewording for an
 * argument error, and the sources as links. Every piece of draft text is escaped.
 */
export function renderHtml(result: CheckResult, options: ReportOptions): string {
  const s = summarize(result);
  const flagsByClaim = new Map<string, Flag[]>();
  const lone: Flag[] = [];
  const claimIds = new Set(result.claims.map((c) => c.id));
  for (const flag of result.flags) {
    if (flag.claimId !== undefined && claimIds.has(flag.claimId)) flagsByClaim.set(flag.claimId, [...(flagsByClaim.get(flag.claimId) ?? []), flag]);
    else lone.push(flag);
  }
  const items: Item[] = [
    ...result.claims.map((claim) => ({ file: claim.file, span: claim.span, claim, flags: sortByPlace(flagsByClaim.get(claim.id) ?? []) })),
    ...lone.map((flag) => ({ file: flag.file, span: flag.span, flags: [flag] })),
  ];
  const files = [...new Set([...result.files, ...items.map((i) => i.file)])];
  const sections = files
    .map((file, index) => ({ file, index, items: sortByPlace(items.filter((i) => i.file === file)) }))
    .filter((section) => section.items.length > 0);
  const rules = [...new Set(result.flags.map((f) => f.ruleId))].sort();
  const script = PAGE_SCRIPT;
  const scriptHash = createHash('sha256').update(script).digest('base64');
  const title = `Firnline review: ${countOf(s.flags, 'flag')} in ${countOf(result.files.length, 'file')}`;
  let plotCount = 0;
  const nextPlotId = () => `plot-${(plotCount += 1)}`;

  return [
    '<!doctype html>',
    '<html lang="en">',
    '<head>',
    '<meta charset="utf-8">',
    `<meta http-equiv="Content-Security-Policy" content="default-src 'none'; style-src 'unsafe-inline'; script-src 'sha256-${scriptHash}'">`,
    '<meta name="viewport" content="width=device-width, initial-scale=1">',
    `<meta name="generator" content="Firnline ${esc(options.toolVersion)}">`,
    `<title>${esc(title)}</title>`,
    `<style>${PAGE_STYLE}</style>`,
    '</head>',
    '<body><main>',
    '<header>',
    '<h1>Claims to review</h1>',
    `<p class="caution">${esc(CAUTION)}</p>`,
    '</header>',
    summarySection(result, s, sections),
    filterForm(result.flags, rules),
    ...sections.map((section) => fileSection(section.file, section.index, section.items, nextPlotId)),
    sections.length === 0 ? '<p class="empty">No claims found.</p>' : '',
    result.skipped.length === 0 ? '' : skippedList(result.skipped),
    '</main>',
    `<script>${script}</script>`,
    '</body>',
    '</html>',
    '',
  ].join('\n');
}

interface Item {
  file: string;
  span: Claim['span'];
  claim?: Claim;
  flags: Flag[];
}

function summarySection(result: CheckResult, s: ReturnType<typeof summarize>, sections: { file: string; index: number; items: Item[] }[]): string {
  const cells = [
    [String(result.files.length), result.files.length === 1 ? 'file checked' : 'files checked'],
    [String(s.claims), s.claims === 1 ? 'claim found' : 'claims found'],
    [String(s.error), s.error === 1 ? 'error' : 'errors'],
    [String(s.warning), s.warning === 1 ? 'warning' : 'warnings'],
    [String(s.note), s.note === 1 ? 'note' : 'notes'],
    [String(s.skipped), 'skipped'],
  ];
  const links = sections.map((section) => {
    const flags = section.items.reduce((n, i) => n + i.flags.length, 0);
    return `<li><a href="#file-${section.index}">${esc(section.file)}</a>: ${esc(countOf(section.items.length, 'claim'))}, ${esc(countOf(flags, 'flag'))}</li>`;
  });
  return [
    '<section aria-label="Summary">',
    `<div class="summary">${cells.map(([n, label]) => `<div><b>${n}</b>${label}</div>`).join('')}</div>`,
    links.length === 0 ? '' : `<ul class="files">${links.join('')}</ul>`,
    '</section>',
  ].join('\n');
}

function filterForm(flags: Flag[], rules: string[]): string {
  const count = (level: Level) => flags.filter((f) => f.level === level).length;
  const boxes = LEVELS.map(
    (level) => `<label><input type="checkbox" name="level" value="${level}" checked> ${shape(level)} ${level} (${count(level)})</label>`,
  );
  boxes.push('<label><input type="checkbox" name="level" value="none" checked> claims without flags</label>');
  const options = ['<option value="">all rules</option>', ...rules.map((r) => `<option value="${esc(r)}">${esc(r)}</option>`)];
  return [
    `<form id="filters" class="filters" data-total="${flags.length}" hidden>`,
    `<fieldset><legend>Show</legend>${boxes.join('')}</fieldset>`,
    `<label>Rule <select name="rule">${options.join('')}</select></label>`,
    '<output id="shown" class="shown" aria-live="polite"></output>',
    '</form>',
  ].join('\n');
}

function fileSection(file: string, index: number, items: Item[], nextPlotId: () => string): string {
  return [`<section class="file" id="file-${index}">`, `<h2>${esc(file)}</h2>`, ...items.map((item) => claimArticle(item, nextPlotId)), '</section>'].join('\n');
}

function claimArticle(item: Item, nextPlotId: () => string): string {
  const worst = LEVELS.find((level) => item.flags.some((f) => f.level === level));
  const sentence = item.claim?.text ?? item.flags[0]?.sentence ?? '';
  const place = item.claim ?? item.flags[0];
  const heading = item.claim?.heading ?? '';
  const verdict = item.claim === undefined ? '' : `<span class="verdict">verdict: ${esc(item.claim.verdict)}</span>`;
  return [
    `<article class="claim${worst === undefined ? '' : ` worst-${worst}`}">`,
    `<div class="place">${place === undefined ? '' : esc(formatPlace(place))}${heading !== '' && place?.paragraph === undefined ? ` · under “${esc(heading)}”` : ''}</div>`,
    `<p class="sentence">${markExcerpts(sentence, item.flags)}</p>`,
    verdict,
    ...item.flags.map((flag) => flagBlock(flag, nextPlotId)),
    '</article>',
  ].join('\n');
}

/** The sentence, escaped, with each flag's words marked (the first place they occur; overlaps left plain). */
function markExcerpts(sentence: string, flags: Flag[]): string {
  const ranges: [number, number][] = [];
  for (const flag of flags) {
    const at = flag.excerpt === '' ? -1 : sentence.indexOf(flag.excerpt);
    if (at >= 0 && !ranges.some(([a, b]) => at < b && a < at + flag.excerpt.length)) ranges.push([at, at + flag.excerpt.length]);
  }
  ranges.sort((a, b) => a[0] - b[0]);
  let out = '';
  let last = 0;
  for (const [a, b] of ranges) {
    out += `${esc(sentence.slice(last, a))}<mark>${esc(sentence.slice(a, b))}</mark>`;
    last = b;
  }
  return out + esc(sentence.slice(last));
}

function flagBlock(flag: Flag, nextPlotId: () => string): string {
  const rows: string[] = [];
  const row = (label: string, html: string) => rows.push(`<dt>${label}</dt><dd>${html}</dd>`);
  row('draft says', esc(flag.claimed === undefined ? `“${flag.excerpt}”` : formatClaimed(flag.claimed)));
  if (flag.reference !== undefined) row('reference', esc(formatReference(flag.reference)));
  if (flag.correction !== undefined) row('correction', `<span class="correction">“${esc(flag.correction)}”</span>`);
  else if (flag.suggestion !== undefined) row('suggested rewording', esc(asSentence(flag.suggestion)));
  if (flag.signoff !== undefined) row('signed off', esc(`by ${flag.signoff.reviewer} on ${flag.signoff.date} (${flag.signoff.decision})`));
  const plot = canPlot(flag) ? numberLine(flag, nextPlotId()) : '';
  return [
    `<div class="flag level-${flag.level}" data-level="${flag.level}" data-rule="${esc(flag.ruleId)}">`,
    `<div class="flag-head"><span class="badge">${shape(flag.level)}${flag.level}</span><span class="rule">${esc(flag.ruleId)}</span></div>`,
    `<p>${esc(asSentence(flag.reason))}</p>`,
    plot,
    `<dl>${rows.join('')}</dl>`,
    flag.sources.length === 0 ? '' : `<ol class="sources">${flag.sources.map(sourceItem).join('')}</ol>`,
    '</div>',
  ].join('\n');
}

function sourceItem(source: Flag['sources'][number]): string {
  const href = safeHref(sourceLink(source));
  const memory = isFromMemory(source) ? ' <span class="memory">(from memory: check before relying on it)</span>' : '';
  if (href === undefined) return `<li>${esc(formatSource(source))}${memory}</li>`;
  return `<li><a href="${esc(href)}" rel="noreferrer">${esc(source.cite.trim())}</a>${memory}</li>`;
}

function skippedList(skipped: CheckResult['skipped']): string {
  return `<section class="skipped" aria-label="Files not checked"><h2>Not checked</h2><ul>${skipped
    .map(({ file, reason }) => `<li>${esc(file)}: ${esc(reason)}</li>`)
    .join('')}</ul></section>`;
}

function shape(level: Level): string {
  return `<svg viewBox="0 0 16 16" aria-hidden="true" class="shape-${level}">${LEVEL_SHAPE[level]}</svg>`;
}
