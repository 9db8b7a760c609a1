/**
 * Checks unit use in one sentence: conversions restated in another unit (ppm ↔ %, °C ↔ °F for
 * changes and readings, BCE/CE ↔ years ago/BP/b2k, m ↔ ft, kyr ↔ years) and CO2 levels written in
 * the wrong unit. Each flag carries the right value in the correction and cites the definition
 * (NIST SP 811 for factors; Stuiver & Polach 1977 for BP; Walker et al. 2009 for b2k).
 */
import { closeFigures, correctionFigures, formatQuantity, fromCanonical, parseQuantities, toCanonical } from '../quantities/index.js';
import type { FlagDraft, Quantity } from '../types.js';
import { correctionFor } from './arithmetic.js';
import { disjoint, levelFor } from './arithmetic-levels.js';
import { shownClaim } from './reference-format.js';
import { UNIT_RULES } from './units-rules.js';

const SCALE_NAME = /(?:^|[^\p{L}])(fahrenheit|celsius|centigrade)(?![\p{L}])/giu;
const BARE_DEGREES = /^[\s\u00A0]+degrees?(?![\p{L}])(?![\s\u00A0]*(?:°|c\b|f\b|celsius|fahrenheit|centigrade|kelvin|north|south|east|west|of[\s\u00A0]+(?:latitude|longitude|arc)))/iu;

/**
 * "In Fahrenheit terms, a 9-degree Celsius swing comes to about 41 degrees": a bare number of
 * degrees in a sentence that names one scale in words, outside its other figures, is read in that
 * scale (a writer names the scale once and leaves it off the figure). Two scales named, or none,
 * leave it a bare number.
 */
function withNamedScale(text: string, qs: Quantity[]): Quantity[] {
  const inFigure = (at: number): boolean => qs.some((q) => q.start <= at && at < q.end);
  const named = new Set([...text.matchAll(SCALE_NAME)].filter((m) => !inFigure((m.index ?? 0) + m[0].length - 1)).map((m) => (m[1] as string).toLowerCase().replace('centigrade', 'celsius')));
  const eras = new Set([...text.matchAll(ERA_NAME)].filter((m) => !inFigure((m.index ?? 0) + m[0].length - 1)).map((m) => (m[1] as string).toLowerCase()));
  const dated = eras.size === 1 ? withNamedEra(text, qs, [...eras][0] as string) : qs;
  if (named.size !== 1) return dated;
  const [scale] = [...named] as [string];
  const temperatures = dated.filter((q) => q.dimension === 'temperature' || q.dimension === 'temperature-change');
  // "In Fahrenheit, that's about 43 degrees colder": a figure of bare degrees took the default
  // scale; when no figure of the sentence marks a scale of its own, it is in the scale named.
  const unmarked = temperatures.length > 0 && temperatures.every((q) => UNMARKED_DEGREES.test(q.text));
  return dated.map((q) => {
    if (unmarked && temperatures.includes(q)) return inScale(q, scale);
    const bare = q.dimension === 'number' ? BARE_DEGREES.exec(text.slice(q.end)) : null;
    const after = bare ?? (q.dimension === 'number' ? IN_NAMED_SCALE.exec(text.slice(q.end)) : null);
    if (after === null) return q;
    const end = q.end + after[0].length;
    const [read] = parseQuantities(bare === null ? `${q.text} degrees ${scale}` : `${text.slice(q.start, end)} ${scale}`);
    if (read === undefined || (read.dimension !== 'temperature' && read.dimension !== 'temperature-change')) return q;
    return { ...read, start: q.start, end, text: text.slice(q.start, end) };
  });
}

/**
 * "6 degrees C of cooling is 43 in fahrenheit": a bare number followed by "in" and the scale named
 * in words is a figure on that scale (the scale named right after the number, not on it).
 */
const IN_NAMED_SCALE = /^(?:[\s\u00A0]+degrees?)?[\s\u00A0]+in[\s\u00A0]+(?:degrees[\s\u00A0]+)?(?:fahrenheit|celsius|centigrade)(?![\p{L}])/iu;

/** A temperature figure written as bare degrees, with no scale of its own: "about 43 degrees". */
const UNMARKED_DEGREES = /^[^°℃℉]*[\s\u00A0]degrees?$/iu;

