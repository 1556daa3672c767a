import type { BenchCase } from '../bench-case.ts';
import { runJob, type JobRequest } from '../../src/core/project/jobs.ts';
import { builtinTheory } from '../../src/core/theory/builtin/index.ts';

const phi4 = builtinTheory('phi4');

/**
 * The structure workbench's engine side for one 5-loop graph: the `structure` job (power
 * counting, subgraphs, coproduct, formula tree, counterterm diagrams, all pictures) and the
 * first forest page, as the worker runs them when a graph is selected (target 300 ms for the
 * whole round trip, the app's part measured in the end-to-end test). A trailing space in the
 * notation each run defeats the job's one-graph memo, so every run starts cold.
 */
function structureCase(label: string, notation: string): BenchCase {
  let n = 0;
  return {
    name: `structure panels: ${label} (structure job + first forest page)`,
    targetMs: 300,
    run() {
      const text = `${notation}${' '.repeat(n++ % 2)}`;
      const jobs: JobRequest[] = [
        { kind: 'structure', theory: phi4, notation: text },
        { kind: 'forest-page', theory: phi4, notation: text, which: 'all', offset: 0, limit: 10 },
      ];
      for (const j of jobs) {
        const out = runJob(j);
        if (!out.ok) throw new Error(out.error.message);
      }
    },
  };
}

export const cases: BenchCase[] = [
  structureCase('5-loop φ⁴ bubble chain, 14 subgraphs, 197 forests', '1-2 1-2 2-3 2-3 3-4 3-4 4-5 4-5 5-6 5-6 / 1 1 6 6'),
  structureCase('5-loop φ⁴ propagator graph, 12 subgraphs, 104 forests', '2-5 4-2 1-3 3-1 1-5 4-3 2-5 3-1 4-4 / 5 2'),
];
