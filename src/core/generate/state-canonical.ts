import { hashId, type ColouredStructure } from '../canon/coloured-structure.ts';
import { searchCanonical, type SearchOptions, type SearchResult } from '../canon/search-tree.ts';
import type { GenerationContext } from './generation-context.ts';
import type { PartialState } from './partial-state.ts';

/**
 * Vertex codes (type, legs, free half-edges, self-loops: base-16 digits) interned to small
 * colour ids. One table serves a whole generation run, so equal codes always get equal ids
 * and the certificates of two states can be compared directly. @internal
 */
export class ColourTable {
  private readonly ids = new Map<number, number>();
  id(code: number): number {
    let id = this.ids.get(code);
    if (id === undefined) this.ids.set(code, (id = this.ids.size));
    return id;
  }
}

function vertexCode(ctx: GenerationContext, s: PartialState, v: number): number {
  const nl = ctx.labels.length;
  let code = s.type[v]!;
  for (let l = 0; l < nl; l++) code = code * 16 + s.legs[v * nl + l]!;
  for (let l = 0; l < nl; l++) code = code * 16 + s.rem[v * nl + l]!;
  for (let k = 0; k < ctx.kinds.length; k++) code = code * 16 + s.loops[k * s.V + v]!;
  return code;
}

/**
 * The bundle of lines from u to v as a base-16 code (0: no line): one digit per kind, two
 * for an arrow (u → v, then v → u).
 */
export function bundleCode(oriented: readonly boolean[], s: PartialState, u: number, v: number): number {
  const V = s.V;
  const VV = V * V;
  let code = 0;
  for (let k = 0; k < oriented.length; k++) {
    code = code * 16 + s.mult[k * VV + u * V + v]!;
    if (oriented[k]) code = code * 16 + s.mult[k * VV + v * V + u]!;
  }
  return code;
}

/** The state as the coloured bundle structure that the canonical-form search works on. */
export function stateStructure(ctx: GenerationContext, s: PartialState, colours: ColourTable): ColouredStructure {
  const n = s.V;
  const oriented = ctx.kinds.map((k) => k.oriented);
  const colour = new Int32Array(n);
  for (let v = 0; v < n; v++) colour[v] = colours.id(vertexCode(ctx, s, v));
  const bundle = new Int32Array(n * n);
  const adjStart = new Int32Array(n + 1);
  let edges = 0;
  for (let u = 0; u < n; u++) {
    for (let v = u + 1; v < n; v++) {
      const uv = bundleCode(oriented, s, u, v);
      if (uv === 0) continue;
      bundle[u * n + v] = uv;
      bundle[v * n + u] = bundleCode(oriented, s, v, u);
      adjStart[u + 1]!++;
      adjStart[v + 1]!++;
      edges += 2;
    }
  }
  for (let u = 0; u < n; u++) adjStart[u + 1]! += adjStart[u]!;
  const adjVertex = new Int32Array(edges);
  const adjHash = new Int32Array(edges);
  let at = 0;
  for (let u = 0; u < n; u++) {
    const row = u * n;
    for (let v = 0; v < n; v++) {
      if (v === u || bundle[row + v] === 0) continue;
      adjVertex[at] = v;
      adjHash[at++] = hashId(bundle[v * n + u]!);
    }
  }
  return { n, colour, bundle, adjStart, adjVertex, adjHash };
}

/** A state's canonical key (equal exactly for isomorphic states) and its automorphisms. @internal */
export interface StateCanon {
  readonly key: string;
  readonly search: SearchResult;
}

/**
 * Canonical labelling of a state by the project's individualization–refinement search; the
 * key lists the colour ids and the bundle codes in canonical order. Colour ids come from a
 * run-wide table and bundle codes are the multiplicities themselves, so equal keys mean
 * isomorphic states (the key determines the state up to relabelling).
 */
export function stateCanon(ctx: GenerationContext, s: PartialState, colours: ColourTable, opts: SearchOptions = {}): StateCanon {
  const st = stateStructure(ctx, s, colours);
  const search = searchCanonical(st, opts);
  const n = s.V;
  const lab = search.lab;
  const codes: number[] = [];
  for (let i = 0; i < n; i++) codes.push(st.colour[lab[i]!]!);
  for (let i = 0; i < n; i++) {
    const row = lab[i]! * n;
    for (let j = i + 1; j < n; j++) {
      const b = st.bundle[row + lab[j]!]!;
      codes.push(b & 0xfff, b >>> 12);
    }
  }
  return { key: String.fromCharCode(...codes), search };
}
