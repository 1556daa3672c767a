import { InputError, TheoryError } from '../errors.ts';
import type { Edge, Graph, Leg } from '../graph/types.ts';
import type { FieldSpec, Theory } from './types.ts';

/** Momentum powers carried by a counterterm vertex of each structure. */
export const COUNTERTERM_STRUCTURES: Readonly<Record<string, number>> = { '': 0, p: 1, p2: 2, pslash: 1, m2: 0 };

/**
 * A graph checked against its theory: every field resolved, every vertex matched, with the
 * per-edge propagator weights and per-vertex derivative counts that power counting needs.
 */
export interface BoundGraph {
  /** The graph with every field resolved (never null) and antiparticle-named edges flipped. */
  readonly graph: Graph;
  readonly theory: Theory;
  readonly edgeWeight: readonly number[];
  readonly vertexDerivatives: readonly number[];
  /** Sorted half-edge labels at each vertex (edges and legs). */
  readonly vertexLabels: readonly (readonly string[])[];
  /** Index of the matching theory vertex, or −1 for a counterterm vertex. */
  readonly vertexKind: readonly number[];
}

export function fieldByName(theory: Theory, name: string): FieldSpec | undefined {
  return theory.fields.find((f) => f.name === name);
}

/** Label of an edge's half-edge at vertex end `atB` (true: the b end, where the arrow arrives). */
export function halfEdgeLabel(theory: Theory, e: Edge, atB: boolean): string {
  const f = fieldByName(theory, e.field!)!;
  if (!f.antiparticle) return f.name;
  return atB ? f.name : f.antiparticle;
}

export function legLabel(theory: Theory, l: Leg): string {
  const f = fieldByName(theory, l.field!)!;
  if (!f.antiparticle) return f.name;
  return l.direction === 'in' ? f.name : f.antiparticle;
}

const describeLabels = (labels: readonly string[]) => `(${labels.join(',')})`;

