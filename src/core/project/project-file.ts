/**
 * The project file (`*.coppice.json`), our own format: versioned JSON with named keys.
 *
 *     { "format": "coppice-project", "version": 1, "name": "…",
 *       "theory": { "builtin": "phi4" }            (or { "custom": { …theory file… } })
 *       "graphs": [ { "name": "…", "notation": "1-2 1-2 / 1 1 2 2",
 *                     "layout": { "1": [0, 0], "2": [120, 0] } } ] }
 *
 * Graphs are stored in the compact notation (DESIGN §10) plus vertex positions by name, so
 * a file reads well and diffs well. Loading validates with zod and names the broken field.
 */
import { z } from 'zod';
import { CoppiceError, InputError } from '../errors.ts';
import { parseNotation } from '../graph/notation-parse.ts';
import { printNotation } from '../graph/notation-print.ts';
import { builtinTheory } from '../theory/builtin/index.ts';
import { parseTheory } from '../theory/parse-theory.ts';
import type { Theory } from '../theory/types.ts';
import { fromEngineGraph, idSource, toEngineGraph, type DocGraph, type IdSource, type Point } from './doc-graph.ts';
import { decodeTagged, encodeTagged } from './tagged-json.ts';

export const PROJECT_FORMAT = 'coppice-project';
export const PROJECT_VERSION = 1;
export const PROJECT_EXTENSION = '.coppice.json';
/** Project files larger than this are refused before parsing. */
export const MAX_PROJECT_FILE_LENGTH = 20_000_000;

/** A project file that cannot be read; `field` is the JSON path of the broken value. */
export class ProjectFileError extends CoppiceError {
  readonly field: string;
  constructor(message: string, field: string, hint?: string) {
    super(field ? `${message} (at ${field})` : message, hint);
    this.field = field;
  }
}

/** Which theory a project uses: a built-in one by name, or a theory file embedded whole. */
export type ProjectTheory = { readonly builtin: string } | { readonly custom: unknown };

export interface Project {
  readonly name: string;
  readonly theory: ProjectTheory;
  readonly graphs: readonly DocGraph[];
}

const point = z.tuple([z.number().finite(), z.number().finite()]);
const graphSchema = z.strictObject({
  name: z.string().min(1).max(200),
  notation: z.string().max(100_000),
  layout: z.record(z.string(), point).optional(),
});
const fileSchema = z.strictObject({
  format: z.literal(PROJECT_FORMAT),
  version: z.number().int(),
  name: z.string().max(200),
  theory: z.union([z.strictObject({ builtin: z.string() }), z.strictObject({ custom: z.unknown() })]),
  graphs: z.array(graphSchema).max(10_000),
});

const pathOf = (path: readonly PropertyKey[]) =>
  path.map((p, i) => (typeof p === 'number' ? `[${p}]` : `${i ? '.' : ''}${String(p)}`)).join('') || '(top level)';

/** The theory a project names; a ProjectFileError at `theory` when it is unknown or invalid. */
export function resolveTheory(t: ProjectTheory): Theory {
  try {
    return 'builtin' in t ? builtinTheory(t.builtin) : parseTheory(t.custom, 'the project\'s theory');
  } catch (e) {
    if (e instanceof CoppiceError) throw new ProjectFileError(e.message, 'builtin' in t ? 'theory.builtin' : 'theory.custom', e.hint);
    throw e;
  }
}

/** Reads a project file's text; throws ProjectFileError naming the broken field. */
export function readProject(text: string, ids: IdSource = idSource()): Project {
  if (text.length > MAX_PROJECT_FILE_LENGTH) throw new ProjectFileError(`the file is larger than ${MAX_PROJECT_FILE_LENGTH} characters`, '');
  let data: unknown;
  try {
    data = decodeTagged(text);
  } catch (e) {
    throw new ProjectFileError(`the file is not JSON: ${(e as Error).message}`, '', 'a project file is the JSON that Coppice saves');
  }
  if (data && typeof data === 'object' && 'version' in data && typeof data.version === 'number' && data.version > PROJECT_VERSION) {
    throw new ProjectFileError(`the file has version ${data.version}, newer than this Coppice reads (${PROJECT_VERSION})`, 'version', 'update Coppice');
  }
  const parsed = fileSchema.safeParse(data);
  if (!parsed.success) {
    const first = parsed.error.issues[0]!;
    throw new ProjectFileError(first.message, pathOf(first.path), `a project file has the keys format ("${PROJECT_FORMAT}"), version, name, theory and graphs`);
  }
  const f = parsed.data;
  if (f.version !== PROJECT_VERSION) throw new ProjectFileError(`unknown version ${f.version}`, 'version', `this Coppice reads version ${PROJECT_VERSION}`);
  resolveTheory(f.theory);
  const graphs = f.graphs.map((g, i) => {
    let graph;
    try {
      graph = parseNotation(g.notation, `graphs[${i}].notation`);
    } catch (e) {
      if (e instanceof InputError) throw new ProjectFileError(e.message, `graphs[${i}].notation`, e.hint);
      throw e;
    }
    const positions = new Map<string, Point>(Object.entries(g.layout ?? {}).map(([k, [x, y]]) => [k, { x, y }]));
    return fromEngineGraph(graph, g.name, ids, positions);
  });
  return { name: f.name, theory: f.theory, graphs };
}

/** The file text of a project (stable key order, two-space indent, trailing newline). */
export function writeProject(p: Project): string {
  let defaultField: string | undefined;
  try {
    defaultField = resolveTheory(p.theory).defaultField;
  } catch {
    defaultField = undefined;
  }
  const file = {
    format: PROJECT_FORMAT,
    version: PROJECT_VERSION,
    name: p.name,
    theory: p.theory,
    graphs: p.graphs.map((g) => ({
      name: g.name,
      notation: printNotation(toEngineGraph(g).graph, defaultField ? { defaultField } : {}),
      layout: Object.fromEntries(g.vertices.map((v) => [v.name, [Math.round(v.position.x), Math.round(v.position.y)]])),
    })),
  };
  // Positions on one line each: `"1": [-70, 0]`.
  return encodeTagged(file, 2).replace(/\[\s+(-?\d+),\s+(-?\d+)\s+\]/g, '[$1, $2]') + '\n';
}
