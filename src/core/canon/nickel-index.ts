import { InputError, LimitError } from '../errors.ts';
import type { Graph } from '../graph/types.ts';
import { automorphismGroup } from './automorphism-group.ts';
import { NICKEL_DIGITS } from './nickel-parse.ts';

export interface NickelOptions {
  /** Numberings tried before giving up with a LimitError (default 2,000,000). */
  readonly maxNickelSteps?: number;
}

/** A graph's Nickel index and the numbering that produces it. */
export interface NickelIndex {
  /** E.g. `e111|e|`. */
  readonly index: string;
  /** `numbering[v]`: the Nickel number of input vertex v. */
  readonly numbering: readonly number[];
}

// Internally '|' is written '!' and 'e' '#', so that plain string order is the index's
// order: '|' < 'e' < 0 < … < 9 < A < … < Z.
const BAR = '!';
const LEG = '#';

function checkNickelGraph(g: Graph): void {
  const fail = (what: string) => new InputError(`the Nickel index describes graphs of one self-conjugate field without counterterm vertices, but ${what}`, undefined, 'use the compact notation (or the canonical form) for this graph');
  const fields = new Set([...g.edges.map((e) => e.field), ...g.legs.map((l) => l.field)]);
  if (fields.size > 1) throw fail(`this graph has lines or legs of ${fields.size} different fields`);
  if (g.edges.some((e) => e.oriented) || g.legs.some((l) => l.direction !== 'none')) throw fail('this graph has oriented lines');
  const ct = g.vertices.find((v) => v.counterterm);
  if (ct) throw fail(`vertex "${ct.name}" is a counterterm vertex`);
  if (g.vertices.length === 0) throw new InputError('the empty graph has no Nickel index');
  if (g.vertices.length > NICKEL_DIGITS.length) throw fail(`this graph has ${g.vertices.length} vertices, more than the ${NICKEL_DIGITS.length} a Nickel index can number`);
}

/**
 * The Nickel index of a φ⁴-type graph (one self-conjugate field, legs unlabelled): over all
 * numberings of the vertices, the least listing, for vertex 0, 1, 2, …, of 'e' for each leg
 * and then the numbers of the neighbours numbered at least as high as the vertex (a
 * self-loop lists the vertex itself once), each list sorted and ended by '|'. Strings are
 * ordered character by character with '|' < 'e' < 0 < … < 9 < A < … < Z, so a shorter list
 * beats a longer one that extends it.
 *
 *     toNickel(parseNotation('1-2 1-2 1-2 / 1 2')).index   // 'e111|e|'
 *
 * The search numbers vertices breadth first (a vertex's unnumbered neighbours take the next
 * numbers, more lines first), which loses no minimal numbering, tries every order of
 * neighbours joined by equally many lines, and cuts numberings whose prefix is already larger
 * than the best found; vertex 0 is tried once per automorphism orbit.
 */
export function toNickel(g: Graph, opts: NickelOptions = {}): NickelIndex {
  checkNickelGraph(g);
  const n = g.vertices.length;
  const maxSteps = opts.maxNickelSteps ?? 2_000_000;
  const mult = new Int32Array(n * n);
  const loops = new Int32Array(n);
  const legs = new Int32Array(n);
  for (const e of g.edges) {
    if (e.a === e.b) loops[e.a]!++;
    else {
      mult[e.a * n + e.b]!++;
      mult[e.b * n + e.a]!++;
    }
  }
  for (const l of g.legs) legs[l.vertex]!++;
  for (let v = 0; v < n; v++) {
    if (!legs[v] && !loops[v] && !mult.subarray(v * n, v * n + n).some((x) => x > 0)) {
      throw new InputError(`vertex "${g.vertices[v]!.name}" has no lines and no legs`, undefined, 'remove isolated vertices first');
    }
  }
  const orbits = automorphismGroup(g, { legs: 'unlabelled' }).orbits;

  const num = new Int32Array(n).fill(-1);
  const order = new Int32Array(n);
  let next = 0;
  let best: string | null = null;
  let bestNumbering: Int32Array | null = null;
  let steps = 0;

  const step = (k: number, prefix: string): void => {
    if (++steps > maxSteps) throw new LimitError('Nickel index search', 'maxNickelSteps', maxSteps, 'more numberings', 'pass a larger maxNickelSteps');
    if (k === n) {
      if (best === null || prefix < best) {
        best = prefix;
        bestNumbering = num.slice();
      }
      return;
    }
    if (next === k) {
      // A new component (or vertex 0): any unnumbered vertex may start it.
      for (let c = 0; c < n; c++) {
        if (num[c]! >= 0 || (k === 0 && orbits[c] !== c)) continue;
        num[c] = k;
        order[k] = c;
        next++;
        step(k, prefix);
        next--;
        num[c] = -1;
      }
      return;
    }
    const x = order[k]!;
    let head = LEG.repeat(legs[x]!) + NICKEL_DIGITS[k]!.repeat(loops[x]!);
    const known: number[] = [];
    const fresh: number[] = [];
    for (let y = 0; y < n; y++) {
      const m = mult[x * n + y]!;
      if (!m || y === x) continue;
      if (num[y]! > k) for (let i = 0; i < m; i++) known.push(num[y]!);
      else if (num[y]! < 0) fresh.push(y);
    }
    known.sort((p, q) => p - q);
    head += known.map((d) => NICKEL_DIGITS[d]!).join('');
    fresh.sort((p, q) => mult[x * n + q]! - mult[x * n + p]!);
    const base = next;
    // Every order of `fresh` that keeps more-lines-first; neighbours with equal counts permute.
    const arrange = (i: number): void => {
      if (i === fresh.length) {
        let list = head;
        for (let j = 0; j < fresh.length; j++) list += NICKEL_DIGITS[base + j]!.repeat(mult[x * n + fresh[j]!]!);
        const cur = prefix + list + BAR;
        if (best !== null && cur > best.slice(0, cur.length)) return;
        next = base + fresh.length;
        step(k + 1, cur);
        next = base;
        return;
      }
      const m = mult[x * n + fresh[i]!]!;
      for (let j = i; j < fresh.length && mult[x * n + fresh[j]!] === m; j++) {
        [fresh[i], fresh[j]] = [fresh[j]!, fresh[i]!];
        const y = fresh[i]!;
        num[y] = base + i;
        order[base + i] = y;
        arrange(i + 1);
        num[y] = -1;
        [fresh[i], fresh[j]] = [fresh[j]!, fresh[i]!];
      }
    };
    arrange(0);
  };
  step(0, '');
  const index = best!.replaceAll(BAR, '|').replaceAll(LEG, 'e');
  return { index, numbering: Array.from(bestNumbering!) };
}
