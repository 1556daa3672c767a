import type { BenchCase } from '../bench-case.ts';
import { generateGraphs } from '../../src/core/generate/generate-graphs.ts';
import { bindGraph } from '../../src/core/theory/bind-graph.ts';
import { builtinTheory } from '../../src/core/theory/builtin/index.ts';
import { CountertermEngine } from '../../src/core/renorm/counterterm-engine.ts';
import { schemeOf } from '../../src/core/schemes/scheme.ts';

const phi4 = builtinTheory('phi4');
const graphs = [
  ...[1, 2, 3].flatMap((L) => generateGraphs(phi4, { residue: ['phi', 'phi', 'phi', 'phi'], loops: L }).graphs),
  ...[2, 3].flatMap((L) => generateGraphs(phi4, { residue: ['phi', 'phi'], loops: L }).graphs),
].map((g) => bindGraph(g.graph, phi4));

export const cases: BenchCase[] = [
  {
    name: `MS-bar counterterms of all non-vanishing φ⁴ 4- and 2-point graphs through 3 loops (${graphs.length} graphs, total)`,
    targetMs: 1000,
    iterations: 3,
    run() {
      // A fresh engine: nothing memoized from the previous run; one routing per graph.
      const engine = new CountertermEngine(phi4, schemeOf('msbar'), { compareRoutings: 1 });
      for (const bg of graphs) engine.counterterm(bg);
    },
  },
];
