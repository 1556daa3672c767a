/**
 * Scheme (in)dependence and the honesty rules of the RG computation. Facts used (DESIGN §6,
 * ../shared/REFERENCES.md): MS and MS-bar counterterms are identical graph by graph (a constant
 * rescaling of μ); the G-scheme changes the per-loop measure (here shown to leave every counterterm unchanged); the first two β
 * coefficients of one coupling are scheme independent ("Renormalization", J. Collins, Cambridge
 * 1984). In massless φ⁴ the momentum-subtraction point with p in at leg 1 and out at leg 2 is
 * infrared divergent for graphs with legs 1 and 2 on one vertex (the s-channel bubble already):
 * those must be named and every coefficient they enter left out.
 */
import { beforeAll, describe, expect, it } from 'vitest';
import { Approx, Poly, Series, polePart, type Term } from '../../../src/core/algebra/index.ts';
import { builtinTheory } from '../../../src/core/theory/index.ts';
import { computeRg, GSeries, rgConventions, rgFunctions, rgReport, type RgComputation } from '../../../src/core/rg/index.ts';

const report = (r: RgComputation) => rgReport(r, rgConventions(r.theory, r.scheme));
const functions = (r: RgComputation) => {
  const j = report(r);
  return { beta: j.beta, gamma: j.gamma, gammaMass: j.gammaMass, knownThrough: j.knownThrough };
};

describe('MS = MS-bar = G-scheme (O(N) φ⁴, three loops)', () => {
  let ms: RgComputation, msbar: RgComputation, g: RgComputation;
  beforeAll(() => {
    const t = builtinTheory('phi4-on');
    ms = computeRg(t, { loops: 3, scheme: 'ms' });
    msbar = computeRg(t, { loops: 3, scheme: 'msbar' });
    g = computeRg(t, { loops: 3, scheme: 'g' });
  });
  it('MS and MS-bar counterterms are identical graph by graph', () => {
    expect(ms.counterterms.size).toBe(msbar.counterterms.size);
    for (const [n, v] of ms.counterterms) expect(v!.sub(msbar.counterterms.get(n)!).coeffs.every((c) => c.isZero()), n).toBe(true);
  });
  it('the G-scheme counterterms are identical too, and β, γ_φ, γ_{m²} agree in all three', () => {
    // Why (not only MS vs MS-bar): a per-loop factor F(ε) = 1 + O(ε) acts on an L-loop term as
    // (μ²)^{Lε} → (μ² e^{y(ε)})^{Lε} with y = ln F / ε regular, and the pole part of R̄Γ does not
    // depend on ln μ² — Σ_l (lε)^k A_l is finite for k ≥ 1 — so it does not depend on y(ε) either.
    for (const [n, v] of ms.counterterms) expect(v!.sub(g.counterterms.get(n)!).coeffs.every((c) => c.isZero()), n).toBe(true);
    expect(functions(g)).toEqual(functions(ms));
    expect(functions(msbar)).toEqual(functions(ms));
    expect(report(g).checks.rgConsistent).toBe(true);
  });
});

describe('momentum subtraction in massless φ⁴', () => {
  let mom: RgComputation;
  beforeAll(() => {
    mom = computeRg(builtinTheory('phi4'), { loops: 2, scheme: 'mom' });
  });
  it('names the s-channel bubble (legs 1, 2 on one vertex: infrared divergent at the exceptional point) with its reason', () => {
    const j = report(mom);
    expect(j.notEvaluable).toContain('1-2 1-2 / 1 1 2 2');
    expect(j.reasons['1-2 1-2 / 1 1 2 2']).toMatch(/infrared/);
  });
  it('reports no coefficient it cannot vouch for: β only −2εg, the rest listed as incomplete', () => {
    const j = report(mom);
    expect(j.beta.g).toEqual({ 'eps*g': '-2' });
    expect(j.incomplete.beta.g).toEqual(['g^2', 'g^3']);
    expect(j.gammaMass).toEqual({});
    expect(j.incomplete.gammaMass).toEqual(['g', 'g^2']);
    expect(j.checks.rgConsistent).toBe(true);
  });
  it('the evaluable one-loop t/u-channel bubbles have the same 1/ε pole as in MS (scheme-independent leading pole)', () => {
    const ms = computeRg(builtinTheory('phi4'), { loops: 1, scheme: 'ms' });
    for (const n of ['1-2 1-2 / 1 2 1 2', '1-2 1-2 / 1 2 2 1']) {
      const v = mom.counterterms.get(n);
      expect(v, n).toBeTruthy();
      expect(polePart(v!).sub(ms.counterterms.get(n)!).coeffs.every((c) => c.isZero())).toBe(true);
      expect(v!.coeff(0).isZero()).toBe(false); // MOM keeps a finite part
    }
  });
});

describe('RG consistency check and incomplete data', () => {
  it('a Z-factor whose 1/ε² term does not follow from its simple pole is caught (rgConsistent false)', () => {
    const r = computeRg(builtinTheory('phi4'), { loops: 2, scheme: 'ms' });
    const z2 = r.z.vertex.coeff(2).add(Series.monomial(Poly.ONE, -2));
    const bad = { ...r.z, vertex: GSeries.make([r.z.vertex.coeff(0), r.z.vertex.coeff(1), z2], 2) };
    const j = rgReport({ ...r, z: bad, rg: rgFunctions(bad, r.theory.conventions) }, {});
    expect(j.checks.rgConsistent).toBe(false);
    expect(j.checks.failures.join()).toMatch(/beta: the coefficient of g\^3 keeps poles/);
  });
  it('a missing three-loop vertex graph leaves β at g⁴ out (and only that): γ_φ at g³ needs no three-loop vertex graph', () => {
    const r = computeRg(builtinTheory('phi4'), { loops: 3, scheme: 'ms' });
    const z = { ...r.z, vertex: r.z.vertex.truncate(2) };
    const j = rgReport({ ...r, z, rg: rgFunctions(z, r.theory.conventions) }, {});
    expect(j.knownThrough).toEqual({ beta: { g: 3 }, gamma: { phi: 3 }, gammaMass: 3 });
    expect(j.incomplete.beta.g).toEqual(['g^4']);
    expect('g^4' in j.beta.g!).toBe(false);
    expect(j.gamma.phi).toEqual({ 'g^2': '1/12', 'g^3': '-1/16' });
  });
  it('a supplied approximate counterterm is used, listed as approximate, and its error reaches β as {approx, error}', () => {
    const box = '1-3 1-4 2-3 2-4 3-4 3-4 / 1 1 2 2';
    const exact = computeRg(builtinTheory('phi4'), { loops: 3, scheme: 'ms' });
    const value = exact.counterterms.get(box)!;
    expect(value).toBeTruthy();
    const fuzz = (p: Poly) => Poly.fromTerms(p.terms().map((t: Term) => ({ mono: t.mono, coeff: new Approx((t.coeff as { toNumber(): number }).toNumber(), 1e-6) })));
    const approx = Series.make(value.val, value.coeffs.map(fuzz));
    const r = computeRg(builtinTheory('phi4'), { loops: 3, scheme: 'ms', supplied: new Map([[box, approx]]) });
    const j = report(r);
    expect(j.approximate).toEqual([box]);
    const b4 = j.beta.g!['g^4'] as { approx: number; error: number };
    expect(typeof b4).toBe('object');
    expect(b4.error).toBeGreaterThan(0);
    expect(Math.abs(b4.approx - (145 / 8 + 12 * 1.2020569031595942))).toBeLessThan(Math.max(4 * b4.error, 1e-9));
    expect(j.beta.g!['g^3']).toBe('-17/3');
  });
});
