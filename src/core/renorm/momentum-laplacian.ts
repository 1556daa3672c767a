import { Poly } from '../algebra/polynomial.ts';
import { polePart } from '../algebra/pole-part.ts';
import { Rational } from '../algebra/rational.ts';
import { Series } from '../algebra/series.ts';
import { LimitError } from '../errors.ts';
import { inverse } from '../algebra/series-inverse.ts';
import type { GraphAnalysis } from '../hopf/hopf-algebra.ts';
import { NotEvaluable } from '../integrals/evaluate-integral.ts';
import { ONE_INDEX, shiftIndex } from '../integrals/line-index.ts';
import type { PropLine } from '../integrals/prop-integral.ts';
import { omegaOfGraph } from '../theory/power-counting.ts';
import type { GeneralRStar } from './general-rstar.ts';
import { infraredDivergence } from './infrared-safety.ts';
import { routedIntegral } from './routed-integral.ts';
import type { ScalarGraph } from './scalar-graph.ts';

/** A log-divergent graph G_i with its weight c_i in □_p G = Σ c_i G_i. */
interface DerivativeTerm {
  readonly weight: Series;
  readonly graph: ScalarGraph;
  readonly what: string;
}

export type LaplacianResult = { ok: true; value: Series; method: string; routingsCompared: number; routingsAgree: boolean } | { ok: false; reason: string };

/**
 * The p² counterterm of a quadratically divergent two-point graph G from logarithmically
 * divergent ones (common practice: differentiate twice in the external momentum, then use
 * infrared rearrangement on what is left). Route p from s to t along a path P of one or two
 * lines; in D = D0 − 2ε, with f = 1/q² and b = 2(4 − D) (4ε in four dimensions),
 *   □_p f = b f²,   ∇_p f₁·∇_p f₂ = 4 q₁·q₂ f₁² f₂²,   2q₁·q₂ = q₁² + q₂² − h²,
 * h = q₁ − q₂ the momentum leaving the middle vertex x through its other lines. So
 *   one line e:         □_p G = b G_e,
 *   two lines e₁, e₂:   □_p G = (b + 4)(G_{e₁} + G_{e₂}) − 4 G_h,
 * G_e with e doubled, G_h with e₁ and e₂ doubled and x split in two by a numerator line h of index
 * −1 between (e₁, e₂) and the other lines. R̄ commutes with □_p here (every UV subgraph on the path
 * is logarithmic, so its counterterm is a constant). In each G_{e} the line e can go soft; those
 * infrared terms are Z̃(e)·R(G∖e) with the full renormalization of G∖e (it is a UV subgraph of G),
 * finite when G∖e with p from s to t is infrared safe, and on two lines their 1/ε parts cancel
 * between G_e and G_h (in D0 = 6 a doubled line is infrared safe anyway). With
 * R̄G = Σ_l a_l (p²)^{1−lε} and □(p²)^{1−lε} = 4(1−lε)(D0/2 − (l+1)ε)(p²)^{−lε}, locality of every
 * G_i removes the l-dependent factors, leaving □_p p² = 2D:
 *   S(G) = K[ Σ_i c_i S(G_i) / (2D) ],
 * with S(G_i) = −K R* G_i by infrared rearrangement on any routing (general-rstar.ts).
 */
export function laplacianCounterterm(a: GraphAnalysis, D0: number, rstar: GeneralRStar, compare = 2): LaplacianResult {
  const setup = laplacianSetup(a);
  if (!setup.ok) return setup;
  const reasons: string[] = [];
  for (const path of setup.paths) {
    const r = laplacianOnPath(setup.graph, setup.s, setup.t, path, D0, rstar, compare, a.bound.graph.vertices.map((v) => v.name));
    if (r.ok) return r;
    reasons.push(r.reason);
  }
  return { ok: false, reason: reasons.length ? reasons.slice(0, 2).join('; ') : 'no path of one or two lines joins the legs\' vertices' };
}

/** The scalar graph of a two-point graph, its legs' vertices and the paths of one or two lines between them. */
export function laplacianSetup(a: GraphAnalysis): { ok: true; graph: ScalarGraph; s: number; t: number; paths: number[][] } | { ok: false; reason: string } {
  const bg = a.bound;
  const g = bg.graph;
  if (g.legs.length !== 2 || omegaOfGraph(bg) !== 2) return { ok: false, reason: 'the □_p route applies to quadratically divergent two-point graphs' };
  if (a.subgraphs.some((s) => s.omega > 0)) return { ok: false, reason: 'the □_p route needs every subdivergence to be logarithmic (a quadratic subgraph on the path would need its counterterm differentiated)' };
  const [s, t] = [g.legs[0]!.vertex, g.legs[1]!.vertex];
  if (s === t) return { ok: false, reason: 'both legs sit on one vertex' };
  const routed = routedIntegral(bg, s, t);
  if (!routed.ok) return { ok: false, reason: routed.reason };
  if (routed.integral.lines.length !== g.edges.length) return { ok: false, reason: 'the □_p route handles graphs without counterterm vertices' };
  const graph: ScalarGraph = { vertexCount: routed.integral.vertexCount, lines: routed.integral.lines };
  return { ok: true, graph, s, t, paths: pathsOfLength(graph, s, t) };
}