/** Checks `g` against `theory` and resolves its fields; throws TheoryError / InputError naming the vertex or edge. */
export function bindGraph(g: Graph, theory: Theory): BoundGraph {
  const labelOwner = new Map<string, FieldSpec>();
  for (const f of theory.fields) {
    labelOwner.set(f.name, f);
    if (f.antiparticle) labelOwner.set(f.antiparticle, f);
  }
  const known = [...labelOwner.keys()].join(', ');
  const vname = (v: number) => `vertex "${g.vertices[v]!.name}"`;

  const edges: Edge[] = g.edges.map((e, i) => {
    const where = `edge ${i + 1} (${g.vertices[e.a]!.name}${e.oriented ? '>' : '-'}${g.vertices[e.b]!.name})`;
    const written = e.field ?? (e.oriented && theory.defaultOrientedField ? theory.defaultOrientedField : theory.defaultField);
    const f = labelOwner.get(written);
    if (!f) throw new TheoryError(`unknown field "${written}" in theory ${theory.name}`, where, `known fields: ${known}`);
    if (!f.antiparticle) {
      if (e.oriented) throw new TheoryError(`field ${f.name} is its own antiparticle, so its lines carry no arrow`, where, `write ${g.vertices[e.a]!.name}-${g.vertices[e.b]!.name}${e.field ? ':' + f.name : ''}`);
      return { ...e, field: f.name };
    }
    if (!e.oriented) throw new TheoryError(`${f.name} lines must be oriented (the arrow shows the particle flow)`, where, `write ${g.vertices[e.a]!.name}>${g.vertices[e.b]!.name}:${f.name}`);
    // An edge written with the antiparticle's name is the particle running the other way.
    return written === f.name ? { ...e, field: f.name } : { a: e.b, b: e.a, field: f.name, oriented: true };
  });

  const legs: Leg[] = g.legs.map((l, i) => {
    const where = `leg ${i + 1} at vertex "${g.vertices[l.vertex]!.name}"`;
    const written = l.field ?? (l.direction !== 'none' && theory.defaultOrientedField ? theory.defaultOrientedField : theory.defaultField);
    const f = labelOwner.get(written);
    if (!f) throw new TheoryError(`unknown field "${written}" in theory ${theory.name}`, where, `known fields: ${known}`);
    if (!f.antiparticle) {
      if (l.direction !== 'none') throw new TheoryError(`field ${f.name} is its own antiparticle, so its legs carry no arrow`, where);
      return { ...l, field: f.name };
    }
    if (l.direction === 'none') throw new TheoryError(`${f.name} legs must say whether the particle enters (">${g.vertices[l.vertex]!.name}:${f.name}") or leaves ("${g.vertices[l.vertex]!.name}>:${f.name}")`, where);
    if (written === f.name) return { ...l, field: f.name };
    return { ...l, field: f.name, direction: l.direction === 'in' ? 'out' : 'in' };
  });

  const graph: Graph = { vertices: g.vertices, edges, legs };
  const labels: string[][] = g.vertices.map(() => []);
  edges.forEach((e) => {
    labels[e.a]!.push(halfEdgeLabel(theory, e, false));
    labels[e.b]!.push(halfEdgeLabel(theory, e, true));
  });
  legs.forEach((l) => labels[l.vertex]!.push(legLabel(theory, l)));
  labels.forEach((l) => l.sort());

  const vertexKind: number[] = [];
  const vertexDerivatives: number[] = [];
  g.vertices.forEach((vx, v) => {
    const here = labels[v]!;
    if (vx.counterterm) {
      const ct = vx.counterterm;
      for (const f of ct.residue) if (!labelOwner.has(f)) throw new TheoryError(`unknown field "${f}" in the residue of counterterm vertex`, vname(v), `known fields: ${known}`);
      if (!(ct.structure in COUNTERTERM_STRUCTURES)) {
        throw new TheoryError(`unknown counterterm structure "${ct.structure}"`, vname(v), `known structures: ${Object.keys(COUNTERTERM_STRUCTURES).filter(Boolean).join(', ')} (or none)`);
      }
      if (ct.residue.length === 2 && ct.structure === '') {
        throw new TheoryError('a two-point counterterm vertex needs its structure', vname(v), `write ${vx.name}{${ct.residue.join(',')};${labelOwner.get(ct.residue[0]!)!.propagatorWeight === 1 ? 'pslash' : 'p2'}}`);
      }
      if (describeLabels(ct.residue) !== describeLabels(here)) {
        throw new TheoryError(`counterterm vertex has half-edges ${describeLabels(here)} but its residue says ${describeLabels(ct.residue)}`, vname(v), 'the lines meeting a counterterm vertex must match the residue in its braces');
      }
      vertexKind.push(-1);
      vertexDerivatives.push(COUNTERTERM_STRUCTURES[ct.structure]!);
      return;
    }
    const k = theory.vertices.findIndex((tv) => describeLabels(tv.fields) === describeLabels(here));
    if (k < 0) {
      const valences = [...new Set(theory.vertices.map((tv) => tv.fields.length))].join(' or ');
      const options = theory.vertices.map((tv) => describeLabels(tv.fields)).join(', ');
      throw new TheoryError(
        `has half-edges ${describeLabels(here)}, which is not a vertex of theory ${theory.name}`,
        vname(v),
        `vertices of ${theory.name} join ${valences} lines: ${options}${theory.fields.some((f) => f.antiparticle) ? '; check the arrows of fermion lines' : ''}`,
      );
    }
    vertexKind.push(k);
    vertexDerivatives.push(theory.vertices[k]!.derivatives);
  });

  const edgeWeight = edges.map((e) => fieldByName(theory, e.field!)!.propagatorWeight);
  return { graph, theory, edgeWeight, vertexDerivatives, vertexLabels: labels, vertexKind };
}

/** Rejects graphs that are empty or disconnected where a connected graph is needed. */
export function requireNonEmpty(g: Graph): void {
  if (g.vertices.length === 0) throw new InputError('the graph has no vertices', { input: 'graph notation', offset: 0 }, 'e.g. "1-2 1-2 / 1 1 2 2"');
}
