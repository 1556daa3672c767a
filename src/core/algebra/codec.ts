/**
 * The tagged JSON codec for algebra values crossing a boundary (IPC, workers, files):
 * BigInts travel as decimal strings, Infinity as null.
 *
 *   Rational  {"type":"Rational","n":"-3","d":"8"}
 *   Approx    {"type":"Approx","value":1.2345,"error":0.0012}
 *   Poly      {"type":"Poly","terms":[{"mono":[["N",1],["pi",2]],"coeff":<Rational|Approx>}]}
 *   Series    {"type":"Series","val":-1,"order":2,"coeffs":[<Poly>, …]}   (order null = exact)
 */
import { InputError } from '../errors.ts';
import { Approx } from './approx.ts';
import { monomial } from './monomial.ts';
import type { Num } from './num.ts';
import { Poly } from './polynomial.ts';
import { Rational } from './rational.ts';
import { Series } from './series.ts';

/** JSON of a Rational. */
export interface RationalJSON { readonly type: 'Rational'; readonly n: string; readonly d: string }
/** JSON of an Approx. */
export interface ApproxJSON { readonly type: 'Approx'; readonly value: number; readonly error: number }
/** JSON of a Poly. */
export interface PolyJSON {
  readonly type: 'Poly';
  readonly terms: readonly { readonly mono: readonly (readonly [string, number])[]; readonly coeff: RationalJSON | ApproxJSON }[];
}
/** JSON of a Series. */
export interface SeriesJSON { readonly type: 'Series'; readonly val: number | null; readonly order: number | null; readonly coeffs: readonly PolyJSON[] }
/** Any encoded algebra value. */
export type AlgebraJSON = RationalJSON | ApproxJSON | PolyJSON | SeriesJSON;
/** Any algebra value the codec handles. */
export type AlgebraValue = Rational | Approx | Poly | Series;

function numToJSON(c: Num): RationalJSON | ApproxJSON {
  return c instanceof Rational ? { type: 'Rational', n: c.n.toString(), d: c.d.toString() } : { type: 'Approx', value: c.value, error: c.error };
}

/** Encodes a value as tagged JSON (safe for JSON.stringify). */
export function toJSON(x: Rational): RationalJSON;
export function toJSON(x: Approx): ApproxJSON;
export function toJSON(x: Poly): PolyJSON;
export function toJSON(x: Series): SeriesJSON;
export function toJSON(x: AlgebraValue): AlgebraJSON;
export function toJSON(x: AlgebraValue): AlgebraJSON {
  if (x instanceof Rational || x instanceof Approx) return numToJSON(x);
  if (x instanceof Poly) {
    return { type: 'Poly', terms: x.terms().map((t) => ({ mono: t.mono.factors.map((f) => [f.name, f.exp] as const), coeff: numToJSON(t.coeff) })) };
  }
  return {
    type: 'Series',
    val: Number.isFinite(x.val) ? x.val : null,
    order: Number.isFinite(x.order) ? x.order : null,
    coeffs: x.coeffs.map((c) => toJSON(c)),
  };
}

const bad = (what: string): never => {
  throw new InputError(`malformed algebra JSON: ${what}`);
};
const isObj = (v: unknown): v is Record<string, unknown> => typeof v === 'object' && v !== null && !Array.isArray(v);
const INT = /^-?\d{1,100000}$/;

function decodeNum(v: unknown): Num {
  if (!isObj(v)) return bad('expected a Rational or Approx object');
  if (v.type === 'Rational') {
    if (typeof v.n !== 'string' || typeof v.d !== 'string' || !INT.test(v.n) || !INT.test(v.d)) return bad('Rational needs integer strings n and d');
    if (BigInt(v.d) === 0n) return bad('Rational with zero denominator');
    return Rational.of(BigInt(v.n), BigInt(v.d));
  }
  if (v.type === 'Approx') {
    if (typeof v.value !== 'number' || typeof v.error !== 'number' || !Number.isFinite(v.value) || !(v.error >= 0)) return bad('Approx needs a finite value and an error ≥ 0');
    return new Approx(v.value, v.error);
  }
  return bad(`unknown type ${JSON.stringify(v.type)}`);
}

function decodePoly(v: unknown): Poly {
  if (!isObj(v) || v.type !== 'Poly' || !Array.isArray(v.terms)) return bad('expected a Poly object with terms');
  return Poly.fromTerms(
    v.terms.map((t: unknown) => {
      if (!isObj(t) || !Array.isArray(t.mono)) return bad('a Poly term needs mono and coeff');
      const factors = t.mono.map((f: unknown) => {
        if (!Array.isArray(f) || f.length !== 2 || typeof f[0] !== 'string' || !Number.isSafeInteger(f[1])) return bad('a monomial factor is [name, integer power]');
        return { name: f[0] as string, exp: f[1] as number };
      });
      let mono;
      try {
        mono = monomial(factors);
      } catch (e) {
        return bad((e as Error).message);
      }
      return { mono, coeff: decodeNum(t.coeff) };
    }),
  );
}

/** Decodes tagged JSON (as produced by `toJSON`); InputError when malformed. */
export function fromJSON(v: unknown): AlgebraValue {
  if (!isObj(v)) return bad('expected an object');
  if (v.type === 'Rational' || v.type === 'Approx') return decodeNum(v);
  if (v.type === 'Poly') return decodePoly(v);
  if (v.type === 'Series') {
    const val = v.val === null ? Infinity : v.val;
    const order = v.order === null ? Infinity : v.order;
    if (!(Number.isSafeInteger(val) || val === Infinity) || !(Number.isSafeInteger(order) || order === Infinity) || !Array.isArray(v.coeffs)) {
      return bad('Series needs integer val and order (or null) and coeffs');
    }
    return Series.make(val === Infinity ? 0 : (val as number), v.coeffs.map(decodePoly), order as number);
  }
  return bad(`unknown type ${JSON.stringify(v.type)}`);
}
