/**
 * Graphs and constants shared by the period tests. Sources:
 * - "Quantum periods: A census of φ⁴-transcendentals", O. Schnetz, Commun. Number Theory Phys.
 *   4 (2010) 1, arXiv:0801.2856 — completion, the product rule, P(wheel 3) = 6ζ(3),
 *   P(wheel 4) = 20ζ(5).
 * - "Single-valued multiple polylogarithms and a proof of the zig-zag conjecture", F. Brown and
 *   O. Schnetz, J. Number Theory 148 (2015) 478, arXiv:1208.1890 — P(Z_n).
 * - ζ values: DLMF 25.6 / Abramowitz & Stegun Table 23.3.
 */
import { parseNotation } from '../../../src/core/graph/notation-parse.ts';
import type { Graph } from '../../../src/core/graph/types.ts';

export const ZETA: Record<number, number> = {
  3: 1.2020569031595942854,
  5: 1.0369277551433699263,
  7: 1.0083492773819228268,
  9: 1.0020083928260822144,
};

/** The wheel with three spokes, K4 as a four-point graph. */
export const WHEEL3 = '1-2 1-3 1-4 2-3 2-4 3-4 / 1 2 3 4';

/** The circulant C_m(1,2) in notation: the completed zigzag with m − 2 loops (K5 for m = 5, the octahedron for m = 6). */
export function circulant12(m: number, prefix = 'v'): string {
  const e: string[] = [];
  for (let i = 0; i < m; i++) e.push(`${prefix}${i}-${prefix}${(i + 1) % m}`, `${prefix}${i}-${prefix}${(i + 2) % m}`);
  return e.join(' ') + ' /';
}

/** Zigzag formula: P(Z_n) = 4(2n−2)!/(n!(n−1)!) · (1 − (1 − (−1)^n)/2^{2n−3}) · ζ(2n−3). */
export function zigzagPeriod(n: number): number {
  const f = (k: number): number => (k <= 1 ? 1 : k * f(k - 1));
  return ((4 * f(2 * n - 2)) / (f(n) * f(n - 1))) * (1 - (1 - (-1) ** n) / 2 ** (2 * n - 3)) * ZETA[2 * n - 3]!;
}

/**
 * Product rule input: two completed graphs each with the triangle (a, b, c) — its edges deleted —
 * glued at a, b, c. The result is completed (4-regular) with the three-vertex cut {a, b, c}.
 */
export function glueAlongTriangle(first: string, second: string, a: [string, string], b: [string, string], c: [string, string]): string {
  const edges = (text: string, tri: string[], rename: Map<string, string>) => {
    const isTri = (x: string, y: string) => tri.includes(x) && tri.includes(y) && x !== y;
    const out: string[] = [];
    for (const e of text.replace('/', '').trim().split(/\s+/)) {
      const [x, y] = e.split('-') as [string, string];
      if (isTri(x, y)) continue;
      out.push(`${rename.get(x) ?? x}-${rename.get(y) ?? y}`);
    }
    return out;
  };
  const r1 = new Map([[a[0], 'a'], [b[0], 'b'], [c[0], 'c']]);
  const r2 = new Map([[a[1], 'a'], [b[1], 'b'], [c[1], 'c']]);
  return [...edges(first, [a[0], b[0], c[0]], r1), ...edges(second, [a[1], b[1], c[1]], r2)].join(' ') + ' /';
}

export const graph = (text: string): Graph => parseNotation(text);
