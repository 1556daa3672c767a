import { InputError } from '../errors.ts';
import type { Edge, Graph, Leg, Vertex } from '../graph/types.ts';

/** Vertex numbers in a Nickel index: 0–9, then A–Z (10–35). */
export const NICKEL_DIGITS = '0123456789ABCDEFGHIJKLMNOPQRSTUVWXYZ';

/** Longest Nickel index accepted (hostile input is refused before any work). */
export const MAX_NICKEL_LENGTH = 10_000;

const HINT =
  "a Nickel index lists, vertex by vertex, 'e' for each external leg and the numbers (0-9, then A-Z) of the neighbours numbered at least as high as the vertex, each list ended by '|'; e.g. e111|e| (the two-loop sunset)";

/**
 * Reads a Nickel index (Nickel, Meiron and Baker's labelling of φ⁴-type graphs) into a
 * graph: vertex i is named "i", every edge and leg has the theory's default field, edges in
 * the order they are listed, legs labelled 1…n in order of occurrence.
 *
 *     parseNickel('e111|e|')       // two vertices, three lines between them, one leg at each
 *     parseNickel('ee0|')          // the tadpole: a self-loop at 0 and two legs
 *     parseNickel('123|23|3||')    // the complete graph K4 as a vacuum graph
 *
 * Any numbering is accepted, minimal or not (see `toNickel` for the minimal one); the final
 * `|` may be left out, and a vertex only mentioned by a lower one needs no list of its own.
 * Errors (InputError) name the character at fault.
 */
export function parseNickel(text: string, inputName = 'Nickel index'): Graph {
  const src = text.trim();
  const err = (message: string, offset: number, hint = HINT) => new InputError(message, { input: inputName, offset, source: src }, hint);
  if (src.length > MAX_NICKEL_LENGTH) throw err(`Nickel index is ${src.length} characters long, more than the ${MAX_NICKEL_LENGTH} accepted`, 0, 'use the compact notation for graphs this large');
  if (src === '') throw err('empty Nickel index', 0);
  const edges: Edge[] = [];
  const legs: Leg[] = [];
  const listStart: number[] = [0];
  const mentioned: boolean[] = [];
  let v = 0;
  let maxRef = -1;
  for (let i = 0; i < src.length; i++) {
    const c = src[i]!;
    if (c === '|') {
      v++;
      listStart.push(i + 1);
      continue;
    }
    if (v >= NICKEL_DIGITS.length) throw err(`a Nickel index has at most ${NICKEL_DIGITS.length} vertices (0-9, A-Z)`, i, 'use the compact notation for larger graphs');
    if (c === 'e') {
      legs.push({ vertex: v, field: null, direction: 'none' });
      mentioned[v] = true;
      continue;
    }
    const d = NICKEL_DIGITS.indexOf(c);
    if (d < 0) {
      throw err(/\s/.test(c) ? 'unexpected space inside a Nickel index' : `unexpected character "${c}" in a Nickel index`, i);
    }
    if (d < v) {
      throw err(`vertex ${NICKEL_DIGITS[v]} lists neighbour ${c}, which is numbered lower`, i, `each vertex lists only neighbours numbered at least its own: write this line in the list of vertex ${c}`);
    }
    edges.push({ a: v, b: d, field: null, oriented: false });
    mentioned[v] = true;
    mentioned[d] = true;
    maxRef = Math.max(maxRef, d);
  }
  // Vertices: every completed list, an unterminated last one, and any higher vertex mentioned.
  const lastTerminated = src.endsWith('|');
  const listed = lastTerminated ? v : v + 1;
  const n = Math.max(listed, maxRef + 1);
  for (let u = 0; u < n; u++) {
    if (!mentioned[u]) {
      const at = u < listStart.length ? listStart[u]! : src.length;
      throw err(`vertex ${NICKEL_DIGITS[u] ?? u} has no lines and no legs`, Math.min(at, src.length - 1), 'remove the empty list (two "|" in a row), or give the vertex its lines');
    }
  }
  const vertices: Vertex[] = Array.from({ length: n }, (_, u) => ({ name: String(u) }));
  return { vertices, edges, legs };
}
