/**
 * The part of SARIF 2.1.0 (OASIS standard) that Firnline writes, as TypeScript shapes. Property
 * names and meanings are the standard's; only the properties we fill are listed.
 */

/** The SARIF levels Firnline uses (the standard also has `none`). */
export type SarifLevel = 'error' | 'warning' | 'note';

/** A plain-text message (SARIF §3.11). */
export interface SarifMessage {
  text: string;
}

/** Where an artifact is: a URI relative to a named base (SARIF §3.4). */
export interface SarifArtifactLocation {
  uri?: string;
  uriBaseId?: string;
  description?: SarifMessage;
}

/** A stretch of an artifact: lines and columns 1-based, characters 0-based (SARIF §3.30). */
export interface SarifRegion {
  startLine: number;
  startColumn: number;
  endLine: number;
  endColumn: number;
  charOffset: number;
  charLength: number;
  snippet?: { text: string };
}

/** A proposed edit (SARIF §3.55 to §3.57). */
export interface SarifFix {
  description: SarifMessage;
  artifactChanges: {
    artifactLocation: SarifArtifactLocation;
    replacements: { deletedRegion: SarifRegion; insertedContent: { text: string } }[];
  }[];
}

/**
 * Where a result is (SARIF §3.28). A text draft gives a region; a Word draft, whose file is a zip
 * package with no lines, gives no region but a logical location naming the paragraph (§3.33), a
 * message saying it in words (§3.28.5) and the paragraph number and heading as properties (§3.8).
 */
export interface SarifLocation {
  physicalLocation: { artifactLocation: SarifArtifactLocation; region?: SarifRegion };
  logicalLocations?: { name: string; fullyQualifiedName: string; kind: 'element' }[];
  message?: SarifMessage;
  properties?: { paragraph: number; heading: string };
}

/** One finding (SARIF §3.27). */
export interface SarifResult {
  ruleId: string;
  ruleIndex?: number;
  level: SarifLevel;
  message: SarifMessage;
  locations: SarifLocation[];
  partialFingerprints?: Record<string, string>;
  fixes?: SarifFix[];
  /** SARIF §3.35: an expert's sign-off is an external, accepted suppression. */
  suppressions?: { kind: 'external'; status: 'accepted'; justification: string }[];
}

/** One rule's metadata (SARIF §3.49). */
export interface SarifReportingDescriptor {
  id: string;
  shortDescription: SarifMessage;
  fullDescription: SarifMessage;
  help: SarifMessage;
  defaultConfiguration: { level: SarifLevel };
  properties: Record<string, unknown>;
}

/** A whole SARIF log with its single run (SARIF §3.13, §3.14). */
export interface SarifLog {
  $schema: string;
  version: '2.1.0';
  runs: [
    {
      tool: { driver: { name: string; version: string; rules: SarifReportingDescriptor[] } };
      originalUriBaseIds: Record<string, SarifArtifactLocation>;
      columnKind: 'unicodeCodePoints';
      results: SarifResult[];
      invocations?: SarifInvocation[];
    },
  ];
}

/** One run of the tool (SARIF §3.20): whether it succeeded, and a notification per file passed over (§3.58). */
export interface SarifInvocation {
  executionSuccessful: boolean;
  toolExecutionNotifications: {
    level: SarifLevel;
    message: { text: string };
    locations: { physicalLocation: { artifactLocation: SarifArtifactLocation; region?: { startLine: number; startColumn?: number } } }[];
  }[];
}
