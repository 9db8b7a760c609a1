import type { Flag, Span } from '../types.js';
import { describeFlag } from './describe-flag.js';
import { formatParagraph } from './format-place.js';
import type { SarifArtifactLocation, SarifLocation, SarifRegion, SarifResult } from './sarif-log.js';
import { SARIF_LEVELS } from './sarif-rules.js';

/** The base every artifact URI is relative to: the folder Firnline ran in. */
export const SRCROOT = '%SRCROOT%';

/** The key under which a result carries its claim id, versioned as SARIF advises (§3.27.17). */
export const CLAIM_FINGERPRINT = 'firnlineClaimId/v1';

/**
 * A report path as a relative URI reference: each segment percent-encoded, so a draft called
 * `notes #2/ice age.md` becomes `notes%20%232/ice%20age.md` and still resolves against %SRCROOT%.
 */
export function toArtifactUri(path: string): string {
  return path.split('/').map(encodeURIComponent).join('/');
}

function artifactLocation(file: string): SarifArtifactLocation {
  return { uri: toArtifactUri(file), uriBaseId: SRCROOT };
}

/** A span as a full SARIF region; offsets and columns are both in code points (run.columnKind). */
export function toRegion(span: Span): SarifRegion {
  return {
    startLine: span.start.line,
    startColumn: span.start.column,
    endLine: span.end.line,
    endColumn: span.end.column,
    charOffset: span.start.offset,
    charLength: span.end.offset - span.start.offset,
  };
}

/**
 * One SARIF result for one flag: rule, level, the flag's words as the message, the place with the
 * flagged text as snippet, a fix when a correction exists, and the claim id as a fingerprint.
 */
export function toSarifResult(flag: Flag, ruleIndex: number | undefined): SarifResult {
  const location = artifactLocation(flag.file);
  const result: SarifResult = {
    ruleId: flag.ruleId,
    ...(ruleIndex === undefined ? {} : { ruleIndex }),
    level: SARIF_LEVELS[flag.level],
    message: { text: describeFlag(flag) },
    locations: [locationOf(flag, location)],
  };
  if (flag.claimId !== undefined) result.partialFingerprints = { [CLAIM_FINGERPRINT]: flag.claimId };
  if (flag.signoff !== undefined) {
    const { reviewer, date, decision } = flag.signoff;
    result.suppressions = [{ kind: 'external', status: 'accepted', justification: `Signed off by ${reviewer} on ${date} (${decision}).` }];
  }
  // A fix needs a text region to replace; a Word draft has none, and its message carries the correction.
  if (flag.correction !== undefined && flag.paragraph === undefined) {
    result.fixes = [
      {
        description: { text: `Replace "${flag.excerpt}" with "${flag.correction}".` },
        artifactChanges: [
          {
            artifactLocation: location,
            replacements: [{ deletedRegion: toRegion(flag.span), insertedContent: { text: flag.correction } }],
          },
        ],
      },
    ];
  }
  return result;
}

/** A text draft's region; or, in a Word draft, the paragraph as a logical location (see SarifLocation). */
function locationOf(flag: Flag, artifactLocation: SarifArtifactLocation): SarifLocation {
  if (flag.paragraph === undefined) {
    return { physicalLocation: { artifactLocation, region: { ...toRegion(flag.span), snippet: { text: flag.excerpt } } } };
  }
  const { number, heading } = flag.paragraph;
  const name = `paragraph ${number}`;
  return {
    physicalLocation: { artifactLocation },
    logicalLocations: [{ name, fullyQualifiedName: name, kind: 'element' }],
    message: { text: `${formatParagraph(flag.paragraph)}: "${flag.excerpt}"` },
    properties: { paragraph: number, heading },
  };
}
