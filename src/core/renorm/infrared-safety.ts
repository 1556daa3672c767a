import { LimitError } from '../errors.ts';
import type { PropIntegral } from '../integrals/prop-integral.ts';

/** A soft region that diverges: the lines that go soft and its infrared degree. */
export interface InfraredDivergence {
  readonly softLines: readonly number[];
  readonly degree: number;
}

/**
 * The shape of one soft region: its infrared degree and its dual vacuum graph — the soft lines
 * with every vertex of the hard part merged into one vertex O (vertex 0 of `dualLines`); vertices
 * touched only by soft lines (the region's interior) are numbered from 1 in `interior` order.
 */
export interface SoftRegion {
  readonly softLines: readonly number[];
  readonly degree: number;
  readonly interior: readonly number[];
  readonly dualVertexCount: number;
  readonly dualLines: readonly { readonly u: number; readonly v: number; readonly line: number }[];
}

/**
 * Infrared power counting of every soft region of a massless propagator integral with the
 * momentum entering at s and leaving at t (common practice; the IR counting behind infrared
 * rearrangement and R*, Phys. Lett. B114 (1982) 340). A region is a set S of lines going soft;
 * the remaining hard lines H must carry the external momentum, so they form one connected piece
 * through s and t — a hard piece not connected to the external momentum is scaleless, and such a
 * region does not diverge — and every hard line must carry momentum once the soft ones are at
 * zero (H with s and t joined has no bridge; a hard bridge would be pinned to soft momenta, so it
 * belongs to the soft region). Contracting H, the soft lines form a graph with L_S loops and
 *   ω_IR(S) = D0·L_S − Σ_{e∈S} 2ν_e,
 * (integer parts of the indices); ω_IR ≤ 0 is an infrared divergence. With s = t the integral is
 * a vacuum graph whose vertex s stands for a hard part already contracted (the dual of a soft
 * region): then S may be every line. Returns the first one found (smallest regions first), or
 * null when the integral is infrared safe.
 */
export function infraredDivergence(I: PropIntegral, D0: number): InfraredDivergence | null {
  return infraredRegions(I, D0, true)[0] ?? null;
}

/** Every divergent soft region (or only the first, smallest ones first, with `firstOnly`). */
export function infraredRegions(I: PropIntegral, D0: number, firstOnly = false): SoftRegion[] {
  const E = I.lines.length;
  if (E > 20) throw new LimitError('infrared power counting', 'maxSoftRegionLines', 20, `${E} lines`, 'the graph is too large for counting soft regions by subsets');
  const found: SoftRegion[] = [];
  const masks = [...Array(1 << E).keys()].slice(1).sort((x, y) => popcount(x) - popcount(y));
  for (const S of masks) {
    const r = softRegion(I, S, D0);
    if (r && r.degree <= 0) {
      found.push(r);
      if (firstOnly) return found;
    }
  }
  return found;
}

/** The region where the lines of bit mask S go soft, or null when S is not a region (hard part not carrying p). */
export function softRegion(I: PropIntegral, S: number, D0: number): SoftRegion | null {
  const E = I.lines.length;
  const parent = Array.from({ length: I.vertexCount }, (_, i) => i);
  const find = (x: number): number => (parent[x] === x ? x : (parent[x] = find(parent[x]!)));
  for (let k = 0; k < E; k++) if (!(S & (1 << k))) parent[find(I.lines[k]!.u)] = find(I.lines[k]!.v);
  const hardRoot = find(I.s);
  if (find(I.t) !== hardRoot) return null; // the hard lines must carry p from s to t
  for (let k = 0; k < E; k++) if (!(S & (1 << k)) && find(I.lines[k]!.u) !== hardRoot) return null; // a hard piece without external momentum
  if (hasHardBridge(I, S)) return null;
  const hardTouched = new Set<number>([I.s, I.t]);
  for (let k = 0; k < E; k++) if (!(S & (1 << k))) hardTouched.add(I.lines[k]!.u).add(I.lines[k]!.v);
  const interior: number[] = [];
  const dualOf = (x: number): number => {
    if (hardTouched.has(x)) return 0;
    let i = interior.indexOf(x);
    if (i < 0) i = interior.push(x) - 1;
    return i + 1;
  };
  const dualLines: { u: number; v: number; line: number }[] = [];
  let weight = 0;
  for (let k = 0; k < E; k++) {
    if (!(S & (1 << k))) continue;
    const l = I.lines[k]!;
    weight += 2 * l.index.a;
    dualLines.push({ u: dualOf(l.u), v: dualOf(l.v), line: k });
  }
  const loops = dualLoops(1 + interior.length, dualLines);
  return { softLines: dualLines.map((d) => d.line), degree: D0 * loops - weight, interior, dualVertexCount: 1 + interior.length, dualLines };
}

/** Whether some hard line (not in S) is a bridge of the hard graph with s and t joined. */
function hasHardBridge(I: PropIntegral, S: number): boolean {
  const hard = I.lines.map((l, k) => ({ l, k })).filter(({ k }) => !(S & (1 << k)));
  for (const { l, k } of hard) {
    if (l.u === l.v) continue;
    const parent = Array.from({ length: I.vertexCount }, (_, i) => i);
    const find = (x: number): number => (parent[x] === x ? x : (parent[x] = find(parent[x]!)));
    parent[find(I.s)] = find(I.t);
    for (const o of hard) if (o.k !== k) parent[find(o.l.u)] = find(o.l.v);
    if (find(l.u) !== find(l.v)) return true;
  }
  return false;
}

function dualLoops(n: number, lines: readonly { u: number; v: number }[]): number {
  const parent = Array.from({ length: n }, (_, i) => i);
  const find = (x: number): number => (parent[x] === x ? x : (parent[x] = find(parent[x]!)));
  const touched = new Set<number>();
  let merges = 0;
  for (const l of lines) {
    touched.add(l.u).add(l.v);
    const a = find(l.u);
    const b = find(l.v);
    if (a !== b) {
      parent[a] = b;
      merges++;
    }
  }
  // L = E − V + C over the touched vertices; V − C is the number of successful merges.
  return lines.length - merges;
}

function popcount(x: number): number {
  let c = 0;
  while (x) {
    x &= x - 1;
    c++;
  }
  return c;
}
