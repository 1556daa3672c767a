import { z } from 'zod';
import { TheoryError } from '../errors.ts';
import { defaultConventions } from './conventions.ts';
import type { Theory } from './types.ts';

/** Theory files larger than this are refused before parsing. */
export const MAX_THEORY_FILE_LENGTH = 1_000_000;

const name = z.string().regex(/^[A-Za-z][A-Za-z0-9_']*$/, 'a name of letters, digits, _ and \' starting with a letter');

const fieldSchema = z.strictObject({
  name,
  antiparticle: name.optional(),
  statistics: z.enum(['boson', 'fermion']),
  propagatorWeight: z.number().int().min(0).max(8),
  line: z.enum(['plain', 'dashed', 'arrow', 'wavy', 'curly']),
  latex: z.string().max(200).optional(),
});

const vertexSchema = z.strictObject({
  fields: z.array(name).min(1).max(16),
  coupling: name,
  derivatives: z.number().int().min(0).max(8).default(0),
  normalization: z.string().regex(/^\d+(\/\d+)?$/, 'a positive rational such as "1/24"').default('1'),
  tensor: z.string().optional(),
});

const conventionsSchema = z.strictObject({
  dimension: z.enum(['D0-2eps', 'D0-eps']),
  vertexSign: z.union([z.literal(-1), z.literal(1)]),
  fermionLoopSign: z.union([z.literal(-1), z.literal(1)]),
  loopMeasure: z.string(),
  couplingRescaling: z.string(),
  zDefinitions: z.array(z.string()),
  gammaPhiHalf: z.boolean(),
  betaSign: z.union([z.literal(-1), z.literal(1)]),
});

const theorySchema = z.strictObject({
  name: z.string().regex(/^[A-Za-z0-9_-]+$/, 'letters, digits, _ and -'),
  title: z.string().max(500).default(''),
  dimension: z.number().int().min(1).max(26),
  fields: z.array(fieldSchema).min(1).max(64),
  vertices: z.array(vertexSchema).max(256),
  couplings: z.array(z.strictObject({ name, latex: z.string().max(200).optional() })).max(64),
  defaultField: name.optional(),
  defaultOrientedField: name.optional(),
  symbols: z.array(name).max(16).default([]),
  protectedResidues: z.array(z.strictObject({ residue: z.array(name).max(16), reason: z.string() })).default([]),
  conventions: conventionsSchema.partial().default({}),
});

/** Known internal-symmetry tensors (contracted by the group-factor code). */
export const KNOWN_TENSORS = ['on-symmetric-delta-delta'] as const;

/**
 * Parses and validates a theory file (JSON text or an already-parsed object). Errors are
 * TheoryErrors naming the JSON path of the offending entry.
 */
export function parseTheory(input: string | unknown, source = 'theory file'): Theory {
  let data: unknown = input;
  if (typeof input === 'string') {
    if (input.length > MAX_THEORY_FILE_LENGTH) throw new TheoryError(`${source} is larger than ${MAX_THEORY_FILE_LENGTH} characters`, source);
    try {
      data = JSON.parse(input);
    } catch (e) {
      throw new TheoryError(`${source} is not valid JSON: ${(e as Error).message}`, source, 'check commas and quotes');
    }
  }
  const parsed = theorySchema.safeParse(data);
  if (!parsed.success) {
    const issue = parsed.error.issues[0]!;
    const path = issue.path.length ? issue.path.map((p) => (typeof p === 'number' ? `[${p}]` : `.${String(p)}`)).join('').replace(/^\./, '') : '(top level)';
    throw new TheoryError(`invalid theory: ${issue.message}`, `${source}: ${path}`);
  }
  const t = parsed.data;
  const fieldNames = new Map<string, string>(); // label → field
  t.fields.forEach((f, i) => {
    for (const label of [f.name, f.antiparticle].filter((x): x is string => !!x)) {
      if (fieldNames.has(label)) throw new TheoryError(`the label "${label}" is used twice`, `${source}: fields[${i}]`);
      fieldNames.set(label, f.name);
    }
    if (f.statistics === 'fermion' && !f.antiparticle) {
      throw new TheoryError(`fermion "${f.name}" needs an antiparticle name (Majorana fermions are not supported)`, `${source}: fields[${i}]`, 'add "antiparticle": "' + f.name + 'bar"');
    }
  });
  const couplings = new Set(t.couplings.map((c) => c.name));
  t.vertices.forEach((v, i) => {
    v.fields.forEach((f, j) => {
      if (!fieldNames.has(f)) throw new TheoryError(`unknown field label "${f}"`, `${source}: vertices[${i}].fields[${j}]`, `known labels: ${[...fieldNames.keys()].join(', ')}`);
    });
    if (!couplings.has(v.coupling)) throw new TheoryError(`unknown coupling "${v.coupling}"`, `${source}: vertices[${i}].coupling`, 'declare it under "couplings"');
    if (v.tensor !== undefined && !(KNOWN_TENSORS as readonly string[]).includes(v.tensor)) {
      throw new TheoryError(`unknown tensor "${v.tensor}"`, `${source}: vertices[${i}].tensor`, `known tensors: ${KNOWN_TENSORS.join(', ')}`);
    }
    // Fermion number is conserved at each vertex: as many arrows in as out.
    for (const f of t.fields.filter((x) => x.antiparticle)) {
      const nIn = v.fields.filter((x) => x === f.name).length;
      const nOut = v.fields.filter((x) => x === f.antiparticle).length;
      if (nIn !== nOut) throw new TheoryError(`vertex does not conserve ${f.name}-number (${nIn} ${f.name}, ${nOut} ${f.antiparticle})`, `${source}: vertices[${i}]`);
    }
  });
  const defaultField = t.defaultField ?? t.fields[0]!.name;
  if (!t.fields.some((f) => f.name === defaultField)) throw new TheoryError(`defaultField "${defaultField}" is not a field`, `${source}: defaultField`);
  if (t.defaultOrientedField && !t.fields.some((f) => f.name === t.defaultOrientedField)) {
    throw new TheoryError(`defaultOrientedField "${t.defaultOrientedField}" is not a field`, `${source}: defaultOrientedField`);
  }
  t.protectedResidues.forEach((p, i) =>
    p.residue.forEach((f, j) => {
      if (!fieldNames.has(f)) throw new TheoryError(`unknown field label "${f}"`, `${source}: protectedResidues[${i}].residue[${j}]`);
    }),
  );
  return {
    name: t.name,
    title: t.title,
    dimension: t.dimension,
    fields: t.fields.map((f) => ({ ...f })),
    vertices: t.vertices.map((v) => ({ ...v, fields: [...v.fields].sort() })),
    couplings: t.couplings,
    defaultField,
    ...(t.defaultOrientedField ? { defaultOrientedField: t.defaultOrientedField } : {}),
    symbols: t.symbols,
    protectedResidues: t.protectedResidues.map((p) => ({ residue: [...p.residue].sort(), reason: p.reason })),
    conventions: { ...defaultConventions, ...t.conventions },
  };
}
