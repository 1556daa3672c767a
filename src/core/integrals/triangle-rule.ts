import { Rational } from '../algebra/rational.ts';
import { addIndex, isIntegerIndex, shiftIndex, type LineIndex } from './line-index.ts';
import type { PropIntegral, PropLine } from './prop-integral.ts';

/**
 * The integration-by-parts triangle rule ("Integration by parts: the algorithm to calculate
 * β-functions in 4 loops", Nucl. Phys. B192 (1981) 159). For a loop momentum k through a triangle
 * of lines 0 (A–B, index α0), 1 (A–C, α1), 2 (B–C, α2), where A and B are three-valent vertices
 * without external momentum whose third lines are 3 (at A) and 4 (at B), ∫∂_k·k(…) = 0 gives
 *   (D − 2α0 − α1 − α2) I = α1 1⁺(0⁻ − 3⁻) I + α2 2⁺(0⁻ − 4⁻) I,
 * derived from 2k·(k−q) = k² + (k−q)² − q². Lines 0, 3, 4 are lowered and must have integer
 * indices, so repeated use ends with one of them at index 0 (contracted).
 */
export interface TriangleApplication {
  readonly alpha0: LineIndex;
  readonly alpha1: LineIndex;
  readonly alpha2: LineIndex;
  /** α1 1⁺0⁻, α1 1⁺3⁻, α2 2⁺0⁻, α2 2⁺4⁻ (the 3⁻ and 4⁻ terms enter with a minus sign). */
  readonly terms: readonly { readonly coefficient: 1 | 2; readonly sign: 1 | -1; readonly integral: PropIntegral }[];
}

export function findTriangles(I: PropIntegral): TriangleApplication[] {
  const out: TriangleApplication[] = [];
  const linesAt = (x: number) => I.lines.map((l, k) => ({ l, k })).filter(({ l }) => l.u === x || l.v === x);
  const other = (l: PropLine, x: number) => (l.u === x ? l.v : l.u);
  for (let A = 0; A < I.vertexCount; A++) {
    if (A === I.s || A === I.t) continue;
    const atA = linesAt(A);
    if (atA.length !== 3) continue;
    for (const zero of atA) {
      const B = other(zero.l, A);
      if (B === I.s || B === I.t || B === A) continue;
      const atB = linesAt(B);
      if (atB.length !== 3) continue;
      for (const one of atA) {
        if (one.k === zero.k) continue;
        const C = other(one.l, A);
        const two = atB.find((x) => x.k !== zero.k && other(x.l, B) === C);
        if (!two || C === A || C === B) continue;
        const three = atA.find((x) => x.k !== zero.k && x.k !== one.k)!;
        const four = atB.find((x) => x.k !== zero.k && x.k !== two.k)!;
        if (![zero, three, four].every((x) => isIntegerIndex(x.l.index) && x.l.index.a >= 1)) continue;
        const change = (ups: number, downs: number[]) =>
          ({
            ...I,
            lines: I.lines.map((l, k) => (k === ups ? { ...l, index: shiftIndex(l.index, 1) } : downs.includes(k) ? { ...l, index: shiftIndex(l.index, -1) } : l)),
          }) as PropIntegral;
        out.push({
          alpha0: zero.l.index,
          alpha1: one.l.index,
          alpha2: two.l.index,
          terms: [
            { coefficient: 1, sign: 1, integral: change(one.k, [zero.k]) },
            { coefficient: 1, sign: -1, integral: change(one.k, [three.k]) },
            { coefficient: 2, sign: 1, integral: change(two.k, [zero.k]) },
            { coefficient: 2, sign: -1, integral: change(two.k, [four.k]) },
          ],
        });
      }
    }
  }
  return out;
}

/** D − 2α0 − α1 − α2 as a + bε (D = D0 − 2ε). */
export function triangleDenominator(t: TriangleApplication, D0: number): LineIndex {
  const sum = addIndex(addIndex(addIndex(t.alpha0, t.alpha0), t.alpha1), t.alpha2);
  return { a: D0 - sum.a, b: Rational.int(-2).sub(sum.b) };
}
