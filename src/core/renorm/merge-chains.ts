import { addIndex } from '../integrals/line-index.ts';
import type { PropIntegral, PropLine } from '../integrals/prop-integral.ts';

/** Lines in series through vertices without external momentum merged into single lines (indices add). */
export function mergeChains(I: PropIntegral): PropIntegral {
  let lines: PropLine[] = [...I.lines];
  for (let guard = 0; guard < 10_000; guard++) {
    const degree = new Map<number, number[]>();
    lines.forEach((l, k) => {
      for (const x of l.u === l.v ? [l.u] : [l.u, l.v]) degree.set(x, [...(degree.get(x) ?? []), k]);
      if (l.u === l.v) degree.set(l.u, [...degree.get(l.u)!, k]);
    });
    const w = [...degree.entries()].find(([x, ks]) => x !== I.s && x !== I.t && ks.length === 2 && ks[0] !== ks[1]);
    if (!w) break;
    const [x, [k1, k2]] = w as [number, [number, number]];
    const a = lines[k1]!;
    const b = lines[k2]!;
    const ends = [a.u === x ? a.v : a.u, b.u === x ? b.v : b.u];
    lines = lines.filter((_, k) => k !== k1 && k !== k2);
    lines.push({ u: ends[0]!, v: ends[1]!, index: addIndex(a.index, b.index) });
  }
  return { ...I, lines };
}
