import { describe, expect, it } from 'vitest';
import { formatSeries } from '../../../src/core/algebra/format-text.ts';
import { polePart } from '../../../src/core/algebra/pole-part.ts';
import { parseNotation } from '../../../src/core/graph/notation-parse.ts';
import { bindGraph } from '../../../src/core/theory/bind-graph.ts';
import { builtinTheory } from '../../../src/core/theory/builtin/index.ts';
import { CountertermEngine } from '../../../src/core/renorm/counterterm-engine.ts';
import { atReferencePoint } from '../../../src/core/renorm/momentum-series.ts';
import { checkRgPoles } from '../../../src/core/renorm/rg-pole-check.ts';
import { schemeOf } from '../../../src/core/schemes/scheme.ts';

/*
 * Infrared R* ("Infrared R-operation and ultraviolet counterterms in the MS-scheme", Phys. Lett.
 * B114 (1982) 340; "R*-operation corrected", Phys. Lett. B144 (1984) 419) with soft lines in series:
 * a routing through vertices that lost their legs becomes usable once the infrared divergence of
 * each soft chain is subtracted. Checks: R* on routings that are unsafe must reproduce the
 * counterterm found on safe routings (a second method), and where no routing is safe, several
 * R* routings must agree with each other, and the result must obey locality and the RG relations.
 */
const phi4 = builtinTheory('phi4');

describe('R* with soft chains', () => {
  it('nested two-loop graph: every unsafe routing, made safe by R*, gives the safe routings\' counterterm', () => {
    const engine = new CountertermEngine(phi4, schemeOf('msbar'));
    const bg = bindGraph(parseNotation('1-2 1-2 1-3 2-3 / 1 2 3 3'), phi4);
    const a = engine.algebra.analyze(engine.algebra.representative(engine.algebra.classOf(bg)));
    const values = new Set<string>();
    let viaRstar = 0;
    const n = a.bound.graph.vertices.length;
    for (let u = 0; u < n; u++) for (let v = u + 1; v < n; v++) {
      const safe = engine.subtractedOnRouting(a, { u, v }, false);
      const star = engine.subtractedOnRouting(a, { u, v }, true);
      if (!star.ok) continue;
      if (!safe.ok) viaRstar++;
      values.add(formatSeries(polePart(atReferencePoint(star.terms))));
    }
    expect(viaRstar).toBeGreaterThan(0);
    expect([...values]).toEqual(['(-1/2)*eps^-2 + (1/2)*eps^-1']);
  });

  it('the box with a doubled diagonal: four R* routings agree, local and RG-consistent', () => {
    const engine = new CountertermEngine(phi4, schemeOf('msbar'), { compareRoutings: 4 });
    const bg = bindGraph(parseNotation('1-3 1-4 2-3 2-4 3-4 3-4 / 1 1 2 2'), phi4);
    const r = engine.counterterm(bg);
    if (!r.ok) throw new Error(r.reason);
    expect(r.detail.method).toMatch(/R\*/);
    expect(r.detail.routingsCompared).toBe(4);
    expect(r.detail.routingsAgree).toBe(true);
    expect(r.detail.local).toBe(true);
    const rep = engine.algebra.representative(engine.algebra.classOf(bg));
    expect(checkRgPoles(engine, engine.algebra.analyze(rep), r.value).consistent).toBe(true);
    // Its leading pole follows from its subgraphs by the RG (checked above); the whole value is
    // cross-checked again through the three-loop β coefficient 145/8 + 12ζ(3) in test/core/rg.
    expect(formatSeries(r.value)).toBe('(-1/3)*eps^-3 + (2/3)*eps^-2 + (-1/3)*eps^-1');
  });
});

/*
 * Four-loop coverage (issue 7): every non-vanishing φ⁴ four- and two-point graph with four loops
 * goes through the evaluator; the exact count is pinned so it cannot silently decrease. The two
 * self-energies whose direct integral is stuck on a kite with ε-dependent lines come through the
 * □_p route with the general R* (their counterterm only: R̄Γ on the true kinematics stays out of
 * reach, so finiteness is not checked for them; the RG pole relations are).
 */
import { generateGraphs } from '../../../src/core/generate/generate-graphs.ts';
import { canonicalNotation } from '../../../src/core/canon/canonical-form.ts';
import { renormalizedValue } from '../../../src/core/renorm/counterterm-engine.ts';

