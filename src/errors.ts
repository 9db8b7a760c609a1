/**
 * A mistake the user must fix (a missing path, a broken rule pack, a bad setting). Each one prints
 * as one line, `file:line:column: what is wrong and how to fix it`, and the CLI exits with 2.
 * Internal invariants are plain assertions, never this class.
 */
export class FirnlineError extends Error {
  override readonly name = 'FirnlineError';

  constructor(
    /** Stable machine-readable code, e.g. `path-missing`, `pack-schema`, `pack-duplicate-id`. */
    readonly code: string,
    message: string,
    /** Where the mistake is; line and column are 1-based and omitted when unknown. */
    readonly where: { file: string; line?: number; column?: number } | undefined = undefined,
  ) {
    super(message);
  }

  /** The one line shown to the user. */
  toLine(): string {
    if (this.where === undefined) return this.message;
    const { file, line, column } = this.where;
    const place = line === undefined ? file : column === undefined ? `${file}:${line}` : `${file}:${line}:${column}`;
    return `${place}: ${this.message}`;
  }
}

/** Several user mistakes found in one pass (e.g. every error in a rule pack), reported together. */
export class FirnlineErrors extends Error {
  override readonly name = 'FirnlineErrors';

  constructor(readonly errors: FirnlineError[]) {
    super(errors.map((e) => e.toLine()).join('\n'));
  }
}

/** True for the user-facing error classes above. */
export function isUserError(error: unknown): error is FirnlineError | FirnlineErrors {
  return error instanceof FirnlineError || error instanceof FirnlineErrors;
}
