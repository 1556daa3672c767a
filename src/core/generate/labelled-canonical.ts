import { compareEdges, placeEdge } from '../canon/edge-order.ts';
import { hashId, type ColouredStructure } from '../canon/coloured-structure.ts';
import { searchCanonical, type SearchOptions } from '../canon/search-tree.ts';
import { printNotation } from '../graph/notation-print.ts';
import type { Edge, Graph, Leg, Vertex } from '../graph/types.ts';
import type { GenerationContext } from './generation-context.ts';
import type { PartialState } from './partial-state.ts';
import { bundleCode } from './state-canonical.ts';

/**
 * The canonical form with labelled legs of a generated graph, equal to what
 * `canonicalForm(g, { legs: 'labelled' })` gives (a test checks it graph by graph), but
 * built from the state's multiplicities: the coloured structure uses the same vertex and
 * bundle keys and the same id assignment (sorted keys), with the bundle keys cached by
 * their numeric code. Generation produces hundreds of thousands of graphs, and this is the
 * step done once per graph.
 * @internal
 */
export class LabelledCanonicalizer {
  private readonly bundleKeys = new Map<number, string>();
  private readonly oriented: readonly boolean[];
  constructor(
    private readonly ctx: GenerationContext,
    private readonly defaultField: string,
  ) {
    this.oriented = ctx.kinds.map((k) => k.oriented);
  }

  /** The key `colouredStructure` gives the bundle from u to v: its edge codes, sorted, joined. */
  private bundleKey(code: number): string {
    let key = this.bundleKeys.get(code);
    if (key !== undefined) return key;
    const parts: string[] = [];
    const digits: number[] = [];
    for (let c = code; c > 0; c = Math.floor(c / 16)) digits.push(c % 16);
    // Digits were written most significant first, kind by kind (out then in for arrows).
    const slots: { code: string }[] = [];
    for (const kind of this.ctx.kinds) {
      if (kind.oriented) slots.push({ code: `>${kind.field}` }, { code: `<${kind.field}` });
      else slots.push({ code: `-${kind.field}` });
    }
    slots.forEach((slot, i) => {
      const d = digits[slots.length - 1 - i] ?? 0;
      for (let j = 0; j < d; j++) parts.push(slot.code);
    });
    key = parts.sort().join(' ');
    this.bundleKeys.set(code, key);
    return key;
  }

  canonical(s: PartialState, edges: readonly Edge[], vertexOfLeg: readonly number[], opts: SearchOptions = {}): { notation: string; graph: Graph; groupOrder: bigint } {
    const ctx = this.ctx;
    const n = s.V;
    const V = n;
    // Vertex keys exactly as colouredStructure writes them for labelled legs (no counterterms here).
    const legParts: string[][] = Array.from({ length: n }, () => []);
    vertexOfLeg.forEach((v, i) => {
      const l = ctx.legs[i]!;
      legParts[v]!.push(`${String(i).padStart(7, '0')}${l.direction === 'in' ? '>' : l.direction === 'out' ? '<' : '-'}${l.field}`);
    });
    const keys: string[] = [];
    for (let v = 0; v < n; v++) {
      const loops: string[] = [];
      for (let k = 0; k < ctx.kinds.length; k++) {
        const kind = ctx.kinds[k]!;
        for (let c = 0; c < s.loops[k * V + v]!; c++) loops.push(`${kind.oriented ? '>' : '-'}${kind.field}`);
      }
      keys.push(`${legParts[v]!.length ? '0' : '1'}[${legParts[v]!.join(' ')}][${loops.sort().join(' ')}]`);
    }
    const sortedKeys = [...new Set(keys)].sort();
    const colour = Int32Array.from(keys, (k) => sortedKeys.indexOf(k));
    const codes = new Int32Array(n * n);
    const present = new Set<number>();
    for (let u = 0; u < n; u++) {
      for (let v = 0; v < n; v++) {
        if (u === v) continue;
        const code = bundleCode(this.oriented, s, u, v);
        codes[u * n + v] = code;
        if (code) present.add(code);
      }
    }
    const bundleList = [...new Set([...present].map((c) => this.bundleKey(c)))].sort();
    const idOf = new Map<number, number>();
    for (const c of present) idOf.set(c, bundleList.indexOf(this.bundleKey(c)) + 1);
    const bundle = new Int32Array(n * n);
    const adjStart = new Int32Array(n + 1);
    for (let k = 0; k < n * n; k++) {
      if (codes[k] === 0) continue;
      bundle[k] = idOf.get(codes[k]!)!;
      adjStart[Math.floor(k / n) + 1]!++;
    }
    for (let u = 0; u < n; u++) adjStart[u + 1]! += adjStart[u]!;
    const adjVertex = new Int32Array(adjStart[n]!);
    const adjHash = new Int32Array(adjStart[n]!);
    let at = 0;
    for (let k = 0; k < n * n; k++) {
      if (codes[k] === 0) continue;
      const u = Math.floor(k / n);
      const v = k % n;
      adjVertex[at] = v;
      adjHash[at++] = hashId(bundle[v * n + u]!);
    }
    const structure: ColouredStructure = { n, colour, bundle, adjStart, adjVertex, adjHash };
    const search = searchCanonical(structure, opts);
    const pos = new Array<number>(n);
    search.lab.forEach((v, i) => (pos[v] = i));
    const vertices: Vertex[] = Array.from({ length: n }, (_, i) => ({ name: String(i + 1) }));
    const placed = edges.map((e) => placeEdge(e, pos)).sort(compareEdges);
    const legs: Leg[] = ctx.legs.map((l, i) => ({ vertex: pos[vertexOfLeg[i]!]!, field: l.field, direction: l.direction }));
    const graph: Graph = { vertices, edges: placed, legs };
    return { notation: printNotation(graph, { defaultField: this.defaultField }), graph, groupOrder: search.groupOrder };
  }
}

