import type { BenchCase } from '../bench-case.ts';
import { builtinTheory } from '../../src/core/theory/builtin/index.ts';
import { computeRg, rgConventions, rgReport } from '../../src/core/rg/index.ts';

const on = builtinTheory('phi4-on');

export const cases: BenchCase[] = [
  {
    name: 'rg --loops 3 for O(N) φ⁴ (MS-bar) end to end: generation, group factors, 64 counterterms, Z-factors, β, γ_φ, γ_m², report',
    targetMs: 1000,
    iterations: 3,
    run() {
      const r = computeRg(on, { loops: 3, scheme: 'msbar' });
      rgReport(r, rgConventions(on, r.scheme));
    },
  },
];