/** S(G) by □_p with the momentum along one path (line indices in order from s to t). */
export function laplacianOnPath(G: ScalarGraph, s: number, t: number, path: readonly number[], D0: number, rstar: GeneralRStar, compare: number, names?: readonly string[]): LaplacianResult {
  const unsafe = path.find((e) => infraredDivergence({ vertexCount: G.vertexCount, s, t, lines: G.lines.filter((_, k) => k !== e) }, D0));
  if (unsafe !== undefined) return { ok: false, reason: `without line ${unsafe + 1} the graph is infrared divergent with the momentum through its legs` };
  const terms = derivativeTerms(G, path, D0);
  try {
    let sum = Series.ZERO;
    let compared = Infinity;
    let agree = true;
    for (const term of terms) {
      const z = rstar.uvCountertermCompared(term.graph, compare);
      compared = Math.min(compared, z.compared);
      agree &&= z.agree;
      sum = sum.add(term.weight.mul(z.value));
    }
    // □_p p² = 2D = 2D0 − 4ε.
    const order = -sum.val + 2;
    const twoD = Series.make(0, [Poly.constant(Rational.int(2 * D0)), Poly.constant(Rational.int(-4))]);
    const value = polePart(sum.mul(inverse(twoD, order)));
    const name = (v: number) => names?.[v] ?? String(v + 1);
    const lines = path.map((e) => `${name(G.lines[e]!.u)}-${name(G.lines[e]!.v)}`).join(', ');
    return {
      ok: true,
      value,
      method: `□_p along line(s) ${lines}: S = K[Σ c_i S(G_i)/(2D)] over ${terms.map((x) => x.what).join(', ')}, each S(G_i) by infrared rearrangement with R* (${compared} routing(s) each)`,
      routingsCompared: compared,
      routingsAgree: agree,
    };
  } catch (e) {
    if (!(e instanceof NotEvaluable) && !(e instanceof LimitError)) throw e;
    return { ok: false, reason: `along lines ${path.map((k) => k + 1).join(',')}: ${e.message}` };
  }
}

/** Paths s → t of one line, then of two lines (through a middle vertex), as line indices in order. */
function pathsOfLength(G: ScalarGraph, s: number, t: number): number[][] {
  const ends = (k: number) => [G.lines[k]!.u, G.lines[k]!.v];
  const other = (k: number, x: number) => (G.lines[k]!.u === x ? G.lines[k]!.v : G.lines[k]!.u);
  const out: number[][] = [];
  const seen = new Set<string>();
  G.lines.forEach((_, k) => {
    const [u, v] = ends(k);
    if ((u === s && v === t) || (u === t && v === s)) out.push([k]);
  });
  G.lines.forEach((_, k1) => {
    const [u, v] = ends(k1);
    if (u !== s && v !== s) return;
    const x = other(k1, s);
    if (x === s || x === t) return;
    G.lines.forEach((_, k2) => {
      if (k2 === k1 || !ends(k2).includes(x) || other(k2, x) !== t) return;
      // Lines with the same ends give the same integrals: one representative per pair of vertex pairs.
      const key = `${x}`;
      if (seen.has(key)) return;
      seen.add(key);
      out.push([k1, k2]);
    });
  });
  return out;
}

/** The graphs and weights of □_p G for p along `path` (one or two lines). */
function derivativeTerms(G: ScalarGraph, path: readonly number[], D0: number): DerivativeTerm[] {
  const eps = (c: number, d: number) => Series.make(0, [Poly.constant(Rational.int(c)), Poly.constant(Rational.int(d))]);
  const weightText = (c: number, d: number) => [c ? String(c) : '', d ? `${d > 0 && c ? '+' : ''}${d}ε` : ''].join('') || '0';
  const doubled = (ks: readonly number[]): PropLine[] => G.lines.map((l, k) => (ks.includes(k) ? { ...l, index: shiftIndex(l.index, 1) } : l));
  // □_p 1/q² = 2(4 − D)/q⁴ with D = D0 − 2ε.
  const box = 8 - 2 * D0;
  if (path.length === 1) return [{ weight: eps(box, 4), graph: { vertexCount: G.vertexCount, lines: doubled(path) }, what: `G with line ${path[0]! + 1} doubled (weight ${weightText(box, 4)})` }];
  const [e1, e2] = path as [number, number];
  const x = [G.lines[e1]!.u, G.lines[e1]!.v].find((v) => v === G.lines[e2]!.u || v === G.lines[e2]!.v)!;
  // Split x: x keeps e₁, e₂ and h; a new vertex y takes the other lines at x; h = x–y has index −1.
  const y = G.vertexCount;
  const lines = doubled(path).map((l, k) => (k === e1 || k === e2 ? l : { ...l, u: l.u === x ? y : l.u, v: l.v === x ? y : l.v }));
  lines.push({ u: x, v: y, index: shiftIndex(ONE_INDEX, -2) });
  return [
    { weight: eps(box + 4, 4), graph: { vertexCount: G.vertexCount, lines: doubled([e1]) }, what: `G with line ${e1 + 1} doubled (weight ${weightText(box + 4, 4)})` },
    { weight: eps(box + 4, 4), graph: { vertexCount: G.vertexCount, lines: doubled([e2]) }, what: `G with line ${e2 + 1} doubled (weight ${weightText(box + 4, 4)})` },
    { weight: eps(-4, 0), graph: { vertexCount: G.vertexCount + 1, lines }, what: 'G with both doubled and a numerator line (weight −4)' },
  ];
}
