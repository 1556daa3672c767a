import { describe, expect, it } from 'vitest';
import { periodCounterterm } from '../../../src/core/periods/period-counterterm.ts';
import { estimatePeriod, preparePeriod } from '../../../src/core/periods/period-estimate.ts';
import { periodInput } from '../../../src/core/periods/period-input.ts';
import { builtinTheory } from '../../../src/core/theory/builtin/index.ts';
import { graph, WHEEL3, ZETA } from './graphs.ts';

/*
 * Why the MS-bar counterterm of a primitive log-divergent graph is −P/(Lε) (DESIGN §5, §8):
 *
 * Measure e^{γε} d^Dk/π^{D/2} per loop, D = 2h − 2ε (h = 2 for φ⁴), N = h·L massless lines 1/q².
 * Schwinger parameters 1/q² = ∫₀^∞ dα e^{−αq²} and the Gaussian loop integral
 * ∫ Π_l d^Dk_l/π^{D/2} e^{−kᵀΛk + …} = (det Λ)^{−D/2} e^{−φ/ψ}, det Λ = ψ, give
 *
 *     I(G) = e^{Lγε} ∫_{α>0} d^Nα ψ^{−D/2} e^{−φ/ψ},   φ the second Symanzik polynomial.
 *
 * Insert 1 = ∫dλ δ(λ − Σα) and scale α = λa: ψ has degree L, φ degree L + 1, so the integrand
 * picks up λ^{N−1−L·D/2} = λ^{Lε−1} (because N = hL), and ∫₀^∞ dλ λ^{Lε−1} e^{−λφ/ψ} = Γ(Lε)(ψ/φ)^{Lε}:
 *
 *     I(G) = e^{Lγε} Γ(Lε) ∫ Ω ψ^{−h+ε} (ψ/φ)^{Lε}.
 *
 * Γ(Lε) = 1/(Lε) + O(1), and for a primitive graph ∫Ω/ψ^h = P converges, so
 * I(G) = P/(Lε) + O(ε⁰). Without subdivergences the R-operation subtracts just the pole:
 * Z(G) = −K I(G) = −P/(Lε). The factor e^{Lγε} (MS-bar rather than MS) only changes O(ε⁰).
 *
 * Checks: the one-loop bubble (L = 1) has I = Γ(ε)Γ(1−ε)²/Γ(2−2ε)·(p²)^{−ε}·e^{γε} = 1/ε + …,
 * so P = 1 and Z = −1/ε; the wheel with three spokes (L = 3, P = 6ζ(3), "Quantum periods: A
 * census of φ⁴-transcendentals", Schnetz, Commun. Number Theory Phys. 4 (2010) 1, arXiv:0801.2856)
 * gives −2ζ(3)/ε, as REFERENCES.md states for this normalization.
 */
const phi4 = builtinTheory('phi4');

describe('counterterm −P/(Lε) from the period', () => {
  it('is a simple pole with coefficient −P/L, error scaled alike', () => {
    expect(periodCounterterm({ value: 6, error: 1.5 }, 3)).toEqual({ '-1': { approx: -2, error: 0.5 } });
  });

  it('the bubble: −1/ε', () => {
    const e = estimatePeriod(preparePeriod(periodInput(graph('1-2 1-2 / 1 1 2 2'), phi4).periodGraph), { samples: 40_000, seed: 2 });
    const z = periodCounterterm(e, 1)['-1'];
    expect(Math.abs(z.approx + 1)).toBeLessThan(4 * z.error);
  });

  it('the wheel with three spokes: −2ζ(3)/ε, consistent with 6ζ(3)/3', () => {
    const input = periodInput(graph(WHEEL3), phi4);
    expect(input.periodGraph.loops).toBe(3);
    const e = estimatePeriod(preparePeriod(input.periodGraph), { samples: 200_000, seed: 4 });
    const z = periodCounterterm(e, input.periodGraph.loops)['-1'];
    expect(Math.abs(z.approx + 2 * ZETA[3]!)).toBeLessThan(4 * z.error);
    expect(z.error).toBeLessThan(0.01);
  });
});
