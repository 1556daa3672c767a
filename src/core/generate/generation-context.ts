import { InputError, TheoryError } from '../errors.ts';
import type { LegDirection } from '../graph/types.ts';
import type { Theory } from '../theory/types.ts';

/**
 * A line type as the generator sees it: which half-edge label it uses at its tail (`a`) and
 * at its head (`b`). A self-conjugate field uses its own name at both ends; a field with an
 * antiparticle is an arrow a → b, labelled with the antiparticle's name where the arrow
 * leaves (a) and the particle's name where it arrives (b) — the convention of
 * `Theory.vertices[].fields`.
 */
export interface LineKind {
  readonly field: string;
  readonly oriented: boolean;
  /** Label index used at the tail end (`a`). */
  readonly tail: number;
  /** Label index used at the head end (`b`). */
  readonly head: number;
}

/** A vertex type of the theory with its half-edge label counts. */
export interface VertexType {
  /** Index into `theory.vertices`. */
  readonly index: number;
  /** `labels[l]`: how many half-edges with label l meet at the vertex. */
  readonly labels: readonly number[];
  readonly valence: number;
}

/** An external leg as a label: which field, which direction. */
export interface LegLabel {
  readonly label: number;
  readonly field: string;
  readonly direction: LegDirection;
}

/** Everything the generator needs to know about a theory, as small integers. @internal */
export interface GenerationContext {
  readonly theory: Theory;
  /** Half-edge label names (field and antiparticle names), indexed 0…. */
  readonly labels: readonly string[];
  readonly kinds: readonly LineKind[];
  /** `kindOf[tailLabel * labels.length + headLabel]`: the line kind joining those labels, or −1. */
  readonly kindOf: Int32Array;
  readonly types: readonly VertexType[];
  /** The external legs in label order 1..n. */
  readonly legs: readonly LegLabel[];
}

/** Digits of the base-16 codes used for colours and bundles: multiplicities up to 15. */
export const MAX_MULTIPLICITY = 15;

/**
 * Reads the theory's fields and vertices into label indices and the residue's field labels
 * (e.g. `["phi","phi","phi","phi"]`, or `["psi","psibar"]`: a leg labelled ψ brings a ψ
 * half-edge to its vertex, so the particle enters the graph there) into legs.
 */
export function generationContext(theory: Theory, residue: readonly string[]): GenerationContext {
  const labels: string[] = [];
  const kinds: LineKind[] = [];
  for (const f of theory.fields) {
    if (f.antiparticle) {
      labels.push(f.name, f.antiparticle);
      kinds.push({ field: f.name, oriented: true, tail: labels.length - 1, head: labels.length - 2 });
    } else {
      labels.push(f.name);
      kinds.push({ field: f.name, oriented: false, tail: labels.length - 1, head: labels.length - 1 });
    }
  }
  const nl = labels.length;
  // Bundle codes hold one base-16 digit per line kind and direction (24 bits), vertex codes
  // one per label twice plus one per kind (below 2^53).
  const bundleDigits = kinds.reduce((d, k) => d + (k.oriented ? 2 : 1), 0);
  if (bundleDigits > 6 || 1 + 2 * nl + kinds.length > 13) {
    throw new TheoryError(`graph generation handles theories with up to six line types counting directions; theory ${theory.name} has ${bundleDigits}`, 'fields', 'generate graphs of a theory with fewer fields');
  }
  const kindOf = new Int32Array(nl * nl).fill(-1);
  kinds.forEach((k, i) => (kindOf[k.tail * nl + k.head] = i));
  const labelIndex = (name: string, where: string): number => {
    const i = labels.indexOf(name);
    if (i < 0) throw new InputError(`unknown field label "${name}" ${where}`, undefined, `labels of theory ${theory.name}: ${labels.join(', ')}`);
    return i;
  };
  const types: VertexType[] = theory.vertices.map((v, index) => {
    const counts = new Array<number>(nl).fill(0);
    for (const f of v.fields) counts[labelIndex(f, `in vertex ${index + 1} of theory ${theory.name}`)]!++;
    if (v.fields.length < 3) {
      throw new TheoryError(`graph generation needs vertices with at least three lines; this one has ${v.fields.length}`, `vertex ${index + 1} (${v.fields.join(',')})`, 'two-point insertions make the number of graphs at fixed loop order infinite; leave them out of the theory used for generation');
    }
    if (Math.max(...counts) > MAX_MULTIPLICITY) throw new TheoryError('a vertex with more than 15 lines of one field is beyond the generator', `vertex ${index + 1}`);
    return { index, labels: counts, valence: v.fields.length };
  });
  const legs: LegLabel[] = residue.map((name) => {
    const label = labelIndex(name, 'in the residue');
    const f = theory.fields.find((x) => x.name === name || x.antiparticle === name)!;
    const direction: LegDirection = !f.antiparticle ? 'none' : name === f.name ? 'in' : 'out';
    return { label, field: f.name, direction };
  });
  return { theory, labels, kinds, kindOf, types, legs };
}
