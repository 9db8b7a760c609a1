// XML 1.0 cannot carry these at all, not even as character references (XML 1.0 §2.2, Char):
// C0 controls other than tab, line feed and carriage return, U+FFFE, U+FFFF, and lone surrogates.
// eslint-disable-next-line no-control-regex -- matching these control characters is the point
const FORBIDDEN = /[\u0000-\u0008\u000B\u000C\u000E-\u001F\uFFFE\uFFFF]|[\uD800-\uDBFF](?![\uDC00-\uDFFF])|(?<![\uD800-\uDBFF])[\uDC00-\uDFFF]/g;

/**
 * Makes a forbidden character visible instead of dropping it: a C0 control becomes its Unicode
 * "control picture" (U+0001 → U+2401 ␁), anything else the replacement character U+FFFD.
 */
function replaceForbidden(char: string): string {
  const code = char.charCodeAt(0);
  return code < 0x20 ? String.fromCharCode(0x2400 + code) : '\uFFFD';
}

// A bare carriage return would be turned into a line feed by the parser (XML 1.0 §2.11).
const TEXT_ESCAPES: Record<string, string> = { '&': '&amp;', '<': '&lt;', '>': '&gt;', '\r': '&#13;' };

// Inside an attribute a parser turns tab, newline and carriage return into spaces unless they are
// written as character references (XML 1.0 §3.3.3), so those are escaped too.
const ATTRIBUTE_ESCAPES: Record<string, string> = {
  ...TEXT_ESCAPES,
  '"': '&quot;',
  '\t': '&#9;',
  '\n': '&#10;',
};

/** Text safe inside an XML element: `a < b & c` gives `a &lt; b &amp; c`. */
export function escapeXmlText(text: string): string {
  return text.replace(FORBIDDEN, replaceForbidden).replace(/[&<>\r]/g, (c) => TEXT_ESCAPES[c] ?? c);
}

/** Text safe inside a double-quoted XML attribute, line breaks and tabs kept as references. */
export function escapeXmlAttribute(text: string): string {
  return text.replace(FORBIDDEN, replaceForbidden).replace(/[&<>"\t\n\r]/g, (c) => ATTRIBUTE_ESCAPES[c] ?? c);
}