describe('four-loop coverage', () => {
  it('φ⁴ four-point: all 204 exact, finite, local, routing-independent, RG-consistent; two-point: all 4', { timeout: 300_000 }, () => {
    const results: Record<string, { total: number; exact: number }> = {};
    const stuck: string[] = [];
    const poleOnly: string[] = [];
    for (const legs of [4, 2]) {
      const engine = new CountertermEngine(phi4, schemeOf('msbar'));
      const graphs = generateGraphs(phi4, { residue: Array<string>(legs).fill('phi'), loops: 4 }).graphs;
      let exact = 0;
      for (const g of graphs) {
        const bg = bindGraph(g.graph, phi4);
        const r = engine.counterterm(bg);
        if (!r.ok) {
          stuck.push(g.notation);
          continue;
        }
        exact++;
        expect(r.detail.local, g.notation).toBe(true);
        expect(r.detail.routingsAgree, g.notation).toBe(true);
        if (r.detail.poleOnly) poleOnly.push(g.notation);
        else expect(renormalizedValue(r.detail.subtracted, r.value, 10).finite, g.notation).toBe(true);
        const rep = engine.algebra.representative(engine.algebra.classOf(bg));
        const rg = checkRgPoles(engine, engine.algebra.analyze(rep), r.value);
        if (rg.checked) expect(rg.consistent, `${g.notation} ${rg.reason}`).toBe(true);
      }
      results[legs] = { total: graphs.length, exact };
    }
    expect(results).toEqual({ 4: { total: 204, exact: 204 }, 2: { total: 4, exact: 4 } });
    expect(stuck).toEqual([]);
    // The two named in issue 7, compared as isomorphism classes (legs labelled), are the □_p ones.
    const canon = (t: string) => canonicalNotation(bindGraph(parseNotation(t), phi4).graph, { defaultField: 'phi' });
    expect(poleOnly.map(canon).sort()).toEqual(['1-2 1-3 1-4 2-3 2-4 3-4 3-4 / 1 2', '1-3 1-4 1-4 2-3 2-3 2-4 3-4 / 1 2'].map(canon).sort());
  });
});

describe('glue-and-cut for primitive graphs', () => {
  it('the wheel with three spokes: −2ζ(3)/ε from the two-loop master, agreeing with infrared rearrangement', async () => {
    const { glueAndCut } = await import('../../../src/core/renorm/glue-and-cut.ts');
    const engine = new CountertermEngine(phi4, schemeOf('msbar'));
    const bg = bindGraph(parseNotation('1-2 1-3 1-4 2-3 2-4 3-4 / 1 2 3 4'), phi4);
    const a = engine.algebra.analyze(engine.algebra.representative(engine.algebra.classOf(bg)));
    const g = glueAndCut(a, engine.evaluator, 4);
    if (!g.ok) throw new Error(g.reason);
    expect(formatSeries(g.value)).toBe('(-2*zeta(3))*eps^-1');
    const r = engine.counterterm(bg);
    expect(r.ok && formatSeries(r.value)).toBe('(-2*zeta(3))*eps^-1');
  });
  it('every primitive four-loop φ⁴ four-point graph: glue-and-cut equals infrared rearrangement', { timeout: 120_000 }, async () => {
    const { glueAndCut } = await import('../../../src/core/renorm/glue-and-cut.ts');
    const engine = new CountertermEngine(phi4, schemeOf('msbar'));
    let primitives = 0;
    for (const g of generateGraphs(phi4, { residue: ['phi', 'phi', 'phi', 'phi'], loops: 4 }).graphs) {
      const bg = bindGraph(g.graph, phi4);
      const a = engine.algebra.analyze(engine.algebra.representative(engine.algebra.classOf(bg)));
      if (a.subgraphs.length) continue;
      primitives++;
      const glued = glueAndCut(a, engine.evaluator, 4);
      const r = engine.counterterm(bg);
      if (!glued.ok || !r.ok) throw new Error(`${g.notation}: ${glued.ok ? '' : glued.reason} ${r.ok ? '' : r.reason}`);
      expect(formatSeries(glued.value), g.notation).toBe(formatSeries(r.value));
    }
    // Four-loop primitive φ⁴ graphs: the wheel with four spokes (20ζ(5), period census arXiv:0801.2856)
    // in its leg labellings, at least.
    expect(primitives).toBeGreaterThan(0);
  });
});
