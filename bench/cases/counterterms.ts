import type { BenchCase } from '../bench-case.ts';
import { generateGraphs } from '../../src/core/generate/generate-graphs.ts';
import { bindGraph } from '../../src/core/theory/bind-graph.ts';
import { builtinTheory } from '../../src/core/theory/builtin/index.ts';
import { CountertermEngine } from '../../src/core/renorm/counterterm-engine.ts';
import { schemeOf } from '../../src/core/schemes/scheme.ts';
import { parseNotation } from '../../src/core/graph/notation-parse.ts';

const phi4 = builtinTheory('phi4');
const graphs = [
  ...[1, 2, 3].flatMap((L) => generateGraphs(phi4, { residue: ['phi', 'phi', 'phi', 'phi'], loops: L }).graphs),
  ...[2, 3].flatMap((L) => generateGraphs(phi4, { residue: ['phi', 'phi'], loops: L }).graphs),
].map((g) => bindGraph(g.graph, phi4));

const fourLoop = [
  ...generateGraphs(phi4, { residue: ['phi', 'phi', 'phi', 'phi'], loops: 4 }).graphs,
  ...generateGraphs(phi4, { residue: ['phi', 'phi'], loops: 4 }).graphs,
].map((g) => bindGraph(g.graph, phi4));
const boxP = ['1-2 1-3 1-4 2-3 2-4 3-4 3-4 / 1 2', '1-3 1-4 1-4 2-3 2-3 2-4 3-4 / 1 2'].map((n) => bindGraph(parseNotation(n), phi4));

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
  {
    name: `MS counterterms of all non-vanishing φ⁴ 4- and 2-point graphs with 4 loops (${fourLoop.length} graphs, with R* and □_p where needed)`,
    iterations: 1,
    run() {
      const engine = new CountertermEngine(phi4, schemeOf('ms'), { compareRoutings: 1 });
      for (const bg of fourLoop) engine.counterterm(bg);
    },
  },
  {
    name: 'the two four-loop self-energies reached only by □_p and the general R* (fresh engine each)',
    iterations: 2,
    run() {
      for (const bg of boxP) new CountertermEngine(phi4, schemeOf('ms'), { compareRoutings: 1 }).counterterm(bg);
    },
  },
];
