/**
 * A post's byline in a comment section, a forum or a thread: who wrote it and when, on a line of its
 * own, before the post ("BigSkyBarb · 5h", "@mossy_bank · 2 days ago · ♥ 12", "Hal Brisco — Mar 3,
 * 2026", "oldsalt · Member · 9,870 posts"). A byline is no sentence: the post starts on the next line,
 * and a block quote that opens with one is a reply in its writer's own voice, not a quotation.
 *
 * The reader is structural: a short line cut into fields by a separator (middle dot, bullet, bar, dash),
 * whose first field is a name or a handle and some later field a time stamp (a number with a unit of
 * elapsed time, "N units ago", a month and a day, a clock time, "yesterday") or a count of the
 * writer's posts or of the post's votes. Common practice of comment and forum software.
 */

/** Fields of a byline: separated by a middle dot, a bullet, a bar or a dash with space around it. */
const SEPARATOR = /\s+[·•|—–-]\s+|\s*[·•|]\s*/u;

/** Units of elapsed time as comment software abbreviates or spells them. */
const ELAPSED_UNIT = String.raw`(?:s|m|h|d|w|mo|y|yr|yrs|min|mins|hr|hrs|sec|secs|seconds?|minutes?|hours?|days?|weeks?|months?|years?)`;
const MONTH = String.raw`(?:jan|feb|mar|apr|may|jun|jul|aug|sep|sept|oct|nov|dec)[a-z]*\.?`;

/** One field that tells when the post was written. */
const WHEN = new RegExp(
  String.raw`^(?:\d{1,3}\s?${ELAPSED_UNIT}(?:\s+ago)?|(?:an?|one)\s+${ELAPSED_UNIT}\s+ago|yesterday|today|just now|edited|${MONTH}\s+\d{1,2}(?:,?\s+\d{4})?|\d{1,2}\s+${MONTH}(?:\s+\d{4})?|\d{4}-\d{2}-\d{2}|\d{1,2}:\d{2}(?:\s?[ap]\.?m\.?)?)$`,
  'iu',
);

/** One field that counts the writer's posts or the post's standing ("9,870 posts", "♥ 12", "12 votes"). */
const COUNT = /^(?:[♥❤▲↑+]\s*\d[\d,]*|\d[\d,]*\s+(?:posts?|votes?|points?|likes?|replies|reply|comments?|upvotes?|karma))$/iu;

/** The first field: a name of up to four words or a handle, or a name and a handle ("Ana Ruiz @ana_r"), with no sentence in it. */
const NAME = /^[@]?[\p{L}\p{N}_.'’-]+(?:\s@?[\p{L}\p{N}_.'’-]+){0,3}$/u;

/** Markup and reply marks around a byline: emphasis, a quote mark, a reply arrow. */
const DECORATION = /^[\s>↳*_]+|[\s*_:]+$/gu;

/** True when `line` (one line, markup stripped or not) is a post's byline. */
export function isByline(line: string): boolean {
  if (line.length > 100) return false;
  const text = line.replace(DECORATION, '').replace(/[*_]+/gu, '');
  if (text.length === 0 || text.length > 80 || /[.!?]$/u.test(text)) return false;
  const fields = text.split(SEPARATOR).map((f) => f.trim()).filter((f) => f.length > 0);
  if (fields.length < 2 || !NAME.test(fields[0] ?? '')) return false;
  return fields.slice(1).some((f) => WHEN.test(f) || COUNT.test(f));
}
