import type { BenchCase } from '../bench-case.ts';
import { isOnePIGraph, loopNumber } from '../../src/core/graph/connectivity.ts';
import { bindGraph } from '../../src/core/theory/bind-graph.ts';
import { builtinTheory } from '../../src/core/theory/builtin/index.ts';
import { HopfAlgebra } from '../../src/core/hopf/hopf-algebra.ts';
import { unlabelledLegsClassifier } from '../../src/core/hopf/default-classifier.ts';
import { randomTheoryGraph, rng } from '../../test/helpers/random-graphs.ts';

const phi4 = builtinTheory('phi4');

/** Seeded 1PI four-point φ⁴ graphs with L loops (V = L + 1 vertices, 2L edges). */
function fourPointGraphs(loops: number, count: number, seed: number) {
  const r = rng(seed);
  const out = [];
  while (out.length < count) {
    const g = randomTheoryGraph(phi4, r, { vertices: loops + 1, maxEdges: 2 * loops, legProbability: 0.05 });
    if (g.legs.length === 4 && isOnePIGraph(g) && loopNumber(g) === loops) out.push(bindGraph(g, phi4));
  }
  return out;
}

function hopfCase(loops: number): BenchCase {
  const graphs = fourPointGraphs(loops, 10, 1000 + loops);
  return {
    name: `coproduct+antipode: ten random 1PI φ⁴ four-point graphs, ${loops} loops (per graph)`,
    targetMs: 20,
    run() {
      // A fresh algebra each run: nothing memoized from the previous run.
      const H = new HopfAlgebra(phi4, unlabelledLegsClassifier);
      for (const bg of graphs) H.antipode(H.classOf(bg));
    },
    perRun: graphs.length,
  };
}

export const cases: BenchCase[] = [hopfCase(3), hopfCase(4), hopfCase(5)];
