/**
 * A small, strict reader for the XML the JUnit reporter writes (test helper). It accepts one XML
 * declaration, elements, attributes in double quotes, text and references, and throws on anything
 * XML 1.0 forbids there: an unclosed or mismatched tag, a raw `<` or `&` in text or attributes, an
 * unknown entity, a character reference or a raw character outside XML 1.0's Char production
 * (XML 1.0 §2.2), or text outside the root element. Comments, CDATA and DTDs are not written by
 * the reporter, so they are rejected rather than read.
 */

export interface XmlElement {
  name: string;
  attributes: Record<string, string>;
  children: XmlElement[];
  text: string;
}

const NAME = /^[A-Za-z_:][\w.:-]*/;
const ENTITIES: Record<string, string> = { amp: '&', lt: '<', gt: '>', quot: '"', apos: "'" };

function isXmlChar(code: number): boolean {
  return (
    code === 0x9 || code === 0xa || code === 0xd ||
    (code >= 0x20 && code <= 0xd7ff) || (code >= 0xe000 && code <= 0xfffd) || (code >= 0x10000 && code <= 0x10ffff)
  );
}

function decode(raw: string, where: string): string {
  for (const char of raw) {
    const code = char.codePointAt(0) ?? 0;
    if (!isXmlChar(code)) throw new Error(`${where}: character U+${code.toString(16)} is not allowed in XML 1.0`);
  }
  if (raw.includes('<')) throw new Error(`${where}: raw "<"`);
  return raw.replace(/&([^;]*);|&/g, (match, body: string | undefined) => {
    if (body === undefined) throw new Error(`${where}: raw "&"`);
    const numeric = /^#(?:x([0-9a-fA-F]+)|([0-9]+))$/.exec(body);
    if (numeric !== null) {
      const code = numeric[1] !== undefined ? parseInt(numeric[1], 16) : Number(numeric[2]);
      if (!isXmlChar(code)) throw new Error(`${where}: &${body}; refers to a character XML 1.0 forbids`);
      return String.fromCodePoint(code);
    }
    const entity = ENTITIES[body];
    if (entity === undefined) throw new Error(`${where}: unknown entity &${body};`);
    return entity;
  });
}

/** Parses `xml` and returns its root element, or throws saying what is not well-formed. */
export function parseXml(xml: string): XmlElement {
  let rest = xml.replace(/^<\?xml version="1\.0" encoding="UTF-8"\?>\n/, '');
  if (rest === xml) throw new Error('missing XML declaration');
  const stack: XmlElement[] = [];
  let root: XmlElement | undefined;
  while (rest.length > 0) {
    if (!rest.startsWith('<')) {
      const end = rest.indexOf('<') < 0 ? rest.length : rest.indexOf('<');
      const text = decode(rest.slice(0, end), 'text');
      const parent = stack.at(-1);
      if (parent === undefined) {
        if (text.trim() !== '') throw new Error(`text outside the root element: ${JSON.stringify(text)}`);
      } else parent.text += text;
      rest = rest.slice(end);
      continue;
    }
    if (rest.startsWith('</')) {
      const match = /^<\/([^\s>]+)\s*>/.exec(rest);
      const open = stack.pop();
      if (match === null || open === undefined || open.name !== match[1]) throw new Error(`mismatched close tag at ${JSON.stringify(rest.slice(0, 30))}`);
      rest = rest.slice(match[0].length);
      continue;
    }
    const name = NAME.exec(rest.slice(1))?.[0];
    if (name === undefined) throw new Error(`bad tag at ${JSON.stringify(rest.slice(0, 30))}`);
    rest = rest.slice(1 + name.length);
    const element: XmlElement = { name, attributes: {}, children: [], text: '' };
    for (;;) {
      const attribute = /^\s+([A-Za-z_:][\w.:-]*)="([^"]*)"/.exec(rest);
      if (attribute === null) break;
      const [whole, key = '', value = ''] = attribute;
      if (key in element.attributes) throw new Error(`duplicate attribute ${key} on <${name}>`);
      element.attributes[key] = decode(value, `attribute ${key} of <${name}>`);
      rest = rest.slice(whole.length);
    }
    const close = /^\s*(\/?)>/.exec(rest);
    if (close === null) throw new Error(`unterminated <${name}> at ${JSON.stringify(rest.slice(0, 30))}`);
    rest = rest.slice(close[0].length);
    const parent = stack.at(-1);
    if (parent !== undefined) parent.children.push(element);
    else if (root === undefined) root = element;
    else throw new Error('more than one root element');
    if (close[1] !== '/') stack.push(element);
  }
  if (stack.length > 0) throw new Error(`unclosed <${stack.at(-1)?.name}>`);
  if (root === undefined) throw new Error('no root element');
  return root;
}
