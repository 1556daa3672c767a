import { describe, expect, it } from 'vitest';
import { canonicalNotation, NICKEL_DIGITS, parseNickel, toNickel } from '../../../src/core/canon/index.ts';
import { InputError } from '../../../src/core/errors.ts';
import { parseNotation } from '../../../src/core/graph/notation-parse.ts';
import type { Graph } from '../../../src/core/graph/types.ts';
import { bindGraph } from '../../../src/core/theory/bind-graph.ts';
import { builtinTheory } from '../../../src/core/theory/builtin/index.ts';
import { randomPermutation, randomTheoryGraph, relabel, rng } from './random-graphs.ts';

// The Nickel index (B. G. Nickel, D. I. Meiron, G. A. Baker, "Compilation of 2-pt and 4-pt
// graphs for continuous spin models", University of Guelph report, 1977 — from memory): for
// vertex 0, 1, 2, … list 'e' for each external leg, then the numbers of the neighbours numbered
// at least as high (a self-loop lists the vertex itself once), each list ended by '|'; of all
// numberings take the least string. Our order: '|' < 'e' < 0 < … < 9 < A < … < Z (so a list
// that is a prefix of another is smaller). The small cases below are worked out by hand.
const nickel = (notation: string, theory = 'phi4') => toNickel(bindGraph(parseNotation(notation), builtinTheory(theory)).graph).index;

describe('Nickel indices of small graphs, worked out by hand', () => {
  it('one-loop four-point bubble: ee11|ee|', () => {
    // Either vertex is 0 (they are symmetric): two legs "ee", two lines to 1 "11"; vertex 1 has
    // its two legs and no higher neighbours: "ee".
    expect(nickel('1-2 1-2 / 1 1 2 2')).toBe('ee11|ee|');
  });
  it('tadpole: ee0|', () => {
    // One vertex, two legs, a self-loop listed once as the vertex itself.
    expect(nickel('1-1 / 1 1')).toBe('ee0|');
  });
  it('two-loop sunset: e111|e| (as the φ⁴ literature writes it — from memory)', () => {
    // 0: leg + three lines to 1; 1: leg.
    expect(nickel('1-2 1-2 1-2 / 1 2')).toBe('e111|e|');
  });
  it('s-channel double bubble: ee11|22|ee|', () => {
    // 0 must be an end vertex ("ee11" beats the middle vertex's "1122"); then 1 is the middle one.
    expect(nickel('1-2 1-2 2-3 2-3 / 1 1 3 3')).toBe('ee11|22|ee|');
  });
  it('vacuum graphs: figure-eight 00|, two vertices with four lines 1111||, K4 (φ³) 123|23|3||', () => {
    // Figure-eight: two self-loops at 0. Four lines: 0 lists 1 four times, 1 lists nothing.
    // K4: 0 is joined to 1,2,3; 1 to 2,3; 2 to 3; 3 has no higher neighbour (empty list).
    expect(nickel('1-1 1-1 /')).toBe('00|');
    expect(nickel('1-2 1-2 1-2 1-2 /')).toBe('1111||');
    expect(nickel('1-2 1-3 1-4 2-3 2-4 3-4 /', 'phi3')).toBe('123|23|3||');
  });
  it('the wheel with three spokes as a four-point graph: e123|e23|e3|e|', () => {
    expect(nickel('1-2 1-3 1-4 2-3 2-4 3-4 / 1 2 3 4')).toBe('e123|e23|e3|e|');
  });
  it('three-loop propagator graph (sunset with a bubble on one line): e112|22|e|', () => {
    // Vertices A (leg; 2 lines to B, 1 to C), B (2 lines to A, 2 to C), C (leg; 1 to A, 2 to B).
    // Start at A: B = 1 (two lines) before C = 2 gives "e112", then B lists "22", C "e".
    // Start at C: B = 1, A = 2 gives "e112|22|e|" as well; starting at B gives "1122…", larger.
    expect(nickel('a-b a-b a-c b-c b-c / a c')).toBe('e112|22|e|');
  });
});

