import { describe, expect, it } from 'vitest';
import { evaluatePoly } from '../../../src/core/algebra/evaluate-numeric.ts';
import { parseNotation } from '../../../src/core/graph/notation-parse.ts';
import { periodCounterterm } from '../../../src/core/periods/period-counterterm.ts';
import { estimatePeriod, preparePeriod } from '../../../src/core/periods/period-estimate.ts';
import { periodInput } from '../../../src/core/periods/period-input.ts';
import { CountertermEngine } from '../../../src/core/renorm/counterterm-engine.ts';
import { schemeOf } from '../../../src/core/schemes/scheme.ts';
import { bindGraph } from '../../../src/core/theory/bind-graph.ts';
import { builtinTheory } from '../../../src/core/theory/builtin/index.ts';

// The numerical period and the exact evaluator meet through Z = −P/(Lε) (DESIGN §5, §8; derived in
// test/core/periods/counterterm.test.ts): two independent routes to the same number.
describe('periods against exact counterterms', () => {
  const phi4 = builtinTheory('phi4');
  for (const [name, text] of [
    ['wheel with three spokes', '1-2 1-3 1-4 2-3 2-4 3-4 / 1 2 3 4'],
    ['one-loop bubble', '1-2 1-2 / 1 1 2 2'],
  ] as const) {
    it(name, () => {
      const g = parseNotation(text);
      const exact = new CountertermEngine(phi4, schemeOf('msbar')).counterterm(bindGraph(g, phi4));
      if (!exact.ok) throw new Error(exact.reason);
      const input = periodInput(g, phi4);
      const est = estimatePeriod(preparePeriod(input.periodGraph), { samples: 200_000, seed: 11 });
      const z = periodCounterterm(est, input.periodGraph.loops)['-1'];
      const exactPole = evaluatePoly(exact.value.coeff(-1));
      expect(Math.abs(z.approx - exactPole)).toBeLessThan(4 * z.error);
    });
  }
});
