/**
 * The project document: theory, named graphs, the active graph, the file it came from, and
 * the undo history. Graphs are immutable plain data held in shallow refs, so every edit is
 * a new snapshot and undo/redo is a swap; nothing here is deeply reactive.
 */
import { defineStore } from 'pinia';
import { computed, ref, shallowRef } from 'vue';
import { builtinTheory, CoppiceError, parseNotation, printNotation, type FieldSpec, type LegDirection, type Theory } from '../../../src/core/index.ts';
import {
  addEdge, addLeg, addVertex, deleteElements, fromEngineGraph, idSource, idsOf, moveVertices, PROJECT_EXTENSION, readProject,
  renameGraph, replaceStructure, resolveTheory, reverseArrows, setField, toEngineGraph, validateGraph, writeProject,
  type DocGraph, type FieldChoice, type IdSource, type Point, type Project, type ProjectTheory, type Validation,
} from '../../../src/core/project/index.ts';

interface Snapshot {
  readonly theory: ProjectTheory;
  readonly graphs: readonly DocGraph[];
  readonly activeId: string | null;
}

/** How many edits undo remembers. */
export const HISTORY_LIMIT = 200;

export const useDocumentStore = defineStore('document', () => {
  const name = ref('untitled');
  const theorySpec = shallowRef<ProjectTheory>({ builtin: 'phi4' });
  const graphs = shallowRef<readonly DocGraph[]>([]);
  const activeId = ref<string | null>(null);
  /** Where the project was read from or last saved to (a path in the app, a file name in the browser). */
  const filePath = ref<string | null>(null);
  /** Bumped on every change; `savedVersion` is the version last written to a file. */
  const version = ref(0);
  const savedVersion = ref(0);
  const past = shallowRef<readonly Snapshot[]>([]);
  const future = shallowRef<readonly Snapshot[]>([]);
  let lastMerge: string | null = null;
  let ids: IdSource = idSource();

  const theory = computed<Theory>(() => {
    try {
      return resolveTheory(theorySpec.value);
    } catch {
      return builtinTheory('phi4');
    }
  });
  const activeGraph = computed(() => graphs.value.find((g) => g.id === activeId.value) ?? null);
  const validation = computed<Validation | null>(() => (activeGraph.value ? validateGraph(activeGraph.value, theory.value) : null));
  const notation = computed(() => (activeGraph.value ? printNotation(toEngineGraph(activeGraph.value).graph, { defaultField: theory.value.defaultField }) : ''));
  const dirty = computed(() => version.value !== savedVersion.value);
  const canUndo = computed(() => past.value.length > 0);
  const canRedo = computed(() => future.value.length > 0);
  const fileName = computed(() => (filePath.value ? filePath.value.split(/[\\/]/).pop()! : `${slug(name.value)}${PROJECT_EXTENSION}`));

  const snapshot = (): Snapshot => ({ theory: theorySpec.value, graphs: graphs.value, activeId: activeId.value });
  const restore = (s: Snapshot) => {
    theorySpec.value = s.theory;
    graphs.value = s.graphs;
    activeId.value = s.activeId && s.graphs.some((g) => g.id === s.activeId) ? s.activeId : (s.graphs[0]?.id ?? null);
  };

  /** Records the current state for undo, then applies `change`. Edits sharing `merge` key in a row coalesce into one undo step. */
  function commit(change: () => void, merge: string | null = null): void {
    const before = snapshot();
    change();
    if (before.graphs === graphs.value && before.theory === theorySpec.value) return;
    if (!(merge && merge === lastMerge)) past.value = [...past.value, before].slice(-HISTORY_LIMIT);
    future.value = [];
    lastMerge = merge;
    version.value++;
  }

  function updateActive(f: (g: DocGraph) => DocGraph, merge: string | null = null): void {
    const g = activeGraph.value;
    if (!g) return;
    commit(() => {
      const next = f(g);
      if (next !== g) graphs.value = graphs.value.map((x) => (x.id === g.id ? next : x));
    }, merge);
  }

  function undo(): void {
    const s = past.value.at(-1);
    if (!s) return;
    future.value = [snapshot(), ...future.value];
    past.value = past.value.slice(0, -1);
    restore(s);
    lastMerge = null;
    version.value++;
  }

  function redo(): void {
    const s = future.value[0];
    if (!s) return;
    past.value = [...past.value, snapshot()];
    future.value = future.value.slice(1);
    restore(s);
    lastMerge = null;
    version.value++;
  }

  /** Replaces the whole document (open, new, recovery); clears the history. */
  function load(p: Project, path: string | null = null, saved = true): void {
    name.value = p.name;
    theorySpec.value = p.theory;
    graphs.value = p.graphs;
    activeId.value = p.graphs[0]?.id ?? null;
    filePath.value = path;
    ids = idSource(idsOf(p.graphs));
    past.value = [];
    future.value = [];
    lastMerge = null;
    version.value++;
    savedVersion.value = saved ? version.value : -1;
  }

  /** Reads a project file's text into the document; throws ProjectFileError naming the field. */
  function loadText(text: string, path: string | null = null, saved = true): void {
    load(readProject(text, idSource()), path, saved);
  }

  function newProject(theoryName: string): void {
    const g: DocGraph = { id: 'g1', name: 'graph 1', vertices: [], edges: [], legs: [] };
    load({ name: 'untitled', theory: { builtin: theoryName }, graphs: [g] }, null, true);
  }

  const serialize = () => writeProject({ name: name.value, theory: theorySpec.value, graphs: graphs.value });

  function markSaved(path: string | null): void {
    if (path) filePath.value = path;
    savedVersion.value = version.value;
  }

  /** A line or leg of the named field, oriented when the field has an antiparticle. */
  function choiceFor(field: string): FieldChoice {
    const f: FieldSpec | undefined = theory.value.fields.find((x) => x.name === field);
    return { field, oriented: !!f?.antiparticle };
  }

  // ——— graph edits (each one undoable) ———
  function addVertexAt(p: Point): string {
    let id = '';
    updateActive((g) => {
      const r = addVertex(g, ids, { x: Math.round(p.x), y: Math.round(p.y) });
      id = r.id;
      return r.graph;
    });
    return id;
  }
  function addLine(source: string, target: string, field: string): string {
    let id = '';
    updateActive((g) => {
      const r = addEdge(g, ids, source, target, choiceFor(field));
      id = r.id;
      return r.graph;
    });
    return id;
  }
  function addExternalLeg(vertex: string, field: string, direction: LegDirection = 'in'): string {
    let id = '';
    updateActive((g) => {
      const r = addLeg(g, ids, vertex, choiceFor(field), direction);
      id = r.id;
      return r.graph;
    });
    return id;
  }
  const remove = (elementIds: Iterable<string>) => updateActive((g) => deleteElements(g, elementIds));
  const move = (moves: ReadonlyMap<string, Point>) => updateActive((g) => moveVertices(g, moves));
  const setFieldOf = (elementIds: Iterable<string>, field: string) => updateActive((g) => setField(g, new Set(elementIds), choiceFor(field)));
  const reverse = (elementIds: Iterable<string>) => updateActive((g) => reverseArrows(g, new Set(elementIds)));

  /**
   * Applies text from the notation box to the active graph. Returns null on success, or the
   * parse error (the canvas keeps the last good graph). Typing in one focus session is one undo step.
   */
  function applyNotation(text: string, session = 'notation'): CoppiceError | null {
    const g = activeGraph.value;
    if (!g) return null;
    let parsed;
    try {
      parsed = parseNotation(text);
    } catch (e) {
      if (e instanceof CoppiceError) return e;
      throw e;
    }
    const fresh = fromEngineGraph(parsed, g.name, ids);
    const next = replaceStructure(g, fresh);
    const now = printNotation(toEngineGraph(g).graph, { defaultField: theory.value.defaultField });
    if (printNotation(parsed, { defaultField: theory.value.defaultField }) === now) return null;
    updateActive(() => ({ ...next, id: g.id }), session);
    return null;
  }

  // ——— graph list ———
  function uniqueName(base: string): string {
    const taken = new Set(graphs.value.map((g) => g.name));
    if (!taken.has(base)) return base;
    let n = 2;
    while (taken.has(`${base} (${n})`)) n++;
    return `${base} (${n})`;
  }
  function newGraph(notationText = '/', graphName?: string): string {
    const parsed = parseNotation(notationText);
    const g = fromEngineGraph(parsed, uniqueName(graphName ?? `graph ${graphs.value.length + 1}`), ids);
    commit(() => {
      graphs.value = [...graphs.value, g];
      activeId.value = g.id;
    });
    return g.id;
  }
  function duplicateGraph(id: string): void {
    const g = graphs.value.find((x) => x.id === id);
    if (!g) return;
    const copy = fromEngineGraph(toEngineGraph(g).graph, uniqueName(`${g.name} copy`), ids, new Map(g.vertices.map((v) => [v.name, v.position])));
    commit(() => {
      const i = graphs.value.indexOf(g);
      graphs.value = [...graphs.value.slice(0, i + 1), copy, ...graphs.value.slice(i + 1)];
      activeId.value = copy.id;
    });
  }
  function removeGraph(id: string): void {
    commit(() => {
      const i = graphs.value.findIndex((g) => g.id === id);
      if (i < 0) return;
      graphs.value = graphs.value.filter((g) => g.id !== id);
      if (activeId.value === id) activeId.value = graphs.value[Math.max(0, i - 1)]?.id ?? null;
    });
  }
  function rename(id: string, newName: string): void {
    const clean = newName.trim().slice(0, 200);
    if (!clean) return;
    commit(() => {
      graphs.value = graphs.value.map((g) => (g.id === id ? renameGraph(g, clean) : g));
    });
  }
  function selectGraph(id: string): void {
    if (graphs.value.some((g) => g.id === id)) activeId.value = id;
    lastMerge = null;
  }
  function setTheory(theoryName: string): void {
    builtinTheory(theoryName);
    commit(() => {
      theorySpec.value = { builtin: theoryName };
    });
  }
  function renameProject(newName: string): void {
    const clean = newName.trim().slice(0, 200);
    if (clean && clean !== name.value) {
      name.value = clean;
      version.value++;
    }
  }

  return {
    name, theorySpec, graphs, activeId, filePath, version, savedVersion, past, future,
    theory, activeGraph, validation, notation, dirty, canUndo, canRedo, fileName,
    commit, undo, redo, load, loadText, newProject, serialize, markSaved, choiceFor,
    addVertexAt, addLine, addExternalLeg, remove, move, setFieldOf, reverse, applyNotation,
    newGraph, duplicateGraph, removeGraph, rename, selectGraph, setTheory, renameProject,
  };
});

function slug(s: string): string {
  return s.replace(/φ/g, 'phi').replace(/ψ/g, 'psi').normalize('NFKD').replace(/[^A-Za-z0-9]+/g, '-').replace(/^-|-$/g, '').toLowerCase() || 'project';
}
