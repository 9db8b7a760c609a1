/**
 * Checks a regular expression written in a pack before anything runs it: it must compile with the
 * `iu` flags, stay short, and avoid nested quantifiers such as `(a+)+`, the usual cause of
 * catastrophic backtracking (common practice; see OWASP "Regular expression Denial of Service").
 */

/** The longest pattern a pack may hold, in characters. */
export const MAX_REGEX_LENGTH = 300;

/** A one-line description of what is wrong with `source`, or undefined when it is usable. */
export function regexProblem(source: string): string | undefined {
  if (source.length > MAX_REGEX_LENGTH) return `regular expression is longer than ${MAX_REGEX_LENGTH} characters`;
  try {
    new RegExp(source, 'iu');
  } catch (error) {
    return `invalid regular expression: ${(error as Error).message.replace(/^Invalid regular expression: /u, '')}`;
  }
  if (/\([^()]*[+*][^()]*\)[+*{]/u.test(source)) return 'regular expression repeats a repeated group (like `(a+)+`), which can run for ever; simplify it';
  return undefined;
}

/** Compiles a pattern that regexProblem accepted. */
export function compileRegex(source: string): RegExp {
  return new RegExp(source, 'iu');
}
