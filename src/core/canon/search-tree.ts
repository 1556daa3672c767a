import { LimitError } from '../errors.ts';
import { neverCancel, type CancelToken } from '../util/cancel.ts';
import type { ColouredStructure } from './coloured-structure.ts';
import { OrbitSets } from './orbit-sets.ts';
import { colourPartition, copyPartition, Refiner, restorePartition, type OrderedPartition } from './refine-partition.ts';

export interface SearchOptions {
  /** Nodes of the search tree visited before giving up with a LimitError (default 5,000,000). */
  readonly maxSearchNodes?: number;
  readonly cancel?: CancelToken;
}

/** What the search finds: a canonical labelling and the automorphism group. @internal */
export interface SearchResult {
  /** The canonical order: `lab[i]` is the vertex at canonical position i. */
  readonly lab: Int32Array;
  /** Generators of the vertex automorphism group (`g[v]` is the image of v). */
  readonly generators: readonly Int32Array[];
  /** The order of the vertex automorphism group. */
  readonly groupOrder: bigint;
  /** Orbit representative of each vertex (the smallest vertex of its orbit). */
  readonly orbits: Int32Array;
  readonly nodes: number;
}

interface Leaf {
  lab: Int32Array;
  trace: number[];
  prefix: number[];
  cert: Int32Array;
}

/**
 * Individualization–refinement search (the approach of practical graph-isomorphism programs,
 * McKay 1981; McKay–Piperno 2014), written for the bundle structure of a multigraph.
 *
 * The tree's nodes are refined ordered partitions; a child individualizes one vertex of the
 * first smallest non-singleton cell. Leaves (discrete partitions) are ordered by the traces
 * of the refinements on their path and then by their certificate (the bundle matrix read in
 * leaf order); the least leaf is the canonical labelling. Two leaves with equal trace and
 * certificate give an automorphism; after one is found the search returns to the two leaves'
 * common ancestor. At every node, children in one orbit of the automorphisms found so far
 * that fix the node's individualized vertices are explored once, and a child whose trace can
 * neither beat the best leaf nor match the first leaf is cut. The group order is the product,
 * over the nodes of the first path, of the orbit sizes of the first path's vertex.
 *
 * @internal
 */
export function searchCanonical(s: ColouredStructure, opts: SearchOptions = {}): SearchResult {
  const n = s.n;
  const maxNodes = opts.maxSearchNodes ?? 5_000_000;
  const cancel = opts.cancel ?? neverCancel;
  const refiner = new Refiner(s);
  const part = colourPartition(s);
  const trace: number[] = [refiner.refineAll(part)];
  const prefix: number[] = [];
  const generators: Int32Array[] = [];
  let zeta: Leaf | null = null;
  let best: Leaf | null = null;
  let groupOrder = 1n;
  let nodes = 0;

  const certificate = (lab: Int32Array): Int32Array => {
    const cert = new Int32Array((n * (n - 1)) / 2);
    let k = 0;
    for (let i = 0; i < n; i++) {
      const row = lab[i]! * n;
      for (let j = i + 1; j < n; j++) cert[k++] = s.bundle[row + lab[j]!]!;
    }
    return cert;
  };
  const compareArrays = (x: ArrayLike<number>, y: ArrayLike<number>, len: number): number => {
    for (let i = 0; i < len; i++) if (x[i] !== y[i]) return x[i]! < y[i]! ? -1 : 1;
    return 0;
  };
  /** Compares the current trace (levels 0..level) with a leaf's: −1, 0, 1; a shorter equal prefix sorts first. */
  const compareTrace = (leaf: Leaf, level: number): number => {
    const len = Math.min(level + 1, leaf.trace.length);
    const c = compareArrays(trace, leaf.trace, len);
    if (c !== 0 || level + 1 <= leaf.trace.length) return c;
    return 1;
  };
  const commonPrefix = (other: readonly number[]): number => {
    let l = 0;
    while (l < prefix.length && l < other.length && prefix[l] === other[l]) l++;
    return l;
  };
  const automorphism = (from: Int32Array, to: Int32Array): Int32Array => {
    const g = new Int32Array(n);
    for (let i = 0; i < n; i++) g[from[i]!] = to[i]!;
    return g;
  };

  /** A discrete partition: returns the level to resume at. */
  const leaf = (level: number): number => {
    const lab = part.lab.slice();
    const cert = certificate(lab);
    const here: Leaf = { lab, trace: trace.slice(0, level + 1), prefix: prefix.slice(), cert };
    if (zeta === null) {
      zeta = best = here;
      return level - 1;
    }
    if (compareTrace(zeta, level) === 0 && zeta.trace.length === level + 1 && compareArrays(cert, zeta.cert, cert.length) === 0) {
      generators.push(automorphism(zeta.lab, lab));
      return commonPrefix(zeta.prefix);
    }
    let c = compareTrace(best!, level);
    if (c === 0 && best!.trace.length !== level + 1) c = -1;
    if (c === 0) c = compareArrays(cert, best!.cert, cert.length);
    if (c < 0) {
      best = here;
      return level - 1;
    }
    if (c === 0) {
      generators.push(automorphism(best!.lab, lab));
      return commonPrefix(best!.prefix);
    }
    return level - 1;
  };

  const visit = (level: number): number => {
    if (++nodes > maxNodes) {
      throw new LimitError('graph automorphism search', 'maxSearchNodes', maxNodes, 'more nodes', 'pass a larger maxSearchNodes');
    }
    if ((nodes & 1023) === 0) cancel.throwIfCancelled();
    if (part.cells === n) return leaf(level);
    const onFirstPath = zeta === null;
    // Target cell: the first smallest non-singleton cell.
    let target = -1;
    for (let c = 0; c < n; c += part.cellLen[c]!) {
      const len = part.cellLen[c]!;
      if (len > 1 && (target < 0 || len < part.cellLen[target]!)) target = c;
    }
    const cellVertices = Array.from(part.lab.subarray(target, target + part.cellLen[target]!));
    const saved: OrderedPartition = copyPartition(part);
    const orbits = new OrbitSets(n);
    let used = 0;
    const explored: number[] = [];
    const absorb = () => {
      for (; used < generators.length; used++) {
        const g = generators[used]!;
        if (prefix.every((v) => g[v] === v)) orbits.absorb(g);
      }
    };
    for (const w of cellVertices) {
      absorb();
      if (explored.some((u) => orbits.same(u, w))) continue;
      explored.push(w);
      if (explored.length > 1) restorePartition(part, saved);
      prefix.push(w);
      trace[level + 1] = refiner.individualize(part, w);
      trace.length = level + 2;
      let resume = level;
      const matchesFirst = zeta !== null && compareTrace(zeta, level + 1) === 0;
      if (zeta === null || matchesFirst || compareTrace(best!, level + 1) <= 0) resume = visit(level + 1);
      prefix.pop();
      trace.length = level + 1;
      if (resume < level) return resume;
    }
    if (onFirstPath) {
      absorb();
      groupOrder *= BigInt(orbits.sizeOf(zeta!.prefix[level]!));
    }
    return level - 1;
  };

  visit(0);
  const all = new OrbitSets(n);
  for (const g of generators) all.absorb(g);
  return { lab: best!.lab, generators, groupOrder, orbits: all.representatives(), nodes };
}
