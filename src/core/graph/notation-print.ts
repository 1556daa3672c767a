import type { Graph, Leg } from './types.ts';

export interface PrintOptions {
  /** Field names equal to this are omitted (`1-2` instead of `1-2:phi`). */
  readonly defaultField?: string;
}

/**
 * Prints a graph in the compact notation; `parseNotation(printNotation(g))` gives back g
 * (same vertex order, edge order, legs). Counterterm braces are written at the first mention.
 */
export function printNotation(g: Graph, opts: PrintOptions = {}): string {
  const marked = new Set<number>();
  const ref = (v: number): string => {
    const vx = g.vertices[v]!;
    if (vx.counterterm && !marked.has(v)) {
      marked.add(v);
      const s = vx.counterterm.structure ? `;${vx.counterterm.structure}` : '';
      return `${vx.name}{${vx.counterterm.residue.join(',')}${s}}`;
    }
    return vx.name;
  };
  const fieldSuffix = (f: string | null) => (f === null || f === opts.defaultField ? '' : `:${f}`);
  // Vertices are numbered by first mention, so mention them in index order first when an
  // edge-less vertex (one with legs only) would otherwise change the order on re-parsing.
  const edges = g.edges.map((e) => `${ref(e.a)}${e.oriented ? '>' : '-'}${ref(e.b)}${fieldSuffix(e.field)}`);
  const legs = g.legs.map((l: Leg) => {
    const name = ref(l.vertex);
    const core = l.direction === 'in' ? `>${name}` : l.direction === 'out' ? `${name}>` : name;
    return core + fieldSuffix(l.field);
  });
  const left = edges.join(' ');
  const right = legs.join(' ');
  return `${left}${left ? ' ' : ''}/${right ? ' ' : ''}${right}`;
}
