/** Why a file could not be read as a Word draft; the caller adds the file name. */
export class WordPackageError extends Error {}
