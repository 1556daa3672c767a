import type { ColouredStructure } from './coloured-structure.ts';

/**
 * An ordered partition of the vertices (the node of the search tree): `lab` lists the
 * vertices by position; a cell is a run of positions, named by its first position;
 * `cellOf[v]` is the cell of vertex v and `cellLen[c]` the length of the cell starting at c.
 *
 * @internal
 */
export interface OrderedPartition {
  readonly lab: Int32Array;
  readonly cellOf: Int32Array;
  readonly cellLen: Int32Array;
  cells: number;
}

/** The unit partition refined by the initial colours (cells in colour order). */
export function colourPartition(s: ColouredStructure): OrderedPartition {
  const n = s.n;
  const lab = Int32Array.from({ length: n }, (_, i) => i).sort((x, y) => s.colour[x]! - s.colour[y]! || x - y);
  const cellOf = new Int32Array(n);
  const cellLen = new Int32Array(n);
  let cells = 0;
  for (let p = 0; p < n; ) {
    let q = p;
    while (q < n && s.colour[lab[q]!] === s.colour[lab[p]!]) q++;
    cellLen[p] = q - p;
    for (let r = p; r < q; r++) cellOf[lab[r]!] = p;
    cells++;
    p = q;
  }
  return { lab, cellOf, cellLen, cells };
}

export function copyPartition(p: OrderedPartition): OrderedPartition {
  return { lab: p.lab.slice(), cellOf: p.cellOf.slice(), cellLen: p.cellLen.slice(), cells: p.cells };
}

export function restorePartition(into: OrderedPartition, from: OrderedPartition): void {
  into.lab.set(from.lab);
  into.cellOf.set(from.cellOf);
  into.cellLen.set(from.cellLen);
  into.cells = from.cells;
}

const mix = (h: number, x: number): number => {
  h = Math.imul(h ^ x, 0x5bd1e995);
  return h ^ (h >>> 15);
};

/**
 * Colour refinement (one-dimensional Weisfeiler–Leman) with the bundles of parallel edges in
 * the signature: repeatedly splits every cell by the multiset of bundles its vertices have
 * towards a splitting cell, until every cell is stable towards every cell. The multiset is
 * summarized by a sum of bundle hashes; a collision only leaves a partition coarser, which
 * never makes the search wrong. Pieces are ordered by that value and splitters are processed
 * by position, so the result depends only on the graph's structure, never on vertex numbers.
 * Returns a hash of the refinement's trace (splits and their values), an invariant of the node.
 *
 * @internal
 */
export class Refiner {
  private readonly inv: Int32Array;
  private readonly touched: Int32Array;
  private readonly mark: Uint8Array;
  private readonly cellMark: Uint8Array;
  private readonly inQueue: Uint8Array;
  private readonly queue: Int32Array;
  private readonly tmp: Int32Array;
  constructor(private readonly s: ColouredStructure) {
    const n = s.n;
    this.inv = new Int32Array(n);
    this.touched = new Int32Array(n);
    this.mark = new Uint8Array(n);
    this.cellMark = new Uint8Array(n);
    this.inQueue = new Uint8Array(n);
    this.queue = new Int32Array(n + 1);
    this.tmp = new Int32Array(n);
  }

  /** Refines starting from every cell as a splitter (the root of the search). */
  refineAll(p: OrderedPartition): number {
    const starts: number[] = [];
    for (let c = 0; c < this.s.n; c += p.cellLen[c]!) starts.push(c);
    return this.refine(p, starts);
  }

  /** Moves v to the front of its cell as a singleton and refines; returns the trace hash. */
  individualize(p: OrderedPartition, v: number): number {
    const c = p.cellOf[v]!;
    const len = p.cellLen[c]!;
    let at = c;
    while (p.lab[at] !== v) at++;
    p.lab[at] = p.lab[c]!;
    p.lab[c] = v;
    p.cellLen[c] = 1;
    p.cellLen[c + 1] = len - 1;
    for (let q = c + 1; q < c + len; q++) p.cellOf[p.lab[q]!] = c + 1;
    p.cells++;
    return mix(this.refine(p, [c]), c);
  }

  private refine(p: OrderedPartition, splitters: readonly number[]): number {
    const { adjStart, adjVertex, adjHash } = this.s;
    const { lab, cellOf, cellLen } = p;
    const { inv, touched, mark, cellMark, inQueue, queue, tmp } = this;
    // The queue holds at most one entry per cell start, so a ring of n + 1 slots suffices.
    const size = queue.length;
    let head = 0;
    let tail = 0;
    for (const c of splitters) {
      queue[tail++] = c;
      inQueue[c] = 1;
    }
    let trace = 0x2545f491;
    const cellList: number[] = [];
    while (head !== tail && p.cells < this.s.n) {
      const w = queue[head]!;
      head = (head + 1) % size;
      inQueue[w] = 0;
      let nt = 0;
      for (let q = w, end = w + cellLen[w]!; q < end; q++) {
        const u = lab[q]!;
        for (let k = adjStart[u]!, ke = adjStart[u + 1]!; k < ke; k++) {
          const v = adjVertex[k]!;
          if (!mark[v]) {
            mark[v] = 1;
            inv[v] = 0;
            touched[nt++] = v;
          }
          inv[v] = (inv[v]! + adjHash[k]!) | 0;
        }
      }
      cellList.length = 0;
      for (let i = 0; i < nt; i++) {
        const c = cellOf[touched[i]!]!;
        if (cellLen[c]! > 1 && !cellMark[c]) {
          cellMark[c] = 1;
          cellList.push(c);
        }
      }
      cellList.sort((x, y) => x - y);
      for (const c of cellList) {
        cellMark[c] = 0;
        const len = cellLen[c]!;
        for (let q = 0; q < len; q++) tmp[q] = lab[c + q]!;
        const key = (v: number) => (mark[v] ? inv[v]! : 0);
        const part = tmp.subarray(0, len);
        part.sort((x, y) => key(x) - key(y));
        if (key(part[0]!) === key(part[len - 1]!)) continue;
        lab.set(part, c);
        trace = mix(mix(trace, c), len);
        const wasQueued = inQueue[c] === 1;
        let bestStart = c;
        let bestLen = 0;
        const pieces: number[] = [];
        for (let q = 0; q < len; ) {
          const k0 = key(part[q]!);
          let r = q + 1;
          while (r < len && key(part[r]!) === k0) r++;
          const start = c + q;
          cellLen[start] = r - q;
          for (let t = q; t < r; t++) cellOf[part[t]!] = start;
          trace = mix(mix(trace, r - q), k0);
          pieces.push(start);
          if (r - q > bestLen) {
            bestLen = r - q;
            bestStart = start;
          }
          q = r;
        }
        p.cells += pieces.length - 1;
        for (const start of pieces) {
          if (inQueue[start]) continue;
          if (!wasQueued && start === bestStart) continue;
          queue[tail] = start;
          tail = (tail + 1) % size;
          inQueue[start] = 1;
        }
      }
      for (let i = 0; i < nt; i++) mark[touched[i]!] = 0;
    }
    while (head !== tail) {
      inQueue[queue[head]!] = 0;
      head = (head + 1) % size;
    }
    return mix(trace, p.cells);
  }
}
