import type { Flag } from '../../types.js';
import { formatNumber, formatRange } from '../format-value.js';
import { escapeHtml } from './escape-html.js';

// The plot's size in SVG units; the page scales it to the column width.
const WIDTH = 640;
const LEFT = 16;
const RIGHT = WIDTH - 16;
const HEIGHT = 118;
const AXIS_Y = 96;

/** The unit as written after a number on the plot (the reports' own words for canonical units). */
function unitWord(unit: string): string {
  const words: Record<string, string> = { degC: '°C', 'ppm/yr': 'ppm per year', 'K/yr': '°C per year', ratio: 'times', count: '' };
  return words[unit] ?? unit;
}

/** True when a flag can be drawn: a draft interval and a reference range in one unit, each with a finite end. */
export function canPlot(flag: Flag): boolean {
  const { claimed, reference } = flag;
  if (claimed === undefined || reference === undefined || claimed.unit !== reference.unit) return false;
  const hasFiniteEnd = (value: { low: number; high: number }) => Number.isFinite(value.low) || Number.isFinite(value.high);
  return hasFiniteEnd(claimed) && hasFiniteEnd(reference);
}

/** Round tick steps: 1, 2 or 5 times a power of ten, about four ticks across the domain. */
function ticks(low: number, high: number): number[] {
  const raw = (high - low) / 4;
  const power = 10 ** Math.floor(Math.log10(raw));
  const step = [1, 2, 5, 10].map((m) => m * power).find((s) => s >= raw) ?? raw;
  const out: number[] = [];
  for (let t = Math.ceil(low / step) * step; t <= high + step * 1e-9; t += step) out.push(Number(t.toPrecision(12)));
  return out;
}

/**
 * The number line of one numeric flag: the reference range as a hatched band with its ends
 * labelled, the draft's interval as a solid bar with round caps and its ends labelled, both over one
 * axis with round ticks and the unit. An open end (`more than`, `at least`) runs to the edge with an
 * arrow. Shapes and labels tell the two apart without colour. Returns the SVG element as text.
 */
export function numberLine(flag: Flag, id: string): string {
  const claimed = flag.claimed;
  const reference = flag.reference;
  if (claimed === undefined || reference === undefined) return '';
  const values = [claimed.low, claimed.high, reference.low, reference.high].filter(Number.isFinite);
  let low = Math.min(...values);
  let high = Math.max(...values);
  if (high === low) {
    low -= Math.abs(low) * 0.1 || 1;
    high += Math.abs(high) * 0.1 || 1;
  }
  const pad = (high - low) * 0.12;
  low -= pad;
  high += pad;
  const x = (v: number) => (v === -Infinity ? LEFT : v === Infinity ? RIGHT : LEFT + ((v - low) / (high - low)) * (RIGHT - LEFT));
  const unit = unitWord(claimed.unit);
  const tickMarks = ticks(low, high)
    .map((t) => `<line x1="${x(t).toFixed(1)}" y1="${AXIS_Y}" x2="${x(t).toFixed(1)}" y2="${AXIS_Y + 5}"/><text class="tick" x="${x(t).toFixed(1)}" y="${AXIS_Y + 17}" text-anchor="middle">${escapeHtml(formatNumber(t))}</text>`)
    .join('');
  const referenceText = `reference ${formatRange(reference.low, reference.high, reference.unit)}`;
  const draftText = `draft ${formatRange(claimed.low, claimed.high, claimed.unit)}`;
  const title = `Number line: the draft's ${formatRange(claimed.low, claimed.high, claimed.unit)} against the reference ${formatRange(reference.low, reference.high, reference.unit)}.`;
  const [r0, r1] = [x(reference.low), x(reference.high)];
  const [d0, d1] = [x(claimed.low), x(claimed.high)];
  return [
    `<svg class="number-line" viewBox="0 0 ${WIDTH} ${HEIGHT}" role="img" aria-labelledby="${id}-t" preserveAspectRatio="xMinYMid meet">`,
    `<title id="${id}-t">${escapeHtml(title)}</title>`,
    `<defs><pattern id="${id}-h" width="6" height="6" patternUnits="userSpaceOnUse" patternTransform="rotate(45)"><line x1="0" y1="0" x2="0" y2="6" class="hatch"/></pattern></defs>`,
    `<g class="reference"><rect x="${r0.toFixed(1)}" y="18" width="${Math.max(2, r1 - r0).toFixed(1)}" height="22" fill="url(#${id}-h)"/>`,
    `<rect x="${r0.toFixed(1)}" y="18" width="${Math.max(2, r1 - r0).toFixed(1)}" height="22" class="outline"/>`,
    label(referenceText, (r0 + r1) / 2, 12),
    openEnds(reference.low, reference.high, 29),
    '</g>',
    `<g class="draft"><line x1="${d0.toFixed(1)}" y1="62" x2="${d1.toFixed(1)}" y2="62" class="bar"/>`,
    // Caps closer than their own size would merge into one blot: a narrow interval gets one round mark.
    d1 - d0 < 12 && Number.isFinite(claimed.low) && Number.isFinite(claimed.high)
      ? `<circle cx="${((d0 + d1) / 2).toFixed(1)}" cy="62" r="5"/>`
      : [
          Number.isFinite(claimed.low) ? `<circle cx="${d0.toFixed(1)}" cy="62" r="5"/>` : '',
          Number.isFinite(claimed.high) ? `<circle cx="${d1.toFixed(1)}" cy="62" r="5"/>` : '',
        ].join(''),
    label(draftText, (d0 + d1) / 2, 82),
    openEnds(claimed.low, claimed.high, 62),
    '</g>',
    `<g class="axis"><line x1="${LEFT}" y1="${AXIS_Y}" x2="${RIGHT}" y2="${AXIS_Y}"/>${tickMarks}`,
    unit === '' ? '' : `<text class="unit" x="${RIGHT}" y="${HEIGHT - 2}" text-anchor="end">${escapeHtml(unit)}</text>`,
    '</g></svg>',
  ].join('');
}

/** A label centred on `at` but kept inside the plot (long labels move in from the edges). */
function label(text: string, at: number, y: number): string {
  const half = (text.length * 6.2) / 2;
  const centre = Math.min(Math.max(at, LEFT + half), RIGHT - half);
  return `<text x="${centre.toFixed(1)}" y="${y}" text-anchor="middle">${escapeHtml(text)}</text>`;
}

/** Arrow heads at the plot's edges for an open interval end. */
function openEnds(low: number, high: number, y: number): string {
  const arrows: string[] = [];
  if (low === -Infinity) arrows.push(`<path class="open-end" d="M${LEFT} ${y} l8 -5 v10 z"/>`);
  if (high === Infinity) arrows.push(`<path class="open-end" d="M${RIGHT} ${y} l-8 -5 v10 z"/>`);
  return arrows.join('');
}
