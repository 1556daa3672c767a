/**
 * Orbits of a permutation group on {0, …, n−1}, kept as disjoint sets and grown one
 * generator at a time (each generator joins v with its image g[v]).
 *
 * @internal
 */
export class OrbitSets {
  private readonly parent: Int32Array;
  private readonly size: Int32Array;
  constructor(n: number) {
    this.parent = Int32Array.from({ length: n }, (_, i) => i);
    this.size = new Int32Array(n).fill(1);
  }

  find(x: number): number {
    const p = this.parent;
    while (p[x] !== x) {
      p[x] = p[p[x]!]!;
      x = p[x]!;
    }
    return x;
  }

  union(x: number, y: number): void {
    let a = this.find(x);
    let b = this.find(y);
    if (a === b) return;
    if (this.size[a]! < this.size[b]!) [a, b] = [b, a];
    this.parent[b] = a;
    this.size[a]! += this.size[b]!;
  }

  /** Joins every point with its image under the permutation g. */
  absorb(g: ArrayLike<number>): void {
    for (let v = 0; v < g.length; v++) if (g[v] !== v) this.union(v, g[v]!);
  }

  same(x: number, y: number): boolean {
    return this.find(x) === this.find(y);
  }

  sizeOf(x: number): number {
    return this.size[this.find(x)]!;
  }

  /** For each point, the smallest point of its orbit. */
  representatives(): Int32Array {
    const n = this.parent.length;
    const least = new Int32Array(n).fill(-1);
    const out = new Int32Array(n);
    for (let v = 0; v < n; v++) {
      const r = this.find(v);
      if (least[r]! < 0) least[r] = v;
      out[v] = least[r]!;
    }
    return out;
  }
}
