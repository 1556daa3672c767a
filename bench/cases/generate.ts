import type { BenchCase } from '../bench-case.ts';
import { generateGraphs } from '../../src/core/generate/index.ts';
import { builtinTheory } from '../../src/core/theory/builtin/index.ts';

const phi4 = builtinTheory('phi4');
const phi3 = builtinTheory('phi3');

function genCase(name: string, theory: typeof phi4, legs: number, loops: number, targetMs?: number, iterations?: number, heavy = false): BenchCase {
  return {
    name,
    heavy,
    run() {
      generateGraphs(theory, { residue: Array<string>(legs).fill('phi'), loops, limits: { maxGraphs: 10_000_000 } });
    },
    ...(targetMs === undefined ? {} : { targetMs }),
    ...(iterations === undefined ? {} : { iterations }),
  };
}

// Targets from issue 8: φ⁴ four-point at 5 loops under 2 s, at 6 loops under 30 s.
export const cases: BenchCase[] = [
  genCase('generate: φ⁴ four-point 1PI graphs, 4 loops (204 graphs)', phi4, 4, 4),
  genCase('generate: φ⁴ four-point 1PI graphs, 5 loops (1165 graphs)', phi4, 4, 5, 2000),
  genCase('generate: φ⁴ four-point 1PI graphs, 6 loops (7287 graphs)', phi4, 4, 6, 30000, 3),
  genCase('generate: φ³ three-point 1PI graphs, 5 loops (5905 graphs)', phi3, 3, 5, undefined, 3),
  genCase('generate: φ³ three-point 1PI graphs, 6 loops (72326 graphs)', phi3, 3, 6, undefined, 1, true),
  genCase('generate: φ³ three-point 1PI graphs, 7 loops', phi3, 3, 7, undefined, 1, true),
];
