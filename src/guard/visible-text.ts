/**
 * Makes control characters visible before text reaches a terminal or a Markdown file. A draft, a
 * file name or a ledger entry can hold ESC, BEL or OSC sequences that a terminal or CI log viewer
 * would run (colour changes, line erase, a new window title); here each C0 control and DEL becomes
 * its Unicode control picture (U+2400 block, as the JUnit writer already does), each C1 control
 * and each bidirectional override becomes `<U+XXXX>`. Only the tool's own colour codes, added
 * after this step, ever reach the terminal raw.
 *
 *     visibleLine('planet\u001b[31m cooled')   // 'planet␛[31m cooled'
 */

// eslint-disable-next-line no-control-regex -- finding control characters is the point
const CONTROLS = /[\u0000-\u001f\u007f-\u009f\u202a-\u202e\u2066-\u2069]/gu;
// eslint-disable-next-line no-control-regex -- finding control characters is the point
const CONTROLS_BUT_SPACING = /[\u0000-\u0008\u000b\u000c\u000e-\u001f\u007f-\u009f\u202a-\u202e\u2066-\u2069]/gu;

function picture(c: string): string {
  const code = c.charCodeAt(0);
  if (code < 0x20) return String.fromCharCode(0x2400 + code);
  if (code === 0x7f) return '\u2421';
  return `<U+${code.toString(16).toUpperCase().padStart(4, '0')}>`;
}

/** Every control character (newline and tab too) as a picture: for file names and one-line fields. */
export function visibleLine(text: string): string {
  return text.replace(CONTROLS, picture);
}

/** Controls as pictures, but tab, newline and carriage return kept (multi-line prose). */
export function visibleText(text: string): string {
  return text.replace(CONTROLS_BUT_SPACING, picture);
}

/** True when `text` holds a character `visibleLine` would change. */
export function hasControls(text: string): boolean {
  CONTROLS.lastIndex = 0;
  const found = CONTROLS.test(text);
  CONTROLS.lastIndex = 0;
  return found;
}

const FILE_KEYS = new Set(['file', 'projectPath', 'path']);

/**
 * Plain report data with every string made visible: file names with `visibleLine`, everything
 * else with `visibleText`. Used for the text report and the gate's lines. An array or object none
 * of whose strings changes comes back as itself, not copied (a 2 KB draft's result is some 250 KB
 * of claims and flags, copied whole on every text `check` before); one that changes is a copy, and
 * the data given is never changed.
 */
export function visibleData<T>(data: T): T {
  return mapStrings(data, undefined) as T;
}

function mapStrings(value: unknown, key: string | undefined): unknown {
  if (typeof value === 'string') return key !== undefined && FILE_KEYS.has(key) ? visibleLine(value) : visibleText(value);
  if (Array.isArray(value)) {
    let out: unknown[] | undefined;
    for (let i = 0; i < value.length; i += 1) {
      const v: unknown = value[i];
      const shown = mapStrings(v, key);
      if (shown !== v && out === undefined) out = value.slice(0, i);
      out?.push(shown);
    }
    return out ?? value;
  }
  if (value === null || typeof value !== 'object') return value;
  if (Object.getPrototypeOf(value) !== Object.prototype) return value;
  const entries = Object.entries(value);
  let changed = false;
  for (const entry of entries) {
    const shown = mapStrings(entry[1], entry[0]);
    if (shown !== entry[1]) {
      changed = true;
      entry[1] = shown;
    }
  }
  if (!changed) return value;
  const out: Record<string, unknown> = {};
  for (const [k, v] of entries) out[k] = v;
  return out;
}
