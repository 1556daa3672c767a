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
    const r = softRegion(I, S, D0, true);
    if (r) {
      found.push(r);
      if (firstOnly) return found;
    }
  }
  return found;
}

/**
 * The region where the lines of bit mask S go soft, or null when S is not a region (hard part not
 * carrying p, or a hard bridge) — or, with `divergentOnly`, when it does not diverge. The cheap
 * counting comes first: most subsets fail it, and the dual graph is built only for the rest.
 */
export function softRegion(I: PropIntegral, S: number, D0: number, divergentOnly = false): SoftRegion | null {
  const E = I.lines.length;
  const n = I.vertexCount;
  const parent = new Int32Array(n);
  for (let i = 0; i < n; i++) parent[i] = i;
  const find = (x: number): number => {
    while (parent[x] !== x) x = parent[x] = parent[parent[x]!]!;
    return x;
  };
  for (let k = 0; k < E; k++) if (!(S & (1 << k))) parent[find(I.lines[k]!.u)] = find(I.lines[k]!.v);
  const hardRoot = find(I.s);
  if (find(I.t) !== hardRoot) return null; // the hard lines must carry p from s to t
  for (let k = 0; k < E; k++) if (!(S & (1 << k)) && find(I.lines[k]!.u) !== hardRoot) return null; // a hard piece without external momentum
  // Loops of the soft lines with the hard part contracted: L = E_S − (merges among their ends).
  const p2 = new Int32Array(n);
  for (let i = 0; i < n; i++) p2[i] = i;
  const f2 = (x: number): number => {
    while (p2[x] !== x) x = p2[x] = p2[p2[x]!]!;
    return x;
  };
  let soft = 0;
  let merges = 0;
  let weight = 0;
  for (let k = 0; k < E; k++) {
    if (!(S & (1 << k))) continue;
    soft++;
    weight += 2 * I.lines[k]!.index.a;
    const a = f2(find(I.lines[k]!.u));
    const b = f2(find(I.lines[k]!.v));
    if (a !== b) {
      p2[a] = b;
      merges++;
    }
  }
  const degree = D0 * (soft - merges) - weight;
  if (divergentOnly && degree > 0) return null;
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
  for (let k = 0; k < E; k++) if (S & (1 << k)) dualLines.push({ u: dualOf(I.lines[k]!.u), v: dualOf(I.lines[k]!.v), line: k });
  return { softLines: dualLines.map((d) => d.line), degree, interior, dualVertexCount: 1 + interior.length, dualLines };
}

/** Whether some hard line (not in S) is a bridge of the hard graph with s and t joined (one DFS, Tarjan's low-links). */
function hasHardBridge(I: PropIntegral, S: number): boolean {
  const adj: { to: number; id: number }[][] = Array.from({ length: I.vertexCount }, () => []);
  let id = 0;
  const add = (u: number, v: number) => {
    if (u === v) {
      id++;
      return;
    }
    adj[u]!.push({ to: v, id });
    adj[v]!.push({ to: u, id });
    id++;
  };
  I.lines.forEach((l, k) => {
    if (!(S & (1 << k))) add(l.u, l.v);
  });
  add(I.s, I.t);
  const disc = new Array<number>(I.vertexCount).fill(-1);
  const low = new Array<number>(I.vertexCount).fill(0);
  let time = 0;
  let bridge = false;
  const dfs = (u: number, viaEdge: number): void => {
    disc[u] = low[u] = time++;
    for (const { to, id: e } of adj[u]!) {
      if (e === viaEdge) continue;
      if (disc[to] === -1) {
        dfs(to, e);
        low[u] = Math.min(low[u]!, low[to]!);
        if (low[to]! > disc[u]!) bridge = true;
      } else low[u] = Math.min(low[u]!, disc[to]!);
    }
  };
  dfs(I.s, -1);
  return bridge;
}

function popcount(x: number): number {
  let c = 0;
  while (x) {
    x &= x - 1;
    c++;
  }
  return c;
}
