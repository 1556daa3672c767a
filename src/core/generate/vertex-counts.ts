import type { GenerationContext } from './generation-context.ts';

/**
 * The numbers of vertices of each type that a connected graph with the context's external
 * legs and `loops` loops can have. With n_t vertices of type t and c_t(l) half-edges of
 * label l at each, the internal half-edges of label l number H_l = Σ_t n_t c_t(l) − (legs
 * labelled l); they pair up into lines: a self-conjugate field needs H_l even (H_l / 2
 * lines), a field with an antiparticle needs H_ψ = H_ψ̄ (conservation of fermion number;
 * H_ψ lines). Euler's relation for a connected graph then fixes L = E − V + 1.
 */
export function vertexCountVectors(ctx: GenerationContext, loops: number): number[][] {
  const T = ctx.types.length;
  const nl = ctx.labels.length;
  const legCount = new Array<number>(nl).fill(0);
  for (const l of ctx.legs) legCount[l.label]!++;
  const nLegs = ctx.legs.length;
  // L = Σ_t n_t (k_t/2 − 1) − n/2 + 1 and every k_t ≥ 3, so n_t ≤ 2(L − 1) + n.
  const cap = Math.max(0, 2 * (loops - 1) + nLegs);
  const out: number[][] = [];
  const n = new Array<number>(T).fill(0);
  const check = () => {
    const V = n.reduce((s, x) => s + x, 0);
    if (V === 0) return;
    const H = legCount.map((c) => -c);
    ctx.types.forEach((t, i) => t.labels.forEach((c, l) => (H[l]! += n[i]! * c)));
    if (H.some((h) => h < 0)) return;
    let E = 0;
    for (const k of ctx.kinds) {
      if (k.oriented) {
        if (H[k.tail] !== H[k.head]) return;
        E += H[k.head]!;
      } else {
        if (H[k.tail]! % 2 !== 0) return;
        E += H[k.tail]! / 2;
      }
    }
    if (E - V + 1 === loops) out.push([...n]);
  };
  const rec = (t: number) => {
    if (t === T) return check();
    for (let c = 0; c <= cap; c++) {
      n[t] = c;
      rec(t + 1);
    }
    n[t] = 0;
  };
  rec(0);
  return out;
}
