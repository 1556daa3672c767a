/**
 * Numerical values of the constants, for floating evaluation.
 *
 * γ and ζ(3), ζ(5), ζ(7), ζ(9) to 20 digits: DLMF 5.2.3 and 25.6; Abramowitz & Stegun
 * Table 23.3 (as recorded in REFERENCES.md). Higher ζ(k) are summed numerically.
 */
import { variableInfo } from './variables.ts';
import { zetaNumeric } from './zeta.ts';

/** Euler's constant γ (DLMF 5.2.3). */
export const EULER_GAMMA = 0.57721566490153286061;

/** Tabulated odd zeta values (DLMF 25.6; A&S Table 23.3). */
export const ZETA_TABLE: Readonly<Record<number, number>> = {
  3: 1.2020569031595942854,
  5: 1.0369277551433699263,
  7: 1.0083492773819228268,
  9: 1.0020083928260822144,
};

/**
 * The double value of a constant variable (`pi`, `euler_gamma`, `zeta(k)`, `log(p)`,
 * `log(pi)`); free symbols must be given in `symbols`. Throws RangeError when unknown.
 */
export function variableValue(name: string, symbols: Readonly<Record<string, number>> = {}): number {
  const info = variableInfo(name);
  switch (info.kind) {
    case 'pi':
      return Math.PI;
    case 'euler_gamma':
      return EULER_GAMMA;
    case 'zeta':
      return ZETA_TABLE[info.index] ?? zetaNumeric(info.index);
    case 'log':
      return info.group === 5 ? Math.log(Math.PI) : Math.log(info.index);
    case 'symbol': {
      const v = symbols[name];
      if (v === undefined) throw new RangeError(`no value given for the symbol ${name}`);
      return v;
    }
  }
}