/** `q`, written in bare degrees, read in the scale `scale` with its reading (change or temperature) kept. */
function inScale(q: Quantity, scale: string): Quantity {
  const [read] = parseQuantities(`${q.text} ${scale}`);
  if (read === undefined || (read.dimension !== 'temperature' && read.dimension !== 'temperature-change')) return q;
  const unit = read.statedUnit;
  const again = (x: number): number => toCanonical(fromCanonical(x, unit, read.dimension), unit, q.dimension);
  return { ...q, statedUnit: unit, value: again(read.value), low: again(read.low), high: again(read.high) };
}

const ERA_NAME = /(?:^|[^\p{L}])(bp|b2k)(?![\p{L}])/giu;
/** "in BP it is", "on the b2k scale that's": the era named, then the figure it is read in. */
const ERA_LEAD = /(?:^|[^\p{L}])(?:in|on|as)[\s\u00A0]+(?:the[\s\u00A0]+)?(?:bp|b2k)(?:[\s\u00A0]+(?:terms|scale|years))?[^\d.;:!?]{0,24}$/iu;

/**
 * "BP counts from 1950, so in BP it is 11,750 years": a span of plain years after the one era a
 * sentence names ("in BP", "on the b2k scale") is a date in that era, as a restatement writes it.
 */
function withNamedEra(text: string, qs: Quantity[], era: string): Quantity[] {
  return qs.map((q) => {
    // "which in BP terms is 11,750": a bare number after the era named is a date in it too.
    const plain = (q.dimension === 'duration' && q.statedUnit === 'yr') || (q.dimension === 'number' && q.statedUnit === '');
    if (!plain || !ERA_LEAD.test(text.slice(Math.max(0, q.start - 48), q.start))) return q;
    const [read] = parseQuantities(`${q.text} ${era.toUpperCase() === 'BP' ? 'BP' : 'b2k'}`);
    return read === undefined || read.dimension !== 'age' ? q : { ...read, start: q.start, end: q.end, text: q.text };
  });
}

/**
 * Every unit slip in one sentence. `context` is the sentences before it in the same paragraph, in
 * order; the last one is read for a date or level that this sentence restates ("... at 11,700
 * b2k. That is 11,650 years BP."). Flags always fall on this sentence's own words.
 */
export function checkUnits(text: string, parsed: Quantity[], context: readonly string[] = []): FlagDraft[] {
  // "11,700 years before AD 2000": the reference year inside a date is no figure of its own here.
  const outer = parsed.filter((q) => !parsed.some((o) => o !== q && o.start <= q.start && q.end <= o.end && o.end - o.start > q.end - q.start));
  const quantities = withNamedScale(text, outer);
  const last = context[context.length - 1];
  const previous = last === undefined ? undefined : { text: last, quantities: parseQuantities(last), earlier: context.slice(-3) };
  const flags: FlagDraft[] = [];
  for (const rule of UNIT_RULES) {
    for (const f of rule.find(text, quantities, previous)) {
      const single = f.level !== undefined;
      if (!single && !disjoint(f.stated, f.computed)) continue;
      const q: Quantity = f.stated;
      // One explanation per figure: "800 ka, which is 800 million years ago" is a restatement a
      // thousand times off (unit.age-era) and a span no core holds (unit.age-scale); the first rule says it.
      if (flags.some((o) => o.start === q.start && o.end === q.end)) continue;
      // A share of the air is rounded as the draft rounded its own, unless that moves it more than one
      // percent (closeFigures): "0.42 percent" of 424 ppm is "0.042 percent", as a writer gives a share.
      // Dates, lengths and temperatures keep three figures at least: "11,949 years ago" is "11,900".
      const share = q.dimension === 'percent' && f.unit === undefined;
      const figures = f.figures ?? (share ? closeFigures(f.computed.value, correctionFigures(q, 2)) : correctionFigures(q));
      const right = single ? (f.correction ?? q.text) : formatQuantity(f.computed.value, q.unit, q.statedUnit, figures);
      flags.push({
        ruleId: rule.id,
        level: f.level ?? levelFor(q, f.computed),
        start: q.start,
        end: q.end,
        reason: single ? f.reason : `${q.text} should be ${right}. ${f.reason}`,
        claimed: shownClaim(q),
        reference: { id: rule.id, measures: rule.summary, text: right, low: f.computed.low, high: f.computed.high, unit: f.unit ?? q.unit },
        correction: f.correction ?? correctionFor(q, f.computed.value, figures),
        sources: f.sources,
      });
    }
  }
  return flags.sort((a, b) => a.start - b.start);
}
