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
import { isNegligible } from './negligible.ts';

/** Outcome of the renormalization-group check of a counterterm's higher poles. */
export interface RgCheck {
  readonly checked: boolean;
  readonly consistent: boolean;
  readonly reason?: string;
}

const coeff = (s: Series, p: number): Poly => (p > s.order ? Poly.ZERO : s.coeff(p));

/**
 * In a minimal scheme the higher poles follow from the simple ones: writing S_R = Σ_k c_k ε^{−k}
 * and grading by loop number (Y Γ = L(Γ) Γ), the counterterm satisfies Y(c_{k+1}) = Y(c_1) ⋆ c_k,
 *   L(Γ) c_{k+1}(Γ) = Σ_α L(α) c_1(α) · c_k(Γ/α),
 * the sum over proper admissible α (c_1 of a product from the product of the components'
 * counterterms). Derivation: locality makes ε·(S_R ⋆ Yφ) finite; Y is a derivation, so
 * S_R ⋆ Yφ = Yφ_R − (Y S_R ⋆ S_R^{⋆−1}) ⋆ φ_R, forcing Y S_R ⋆ S_R^{⋆−1} = b/ε with b = Y c_1 —
 * the pole equations of "Renormalization in quantum field theory and the Riemann–Hilbert problem II",
 * Commun. Math. Phys. 216 (2001) 215, arXiv:hep-th/0003188 (β as the residue), graph by graph.
 * Needs the counterterms of the cographs, which the engine computes.
 */
export function checkRgPoles(engine: CountertermEngine, a: GraphAnalysis, value: Series): RgCheck {
  const bg = a.bound;
  const L = loopNumber(bg.graph);
  const maxPole = value.coeffs.length ? -value.val : 0;
  if (maxPole <= 1) return { checked: true, consistent: true };
  const pieces: { cSub: Series; loopsSub: number; ctQ: Series }[] = [];
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
    pieces.push({ cSub: cSub!, loopsSub: comps.reduce((x, c) => x + c.loops, 0), ctQ: ctQ.value });
  }
  for (let k = 1; k < maxPole; k++) {
    const lhs = coeff(value, -(k + 1)).scale(Rational.int(L));
    let rhs = Poly.ZERO;
    for (const p of pieces) rhs = rhs.add(coeff(p.cSub, -1).mul(coeff(p.ctQ, -k)).scale(Rational.int(p.loopsSub)));
    if (!isNegligible(lhs.sub(rhs))) return { checked: true, consistent: false, reason: `the ε^-${k + 1} pole disagrees with the renormalization group` };
  }
  return { checked: true, consistent: true };
}
