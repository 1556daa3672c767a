import type { PropIntegral } from './prop-integral.ts';

/** Vertices reachable from `start` without passing through `blocked`. */
function reach(I: PropIntegral, start: number, blocked: number): Set<number> {
  const seen = new Set([start]);
  const stack = [start];
  while (stack.length) {
    const x = stack.pop()!;
    for (const l of I.lines) {
      const y = l.u === x ? l.v : l.v === x ? l.u : -1;
      if (y < 0 || y === blocked || seen.has(y)) continue;
      seen.add(y);
      stack.push(y);
    }
  }
  return seen;
}

/**
 * A cut vertex w: either it separates s from t — the integral factorizes into (s…w)(w…t), both
 * carrying p — or some part hangs on w alone, which no momentum enters (scaleless, so zero).
 */
export type CutResult = { kind: 'factor'; first: PropIntegral; second: PropIntegral } | { kind: 'scaleless'; vertex: number } | null;

export function findCut(I: PropIntegral): CutResult {
  for (let w = 0; w < I.vertexCount; w++) {
    const touching = I.lines.filter((l) => l.u === w || l.v === w);
    if (touching.length < 2) continue;
    // Components of the graph with w removed, among w's neighbours.
    const comps: Set<number>[] = [];
    for (const l of touching) {
      const y = l.u === w ? l.v : l.u;
      if (comps.some((c) => c.has(y))) continue;
      comps.push(reach(I, y, w));
    }
    if (comps.length < 2) continue;
    const withS = comps.find((c) => c.has(I.s));
    const withT = comps.find((c) => c.has(I.t));
    const idle = comps.find((c) => c !== withS && c !== withT);
    if (idle && !(w === I.s || w === I.t) ) return { kind: 'scaleless', vertex: w };
    if (idle) return { kind: 'scaleless', vertex: w };
    if (withS && withT && withS !== withT && w !== I.s && w !== I.t) {
      const part = (c: Set<number>, ext: number): PropIntegral => ({
        vertexCount: I.vertexCount,
        s: ext,
        t: w,
        lines: I.lines.filter((l) => (c.has(l.u) || l.u === w) && (c.has(l.v) || l.v === w) && (c.has(l.u) || c.has(l.v))),
      });
      return { kind: 'factor', first: part(withS, I.s), second: part(withT, I.t) };
    }
  }
  return null;
}
