/**
 * The engine's error hierarchy. Every message reads "what is wrong; where; how to fix".
 * Callers (CLI, app) map classes to behaviour: InputError → exit 2, LimitError → exit 3,
 * CancelledError → exit 130. Tests check the class and the location, not the wording.
 */

/** Base class of every error the engine raises on purpose. */
export class CoppiceError extends Error {
  /** A short suggestion of how to fix the problem, when there is one. */
  readonly hint: string | undefined;
  constructor(message: string, hint?: string) {
    super(message);
    this.name = new.target.name;
    this.hint = hint;
  }
  /** One line for a terminal: message plus hint. */
  describe(): string {
    return this.hint ? `${this.message} (hint: ${this.hint})` : this.message;
  }
}

/** Where in a text input a problem was found (0-based offset into `source`). */
export interface SourcePosition {
  /** Which input: e.g. "graph notation", "theory file phi4.json", "expression". */
  readonly input: string;
  readonly offset: number;
  /** The text being parsed, so messages can show context. */
  readonly source?: string;
}

/** Malformed or inconsistent user input: a parse error, a wrong valence, an unknown field. */
export class InputError extends CoppiceError {
  readonly position: SourcePosition | undefined;
  constructor(message: string, position?: SourcePosition, hint?: string) {
    super(position ? `${message} (${position.input}, at character ${position.offset + 1})` : message, hint);
    this.position = position;
  }
  /** The source line with a caret under the offending character. */
  excerpt(): string | undefined {
    const p = this.position;
    if (!p || p.source === undefined) return undefined;
    return `${p.source}\n${' '.repeat(Math.min(p.offset, p.source.length))}^`;
  }
}

/** A theory file that is invalid, or a graph that does not belong to its theory. */
export class TheoryError extends CoppiceError {
  /** The offending element: a JSON path in a theory file, or a vertex / edge of a graph. */
  readonly where: string | undefined;
  constructor(message: string, where?: string, hint?: string) {
    super(where ? `${message} (at ${where})` : message, hint);
    this.where = where;
  }
}

/** A request whose work would explode, refused up front. */
export class LimitError extends CoppiceError {
  /** Name of the limit, as accepted by the option that raises it (e.g. "maxForests"). */
  readonly limit: string;
  readonly value: number;
  readonly requested: number | string;
  constructor(what: string, limit: string, value: number, requested: number | string, howToRaise: string) {
    super(`${what}: ${requested} exceeds the limit ${limit} = ${value}`, howToRaise);
    this.limit = limit;
    this.value = value;
    this.requested = requested;
  }
}

/** A job stopped through its cancel token. */
export class CancelledError extends CoppiceError {
  constructor(what = 'computation') {
    super(`${what} was cancelled`);
  }
}
