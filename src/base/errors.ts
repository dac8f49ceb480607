/**
 * Typed errors, which only the CLI turns into one line and an exit code: `input` a bad record, file
 * or option value (exit 2), `usage` a bad command line (exit 2), `internal` a fault of ours (exit 1).
 */
export type ErrorKind = 'input' | 'usage' | 'internal';

/** The file the problem is in, as the user named it, and the 1-based line in it. */
export interface ErrorPlace {
  file?: string;
  line?: number;
}

export class QuakesweepError extends Error {
  readonly kind: ErrorKind;
  readonly file: string | undefined;
  readonly line: number | undefined;

  constructor(kind: ErrorKind, message: string, place: ErrorPlace = {}) {
    super(message);
    this.name = 'QuakesweepError';
    this.kind = kind;
    this.file = place.file;
    this.line = place.line;
  }

  /** `file:line: message`, or as much of it as is known. */
  describe(): string {
    if (this.file === undefined) return this.message;
    return `${this.file}${this.line === undefined ? '' : `:${this.line}`}: ${this.message}`;
  }
}

export function inputError(message: string, place: ErrorPlace = {}): QuakesweepError {
  return new QuakesweepError('input', message, place);
}

export function usageError(message: string): QuakesweepError {
  return new QuakesweepError('usage', message);
}

export function isQuakesweepError(value: unknown): value is QuakesweepError {
  return value instanceof QuakesweepError;
}
