/**
 * The numbers behind the plot of β(g): the truncated series at a chosen ε (and values of free
 * symbols such as N), sampled on [0, gMax], its first zero above g = 0 (the fixed point, when
 * ε > 0) and the slope there, and tick marks for the axes. Pure functions, tested on their own.
 */
import type { NumericPoly, RgFunctionInfo } from '../../../src/core/project/index.ts';

export type SymbolValues = Readonly<Record<string, number>>;

export function evalNumeric(p: NumericPoly, symbols: SymbolValues): number {
  let s = 0;
  for (const t of p.terms) {
    let v = t.value;
    for (const [name, k] of Object.entries(t.symbols)) v *= (symbols[name] ?? 1) ** k;
    s += v;
  }
  return s;
}

/** β as coefficients c_k of g^k at the given ε (the ε g term folded into c_1). */
export function betaCoefficients(beta: RgFunctionInfo, eps: number, symbols: SymbolValues): number[] {
  const c: number[] = [];
  for (const t of beta.terms) {
    const v = evalNumeric(t.numeric, symbols) * (t.eps ? eps : 1);
    c[t.power] = (c[t.power] ?? 0) + v;
  }
  return Array.from({ length: c.length }, (_, k) => c[k] ?? 0);
}

export function evalPolynomial(c: readonly number[], g: number): number {
  let s = 0;
  for (let k = c.length - 1; k >= 0; k--) s = s * g + c[k]!;
  return s;
}

const derivative = (c: readonly number[]) => c.slice(1).map((x, k) => x * (k + 1));

/** The smallest root of the polynomial in (0, gMax], by sign changes on a fine grid and bisection. */
export function firstPositiveZero(c: readonly number[], gMax: number): number | null {
  const n = 800;
  let prevG = gMax / n / 1000;
  let prev = evalPolynomial(c, prevG);
  for (let i = 1; i <= n; i++) {
    const g = (gMax * i) / n;
    const v = evalPolynomial(c, g);
    if (prev === 0) return prevG;
    if (Math.sign(v) !== Math.sign(prev)) {
      let lo = prevG;
      let hi = g;
      for (let k = 0; k < 60; k++) {
        const mid = (lo + hi) / 2;
        const m = evalPolynomial(c, mid);
        if (Math.sign(m) === Math.sign(evalPolynomial(c, lo))) lo = mid;
        else hi = mid;
      }
      return (lo + hi) / 2;
    }
    prevG = g;
    prev = v;
  }
  return null;
}

/** Round numbers for axis ticks between lo and hi (about `count` of them). */
export function niceTicks(lo: number, hi: number, count = 5): number[] {
  if (!(hi > lo)) return [lo];
  const raw = (hi - lo) / count;
  const mag = 10 ** Math.floor(Math.log10(raw));
  const step = [1, 2, 2.5, 5, 10].map((m) => m * mag).find((s) => s >= raw) ?? 10 * mag;
  const out: number[] = [];
  for (let v = Math.ceil(lo / step) * step; v <= hi + step * 1e-9; v += step) out.push(Math.abs(v) < step * 1e-9 ? 0 : Number(v.toPrecision(12)));
  return out;
}

export interface BetaCurve {
  readonly coefficients: readonly number[];
  readonly gMax: number;
  readonly points: readonly (readonly [number, number])[];
  readonly yMin: number;
  readonly yMax: number;
  /** g* with β(g*) = 0, g* > 0, and ω = β'(g*) — only for ε > 0. */
  readonly fixedPoint: { readonly g: number; readonly slope: number } | null;
}

/**
 * The curve on [0, gMax]: gMax twice the one-loop fixed point when ε > 0 (so g* sits mid-plot),
 * else a range where the leading terms dominate; y clipped to what the range shows.
 */
export function betaCurve(beta: RgFunctionInfo, eps: number, symbols: SymbolValues = {}, samples = 160): BetaCurve {
  const c = betaCoefficients(beta, eps, symbols);
  const c1 = c[1] ?? 0;
  const c2 = c[2] ?? 0;
  const oneLoop = c2 !== 0 ? -c1 / c2 : NaN;
  const gMax = eps > 0 && oneLoop > 0 ? Math.min(10, 2 * oneLoop) : c2 !== 0 && c[3] ? Math.min(1, Math.abs(c2 / c[3]) * 0.8) : 0.5;
  const points: [number, number][] = [];
  for (let i = 0; i <= samples; i++) {
    const g = (gMax * i) / samples;
    points.push([g, evalPolynomial(c, g)]);
  }
  const ys = points.map((p) => p[1]);
  let yMin = Math.min(0, ...ys);
  let yMax = Math.max(0, ...ys);
  if (yMax - yMin < 1e-12) {
    yMin = -1;
    yMax = 1;
  }
  const pad = (yMax - yMin) * 0.08;
  const root = eps > 0 ? firstPositiveZero(c, gMax) : null;
  return {
    coefficients: c, gMax, points, yMin: yMin - pad, yMax: yMax + pad,
    fixedPoint: root === null ? null : { g: root, slope: evalPolynomial(derivative(c), root) },
  };
}
