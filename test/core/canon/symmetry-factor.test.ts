import { describe, expect, it } from 'vitest';
import { automorphismGroup, edgePermutationFactor, symmetryFactor } from '../../../src/core/canon/index.ts';
import { parseNotation } from '../../../src/core/graph/notation-parse.ts';
import { bindGraph } from '../../../src/core/theory/bind-graph.ts';
import { builtinTheory } from '../../../src/core/theory/builtin/index.ts';

const S = (notation: string, theory = 'phi4') => symmetryFactor(bindGraph(parseNotation(notation), builtinTheory(theory)).graph);

// Textbook worked examples of φ⁴ symmetry factors with the external legs fixed, the graph
// carrying 1/S: "An Introduction to Quantum Field Theory" (1995), §4.4, and "Quantum Field
// Theory" (Cambridge 2007), ch. 9–10 (as listed in REFERENCES.md).
describe('textbook symmetry factors of φ⁴ graphs', () => {
  it('one-loop four-point bubble: S = 2 (An Introduction to QFT 1995 §4.4; QFT Cambridge 2007 ch. 10)', () => {
    expect(S('1-2 1-2 / 1 1 2 2')).toBe(2n);
  });
  it('tadpole (one-loop two-point graph): S = 2 (An Introduction to QFT 1995 §4.4; QFT Cambridge 2007 ch. 10)', () => {
    expect(S('1-1 / 1 1')).toBe(2n);
  });
  it('two-loop sunset: S = 6 (An Introduction to QFT 1995 §4.4; QFT Cambridge 2007 ch. 10)', () => {
    expect(S('1-2 1-2 1-2 / 1 2')).toBe(6n);
  });
  it('s-channel double bubble: S = 4 (An Introduction to QFT 1995 §4.4)', () => {
    expect(S('1-2 1-2 2-3 2-3 / 1 1 3 3')).toBe(4n);
  });
  it('vacuum figure-eight: S = 8 (An Introduction to QFT 1995 §4.4; QFT Cambridge 2007 ch. 9)', () => {
    expect(S('1-1 1-1 /')).toBe(8n);
  });
  it('two-vertex vacuum graph with four lines: S = 48 (An Introduction to QFT 1995 §4.4; QFT Cambridge 2007 ch. 9)', () => {
    expect(S('1-2 1-2 1-2 1-2 /')).toBe(48n);
  });
  it('does not depend on how the graph is written (vertex names, edge order, leg order at one vertex)', () => {
    expect(S('b-a a-b b-a / a b')).toBe(6n);
    expect(S('x-y y-z x-y z-y / x x z z')).toBe(4n);
  });
});

// Further factors worked out by hand from the definition (half-edge permutations with the
// legs fixed) — common practice; the brute-force property test checks the same definition.
describe('symmetry factors worked out by hand', () => {
  it('double tadpole (two self-loops in series on the propagator): 2 · 2 = 4', () => {
    // 1 and 2 each carry a self-loop (flip 2 each); nothing else moves with legs fixed.
    expect(S('1-1 1-2 2-2 / 1 2')).toBe(4n);
  });
  it('a self-loop on a bubble (two-point cactus): 2! parallel lines × 2 for the flip = 4', () => {
    // 1: two legs and two lines to 2; 2: the two lines and a self-loop.
    expect(S('1-2 1-2 2-2 / 1 1')).toBe(4n);
  });
  it('K4 as a φ³ vacuum graph: S = |S4| = 24', () => {
    // Every permutation of the four vertices of K4 is an automorphism; no parallel lines.
    expect(S('1-2 1-3 1-4 2-3 2-4 3-4 /', 'phi3')).toBe(24n);
  });
  it('the wheel with three spokes as a four-point graph (K4, one leg per vertex): S = 1', () => {
    expect(S('1-2 1-3 1-4 2-3 2-4 3-4 / 1 2 3 4')).toBe(1n);
  });
});