describe('reading Nickel indices', () => {
  it('builds the graph: vertices 0…n−1, lines as listed, legs in order', () => {
    const g = parseNickel('e111|e|');
    expect(g.vertices.map((v) => v.name)).toEqual(['0', '1']);
    expect(g.edges).toHaveLength(3);
    expect(g.legs.map((l) => l.vertex)).toEqual([0, 1]);
  });
  it('second route: the canonical form of the parsed index equals that of the graph written in our notation', () => {
    const pairs: [string, string][] = [
      ['ee11|ee|', '1-2 1-2 / 1 1 2 2'],
      ['ee0|', '1-1 / 1 1'],
      ['e111|e|', '1-2 1-2 1-2 / 1 2'],
      ['ee11|22|ee|', '1-2 1-2 2-3 2-3 / 1 1 3 3'],
      ['1111||', '1-2 1-2 1-2 1-2 /'],
      ['123|23|3||', '1-2 1-3 1-4 2-3 2-4 3-4 /'],
      ['e112|22|e|', 'a-b a-b a-c b-c b-c / a c'],
    ];
    for (const [idx, notation] of pairs) {
      expect(canonicalNotation(parseNickel(idx), { legs: 'unlabelled' })).toBe(canonicalNotation(parseNotation(notation), { legs: 'unlabelled' }));
    }
  });
  it('accepts a non-minimal numbering, a missing final "|", and an empty list for a vertex named only by lower ones', () => {
    expect(toNickel(parseNickel('e122|e22||')).index).toBe('e112|22|e|');
    expect(toNickel(parseNickel('e111|e')).index).toBe('e111|e|');
    expect(toNickel(parseNickel('123|23|3|')).index).toBe('123|23|3||');
  });
  it('malformed indices are InputErrors at the offending character', () => {
    const at = (text: string) => {
      try {
        parseNickel(text);
      } catch (e) {
        expect(e).toBeInstanceOf(InputError);
        expect((e as InputError).hint).toBeTruthy();
        return (e as InputError).position!.offset;
      }
      throw new Error(`no error for ${text}`);
    };
    expect(at('e1x|e|')).toBe(2); // not a Nickel character
    expect(at('e11|0e|')).toBe(4); // vertex 1 lists vertex 0, which is lower
    expect(at('')).toBe(0); // empty
    expect(at('e1|e1||')).toBe(6); // vertex 2 …; its list is empty and nobody names it
    expect(at('ee1 1|ee|')).toBe(3); // a space inside
  });
});

describe('writing Nickel indices', () => {
  it('refuses graphs outside its scope (oriented lines, several fields, counterterm vertices)', () => {
    const qed = bindGraph(parseNotation('1>2:psi 2>1:psi / 1 2'), builtinTheory('qed')).graph;
    expect(() => toNickel(qed)).toThrow(InputError);
    expect(() => toNickel(parseNotation('1-c{phi,phi;p2} c-1 / 1 1'))).toThrow(InputError);
  });
  it('does not depend on the numbering of the input (random φ⁴ and φ³ graphs, relabelled)', () => {
    const rand = rng(31);
    for (let i = 0; i < 60; i++) {
      const t = i % 2 ? 'phi4' : 'phi3';
      const g = randomTheoryGraph(t, rand, 2 + (i % 8), false);
      const h = relabel(g, randomPermutation(rand, g.vertices.length), rand, false);
      const idx = toNickel(g).index;
      expect(toNickel(h).index).toBe(idx);
      // Reading the index back gives the same graph (legs unlabelled): the index is complete.
      expect(canonicalNotation(parseNickel(idx), { legs: 'unlabelled' })).toBe(canonicalNotation(g, { legs: 'unlabelled' }));
    }
  });
  it('equals the least string over all numberings, computed plainly (graphs with up to 6 vertices)', () => {
    const rand = rng(5);
    for (let i = 0; i < 40; i++) {
      const g = randomTheoryGraph(i % 3 ? 'phi4' : 'phi3', rand, 1 + (i % 6), false);
      expect(toNickel(g).index).toBe(bruteNickel(g));
    }
  });
  it('the numbering it returns produces the index', () => {
    const g = parseNotation('a-b a-b a-c b-c b-c / a c');
    const { index, numbering } = toNickel(g);
    expect(listing(g, numbering)).toBe(index);
  });
});

/** The listing of g under a numbering (num[v] = number of v), straight from the definition. */
function listing(g: Graph, num: readonly number[]): string {
  const n = g.vertices.length;
  const lists: string[][] = Array.from({ length: n }, () => []);
  for (const l of g.legs) lists[num[l.vertex]!]!.push('e');
  for (const e of g.edges) {
    const [x, y] = [num[e.a]!, num[e.b]!].sort((p, q) => p - q);
    lists[x!]!.push(NICKEL_DIGITS[y!]!);
  }
  const rank = (c: string) => (c === 'e' ? -1 : NICKEL_DIGITS.indexOf(c));
  return lists.map((l) => l.sort((p, q) => rank(p) - rank(q)).join('') + '|').join('');
}

function bruteNickel(g: Graph): string {
  const n = g.vertices.length;
  const key = (s: string) => s.replaceAll('|', '!').replaceAll('e', '#');
  let best: string | null = null;
  const perm: number[] = [];
  const used: boolean[] = [];
  const go = () => {
    if (perm.length === n) {
      const s = listing(g, perm);
      if (best === null || key(s) < key(best)) best = s;
      return;
    }
    for (let v = 0; v < n; v++) {
      if (used[v]) continue;
      used[v] = true;
      perm.push(v);
      go();
      perm.pop();
      used[v] = false;
    }
  };
  go();
  return best!;
}
