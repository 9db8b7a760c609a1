/**
 * What the server knows about its workspace: the check setup from `firnline.yaml`, the packs and
 * the ledger, and the files whose change means a reload. The CLI's `lsp` command supplies the
 * loader (settings are read exactly as `firnline check` reads them).
 */
import type { CheckSetup } from './check-document.js';

/** A loaded workspace. */
export interface Workspace {
  setup: CheckSetup;
  /** Claim ids and the ledger use paths relative to this folder. */
  projectRoot: string;
  /** Absolute paths whose change (or creation) should reload the workspace. */
  watched: string[];
}

/** Loads the workspace whose root folder is `root`; throws a FirnlineError for bad settings. */
export type WorkspaceLoader = (root: string) => Promise<Workspace>;
