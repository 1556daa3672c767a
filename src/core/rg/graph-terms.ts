import { Poly } from '../algebra/polynomial.ts';
import { Rational } from '../algebra/rational.ts';
import { generateGraphs } from '../generate/generate-graphs.ts';
import { groupFactor } from '../group/group-factor.ts';
import type { Theory } from '../theory/types.ts';
import type { CancelToken } from '../util/cancel.ts';
import type { Graph } from '../graph/types.ts';
import { insertOnLines } from './mass-insertion.ts';

/** Which renormalization constant a graph feeds. */
export type ZKind = 'vertex' | 'field' | 'mass';

/**
 * One graph class entering a Z-factor, with everything but its counterterm:
 *   Z − 1 ⊃ weight · g^loops · S_R(graph).
 * `weight` = −(vertex sign)^V · (tree factor)^{…} · (group factor) / S — see `zWeight`.
 */
export interface GraphTerm {
  readonly kind: ZKind;
  readonly loops: number;
  /** Canonical notation of the graph whose counterterm is taken (mass: the σ leg marks the φ² insertion). */
  readonly notation: string;
  /** The graph the counterterm engine evaluates (mass insertions: a graph of the insertion theory). */
  readonly graph: Graph;
  readonly symmetryFactor: bigint;
  /** Group factor (projection onto the residue's invariant tensor); 1 without tensors. */
  readonly groupFactor: Poly;
  /** Number of the theory's quartic vertices. */
  readonly vertices: number;
  readonly weight: Poly;
  /** Mass terms: the two-point graph and the line that carries the insertion. */
  readonly parent?: { readonly notation: string; readonly line: number };
}

/**
 * Euclidean rules (theory conventions: vertexSign −1): a graph Γ with V vertices −λ·t (t the
 * tree factor: normalization × ∏ field multiplicities!, 1 for λφ⁴/4!) enters the amputated 1PI
 * function as (−λt)^V · c_Γ · I_Γ / S_Γ; the counterterm of the residue's Lagrangian term
 * enters as −(Z − 1)·(tree). So
 *   vertex:  Z_λ − 1   = −Σ (−1)^V t^{V−1} c_Γ S_R(Γ) g^L / S_Γ        (tree −λt, V = L + 1)
 *   field:   Z_φ − 1   = −Σ (−1)^V t^V     c_Γ S_R(Γ) g^L / S_Γ        (S_R: coefficient of p², V = L)
 *   mass:    Z_{m²} − 1 = −Σ_Γ Σ_lines (−1)^{V+1} t^V c_Γ S_R(Γ_line) g^L / S_Γ
 * (the insertion's own factor is −1 per m², the tree term +m²), with g = λ/(16π²): in D0 = 4
 * every loop's d^Dk/(2π)^D is (16π²)^{−1} times the engine's measure d^Dk/π^{D/2} up to the
 * (4π)^ε and e^{γε} that the scheme's μ absorbs, and λ^V/(16π²)^L = λ^{V−L} g^L.
 */
export function zWeight(kind: ZKind, V: number, t: Rational, sign: number, group: Poly, S: bigint): Poly {
  const sV = sign ** V * (kind === 'mass' ? -1 : 1);
  const tPow = kind === 'vertex' ? t.pow(V - 1) : t.pow(V);
  return group.scale(tPow.mul(Rational.of(-sV, S)));
}

/** The tree factor t of the theory's single vertex: normalization × ∏ (multiplicity of each field)!. */
export function treeFactor(theory: Theory): Rational {
  const v = theory.vertices[0]!;
  const [n, d] = v.normalization.split('/').map((x) => BigInt(x.trim()));
  let t = Rational.of(n!, d ?? 1n);
  const counts = new Map<string, number>();
  for (const f of v.fields) counts.set(f, (counts.get(f) ?? 0) + 1);
  for (const c of counts.values()) for (let k = 2; k <= c; k++) t = t.mul(Rational.int(k));
  return t;
}

/**
 * Every graph class through `loops` loops for the three Z-factors of a quartic scalar theory:
 * four-point graphs (Z_λ), two-point graphs without scaleless parts (Z_φ), and two-point graphs
 * — tadpoles included — with a φ² insertion on each line in turn, dropping those that still
 * have a scaleless part (Z_{m²}).
 */
export function collectGraphTerms(theory: Theory, loops: number, cancel?: CancelToken): GraphTerm[] {
  const phi = theory.defaultField;
  const t = treeFactor(theory);
  const sign = theory.conventions.vertexSign;
  const group = (g: Graph) => groupFactor(theory, g)?.value ?? Poly.ONE;
  const out: GraphTerm[] = [];
  for (let L = 1; L <= loops; L++) {
    const four = generateGraphs(theory, { residue: [phi, phi, phi, phi], loops: L, ...(cancel ? { cancel } : {}) });
    for (const g of four.graphs) {
      const c = group(g.graph);
      const V = g.graph.vertices.length;
      out.push({ kind: 'vertex', loops: L, notation: g.notation, graph: g.graph, symmetryFactor: g.symmetryFactor, groupFactor: c, vertices: V, weight: zWeight('vertex', V, t, sign, c, g.symmetryFactor) });
    }
    const two = generateGraphs(theory, { residue: [phi, phi], loops: L, all: true, ...(cancel ? { cancel } : {}) });
    for (const g of two.graphs) {
      const c = group(g.graph);
      const V = g.graph.vertices.length;
      if (!g.vanishes) out.push({ kind: 'field', loops: L, notation: g.notation, graph: g.graph, symmetryFactor: g.symmetryFactor, groupFactor: c, vertices: V, weight: zWeight('field', V, t, sign, c, g.symmetryFactor) });
      const w = zWeight('mass', V, t, sign, c, g.symmetryFactor);
      for (const ins of insertOnLines(g.graph, phi)) {
        if (ins.vanishes) continue;
        out.push({ kind: 'mass', loops: L, notation: ins.notation, graph: ins.graph, symmetryFactor: g.symmetryFactor, groupFactor: c, vertices: V, weight: w, parent: { notation: g.notation, line: ins.line } });
      }
    }
  }
  return out;
}
