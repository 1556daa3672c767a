import type { PeriodEstimate } from './period-estimate.ts';

/** A Laurent coefficient known approximately: value and standard error. */
export interface ApproxCoefficient {
  readonly approx: number;
  readonly error: number;
}

/**
 * The MS-bar counterterm of a primitive log-divergent graph with L loops, from its period:
 * Z = −P/(L·ε), a pure simple pole (DESIGN §5). With the measure e^{γε}d^Dk/π^{D/2} per loop,
 * D = 2h − 2ε and N = h·L lines 1/p², Schwinger parameters and the scale integral give
 *
 *     I(G) = e^{Lγε} Γ(Lε) ∫Ω ψ^{−h+ε} (ψ/φ)^{Lε} = P/(Lε) + O(ε⁰),
 *
 * and minimal subtraction of a graph without subdivergences removes exactly that pole
 * (the derivation is spelled out in test/core/periods/counterterm.test.ts).
 * The error scales the same way. Keys are powers of ε, as in the CLI JSON.
 */
export function periodCounterterm(p: Pick<PeriodEstimate, 'value' | 'error'>, loops: number): { readonly '-1': ApproxCoefficient } {
  return { '-1': { approx: -p.value / loops, error: p.error / loops } };
}
