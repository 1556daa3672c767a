/**
 * Issue 4's independent oracle: zero-dimensional φ⁴ theory, where every graph's value is 1.
 *
 * The relation (Connes–Kreimer, "Renormalization in quantum field theory and the
 * Riemann–Hilbert problem I", Commun. Math. Phys. 210 (2000) 249, arXiv:hep-th/9912092;
 * combinatorial Green functions and their Hopf subalgebra as in "Renormalized asymptotic
 * enumeration of Feynman diagrams", Annals Phys. 385 (2017) 95, arXiv:1703.00840):
 *
 * - Combinatorial Green functions, legs labelled (fixed), ħ counting loops (ħ = −λ for
 *   V = λφ⁴/4!, since a 1PI four-point graph has V = L + 1 vertices and a two-point one V = L):
 *     X⁴ = 1 + Σ_{1PI four-point Γ, L ≥ 1} ħ^L Γ/S(Γ),   X² = 1 − Σ_{1PI two-point Γ, L ≥ 1} ħ^L Γ/S(Γ)
 *   (the vertex function over the tree vertex, and the inverse propagator).
 * - They span a Hopf subalgebra: Δ X^r = Σ_L X^r Q^L ⊗ X^r_L with the invariant charge
 *   Q = X⁴/(X²)², X^r_L the L-loop part.
 * - With the character φ = 1 on every graph and R = id, the twisted antipode is
 *   S_R^φ = φ∘S, and the renormalized character φ_R = (φ∘S) ⋆ φ is the counit: every
 *   renormalized Green function is trivial. The Z-factors are Z^r = φ(S(X^r)).
 * - Applying (φ∘S) ⊗ φ to the coproduct of X^r and using φ_R(X^r) = 1:
 *     Z^r(ħ) · G^r(ħ z(ħ)) = 1,   z = Z⁴/(Z²)²,   G^r = φ(X^r) (the bare 1PI series).
 *
 * The oracle side solves that functional equation by iteration, with G⁴, G² taken from the
 * zero-dimensional generating functions (Gaussian moments, log, Legendre transform; computed
 * in ../generate/zero-dimensional-series.ts, independent of the engine). The engine side
 * generates every graph (scaleless ones included: the algebra keeps tadpoles), takes the
 * antipode of its class from HopfAlgebra (classes have legs unlabelled, but φ is 1 on every
 * class, so φ(S(Γ)) is just the sum of the antipode's coefficients), and weights each
 * labelled graph with its legs-fixed 1/S, as X^r requires.
 */
import { describe, expect, it } from 'vitest';
import { Rational } from '../../../src/core/algebra/rational.ts';
import { generateGraphs } from '../../../src/core/generate/index.ts';
import { HopfAlgebra, unlabelledLegsClassifier } from '../../../src/core/hopf/index.ts';
import { builtinTheory } from '../../../src/core/theory/index.ts';
import { inv, mul, onePISums, type Series } from '../generate/zero-dimensional-series.ts';

const phi4 = builtinTheory('phi4');
const LOOPS = 4;

/** G(ħ · z(ħ)) for a series G and z with z(0) = 1, truncated at ħ^L. */
function compose(G: Series, z: Series, L: number): Series {
  const hz: Series = [Rational.ZERO, ...z.slice(0, L)];
  let out: Series = Array.from({ length: L + 1 }, (_, i) => (i === 0 ? G[0]! : Rational.ZERO));
  let p: Series = [Rational.ONE, ...Array.from({ length: L }, () => Rational.ZERO)];
  for (let k = 1; k <= L; k++) {
    p = mul(p, hz, L);
    out = out.map((x, i) => x.add(p[i]!.mul(G[k] ?? Rational.ZERO)));
  }
  return out;
}

/** The oracle: Z⁴, Z² from Z^r(ħ) G^r(ħ z(ħ)) = 1, z = Z⁴/(Z²)², by iteration (each pass fixes one more order). */
function oracleZ(L: number): { z4: Series; z2: Series; G4: Series; G2: Series } {
  const zd = onePISums(4, L + 1);
  // Zero-dimensional sums carry (−λ)^V; with ħ = −λ: G⁴ = Σ_L ħ^L |four[L+1]|, G² = 1 − Σ_L ħ^L (two[L] in ħ).
  const G4: Series = Array.from({ length: L + 1 }, (_, l) => zd.four[l + 1]!.mul(Rational.int((l + 1) % 2 ? -1 : 1)));
  // two[l] = Σ (−λ)^l/S = (−1)^l w_l with w_l = Σ 1/S ≥ 0; G²[l] = −w_l.
  const G2: Series = Array.from({ length: L + 1 }, (_, l) => (l === 0 ? Rational.ONE : zd.two[l]!.mul(Rational.int(l % 2 ? -1 : 1)).neg()));
  let z4: Series = [Rational.ONE, ...Array.from({ length: L }, () => Rational.ZERO)];
  let z2: Series = [...z4];
  for (let it = 0; it <= L; it++) {
    const z = mul(z4, inv(mul(z2, z2, L), L), L);
    z4 = inv(compose(G4, z, L), L);
    z2 = inv(compose(G2, z, L), L);
  }
  return { z4, z2, G4, G2 };
}

describe('zero-dimensional φ⁴ oracle for the antipode (issue 4)', () => {
  const oracle = oracleZ(LOOPS);
  const H = new HopfAlgebra(phi4, unlabelledLegsClassifier);
  const phiS = new Map<string, bigint>();
  /** φ(S(Γ)) with φ = 1 on every graph: the sum of the antipode's coefficients. */
  const phiOfAntipode = (key: string) => {
    let v = phiS.get(key);
    if (v === undefined) {
      v = 0n;
      for (const c of H.antipode(key).terms.values()) v += c;
      phiS.set(key, v);
    }
    return v;
  };
  /** Σ over generated graphs of φ(S(Γ))/S(Γ) (legs labelled), and Σ 1/S. */
  const sums = (legs: number, L: number) => {
    const r = generateGraphs(phi4, { residue: Array<string>(legs).fill('phi'), loops: L, all: true });
    let z = Rational.ZERO;
    for (const g of r.graphs) z = z.add(Rational.of(phiOfAntipode(H.classOf(g.graph)), g.symmetryFactor));
    return { z, weight: r.weight };
  };

  it('the oracle series start as expected: Z⁴ = 1 − 3/2 ħ + …, Z² = 1 + 1/2 ħ + … (one-loop: −φ(Γ)/S summed)', () => {
    expect(oracle.z4[1]!.toString()).toBe('-3/2');
    expect(oracle.z2[1]!.toString()).toBe('1/2');
  });
  for (let L = 1; L <= LOOPS; L++) {
    it(`Z⁴ and Z² at ${L} loop${L > 1 ? 's' : ''}: Σ φ(S(Γ))/S(Γ) over generated graphs equals the generating-function oracle`, () => {
      const four = sums(4, L);
      const two = sums(2, L);
      expect(four.weight.toString()).toBe(oracle.G4[L]!.toString()); // X⁴ itself: Σ 1/S
      expect(four.z.toString()).toBe(oracle.z4[L]!.toString());
      // X² = 1 − Σ ħ^L Γ/S, so Z² = φ(S(X²)) has −Σ φ(S(Γ))/S at order L.
      expect(two.z.neg().toString()).toBe(oracle.z2[L]!.toString());
    });
  }
});
