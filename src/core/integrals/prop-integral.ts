import type { LineIndex } from './line-index.ts';

/**
 * A massless propagator-type integral: momentum p enters at vertex `s` and leaves at `t`
 * (p² = 1), lines 1/(k_e²)^{ν_e}, one integration per loop with the scheme's measure.
 * Its value is a Laurent series in ε times (p²)^{D L/2 − Σν}.
 */
export interface PropIntegral {
  readonly vertexCount: number;
  readonly s: number;
  readonly t: number;
  readonly lines: readonly PropLine[];
}

export interface PropLine {
  readonly u: number;
  readonly v: number;
  readonly index: LineIndex;
}

export function loopsOf(I: PropIntegral): number {
  // L = E − V + components; integrals here are connected once s and t are joined through p.
  const parent = Array.from({ length: I.vertexCount }, (_, i) => i);
  const find = (x: number): number => (parent[x] === x ? x : (parent[x] = find(parent[x]!)));
  let comps = I.vertexCount;
  for (const l of I.lines) {
    const a = find(l.u);
    const b = find(l.v);
    if (a !== b) {
      parent[a] = b;
      comps--;
    }
  }
  return I.lines.length - I.vertexCount + comps;
}

/** Renumbers vertices 0..n−1 keeping only those that carry lines or are s/t. */
export function compactIntegral(I: PropIntegral): PropIntegral {
  const used = new Set<number>([I.s, I.t]);
  for (const l of I.lines) {
    used.add(l.u);
    used.add(l.v);
  }
  const order = [...used].sort((a, b) => a - b);
  const idx = new Map(order.map((v, k) => [v, k]));
  return {
    vertexCount: order.length,
    s: idx.get(I.s)!,
    t: idx.get(I.t)!,
    lines: I.lines.map((l) => ({ u: idx.get(l.u)!, v: idx.get(l.v)!, index: l.index })),
  };
}

/** Merges vertex `from` into `into` (contracting a line of index 0). */
export function mergeVertices(I: PropIntegral, into: number, from: number): PropIntegral {
  const m = (x: number) => (x === from ? into : x);
  return { vertexCount: I.vertexCount, s: m(I.s), t: m(I.t), lines: I.lines.map((l) => ({ u: m(l.u), v: m(l.v), index: l.index })) };
}
