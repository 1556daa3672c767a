import type { GenerationContext } from './generation-context.ts';
import type { PartialState } from './partial-state.ts';

/**
 * Whether a partial state can still be completed to a connected 1PI graph (and, when
 * `dropVanishing`, to one without scaleless tadpole parts). Only permanent defects are
 * detected, so no completable state is ever cut — a part with no free half-edge can get no
 * new line:
 * - a connected component without free half-edges that is not the whole graph stays a
 *   separate component;
 * - a bridge with a side without free half-edges stays a bridge;
 * - (`dropVanishing`) a self-loop, or a vertex c whose removal leaves a part without external
 *   legs and without free half-edges: that part stays attached at c alone, a massless
 *   tadpole part that vanishes in dimensional regularization.
 * One depth-first search (Tarjan's low points) with per-subtree sums of free half-edges and
 * legs finds bridges and cut vertices together.
 * @internal
 */
export function isViable(ctx: GenerationContext, s: PartialState, dropVanishing: boolean): boolean {
  const V = s.V;
  const nl = ctx.labels.length;
  const K = ctx.kinds.length;
  if (dropVanishing) for (let i = 0; i < K * V; i++) if (s.loops[i]! > 0) return false;
  const free = new Int32Array(V);
  const legs = new Int32Array(V);
  for (let v = 0; v < V; v++) {
    for (let l = 0; l < nl; l++) {
      free[v]! += s.rem[v * nl + l]!;
      legs[v]! += s.legs[v * nl + l]!;
    }
  }
  // Lines between distinct vertices, all kinds and directions, as a symmetric matrix.
  const m = new Int32Array(V * V);
  const VV = V * V;
  for (let k = 0; k < K; k++) {
    const base = k * VV;
    const oriented = ctx.kinds[k]!.oriented;
    for (let i = 0; i < VV; i++) {
      const c = s.mult[base + i]!;
      if (c === 0) continue;
      m[i]! += c;
      if (oriented) m[(i % V) * V + Math.floor(i / V)]! += c;
    }
  }
  const disc = new Int32Array(V).fill(-1);
  const low = new Int32Array(V);
  const subFree = new Int32Array(V);
  const subLegs = new Int32Array(V);
  const subSize = new Int32Array(V);
  let time = 0;
  let compFree = 0;
  let compLegs = 0;
  // Pass 1 computes subtree sums; the checks need the component totals, so they run in pass 2
  // over the recorded tree (parent links).
  const parent = new Int32Array(V).fill(-1);
  const order: number[] = [];
  const dfs = (u: number) => {
    disc[u] = low[u] = time++;
    order.push(u);
    subFree[u] = free[u]!;
    subLegs[u] = legs[u]!;
    subSize[u] = 1;
    for (let w = 0; w < V; w++) {
      if (w === u || m[u * V + w] === 0) continue;
      if (disc[w]! < 0) {
        parent[w] = u;
        dfs(w);
        subFree[u]! += subFree[w]!;
        subLegs[u]! += subLegs[w]!;
        subSize[u]! += subSize[w]!;
        if (low[w]! < low[u]!) low[u] = low[w]!;
      } else if (w !== parent[u] || m[u * V + w]! > 1) {
        // A back edge (a second parallel line to the parent counts as one).
        if (disc[w]! < low[u]!) low[u] = disc[w]!;
      }
    }
  };
  for (let r = 0; r < V; r++) {
    if (disc[r]! >= 0) continue;
    const start = order.length;
    dfs(r);
    compFree = subFree[r]!;
    compLegs = subLegs[r]!;
    const size = order.length - start;
    if (size < V && compFree === 0) return false;
    for (let i = start + 1; i < order.length; i++) {
      const c = order[i]!;
      const p = parent[c]!;
      if (low[c]! > disc[p]! && m[p * V + c] === 1) {
        // Bridge p–c: its sides are c's subtree and the rest of the component.
        if (subFree[c] === 0 || compFree - subFree[c]! === 0) return false;
      }
      if (dropVanishing && low[c]! >= disc[p]!) {
        // Removing p separates c's subtree.
        if (subFree[c] === 0 && subLegs[c] === 0) return false;
      }
    }
    if (dropVanishing) {
      // Removing p also leaves the rest of its component (outside p and its separated
      // subtrees); legless and closed, it hangs at p alone — even when p cuts nothing else
      // off (all the legs at p: no momentum flows through the rest).
      for (let i = start + 1; i < order.length; i++) {
        const p = order[i]!;
        let restFree = compFree - free[p]!;
        let restLegs = compLegs - legs[p]!;
        let restSize = size - 1;
        for (let j = i + 1; j < order.length; j++) {
          const c = order[j]!;
          if (parent[c] === p && low[c]! >= disc[p]!) {
            restFree -= subFree[c]!;
            restLegs -= subLegs[c]!;
            restSize -= subSize[c]!;
          }
        }
        if (restSize > 0 && restFree === 0 && restLegs === 0) return false;
      }
    }
  }
  return true;
}
