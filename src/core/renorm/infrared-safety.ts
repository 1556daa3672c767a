import { LimitError } from '../errors.ts';
import type { PropIntegral } from '../integrals/prop-integral.ts';

/** A soft region that diverges: the lines that go soft and its infrared degree. */
export interface InfraredDivergence {
  readonly softLines: readonly number[];
  readonly degree: number;
}

/**
 * Infrared power counting of every soft region of a massless propagator integral with the
 * momentum entering at s and leaving at t (common practice; the IR counting behind infrared
 * rearrangement and R*, Phys. Lett. B114 (1982) 340). A region is a set S of lines going soft;
 * the remaining hard lines H must carry the external momentum, so they form one connected piece
 * through s and t — a hard piece not connected to the external momentum is scaleless, and such a
 * region does not diverge. Contracting H, the soft lines form a graph with L_S loops and
 *   ω_IR(S) = D0·L_S − Σ_{e∈S} 2ν_e,
 * (integer parts of the indices); ω_IR ≤ 0 is an infrared divergence. Returns the first one found
 * (smallest regions first), or null when the integral is infrared safe.
 */
export function infraredDivergence(I: PropIntegral, D0: number): InfraredDivergence | null {
  return infraredRegions(I, D0, true)[0] ?? null;
}

/** Every divergent soft region (or only the first, smallest ones first, with `firstOnly`). */
export function infraredRegions(I: PropIntegral, D0: number, firstOnly = false): InfraredDivergence[] {
  const E = I.lines.length;
  if (E > 20) throw new LimitError('infrared power counting', 'maxSoftRegionLines', 20, `${E} lines`, 'the graph is too large for counting soft regions by subsets');
  const found: InfraredDivergence[] = [];
  const masks = [...Array(1 << E).keys()].slice(1).sort((x, y) => popcount(x) - popcount(y));
  for (const S of masks) {
    const parent = Array.from({ length: I.vertexCount }, (_, i) => i);
    const find = (x: number): number => (parent[x] === x ? x : (parent[x] = find(parent[x]!)));
    for (let k = 0; k < E; k++) if (!(S & (1 << k))) parent[find(I.lines[k]!.u)] = find(I.lines[k]!.v);
    const hardRoot = find(I.s);
    if (find(I.t) !== hardRoot) continue; // the hard lines must carry p from s to t
    let ok = true;
    for (let k = 0; k < E && ok; k++) if (!(S & (1 << k)) && find(I.lines[k]!.u) !== hardRoot) ok = false;
    if (!ok) continue; // a hard piece without external momentum: scaleless region
    // Soft graph on the contracted vertices.
    const touched = new Set<number>();
    const p2 = new Map<number, number>();
    const f2 = (x: number): number => (p2.get(x) === undefined || p2.get(x) === x ? x : f2(p2.get(x)!));
    let soft = 0;
    let weight = 0;
    for (let k = 0; k < E; k++) {
      if (!(S & (1 << k))) continue;
      soft++;
      weight += 2 * I.lines[k]!.index.a;
      const a = find(I.lines[k]!.u);
      const b = find(I.lines[k]!.v);
      touched.add(a);
      touched.add(b);
      if (!p2.has(a)) p2.set(a, a);
      if (!p2.has(b)) p2.set(b, b);
      const ra = f2(a);
      const rb = f2(b);
      if (ra !== rb) p2.set(ra, rb);
    }
    const comps = new Set([...touched].map(f2)).size;
    const loops = soft - touched.size + comps;
    const degree = D0 * loops - weight;
    if (degree <= 0) {
      found.push({ softLines: [...Array(E).keys()].filter((k) => S & (1 << k)), degree });
      if (firstOnly) return found;
    }
  }
  return found;
}

function popcount(x: number): number {
  let c = 0;
  while (x) {
    x &= x - 1;
    c++;
  }
  return c;
}
