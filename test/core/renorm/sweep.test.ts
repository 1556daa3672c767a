import { describe, expect, it } from 'vitest';
import { formatSeries } from '../../../src/core/algebra/format-text.ts';
import { generateGraphs } from '../../../src/core/generate/generate-graphs.ts';
import { bindGraph } from '../../../src/core/theory/bind-graph.ts';
import { builtinTheory } from '../../../src/core/theory/builtin/index.ts';
import { CountertermEngine, renormalizedValue } from '../../../src/core/renorm/counterterm-engine.ts';
import { checkRgPoles } from '../../../src/core/renorm/rg-pole-check.ts';
import { schemeOf } from '../../../src/core/schemes/scheme.ts';

/*
 * Every non-vanishing φ⁴ four- and two-point graph through three loops and every φ³ three- and
 * two-point graph through two loops: whatever the methods evaluate must be finite after
 * subtraction, local, routing-independent where two routings exist, and satisfy the RG pole
 * relations. The graphs that cannot be evaluated are listed with their reasons (R* is a later
 * issue) — and the list is pinned so coverage cannot silently shrink.
 */
const cases: [string, string[], number[]][] = [
  ['phi4', ['phi', 'phi', 'phi', 'phi'], [1, 2, 3]],
  ['phi4', ['phi', 'phi'], [2, 3]],
  ['phi3', ['phi', 'phi', 'phi'], [1, 2]],
  ['phi3', ['phi', 'phi'], [1, 2]],
];

describe('sweep: every graph the evaluator can do is finite, local, routing-independent and RG-consistent', () => {
  for (const [theory, residue, loopsList] of cases) {
    for (const loops of loopsList) {
      it(`${theory} ${residue.length}-point, ${loops} loop(s)`, () => {
        const t = builtinTheory(theory);
        const engine = new CountertermEngine(t, schemeOf('msbar'));
        const graphs = generateGraphs(t, { residue, loops }).graphs;
        expect(graphs.length).toBeGreaterThan(0);
        const stuck: string[] = [];
        let compared = 0;
        for (const gg of graphs) {
          const bg = bindGraph(gg.graph, t);
          const r = engine.counterterm(bg);
          if (!r.ok) {
            stuck.push(gg.notation);
            continue;
          }
          const rep = engine.algebra.representative(engine.algebra.classOf(bg));
          const ren = renormalizedValue(r.detail.subtracted, r.value, 8);
          expect(ren.finite, `${gg.notation}: ${formatSeries(r.value)}`).toBe(true);
          expect(r.detail.local, gg.notation).toBe(true);
          expect(r.detail.routingsAgree, gg.notation).toBe(true);
          if (r.detail.routingsCompared >= 2) compared++;
          const rg = checkRgPoles(engine, engine.algebra.analyze(rep), r.value);
          if (rg.checked) expect(rg.consistent, `${gg.notation}: ${rg.reason}`).toBe(true);
        }
        // Pinned: graphs these methods cannot do. Through three loops none is left since R* (the box
        // with a doubled diagonal needed it); the four-loop coverage is pinned in rstar.test.ts.
        const expectedStuck: Record<string, number> = {};
        if (stuck.length) expect(new Set(stuck.map((n) => engine.algebra.classOf(bindGraph(graphs.find((x) => x.notation === n)!.graph, t)))).size).toBe(1);
        expect(stuck.length, stuck.join('\n')).toBe(expectedStuck[`${theory} ${residue.length} ${loops}`] ?? 0);
        if ((residue.length === 4 || residue.length === 3) && loops >= 2) expect(compared).toBeGreaterThan(0);
      });
    }
  }
});
