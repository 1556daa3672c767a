/**
 * Live validation of a document graph against its theory, for the editor: every offending
 * vertex, line and leg with the engine's own message (from `bindGraph`), not just the first.
 */
import { CoppiceError, TheoryError } from '../errors.ts';
import type { Edge, Graph, Leg } from '../graph/types.ts';
import { bindGraph, type BoundGraph } from '../theory/bind-graph.ts';
import type { Theory } from '../theory/types.ts';
import { toEngineGraph, type DocGraph, type EngineView } from './doc-graph.ts';

export interface ValidationIssue {
  /** Id of the offending vertex, line or leg. */
  readonly element: string;
  readonly kind: 'vertex' | 'edge' | 'leg';
  /** What is wrong, without the engine's "(at …)" suffix: the editor shows it beside the element. */
  readonly message: string;
  readonly hint?: string;
}

export type Validation =
  | { readonly ok: true; readonly bound: BoundGraph; readonly view: EngineView }
  | { readonly ok: false; readonly issues: readonly ValidationIssue[]; readonly view: EngineView };

const stripWhere = (e: CoppiceError) => (e instanceof TheoryError && e.where ? e.message.replace(` (at ${e.where})`, '') : e.message);

function issue(element: string, kind: ValidationIssue['kind'], e: unknown): ValidationIssue {
  if (e instanceof CoppiceError) return e.hint ? { element, kind, message: stripWhere(e), hint: e.hint } : { element, kind, message: stripWhere(e) };
  return { element, kind, message: String(e) };
}

function tryBind(g: Graph, theory: Theory): unknown {
  try {
    bindGraph(g, theory);
    return null;
  } catch (e) {
    return e;
  }
}

export function validateGraph(d: DocGraph, theory: Theory): Validation {
  const view = toEngineGraph(d);
  const g = view.graph;
  try {
    return { ok: true, bound: bindGraph(g, theory), view };
  } catch (first) {
    const issues: ValidationIssue[] = [];
    // Lines on their own: bindGraph checks lines before vertices, so an error naming the
    // edge is about the line itself.
    g.edges.forEach((e, i) => {
      const solo: Graph = {
        vertices: e.a === e.b ? [g.vertices[e.a]!] : [g.vertices[e.a]!, g.vertices[e.b]!],
        edges: [{ ...e, a: 0, b: e.a === e.b ? 0 : 1 }],
        legs: [],
      };
      const err = tryBind(solo, theory);
      if (err instanceof TheoryError && err.where?.startsWith('edge')) issues.push(issue(view.edgeIds[i]!, 'edge', err));
    });
    const badEdges = new Set(issues.map((x) => x.element));
    // Each vertex with its lines cut open into legs: its own valence and field types.
    g.vertices.forEach((vx, v) => {
      const legs: Leg[] = [];
      g.edges.forEach((e: Edge, i) => {
        if (badEdges.has(view.edgeIds[i]!)) return;
        if (e.a === v) legs.push({ vertex: 0, field: e.field, direction: e.oriented ? 'out' : 'none' });
        if (e.b === v) legs.push({ vertex: 0, field: e.field, direction: e.oriented ? 'in' : 'none' });
      });
      const ownLegs: number[] = [];
      g.legs.forEach((l, i) => {
        if (l.vertex === v) {
          ownLegs.push(i);
          legs.push({ ...l, vertex: 0 });
        }
      });
      const err = tryBind({ vertices: [vx], edges: [], legs }, theory);
      if (!err) return;
      if (err instanceof TheoryError && err.where?.startsWith('leg')) {
        const k = Number(/^leg (\d+)/.exec(err.where)![1]) - 1 - (legs.length - ownLegs.length);
        const legIndex = ownLegs[k];
        if (legIndex !== undefined) {
          issues.push(issue(view.legIds[legIndex]!, 'leg', err));
          return;
        }
      }
      issues.push(issue(view.vertexIds[v]!, 'vertex', err));
    });
    if (issues.length === 0) issues.push(issue(view.vertexIds[0] ?? d.id, 'vertex', first));
    return { ok: false, issues, view };
  }
}
