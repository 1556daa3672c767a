// Period benchmarks (issue 9): Monte Carlo throughput per core on 5-, 7- and 9-loop zigzag graphs
// (ms per block of 4096 samples: samples/s per core = 4096 / (ms/1000)), time to 10⁻³ relative
// error for the wheel with three spokes (target < 2 s), and an 8-loop period to 1% (target < 60 s
// on two cores; timed here on one).
import type { BenchCase } from '../bench-case.ts';
import { heppBoundExact } from '../../src/core/periods/hepp-bound-exact.ts';
import { estimatePeriod, PERIOD_BLOCK_SIZE, preparePeriod, type PeriodPlan } from '../../src/core/periods/period-estimate.ts';
import { periodInput } from '../../src/core/periods/period-input.ts';
import { TropicalSampler } from '../../src/core/periods/tropical-sampler.ts';
import { parseNotation } from '../../src/core/graph/notation-parse.ts';
import { builtinTheory } from '../../src/core/theory/builtin/index.ts';

const phi4 = builtinTheory('phi4');
/** Completed zigzag with m − 2 loops: the circulant C_m(1,2). */
const zigzag = (loops: number): PeriodPlan => {
  const m = loops + 2;
  const e: string[] = [];
  for (let i = 0; i < m; i++) e.push(`${i}-${(i + 1) % m}`, `${i}-${(i + 2) % m}`);
  return preparePeriod(periodInput(parseNotation(e.join(' ') + ' /'), phi4).periodGraph);
};
const wheel3 = preparePeriod(periodInput(parseNotation('1-2 1-3 1-4 2-3 2-4 3-4 / 1 2 3 4'), phi4).periodGraph);

function throughput(loops: number): BenchCase {
  const plan = zigzag(loops);
  const sampler = new TropicalSampler(plan.graph, plan.tables);
  let block = 0;
  return { name: `periods: ${loops}-loop zigzag, one block of ${PERIOD_BLOCK_SIZE} samples (one core)`, run: () => void sampler.sampleBlock(1, block++, PERIOD_BLOCK_SIZE) };
}

const z8 = zigzag(8);

export const cases: BenchCase[] = [
  throughput(5),
  throughput(7),
  throughput(9),
  {
    // Relative standard deviation per sample ≈ 0.89 here, so 800k samples give ≈ 1.0e-3.
    name: 'periods: wheel with three spokes to 1e-3 relative error (800k samples, one core)',
    run: () => void estimatePeriod(wheel3, { samples: 800_000, seed: 1 }),
    iterations: 3,
    targetMs: 2000,
  },
  {
    // Relative standard deviation per sample ≈ 2.0 for Z_8, so 45k samples give ≈ 1%.
    name: 'periods: 8-loop zigzag to 1% (45k samples, one core)',
    run: () => void estimatePeriod(z8, { samples: 45_000, seed: 1 }),
    iterations: 3,
    targetMs: 60_000,
  },
  {
    name: 'periods: 9-loop zigzag, sector tables and exact Hepp bound (2^18 subsets)',
    run: () => void heppBoundExact(zigzag(9).tables),
    iterations: 2,
  },
];
