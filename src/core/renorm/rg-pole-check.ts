import { Poly } from '../algebra/polynomial.ts';
import { Rational } from '../algebra/rational.ts';
import type { Series } from '../algebra/series.ts';
import { contractParts } from '../graph/contract.ts';
import { loopNumber } from '../graph/connectivity.ts';
import { subgraphAsGraph } from '../graph/extract-subgraph.ts';
import { bindGraph } from '../theory/bind-graph.ts';
import { countertermMarks } from '../hopf/counterterm-structure.ts';
import type { GraphAnalysis } from '../hopf/hopf-algebra.ts';
import type { CountertermEngine } from './counterterm-engine.ts';

/** Outcome of the renormalization-group check of a counterterm's higher poles. */
export interface RgCheck {
  readonly checked: boolean;
  readonly consistent: boolean;
  readonly reason?: string;
}

const coeff = (s: Series, p: number): Poly => (p > s.order ? Poly.ZERO : s.coeff(p));

/**
 * In a minimal scheme the higher poles follow from the simple ones: writing S_R = Σ_k c_k ε^{−k}
 * and grading by loop number (Y Γ = L(Γ) Γ), the counterterm satisfies Y(c_{k+1}) = c_k ⋆ Y(c_1),
 *   L(Γ) c_{k+1}(Γ) = Σ_α c_k(α) · L(Γ/α) c_1(Γ/α),
 * the sum over proper admissible α (c_k of a product from the product of the components'
 * counterterms) — the scattering-type formula of "Renormalization in quantum field theory and the
 * Riemann–Hilbert problem II", Commun. Math. Phys. 216 (2001) 215, arXiv:hep-th/0003188, i.e. the
 * RG pole equations graph by graph. Needs the counterterms of the cographs, which the engine computes.
 */
export function checkRgPoles(engine: CountertermEngine, a: GraphAnalysis, value: Series): RgCheck {
  const bg = a.bound;
  const L = loopNumber(bg.graph);
  const maxPole = value.coeffs.length ? -value.val : 0;
  if (maxPole <= 1) return { checked: true, consistent: true };
  const pieces: { cSub: Series; loopsQ: number; c1Q: Poly }[] = [];
  for (const adm of a.admissible) {
    const comps = adm.components.map((i) => a.subgraphs[i]!);
    let cSub: Series | null = null;
    for (const c of comps) {
      const ct = engine.counterterm(bindGraph(subgraphAsGraph(bg.graph, c.edgeList).graph, engine.theory));
      if (!ct.ok) return { checked: false, consistent: false, reason: ct.reason };
      cSub = cSub ? cSub.mul(ct.value) : ct.value;
    }
    const q = contractParts(bg.graph, comps.map((c) => ({ edges: c.edgeList, mark: countertermMarks(engine.theory, c.residue, c.omega)[0]! }))).graph;
    const qb = bindGraph(q, engine.theory);
    const ctQ = engine.counterterm(qb);
    if (!ctQ.ok) return { checked: false, consistent: false, reason: `cograph counterterm not available: ${ctQ.reason}` };
    pieces.push({ cSub: cSub!, loopsQ: loopNumber(q), c1Q: coeff(ctQ.value, -1) });
  }
  for (let k = 1; k < maxPole; k++) {
    const lhs = coeff(value, -(k + 1)).scale(Rational.int(L));
    let rhs = Poly.ZERO;
    for (const p of pieces) rhs = rhs.add(coeff(p.cSub, -k).mul(p.c1Q).scale(Rational.int(p.loopsQ)));
    if (!lhs.sub(rhs).isZero()) return { checked: true, consistent: false, reason: `the ε^-${k + 1} pole disagrees with the renormalization group` };
  }
  return { checked: true, consistent: true };
}
