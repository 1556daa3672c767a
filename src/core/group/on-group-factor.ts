import { variable } from '../algebra/monomial.ts';
import { Poly } from '../algebra/polynomial.ts';
import { Rational } from '../algebra/rational.ts';
import { TheoryError } from '../errors.ts';
import type { Graph } from '../graph/types.ts';

/** One pairing of the external legs (1-based leg numbers, each pair ascending, pairs sorted) with its coefficient. */
export interface LegPairingTerm {
  readonly pairs: readonly (readonly [number, number])[];
  readonly coefficient: Poly;
}

/** The O(N) tensor of a graph: Σ over pairings P of the legs of c_P(N) Π_{(i,j)∈P} δ_{a_i a_j}. */
export interface OnTensor {
  readonly terms: readonly LegPairingTerm[];
  /**
   * The projection onto the residue's invariant tensor, the symmetrized pairing tensor
   * S = (1/#pairings) Σ_P δ_P (two legs: δ; four legs: (δδ + δδ + δδ)/3, the vertex tensor):
   * (T·S)/(S·S) = Σ_P c_P, since δ_P·Σ_Q δ_Q is the same for every P. The tree-level vertex
   * has 1, the propagator 1.
   */
  readonly projection: Poly;
}

/** Union–find with undo (no path compression), over half-edge ids. */
class Strands {
  readonly parent: Int32Array;
  readonly size: Int32Array;
  private readonly log: number[] = [];
  constructor(n: number) {
    this.parent = Int32Array.from({ length: n }, (_, i) => i);
    this.size = new Int32Array(n).fill(1);
  }
  find(x: number): number {
    while (this.parent[x] !== x) x = this.parent[x]!;
    return x;
  }
  /** Joins the strands of x and y; true when they were one strand already (a closed index loop). */
  join(x: number, y: number): boolean {
    let a = this.find(x);
    let b = this.find(y);
    if (a === b) {
      this.log.push(-1);
      return true;
    }
    if (this.size[a]! < this.size[b]!) [a, b] = [b, a];
    this.parent[b] = a;
    this.size[a]! += this.size[b]!;
    this.log.push(b);
    return false;
  }
  undo(): void {
    const b = this.log.pop()!;
    if (b < 0) return;
    const a = this.parent[b]!;
    this.size[a]! -= this.size[b]!;
    this.parent[b] = b;
  }
}

/**
 * Contracts the O(N) vertex tensors (δ_ab δ_cd + δ_ac δ_bd + δ_ad δ_bc)/3 over a φ⁴ graph:
 * each vertex is expanded into its three pairings of half-edges; lines join half-edges; the
 * index strands then either close (a factor N each) or join two external legs. Summing the
 * 3^V choices with weight 3^{−V} gives the graph's tensor as a combination of leg pairings.
 * The choices are walked depth first, with strands kept in a union–find that is undone on
 * the way back, so the work is about 3^V small steps.
 */
export function onTensor(g: Graph): OnTensor {
  const V = g.vertices.length;
  const halves: number[][] = g.vertices.map(() => []);
  let h = 0;
  const lineEnds: [number, number][] = [];
  for (const e of g.edges) {
    halves[e.a]!.push(h);
    halves[e.b]!.push(h + 1);
    lineEnds.push([h, h + 1]);
    h += 2;
  }
  const legHalf: number[] = [];
  for (const l of g.legs) {
    halves[l.vertex]!.push(h);
    legHalf.push(h++);
  }
  halves.forEach((hs, v) => {
    if (hs.length !== 4) throw new TheoryError(`the O(N) vertex tensor needs four lines at each vertex; this one has ${hs.length}`, `vertex "${g.vertices[v]!.name}"`);
  });
  const n = g.legs.length;
  if (n % 2 !== 0) return { terms: [], projection: Poly.ZERO };
  const strands = new Strands(h);
  let closed = 0;
  for (const [x, y] of lineEnds) if (strands.join(x, y)) closed++;
  // counts.get(pairingKey)[loops] = number of choices.
  const counts = new Map<string, number[]>();
  const pairingsOf = new Map<string, [number, number][]>();
  const leaf = () => {
    const byRoot = new Map<number, number[]>();
    legHalf.forEach((x, i) => {
      const r = strands.find(x);
      const list = byRoot.get(r);
      if (list) list.push(i + 1);
      else byRoot.set(r, [i + 1]);
    });
    const pairs = [...byRoot.values()].map((p) => [p[0]!, p[1]!] as [number, number]).sort((a, b) => a[0] - b[0]);
    const key = pairs.map((p) => p.join('-')).join(' ');
    let row = counts.get(key);
    if (!row) {
      counts.set(key, (row = []));
      pairingsOf.set(key, pairs);
    }
    row[closed] = (row[closed] ?? 0) + 1;
  };
  const choices: [number, number, number, number][] = [
    [0, 1, 2, 3],
    [0, 2, 1, 3],
    [0, 3, 1, 2],
  ];
  const rec = (v: number) => {
    if (v === V) return leaf();
    const hs = halves[v]!;
    for (const [a, b, c, d] of choices) {
      const c1 = strands.join(hs[a]!, hs[b]!);
      const c2 = strands.join(hs[c]!, hs[d]!);
      closed += (c1 ? 1 : 0) + (c2 ? 1 : 0);
      rec(v + 1);
      closed -= (c1 ? 1 : 0) + (c2 ? 1 : 0);
      strands.undo();
      strands.undo();
    }
  };
  rec(0);
  const scale = Rational.of(1n, 3n ** BigInt(V));
  const terms: LegPairingTerm[] = [];
  let projection = Poly.ZERO;
  for (const [key, row] of [...counts].sort((a, b) => (a[0] < b[0] ? -1 : 1))) {
    let c = Poly.ZERO;
    row.forEach((k, loops) => {
      if (k) c = c.add(Poly.term(Rational.int(k).mul(scale), variable('N', loops)));
    });
    terms.push({ pairs: pairingsOf.get(key)!, coefficient: c });
    projection = projection.add(c);
  }
  return { terms, projection };
}
