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

/**
 * Fields of a byline: separated by a middle dot, a bullet, a bar, a dash or a full stop with space
 * around it ("@ana . 10:15 am"), or by a reply arrow ("2h  ↳ replying to gritstone77").
 */
const SEPARATOR = /\s+[·•|—–.-]\s+|\s*[·•|↳↪]\s*/u;

/** Units of elapsed time as comment software abbreviates or spells them. */
const ELAPSED_UNIT = String.raw`(?:s|m|h|d|w|mo|y|yr|yrs|min|mins|hr|hrs|sec|secs|seconds?|minutes?|hours?|days?|weeks?|months?|years?)`;
const MONTH = String.raw`(?:jan|feb|mar|apr|may|jun|jul|aug|sep|sept|oct|nov|dec)[a-z]*\.?`;
/** A clock time: "11:20", "3:10pm", "12:05 a.m.". */
const CLOCK = String.raw`\d{1,2}:\d{2}(?:\s?[ap]\.?m\.?)?`;

/**
 * One piece of a time stamp: an elapsed time, a day, a date or a clock time. A stamp is one to
 * three pieces, with commas or spaces between, and a time zone in brackets after them, as wiki
 * signatures and mail headers write it ("12:31, 3 May 2025 (UTC)", "5 Mar 2026 11:20").
 */
const WHEN_PIECE = String.raw`(?:\d{1,3}\s?${ELAPSED_UNIT}(?:\s+ago)?|(?:an?|one)\s+${ELAPSED_UNIT}\s+ago|yesterday|today|just now|edited|${MONTH}\s+\d{1,2}(?:,?\s+\d{4})?|\d{1,2}\s+${MONTH}(?:,?\s+\d{4})?|\d{4}-\d{2}-\d{2}|\d{1,2}\/\d{1,2}\/\d{2,4}|${CLOCK})`;
const ZONE = String.raw`(?:\s*\((?:UTC|GMT|[A-Z]{2,4})\)|\s+(?:UTC|GMT))?`;
const STAMP = String.raw`${WHEN_PIECE}(?:,?\s+${WHEN_PIECE}){0,2}${ZONE}`;

/** One field that tells when the post was written, bare or in brackets ("(6 hours ago)"). */
const WHEN = new RegExp(String.raw`^(?:${STAMP}|\(${STAMP}\))$`, 'iu');

/** A time stamp that ends a byline with no separator before it: one that holds a clock time, or one in brackets. */
const TRAILING_STAMP = new RegExp(String.raw`\s+((?:${WHEN_PIECE},?\s+){0,2}${CLOCK}(?:,?\s+${WHEN_PIECE}){0,2}${ZONE}|\(${STAMP}\))$`, 'iu');

/** One field that counts the writer's posts or the post's standing ("9,870 posts", "♥ 12", "12 votes"). */
const COUNT = /^(?:[♥❤▲↑+]\s*\d[\d,]*|\d[\d,]*\s+(?:posts?|votes?|points?|likes?|replies|reply|comments?|upvotes?|karma))$/iu;

/**
 * The first field: a name of up to four words or a handle, or a display name with its handle after it
 * ("Marisol Ek @marisol_ek"), or a name in square brackets ("[Priyanka S]"), with no sentence in it;
 * a role or a link in brackets may follow it ("Harrowgate_Mo (talk)", "Imogen (Curator)").
 */
const NAME = /^(?:\[[^\]\n]{1,40}\]|@?[\p{L}\p{N}_.'’&-]+(?:\s@?[\p{L}\p{N}_.'’&-]+){0,3})(?:\s\([^()\n]{1,30}\))?$/u;

/**
 * A name that stands before a time stamp with no separator: a name in brackets, a handle (an "@",
 * an underscore, a digit or a dot inside it), a name followed by a role in brackets, or a person's
 * name, each word opening with a capital ("Brannagh Coille"). "Meeting at 10:30" is none.
 */
function isBareName(text: string): boolean {
  if (!NAME.test(text)) return false;
  if (/^\[|\)$/u.test(text)) return true;
  return text.split(/\s+/u).every((w) => /[@_\d.]/u.test(w) || /^\p{Lu}/u.test(w));
}

/** Markup, reply marks and a signature's dashes around a byline: emphasis, a quote mark, a reply arrow, "--". */
const DECORATION = /^[\s>↳↪*_]+|^(?:--|[—–])\s*|[\s*_:]+$/gu;

/** Pictographs a display name carries ("Kelp & Kettles 🌊"), and the joiners inside them. */
const PICTOGRAPHS = /(?:\p{Extended_Pictographic}|\u200d|\ufe0f)+/gu;

/** True when `line` (one line, markup stripped or not) is a post's byline. */
export function isByline(line: string): boolean {
  if (line.length > 100) return false;
  const text = line.replace(DECORATION, '').replace(DECORATION, '').replace(/[*_]{2,}/gu, '').replace(PICTOGRAPHS, '').replace(/\s{2,}/gu, ' ').trim();
  if (text.length === 0 || text.length > 80 || /[.!?]$/u.test(text)) return false;
  const fields = text.split(SEPARATOR).map((f) => f.trim()).filter((f) => f.length > 0);
  if (fields.length >= 2 && NAME.test(fields[0] ?? '') && fields.slice(1).some((f) => WHEN.test(f) || COUNT.test(f))) return true;
  // "[Priyanka S] 18 Oct, 3:10pm", "Brannagh Coille 14:02, 7 March 2025 (UTC)": a name and its time stamp.
  const stamp = TRAILING_STAMP.exec(text);
  return stamp !== null && isBareName(text.slice(0, stamp.index).trim());
}
