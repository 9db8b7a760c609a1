import { formatPlaceInFile } from './format-place.js';
import type { CheckResult, Flag, Span } from '../types.js';
import { reachesFailLevel } from './report-options.js';
import type { ReportOptions } from './report-options.js';
import { sortByPlace } from './sort.js';
import { isSignoffFlag } from '../review/review-flags.js';

/** One JUnit test case: a claim (or a flag no claim owns), or a skipped file. */
export interface JunitCase {
  name: string;
  /** Flags at or above the fail level: one `<failure>` each. */
  failures: Flag[];
  /** Flags below the fail level: written to `<system-out>` so they are still visible. */
  passed: Flag[];
  /** The reason a file was skipped, for a `<skipped>` case. */
  skipped?: string;
}

/** One JUnit test suite: one file, its cases in place order. */
export interface JunitSuite {
  file: string;
  cases: JunitCase[];
}

type PlacedCase = JunitCase & { file: string; span: Span };

// CI viewers show test names on one line; long claim sentences are cut at a readable length.
const NAME_LIMIT = 80;

/** `3:5 The EPICA Dome C core…` (`paragraph 4 ...` in a Word draft): a claim's place and its text on one line, at most 80 code points of text. */
export function caseName(place: string, text: string): string {
  const chars = [...text.replace(/\s+/g, ' ').trim()];
  const shown = chars.length > NAME_LIMIT ? `${chars.slice(0, NAME_LIMIT - 1).join('')}…` : chars.join('');
  return `${place} ${shown}`;
}

function splitByFailLevel(flags: Flag[], options: ReportOptions): Pick<JunitCase, 'failures' | 'passed'> {
  // A sign-off flag fails whatever the fail level, as the sign-off gate does.
  const fails = (flag: Flag) => isSignoffFlag(flag) || (flag.signoff === undefined && reachesFailLevel(flag.level, options.failOn));
  return { failures: flags.filter(fails), passed: flags.filter((flag) => !fails(flag)) };
}

/**
 * Groups a result the JUnit way: a suite per checked file (in the order given, then any other file
 * that has claims or flags), a case per claim with that claim's flags, a case per flag that names
 * no known claim, and a suite with one skipped case per skipped file.
 */
export function toJunitSuites(result: CheckResult, options: ReportOptions): JunitSuite[] {
  const others = [...result.claims, ...result.flags].map((item) => item.file).filter((f) => !result.files.includes(f));
  const files = [...result.files, ...[...new Set(others)].sort()];
  const suites = files.map((file): JunitSuite => {
    const claims = result.claims.filter((claim) => claim.file === file);
    const flags = sortByPlace(result.flags.filter((flag) => flag.file === file));
    const owned = new Set(claims.map((claim) => claim.id));
    const claimCases = claims.map((claim): PlacedCase => ({
      file,
      span: claim.span,
      name: caseName(formatPlaceInFile(claim), claim.text),
      ...splitByFailLevel(flags.filter((flag) => flag.claimId === claim.id), options),
    }));
    // A flag whose claim is not in this file still gets a case: nothing found may go unreported.
    const loneCases = flags
      .filter((flag) => flag.claimId === undefined || !owned.has(flag.claimId))
      .map((flag): PlacedCase => ({
        file,
        span: flag.span,
        name: caseName(formatPlaceInFile(flag), `${flag.ruleId}: "${flag.excerpt}"`),
        ...splitByFailLevel([flag], options),
      }));
    const cases = sortByPlace([...claimCases, ...loneCases]).map(({ file: _file, span: _span, ...rest }) => rest);
    return { file, cases };
  });
  const skipped = result.skipped.map(({ file, reason }): JunitSuite => ({
    file,
    cases: [{ name: 'not checked', failures: [], passed: [], skipped: reason }],
  }));
  return [...suites, ...skipped];
}
