/**
 * Zero-dimensional scalar field theory, computed independently of the engine's generator:
 * the "path integral" Z(j) = ∫ dφ/√(2π) exp(−φ²/2 − c φ^k/k! + jφ) as a formal series in the
 * coupling c, from the Gaussian moments ∫ φ^{2n} e^{−φ²/2}/√(2π) = (2n−1)!!; W = log Z
 * generates connected graphs, its Legendre transform Γ the 1PI ones. Every graph with legs
 * labelled 1..n contributes (−c)^V/S, so the coefficients are signed sums of 1/S
 * ("Number and weights of Feynman diagrams", Phys. Rev. D18 (1978) 1939; "Renormalized
 * asymptotic enumeration of Feynman diagrams", Annals Phys. 385 (2017) 95, arXiv:1703.00840).
 */
import { Rational } from '../../../src/core/algebra/rational.ts';

/** A power series in the coupling c: `s[i]` is the coefficient of c^i. */
export type Series = Rational[];

const R0 = Rational.ZERO;
const zeros = (n: number): Series => Array.from({ length: n }, () => R0);
const fact = (n: number): bigint => (n <= 1 ? 1n : BigInt(n) * fact(n - 1));
const binom = (n: number, k: number): bigint => fact(n) / (fact(k) * fact(n - k));
/** E[X^m] for a standard Gaussian X: (m−1)!! for even m, 0 for odd. */
export function gaussianMoment(m: number): bigint {
  if (m % 2) return 0n;
  let r = 1n;
  for (let i = m - 1; i > 1; i -= 2) r *= BigInt(i);
  return r;
}

export function mul(a: Series, b: Series, G: number): Series {
  const r = zeros(G + 1);
  for (let i = 0; i <= G; i++) {
    if (a[i]!.isZero()) continue;
    for (let k = 0; i + k <= G; k++) r[i + k] = r[i + k]!.add(a[i]!.mul(b[k]!));
  }
  return r;
}
export function inv(a: Series, G: number): Series {
  const r = zeros(G + 1);
  r[0] = Rational.ONE.div(a[0]!);
  for (let n = 1; n <= G; n++) {
    let s = R0;
    for (let k = 1; k <= n; k++) s = s.add(a[k]!.mul(r[n - k]!));
    r[n] = s.neg().div(a[0]!);
  }
  return r;
}
const add = (a: Series, b: Series): Series => a.map((x, i) => x.add(b[i]!));
const scale = (a: Series, c: Rational): Series => a.map((x) => x.mul(c));

/**
 * W(j) = log Z(j) as a polynomial in j (degree ≤ J) with series coefficients (order ≤ G):
 * `W[m]` is the series of the coefficient of j^m. Z(j) = e^{j²/2} Σ_v (−c)^v/(v! k!^v)
 * E[(X+j)^{kv}], so W = j²/2 + log(1 + u) with u = O(c).
 */
export function connectedGenerating(k: number, G: number, J: number): Series[] {
  const u: Series[] = Array.from({ length: J + 1 }, () => zeros(G + 1));
  for (let v = 1; v <= G; v++) {
    const m = k * v;
    const pre = Rational.of((v % 2 ? -1n : 1n), fact(v) * fact(k) ** BigInt(v));
    for (let i = 0; i <= m; i++) {
      const jp = m - i;
      if (jp > J) continue;
      const c = binom(m, i) * gaussianMoment(i);
      if (c) u[jp]![v] = u[jp]![v]!.add(pre.mul(Rational.int(c)));
    }
  }
  // Bivariate product truncated in both degrees.
  const mul2 = (a: Series[], b: Series[]): Series[] => {
    const r: Series[] = Array.from({ length: J + 1 }, () => zeros(G + 1));
    for (let x = 0; x <= J; x++) for (let y = 0; x + y <= J; y++) r[x + y] = add(r[x + y]!, mul(a[x]!, b[y]!, G));
    return r;
  };
  let W: Series[] = Array.from({ length: J + 1 }, () => zeros(G + 1));
  let p = u;
  for (let n = 1; n <= G; n++) {
    W = W.map((w, m) => add(w, scale(p[m]!, Rational.of(n % 2 ? 1n : -1n, BigInt(n)))));
    p = mul2(p, u);
  }
  W[2]![0] = W[2]![0]!.add(Rational.of(1n, 2n));
  return W;
}

/** The d-th derivative of W at j = j0 (a series with j0 = O(c)). */
function derivativeAt(W: Series[], d: number, j0: Series, G: number): Series {
  let res = zeros(G + 1);
  let p: Series = [Rational.ONE, ...zeros(G)];
  for (let m = d; m < W.length; m++) {
    const f = Rational.int(fact(m) / fact(m - d));
    res = add(res, mul(scale(W[m]!, f), p, G));
    p = mul(p, j0, G);
  }
  return res;
}

/**
 * Sums over 1PI graphs with n = 2, 3, 4 labelled legs of (−c)^V/S, as series in c, from the
 * Legendre transform Γ(φ) = jφ − W(j) at φ = 0 (where W'(j0) = 0; j0 ≠ 0 when k is odd):
 * Γ'' = 1/W'', Γ''' = −W'''/W''³, Γ'''' = −(W'''' − 3W'''²/W'')/W''⁴. With the action
 * φ²/2 + c φ^k/k!, Γ'' = 1 − Σ(1PI two-point, loops ≥ 1) and Γ^{(n)} = −Σ(1PI n-point).
 */
export function onePISums(k: number, G: number): { two: Series; three: Series; four: Series; vacuum: Series } {
  const J = G + 6;
  const W = connectedGenerating(k, G, J);
  let j0 = zeros(G + 1);
  for (let it = 0; it < 8; it++) {
    const w1 = derivativeAt(W, 1, j0, G);
    const w2 = derivativeAt(W, 2, j0, G);
    j0 = add(j0, mul(w1, inv(w2, G), G).map((x) => x.neg()));
  }
  const w2 = derivativeAt(W, 2, j0, G);
  const w3 = derivativeAt(W, 3, j0, G);
  const w4 = derivativeAt(W, 4, j0, G);
  const i2 = inv(w2, G);
  const g2 = i2;
  const g3 = mul(w3, mul(i2, mul(i2, i2, G), G), G).map((x) => x.neg());
  const i4 = mul(mul(i2, i2, G), mul(i2, i2, G), G);
  const inner = add(w4, scale(mul(mul(w3, w3, G), i2, G), Rational.int(-3)));
  const g4 = mul(inner, i4, G).map((x) => x.neg());
  const two = g2.map((x, i) => (i === 0 ? Rational.ONE.sub(x) : x.neg()));
  return { two, three: g3.map((x) => x.neg()), four: g4.map((x) => x.neg()), vacuum: W[0]! };
}
