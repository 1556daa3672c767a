/**
 * Seeded random graphs that belong to a theory: vertices drawn from the theory's vertex types,
 * half-edges paired at random (compatible labels only), leftovers become legs. Used by property
 * tests of every module; plain code, independent of the engine's own graph algorithms.
 */
import { builtinTheory } from '../../src/core/theory/builtin/index.ts';
import type { Edge, Graph, Leg } from '../../src/core/graph/types.ts';
import type { Theory } from '../../src/core/theory/types.ts';

/** mulberry32: a small seeded PRNG (common practice). */
export function rng(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

interface HalfEdge {
  vertex: number;
  label: string;
}

export interface RandomGraphOptions {
  vertices: number;
  /** Probability that a pairable half-edge stays external. */
  legProbability?: number;
  maxEdges?: number;
}

/** One random connected graph of the theory (retries until connected, within edge bounds). */
export function randomTheoryGraph(theory: Theory | string, random: () => number, opts: RandomGraphOptions): Graph {
  const t = typeof theory === 'string' ? builtinTheory(theory) : theory;
  for (let attempt = 0; attempt < 1000; attempt++) {
    const g = attemptGraph(t, random, opts);
    if (g && connected(g) && g.edges.length <= (opts.maxEdges ?? 14)) return g;
  }
  throw new Error('could not generate a connected graph');
}

function attemptGraph(t: Theory, random: () => number, opts: RandomGraphOptions): Graph | null {
  const half: HalfEdge[] = [];
  for (let v = 0; v < opts.vertices; v++) {
    const tv = t.vertices[Math.floor(random() * t.vertices.length)]!;
    for (const label of tv.fields) half.push({ vertex: v, label });
  }
  // Shuffle, then pair greedily with a compatible partner.
  for (let i = half.length - 1; i > 0; i--) {
    const j = Math.floor(random() * (i + 1));
    [half[i], half[j]] = [half[j]!, half[i]!];
  }
  const anti = new Map<string, string>();
  for (const f of t.fields) {
    anti.set(f.name, f.antiparticle ?? f.name);
    if (f.antiparticle) anti.set(f.antiparticle, f.name);
  }
  const fieldOf = (label: string) => t.fields.find((f) => f.name === label || f.antiparticle === label)!;
  const used = new Array<boolean>(half.length).fill(false);
  const edges: Edge[] = [];
  const legs: Leg[] = [];
  const legProb = opts.legProbability ?? 0.15;
  for (let i = 0; i < half.length; i++) {
    if (used[i]) continue;
    used[i] = true;
    const h = half[i]!;
    const f = fieldOf(h.label);
    let partner = -1;
    if (random() >= legProb) {
      for (let j = i + 1; j < half.length; j++) if (!used[j] && half[j]!.label === anti.get(h.label)) {
        partner = j;
        break;
      }
    }
    if (partner < 0) {
      // An external leg; for a fermion, label f.name means the arrow enters the vertex.
      legs.push({ vertex: h.vertex, field: f.name, direction: f.antiparticle ? (h.label === f.name ? 'in' : 'out') : 'none' });
      continue;
    }
    used[partner] = true;
    const p = half[partner]!;
    if (!f.antiparticle) edges.push({ a: h.vertex, b: p.vertex, field: f.name, oriented: false });
    // The arrow leaves the vertex whose half-edge carries the antiparticle label.
    else if (h.label === f.antiparticle) edges.push({ a: h.vertex, b: p.vertex, field: f.name, oriented: true });
    else edges.push({ a: p.vertex, b: h.vertex, field: f.name, oriented: true });
  }
  const vertices = Array.from({ length: opts.vertices }, (_, v) => ({ name: String(v + 1) }));
  return { vertices, edges, legs };
}

function connected(g: Graph): boolean {
  const n = g.vertices.length;
  const seen = new Set<number>([0]);
  const stack = [0];
  while (stack.length) {
    const v = stack.pop()!;
    for (const e of g.edges) {
      const w = e.a === v ? e.b : e.b === v ? e.a : -1;
      if (w >= 0 && !seen.has(w)) {
        seen.add(w);
        stack.push(w);
      }
    }
  }
  return seen.size === n;
}