describe('typed and oriented lines', () => {
  it('a fermion self-loop cannot be flipped, a scalar one can (Yukawa tadpole: S = 1)', () => {
    // φ leg into a Yukawa vertex whose ψ line closes on itself: the loop's ends are ψ and ψ̄.
    expect(S('1>1:psi / 1', 'yukawa')).toBe(1n);
    expect(edgePermutationFactor(parseNotation('1>1:psi /'))).toBe(1n);
    expect(edgePermutationFactor(parseNotation('1-1 /'))).toBe(2n);
  });
  it('a fermion loop of two propagators between two vertices: the lines differ in direction, S = 1 (QED vacuum polarization)', () => {
    expect(S('1>2:psi 2>1:psi / 1 2', 'qed')).toBe(1n);
  });
  it('the two-loop QED vacuum graph (a fermion loop with one photon): the vertex swap is a symmetry, S = 2', () => {
    // Swapping 1 and 2 turns 1>2, 2>1 into 2>1, 1>2: the same graph, and the photon 1-2 is kept.
    // So |Aut| = 2 and S = 2 (the loop's orientation is not reversed; the two propagators trade places).
    expect(S('1>2:psi 2>1:psi 1-2:A /', 'qed')).toBe(2n);
  });
  it('parallel lines of different fields do not permute (Yukawa: a φ line and ψ lines between two vertices)', () => {
    // 1: ψ̄ψφ vertex, 2: ψ̄ψφ vertex; lines 1>2, 2>1 and 1-2:phi; legs none: only the vertex swap.
    expect(S('1>2:psi 2>1:psi 1-2:phi /', 'yukawa')).toBe(2n);
    // Two identical φ lines between two φ⁴ vertices of a Yukawa graph do permute.
    expect(S('1-2 1-2 1-2 1-2 /', 'yukawa')).toBe(48n);
  });
  it('counterterm vertices: residue and structure are part of the vertex', () => {
    // A p² insertion on one line of the bubble: the two lines differ now, S = 1; on both lines, S = 2.
    expect(S('1-c{phi,phi;p2} c-2 1-2 / 1 1 2 2')).toBe(1n);
    expect(S('1-c{phi,phi;p2} c-2 1-d{phi,phi;p2} d-2 / 1 1 2 2')).toBe(2n);
    expect(S('1-c{phi,phi;p2} c-2 1-d{phi,phi;m2} d-2 / 1 1 2 2')).toBe(1n);
    // Two different insertions on a vacuum ring cannot be exchanged; two equal ones can.
    const ring = (x: string, y: string) => automorphismGroup(parseNotation(`a{phi,phi;${x}}-b{phi,phi;${y}} b-a /`)).order;
    expect(ring('p2', 'm2')).toBe(1n);
    expect(ring('p2', 'p2')).toBe(2n);
  });
});

describe('automorphism group', () => {
  it('orders of small graphs: K4 24, C5(1,2) = K5 120, the cycle of length 6 12', () => {
    expect(automorphismGroup(parseNotation('1-2 1-3 1-4 2-3 2-4 3-4 /')).order).toBe(24n);
    expect(automorphismGroup(parseNotation('1-2 1-3 1-4 1-5 2-3 2-4 2-5 3-4 3-5 4-5 /')).order).toBe(120n);
    expect(automorphismGroup(parseNotation('1-2 2-3 3-4 4-5 5-6 6-1 /')).order).toBe(12n);
  });
  it('orbits: in the sunset with labelled legs both vertices are fixed; with unlabelled legs they swap', () => {
    const g = parseNotation('1-2 1-2 1-2 / 1 2');
    expect(automorphismGroup(g).orbits).toEqual([0, 1]);
    expect(automorphismGroup(g, { legs: 'unlabelled' }).orbits).toEqual([0, 0]);
  });
  it('edge cases: the empty graph and a single vertex have the trivial group', () => {
    expect(automorphismGroup(parseNotation('/')).order).toBe(1n);
    expect(symmetryFactor(parseNotation('/'))).toBe(1n);
    expect(automorphismGroup(parseNotation('/ 1 1 1 1')).order).toBe(1n);
  });
});
