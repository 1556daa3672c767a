import { InputError } from '../errors.ts';
import type { CountertermMark, Edge, Graph, Leg, LegDirection, Vertex } from './types.ts';

/** Largest graph the parser accepts; bigger inputs are refused before any work (hostile input). */
export const MAX_NOTATION_LENGTH = 100_000;

const NAME = /[A-Za-z0-9_]/;
const FIELD = /[A-Za-z0-9_']/;

/**
 * Parses the compact notation (DESIGN §10): edges separated by spaces, then `/`, then the
 * external legs in label order.
 *
 *     1-2 1-2 / 1 1 2 2                 one-loop four-point bubble (default field)
 *     1>2:psi 2>1:psi 1-2:A / >1:psi 1>:psi   (fermion edges oriented, legs entering/leaving)
 *     1-c{phi,phi;p2} c-2 / 1 2         c is a counterterm vertex (braces at any one mention)
 *
 * Every error names the position and what was expected.
 */
export function parseNotation(text: string, inputName = 'graph notation'): Graph {
  if (text.length > MAX_NOTATION_LENGTH) {
    throw new InputError(`graph notation is ${text.length} characters long, more than the ${MAX_NOTATION_LENGTH} accepted`, { input: inputName, offset: 0 }, 'split the work into smaller graphs');
  }
  return new NotationParser(text, inputName).parse();
}

class NotationParser {
  private pos = 0;
  private readonly vertexIndex = new Map<string, number>();
  private readonly vertices: { name: string; counterterm?: CountertermMark; ctOffset?: number }[] = [];
  constructor(
    private readonly src: string,
    private readonly inputName: string,
  ) {}

  parse(): Graph {
    const edges: Edge[] = [];
    const legs: Leg[] = [];
    this.skipSpace();
    let sawSlash = false;
    while (this.pos < this.src.length) {
      if (this.peek() === '/') {
        this.pos++;
        sawSlash = true;
        break;
      }
      edges.push(this.edge());
      this.requireSeparator('/');
    }
    if (!sawSlash) {
      throw this.error('expected "/" after the edges, followed by the external legs (write "/" alone for a vacuum graph)', 'e.g. "1-2 1-2 / 1 1 2 2"');
    }
    this.skipSpace();
    while (this.pos < this.src.length) {
      legs.push(this.leg());
      this.requireSeparator(null);
    }
    const vertices: Vertex[] = this.vertices.map((v) => (v.counterterm ? { name: v.name, counterterm: v.counterterm } : { name: v.name }));
    return { vertices, edges, legs };
  }

  private edge(): Edge {
    const start = this.pos;
    const a = this.vertexRef();
    const op = this.peek();
    if (op !== '-' && op !== '>' && op !== '<') {
      throw this.error(op === undefined ? 'expected "-" or ">" to continue the edge' : `expected "-" or ">" between the two ends of an edge, found "${op}"`, 'edges are written a-b, a-b:field or a>b:field');
    }
    this.pos++;
    const b = this.vertexRef();
    let field: string | null = null;
    if (this.peek() === ':') {
      this.pos++;
      field = this.fieldName();
    }
    if (op === '<') return { a: b, b: a, field, oriented: true };
    void start;
    return { a, b, field, oriented: op === '>' };
  }

  private leg(): Leg {
    let direction: LegDirection = 'none';
    if (this.peek() === '>') {
      this.pos++;
      direction = 'in';
    }
    const v = this.vertexRef();
    if (this.peek() === '>') {
      if (direction === 'in') throw this.error('a leg either enters (">a") or leaves ("a>"), not both');
      this.pos++;
      direction = 'out';
    }
    let field: string | null = null;
    if (this.peek() === ':') {
      this.pos++;
      field = this.fieldName();
    }
    return { vertex: v, field, direction };
  }

  private vertexRef(): number {
    const start = this.pos;
    while (this.pos < this.src.length && NAME.test(this.src[this.pos]!)) this.pos++;
    if (this.pos === start) {
      const c = this.peek();
      throw this.error(c === undefined ? 'expected a vertex name, found the end of the input' : `expected a vertex name (letters, digits, _), found "${c}"`);
    }
    const name = this.src.slice(start, this.pos);
    let mark: CountertermMark | undefined;
    if (this.peek() === '{') mark = this.countertermMark();
    let idx = this.vertexIndex.get(name);
    if (idx === undefined) {
      idx = this.vertices.length;
      this.vertexIndex.set(name, idx);
      this.vertices.push({ name });
    }
    if (mark) {
      const v = this.vertices[idx]!;
      if (v.counterterm && !sameMark(v.counterterm, mark)) {
        throw new InputError(`counterterm vertex "${name}" is given two different residues`, { input: this.inputName, offset: start, source: this.src }, 'write the braces once, at any one mention of the vertex');
      }
      v.counterterm = mark;
    }
    return idx;
  }

  private countertermMark(): CountertermMark {
    this.pos++; // '{'
    const residue: string[] = [];
    let structure = '';
    for (;;) {
      this.skipInlineSpace();
      residue.push(this.fieldName());
      this.skipInlineSpace();
      const c = this.peek();
      if (c === ',') {
        this.pos++;
        continue;
      }
      if (c === ';') {
        this.pos++;
        this.skipInlineSpace();
        const s = this.pos;
        while (this.pos < this.src.length && NAME.test(this.src[this.pos]!)) this.pos++;
        structure = this.src.slice(s, this.pos);
        if (!structure) throw this.error('expected a counterterm structure after ";" (e.g. p2, pslash, m2)');
        this.skipInlineSpace();
        if (this.peek() !== '}') throw this.error('expected "}" to close the counterterm vertex');
        this.pos++;
        break;
      }
      if (c === '}') {
        this.pos++;
        break;
      }
      throw this.error(c === undefined ? 'unclosed "{": expected "," or ";" or "}"' : `expected "," or ";" or "}" in the counterterm residue, found "${c}"`, 'e.g. c{phi,phi;p2} or c{phi,phi,phi,phi}');
    }
    return { residue: [...residue].sort(), structure };
  }

  private fieldName(): string {
    const start = this.pos;
    while (this.pos < this.src.length && FIELD.test(this.src[this.pos]!)) this.pos++;
    if (this.pos === start) {
      const c = this.peek();
      throw this.error(c === undefined ? 'expected a field name, found the end of the input' : `expected a field name, found "${c}"`);
    }
    return this.src.slice(start, this.pos);
  }

  /** After an item: whitespace, the end, or (when given) the terminator. */
  private requireSeparator(terminator: string | null): void {
    const before = this.pos;
    this.skipSpace();
    if (this.pos >= this.src.length) return;
    if (terminator !== null && this.peek() === terminator) return;
    if (this.pos === before) {
      throw this.error(`expected a space before the next ${terminator ? 'edge' : 'leg'}, found "${this.peek()}"`);
    }
  }

  private skipSpace(): void {
    while (this.pos < this.src.length && /\s/.test(this.src[this.pos]!)) this.pos++;
  }
  private skipInlineSpace(): void {
    while (this.pos < this.src.length && (this.src[this.pos] === ' ' || this.src[this.pos] === '\t')) this.pos++;
  }
  private peek(): string | undefined {
    return this.src[this.pos];
  }
  private error(message: string, hint?: string): InputError {
    return new InputError(message, { input: this.inputName, offset: this.pos, source: this.src }, hint);
  }
}

function sameMark(x: CountertermMark, y: CountertermMark): boolean {
  return x.structure === y.structure && x.residue.length === y.residue.length && x.residue.every((f, i) => f === y.residue[i]);
}
