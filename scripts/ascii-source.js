// The one-file bundle's text written in ASCII alone, with the same meaning (scripts/build-bundle.js,
// docs/speed.md, Start-up). V8 keeps a script whose text holds one character past ASCII as a string of
// two-byte units: reading the 2.4 MB bundle then decoded it character by character (some 30 ms of CPU
// of every `check`) and hashing it for the code cache's header encoded it back. esbuild writes the
// bundle's strings in ASCII already; what it leaves are comments, regular expression literals and
// template literals. This rewrites each such character where it stands:
//   - in a string literal, an identifier or a comment: `\uXXXX` (the same string, the same name, a
//     comment);
//   - in a regular expression literal: the literal becomes `new RegExp("...", "flags")`, its pattern
//     a string literal written with `\u` escapes, so the expression's `source` and `flags` are the
//     literal's own (a `\u` escape in the pattern would change its source, which the unit matchers'
//     first characters are keyed by);
//   - in a template literal, untagged or tagged by String.raw: a substitution `${"\uXXXX"}` (the
//     same cooked and raw text);
//   - anywhere else (white space past ASCII between tokens, a template with another tag): an error,
//     so the build says what it cannot write.
// The parser is TypeScript's (a dependency of the build), run on the bundle as JavaScript.
import ts from 'typescript';

/** `\uXXXX` for each UTF-16 unit of `ch`. */
const escaped = (ch) => [...ch].map((c) => [...Array(c.length).keys()].map((i) => `\\u${c.charCodeAt(i).toString(16).padStart(4, '0')}`).join('')).join('');

/** `text` with every character past ASCII written as `\uXXXX` (string literal content, comments, names). */
const escapeAll = (text) => text.replace(/\P{ASCII}/gu, escaped);

/** A JavaScript string literal of `text` in ASCII alone. */
const stringLiteral = (text) => escapeAll(JSON.stringify(text)).replace(/\u2028|\u2029/gu, escaped);

/** `code` (a script) written in ASCII alone with the same meaning; throws where it cannot. */
export function asciiSource(code, fileName = 'bundle.js') {
  if (!/\P{ASCII}/u.test(code)) return code;
  const file = ts.createSourceFile(fileName, code, ts.ScriptTarget.Latest, true, ts.ScriptKind.JS);
  // Replacements as [start, end, text], made for each literal that holds a character past ASCII.
  const edits = [];
  const wide = (start, end) => /\P{ASCII}/u.test(code.slice(start, end));
  const visit = (node) => {
    const start = node.getStart(file);
    if (!wide(start, node.end)) return;
    if (node.kind === ts.SyntaxKind.RegularExpressionLiteral) {
      const text = node.getText(file);
      const close = text.lastIndexOf('/');
      edits.push([start, node.end, `new RegExp(${stringLiteral(text.slice(1, close))}, ${JSON.stringify(text.slice(close + 1))})`]);
      return;
    }
    if (node.kind === ts.SyntaxKind.NoSubstitutionTemplateLiteral || ts.isTemplateLiteralToken(node)) {
      let parent = node.parent;
      if (ts.isTemplateSpan(parent)) parent = parent.parent;
      if (ts.isTemplateExpression(parent)) parent = parent.parent;
      if (ts.isTaggedTemplateExpression(parent) && parent.tag.getText(file) !== 'String.raw') {
        throw new Error(`${fileName}: a character past ASCII in a template tagged ${parent.tag.getText(file)}`);
      }
      // Only the template's own text, between its delimiters: "`", "${" and "}".
      const text = node.getText(file);
      const head = 1;
      const tail = node.kind === ts.SyntaxKind.NoSubstitutionTemplateLiteral || node.kind === ts.SyntaxKind.TemplateTail ? 1 : 2;
      const inner = text.slice(head, text.length - tail).replace(/(\\*)(\P{ASCII})/gu, (_, slashes, ch) => {
        // After an odd run of backslashes the character is escaped, and "\${" would be text.
        if (slashes.length % 2 === 1) throw new Error(`${fileName}: an escaped character past ASCII in a template`);
        return `${slashes}\${${stringLiteral(ch)}}`;
      });
      edits.push([start, node.end, `${text.slice(0, head)}${inner}${text.slice(text.length - tail)}`]);
      return;
    }
    ts.forEachChild(node, visit);
  };
  ts.forEachChild(file, visit);
  if (file.parseDiagnostics !== undefined && file.parseDiagnostics.length > 0) {
    throw new Error(`${fileName}: ${ts.flattenDiagnosticMessageText(file.parseDiagnostics[0].messageText, '\n')}`);
  }
  edits.sort((a, b) => a[0] - b[0]);
  let out = '';
  let at = 0;
  for (const [start, end, text] of edits) {
    out += escapeAll(code.slice(at, start)) + text;
    at = end;
  }
  out += escapeAll(code.slice(at));
  return out;
}
