/**
 * Typed errors. The core throws these; only the CLI turns them into one line and an exit code.
 * `input` is a bad record, file or option value (exit 2), `usage` a bad command line (exit 2),
 * `internal` a fault of quakesweep itself (exit 1).
 */
export type ErrorKind = 'input' | 'usage' | 'internal';

export interface ErrorPlace {
  /** The file the problem is in, as the user named it. */
  file?: string;
  /** 1-based line number in that file. */
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

/** A bad record, file or value. */
export function inputError(message: string, place: ErrorPlace = {}): QuakesweepError {
  return new QuakesweepError('input', message, place);
}

/** A bad command line or option. */
export function usageError(message: string): QuakesweepError {
  return new QuakesweepError('usage', message);
}

export function isQuakesweepError(value: unknown): value is QuakesweepError {
  return value instanceof QuakesweepError;
}
