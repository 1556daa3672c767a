import type { PeriodGraph } from './period-graph.ts';

/**
 * ψ/ψ_tr at a point, computed stably as the determinant of a scaled loop matrix.
 *
 * Choice of method (documented because the sampled points span hundreds of orders of
 * magnitude): let T be a minimum spanning tree for the weights α (Kruskal, smallest first), so
 * ψ_tr(α) = max over spanning trees of Π_{e∉T} α_e is attained at T. Take the fundamental cycle
 * basis of T, one cycle c_f per non-tree edge f. In that basis the loop matrix is
 *
 *     Λ = Σ_e α_e c_e c_eᵀ = diag(α_f) + Σ_{t∈T} α_t v_t v_tᵀ,
 *
 * since a non-tree edge lies on its own cycle only. Scaling by diag(α_f)^{-1/2} gives
 *
 *     M = I + Σ_{t∈T} s_t s_tᵀ,   (s_t)_f = ±√(α_t/α_f) when t lies on c_f,
 *
 * with det Λ = ψ and Π α_f = ψ_tr, hence det M = ψ/ψ_tr. By the cycle property of minimum
 * spanning trees α_t ≤ α_f on c_f, so |s| ≤ 1 and no entry is huge; M ≥ I, so its eigenvalues
 * lie in [1, 1 + L(V−1)] — M is well conditioned whatever the spread of α — and every Cholesky
 * pivot is ≥ 1 (pivot k is 1/(M_k⁻¹)_kk with M_k⁻¹ ≤ I), so no pivoting is needed and the
 * determinant has relative error of order L²·ε. Only √α ratios ≤ 1 are formed, so nothing
 * overflows. The shared tree edges of two fundamental cycles form one path, traversed with one
 * relative orientation, so off-diagonal sums have no cancellation either.
 *
 * This class holds preallocated buffers: one instance per thread, reused for every sample.
 * @internal
 */
export class SectorDeterminant {
  private readonly V: number;
  private readonly E: number;
  private readonly ends: Int32Array;
  // Tree adjacency (CSR rebuilt per call), BFS data.
  private readonly adjStart: Int32Array;
  private readonly adjTo: Int32Array;
  private readonly adjEdge: Int32Array;
  private readonly parent: Int32Array;
  private readonly parentEdge: Int32Array;
  private readonly depth: Int32Array;
  private readonly queue: Int32Array;
  private readonly treeIndex: Int32Array;
  private readonly nonTree: Int32Array;
  /** s vectors: row per tree edge slot, column per cycle. */
  private readonly s: Float64Array;
  private readonly m: Float64Array;
  private readonly sizeL: number;

  constructor(g: PeriodGraph) {
    this.V = g.vertexCount;
    this.E = g.edgeCount;
    this.ends = Int32Array.from(g.ends);
    this.adjStart = new Int32Array(this.V + 1);
    this.adjTo = new Int32Array(2 * this.E);
    this.adjEdge = new Int32Array(2 * this.E);
    this.parent = new Int32Array(this.V);
    this.parentEdge = new Int32Array(this.V);
    this.depth = new Int32Array(this.V);
    this.queue = new Int32Array(this.V);
    this.treeIndex = new Int32Array(this.E);
    this.nonTree = new Int32Array(this.E);
    this.sizeL = Math.max(1, this.E);
    this.s = new Float64Array(this.E * this.sizeL);
    this.m = new Float64Array(this.sizeL * this.sizeL);
  }

  /**
   * det M = ψ(α)/ψ_tr(α). `isTree[e]` marks a minimum spanning forest for α (ties broken any
   * consistent way); `sqrtAlpha[e]` = √α_e, for any common scale of α.
   */
  ratio(isTree: Uint8Array, sqrtAlpha: Float64Array): number {
    const { V, E, ends, adjStart, adjTo, adjEdge, parent, parentEdge, depth, queue, treeIndex, nonTree, s, m } = this;
    // Tree adjacency in CSR form.
    adjStart.fill(0);
    let nTree = 0;
    let L = 0;
    for (let e = 0; e < E; e++) {
      if (isTree[e]) {
        adjStart[ends[2 * e]! + 1]!++;
        adjStart[ends[2 * e + 1]! + 1]!++;
        treeIndex[e] = nTree++;
      } else {
        treeIndex[e] = -1;
        nonTree[L++] = e;
      }
    }
    if (L === 0) return 1;
    for (let v = 0; v < V; v++) adjStart[v + 1]! += adjStart[v]!;
    const fillPos = queue; // reuse as a cursor array before the BFS
    for (let v = 0; v < V; v++) fillPos[v] = adjStart[v]!;
    for (let e = 0; e < E; e++) {
      if (!isTree[e]) continue;
      const a = ends[2 * e]!;
      const b = ends[2 * e + 1]!;
      adjTo[fillPos[a]!] = b;
      adjEdge[fillPos[a]!++] = e;
      adjTo[fillPos[b]!] = a;
      adjEdge[fillPos[b]!++] = e;
    }
    // BFS from every unvisited vertex (a forest when the graph is disconnected).
    parent.fill(-2);
    for (let root = 0; root < V; root++) {
      if (parent[root] !== -2) continue;
      parent[root] = -1;
      parentEdge[root] = -1;
      depth[root] = 0;
      let head = 0;
      let tail = 0;
      queue[tail++] = root;
      while (head < tail) {
        const v = queue[head++]!;
        for (let k = adjStart[v]!; k < adjStart[v + 1]!; k++) {
          const w = adjTo[k]!;
          if (parent[w] !== -2) continue;
          parent[w] = v;
          parentEdge[w] = adjEdge[k]!;
          depth[w] = depth[v]! + 1;
          queue[tail++] = w;
        }
      }
    }
    // s_t for every tree edge t on each fundamental cycle: f runs a → b, the tree path b → a.
    s.fill(0, 0, nTree * L);
    for (let i = 0; i < L; i++) {
      const f = nonTree[i]!;
      const inv = 1 / sqrtAlpha[f]!;
      let a = ends[2 * f]!;
      let b = ends[2 * f + 1]!;
      while (a !== b) {
        if (depth[b]! >= depth[a]!) {
          const t = parentEdge[b]!; // traversed child → parent
          s[treeIndex[t]! * L + i] = sqrtAlpha[t]! * inv;
          b = parent[b]!;
        } else {
          const t = parentEdge[a]!; // traversed parent → child
          s[treeIndex[t]! * L + i] = -sqrtAlpha[t]! * inv;
          a = parent[a]!;
        }
      }
    }
    // M = I + Σ_t s_t s_tᵀ (lower triangle), then Cholesky: det = Π pivots.
    for (let i = 0; i < L; i++) {
      for (let j = 0; j <= i; j++) m[i * L + j] = i === j ? 1 : 0;
    }
    for (let t = 0; t < nTree; t++) {
      const row = t * L;
      for (let i = 0; i < L; i++) {
        const si = s[row + i]!;
        if (si === 0) continue;
        for (let j = 0; j <= i; j++) m[i * L + j]! += si * s[row + j]!;
      }
    }
    let det = 1;
    for (let k = 0; k < L; k++) {
      let d = m[k * L + k]!;
      for (let j = 0; j < k; j++) d -= m[k * L + j]! * m[k * L + j]!;
      det *= d;
      const r = Math.sqrt(d);
      m[k * L + k] = r;
      for (let i = k + 1; i < L; i++) {
        let x = m[i * L + k]!;
        for (let j = 0; j < k; j++) x -= m[i * L + j]! * m[k * L + j]!;
        m[i * L + k] = x / r;
      }
    }
    return det;
  }
}
