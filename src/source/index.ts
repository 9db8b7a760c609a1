/**
 * source/: drafts as read from disk. Finds the drafts, reads them, splits them into prose blocks
 * whose every character maps back to its place in the original file, and turns those places into
 * 1-based line and column (code points).
 */
export { findDrafts, DRAFT_EXTENSIONS, type DraftFilters } from './discover.js';
export { readDraft, readDraftText, draftFromText, draftFormat } from './read-draft.js';
export { createLineIndex, type LineIndex } from './line-index.js';
export { readMarkdownBlocks } from './markdown.js';
export { readPlainTextBlocks } from './plain-text.js';
export { blockRange } from './block-range.js';
export { draftAroundHits, markdownSegments, readWindowBlocks, type Window } from './windows.js';
