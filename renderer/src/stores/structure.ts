/**
 * The structure workbench: one engine job per graph (power counting, subgraphs, coproduct,
 * formula tree, counterterm diagrams), forests fetched a page at a time, LaTeX on demand, and
 * what the panels point at (drawn on the canvas as nested marks). Results are frozen and kept
 * out of Vue's deep reactivity; the store's own state is small and serializable.
 */
import { defineStore } from 'pinia';
import { computed, markRaw, nextTick, ref, shallowRef, watch } from 'vue';
import { printNotation } from '../../../src/core/index.ts';
import {
  decodeTagged, encodeTagged,
  type ForestInfo, type ForestSelection, type JobOutcome, type JobRequest, type LatexResult, type LatexSelection, type StructureResult,
} from '../../../src/core/project/index.ts';
import { useDocumentStore } from './document.ts';
import { createJobRunner } from './jobs.ts';

export type WorkbenchTab = 'power' | 'subgraphs' | 'forests' | 'coproduct' | 'counterterms' | 'latex' | 'values' | 'theory';
export const WORKBENCH_TABS: readonly { id: WorkbenchTab; label: string }[] = [
  { id: 'power', label: 'Power counting' },
  { id: 'subgraphs', label: 'Subgraphs' },
  { id: 'forests', label: 'Forests' },
  { id: 'coproduct', label: 'Coproduct' },
  { id: 'counterterms', label: 'Counterterms' },
  { id: 'latex', label: 'LaTeX' },
  { id: 'values', label: 'Values' },
  { id: 'theory', label: 'Theory run' },
];

/** What a panel points at; its subgraphs are marked on the canvas. */
export type Focus =
  | { readonly kind: 'subgraphs'; readonly indices: readonly number[] }
  | { readonly kind: 'node'; readonly id: number }
  | { readonly kind: 'term'; readonly index: number }
  | { readonly kind: 'diagram'; readonly index: number }
  | null;

export type LatexSource = 'coproduct' | 'counterterm' | 'forest';

/** Nesting depth (1 = outermost member) and innermost member's name per canvas element id. */
export interface CanvasMarks {
  readonly depth: Readonly<Record<string, number>>;
  readonly label: Readonly<Record<string, string>>;
}

export const FOREST_PAGE = 10;
/** Above this many lines the structure is computed on request only (the editor stays responsive while drawing large graphs). */
export const AUTO_STRUCTURE_MAX_EDGES = 40;
const SUB = '₀₁₂₃₄₅₆₇₈₉';
/** γ with a subscript, for plain text (the canvas): γ₁₂. */
export const gammaName = (index: number): string => `γ${String(index + 1).replace(/\d/g, (d) => SUB[Number(d)]!)}`;

export type StructureStatus = 'idle' | 'running' | 'done' | 'failed' | 'cancelled';

export const useStructureStore = defineStore('structure', () => {
  const doc = useDocumentStore();
  const runner = createJobRunner();

  const tab = ref<WorkbenchTab>('power');
  const status = ref<StructureStatus>('idle');
  const stage = ref('');
  const error = shallowRef<{ message: string; hint?: string } | null>(null);
  /** Key (theory + notation) of the graph the result describes. */
  const key = ref<string | null>(null);
  const result = shallowRef<StructureResult | null>(null);
  const forestMode = ref<ForestSelection>('all');
  const forestIndex = ref(0);
  const pages = shallowRef<ReadonlyMap<string, readonly ForestInfo[]>>(new Map());
  const pageError = ref<string | null>(null);
  const focus = shallowRef<Focus>(null);
  const hover = shallowRef<Focus>(null);
  const latexSource = ref<LatexSource>('coproduct');
  const latex = shallowRef<LatexResult | null>(null);
  const latexError = ref<string | null>(null);
  /** Milliseconds from asking for a graph's structure to every panel's data being in place. */
  const fillMs = ref<number | null>(null);
  let ticket = 0;
  let requestedAt = 0;
  const pending = new Set<string>();

  const request = computed(() => {
    const v = doc.validation;
    if (!v || !v.ok || !doc.activeGraph?.vertices.length) return null;
    const notation = printNotation(v.view.graph);
    return { key: `${doc.theory.name}\n${notation}`, notation, edgeIds: v.view.edgeIds, graph: doc.activeGraph };
  });
  /** The result, when it describes the graph on the canvas. */
  const current = computed(() => (result.value && request.value && key.value === request.value.key ? result.value : null));

  const plain = (req: JobRequest) => decodeTagged(encodeTagged(req)) as JobRequest;
  async function run(req: JobRequest, onStage?: (s: string) => void): Promise<JobOutcome> {
    try {
      return await runner.run(plain(req), onStage ? (p) => onStage(p.stage) : undefined);
    } catch (e) {
      return { ok: false, error: { name: (e as Error)?.name ?? 'Error', message: String((e as Error)?.message ?? e) } };
    }
  }

  /** The graph is too large to analyse on every edit; `analyse()` still does it on request. */
  const deferred = ref(false);

  async function analyse(): Promise<void> {
    const r = request.value;
    // A job still running for an older graph is stopped, so edits never queue up behind it.
    if (status.value === 'running') runner.cancel();
    const mine = ++ticket;
    deferred.value = false;
    result.value = null;
    pages.value = new Map();
    pending.clear();
    latex.value = null;
    forestIndex.value = 0;
    focus.value = null;
    hover.value = null;
    fillMs.value = null;
    error.value = null;
    if (!r) {
      key.value = null;
      status.value = 'idle';
      return;
    }
    key.value = r.key;
    status.value = 'running';
    stage.value = '';
    const out = await run({ kind: 'structure', theory: doc.theory, notation: r.notation }, (s) => mine === ticket && (stage.value = s));
    if (mine !== ticket) return;
    if (!out.ok || out.result.kind !== 'structure') {
      status.value = out.ok ? 'failed' : out.error.name === 'CancelledError' ? 'cancelled' : 'failed';
      error.value = out.ok ? { message: 'unexpected answer' } : out.error.hint ? { message: out.error.message, hint: out.error.hint } : { message: out.error.message };
      return;
    }
    result.value = markRaw(Object.freeze(out.result));
    status.value = 'done';
    await ensurePage();
    if (tab.value === 'latex') void loadLatex();
    if (mine !== ticket) return;
    await nextTick();
    fillMs.value = Math.round(performance.now() - requestedAt);
  }

  let timer: ReturnType<typeof setTimeout> | undefined;
  let lastGraphId: string | null = null;
  watch(
    () => request.value?.key ?? null,
    (k) => {
      clearTimeout(timer);
      if (k === key.value && status.value !== 'cancelled' && status.value !== 'idle') return;
      requestedAt = performance.now();
      // A newly selected graph at once; edits after a short pause.
      const switched = doc.activeId !== lastGraphId;
      lastGraphId = doc.activeId;
      if (k && (request.value?.graph.edges.length ?? 0) > AUTO_STRUCTURE_MAX_EDGES) {
        if (status.value === 'running') runner.cancel();
        ticket++;
        result.value = null;
        key.value = null;
        status.value = 'idle';
        deferred.value = true;
        return;
      }
      deferred.value = false;
      if (switched || !k) void analyse();
      else timer = setTimeout(() => void analyse(), 80);
    },
    { immediate: true },
  );

  function cancel(): void {
    if (status.value !== 'running') return;
    ticket++;
    runner.cancel();
    status.value = 'cancelled';
    pending.clear();
  }

  // ——— forests ———
  const forestTotal = computed<number>(() => {
    const r = current.value;
    if (!r) return 0;
    return Number(forestMode.value === 'all' ? r.forests.proper : r.forests.maximal);
  });
  const pageKey = (mode: ForestSelection, page: number) => `${mode}:${page}`;
  const currentForest = computed<ForestInfo | null>(() => {
    const page = pages.value.get(pageKey(forestMode.value, Math.floor(forestIndex.value / FOREST_PAGE)));
    return page?.[forestIndex.value % FOREST_PAGE] ?? null;
  });

  async function ensurePage(): Promise<void> {
    const r = request.value;
    if (!r || !current.value) return;
    const mode = forestMode.value;
    const page = Math.floor(forestIndex.value / FOREST_PAGE);
    const pk = pageKey(mode, page);
    if (pages.value.has(pk) || pending.has(pk)) return;
    pending.add(pk);
    const mine = ticket;
    const out = await run({ kind: 'forest-page', theory: doc.theory, notation: r.notation, which: mode, offset: page * FOREST_PAGE, limit: FOREST_PAGE });
    pending.delete(pk);
    if (mine !== ticket) return;
    if (!out.ok || out.result.kind !== 'forest-page') {
      pageError.value = out.ok ? 'unexpected answer' : out.error.message;
      return;
    }
    pageError.value = null;
    const next = new Map(pages.value);
    // Keep a handful of pages: the lists are paged so they never all sit here at once.
    if (next.size >= 8) next.delete(next.keys().next().value!);
    next.set(pk, Object.freeze(out.result.forests));
    pages.value = next;
    if (tab.value === 'latex' && latexSource.value === 'forest') void loadLatex();
  }

  function goToForest(k: number): void {
    const n = forestTotal.value;
    if (!n) return;
    forestIndex.value = Math.min(n - 1, Math.max(0, k));
    void ensurePage();
  }
  const nextForest = () => goToForest(forestIndex.value + 1);
  const prevForest = () => goToForest(forestIndex.value - 1);
  function setForestMode(m: ForestSelection): void {
    if (m === forestMode.value) return;
    forestMode.value = m;
    forestIndex.value = 0;
    void ensurePage();
  }

  // ——— canvas marks ———
  /** Subgraph indices a focus points at. */
  function membersOf(f: Focus | 'forest', r: StructureResult): number[] {
    if (f === 'forest') return [...(currentForest.value?.members ?? [])];
    if (!f) return [];
    switch (f.kind) {
      case 'subgraphs':
        return [...f.indices];
      case 'node': {
        const n = r.tree.nodes[f.id];
        return n && n.subgraphIndex >= 0 ? [n.subgraphIndex] : [];
      }
      case 'term':
        return [...(r.coproduct.terms[f.index]?.components ?? [])];
      case 'diagram':
        return [...(r.diagrams[f.index]?.components ?? [])];
    }
  }

  const marks = computed<CanvasMarks | null>(() => {
    const r = current.value;
    const req = request.value;
    if (!r || !req) return null;
    const f: Focus | 'forest' = hover.value ?? focus.value ?? (tab.value === 'forests' ? 'forest' : null);
    const wholeGraph = f !== 'forest' && f?.kind === 'node' && r.tree.nodes[f.id]?.subgraphIndex === -1;
    const members = wholeGraph ? [] : membersOf(f, r);
    if (!members.length && !wholeGraph) return null;
    const depth: Record<string, number> = {};
    const label: Record<string, string> = {};
    const edgeById = new Map(req.graph.edges.map((e) => [e.id, e]));
    if (wholeGraph) {
      for (const id of req.edgeIds) depth[id] = 1;
      for (const v of req.graph.vertices) depth[v.id] = 1;
      return { depth, label };
    }
    // Outer members first, so the innermost one names each line.
    const order = [...members].sort((a, b) => r.subgraphs[b]!.edges.length - r.subgraphs[a]!.edges.length || a - b);
    for (const m of order) {
      const vertices = new Set<string>();
      for (const e of r.subgraphs[m]!.edges) {
        const id = req.edgeIds[e];
        if (!id) continue;
        depth[id] = (depth[id] ?? 0) + 1;
        label[id] = gammaName(m);
        const de = edgeById.get(id);
        if (de) vertices.add(de.source).add(de.target);
      }
      for (const v of vertices) depth[v] = (depth[v] ?? 0) + 1;
    }
    return { depth, label };
  });

  // ——— LaTeX ———
  async function loadLatex(): Promise<void> {
    const r = request.value;
    if (!r || !current.value || latexSource.value === 'forest') return;
    const document: LatexSelection = latexSource.value;
    if (latex.value?.document === document) return;
    const mine = ticket;
    latexError.value = null;
    const out = await run({ kind: 'latex', theory: doc.theory, notation: r.notation, document, target: 'katex' });
    if (mine !== ticket || latexSource.value !== document) return;
    if (!out.ok || out.result.kind !== 'latex') {
      latexError.value = out.ok ? 'unexpected answer' : out.error.message;
      return;
    }
    latex.value = markRaw(Object.freeze(out.result));
  }
  function setLatexSource(s: LatexSource): void {
    latexSource.value = s;
    void loadLatex();
  }

  /** The KaTeX fragment and pictures the preview shows for the current source. */
  const latexPreview = computed<{ tex: string; pictures: readonly { symbol: string; notation: string; svg: string }[] } | null>(() => {
    const r = current.value;
    if (!r) return null;
    if (latexSource.value === 'forest') {
      const f = currentForest.value;
      if (!f) return null;
      const members = f.members.length ? `\\{${f.members.map((m) => r.subgraphs[m]!.symbol).join(',')}\\}` : '\\varnothing';
      const walk = f.walk.map((w) => w.symbol).join(' \\;\\to\\; ');
      const tex = [
        `\\text{\\textbf{Forest ${f.index + 1} of ${forestTotal.value}}}`,
        `F = ${members}`,
        f.tex,
        `\\text{contracting innermost first: } ${walk}`,
      ].join(' \\\\[1ex]\n');
      const pictures = [r.root, ...f.members.map((m) => r.subgraphs[m]!), ...f.walk.slice(1)];
      return { tex: `\\begin{gathered}\n${tex}\n\\end{gathered}`, pictures };
    }
    return latex.value && latex.value.document === latexSource.value ? { tex: latex.value.text, pictures: latex.value.pictures } : null;
  });

  /** A complete .tex file (TikZ pictures) of the current source; the forest's source is the counterterm. */
  async function texDocument(): Promise<string> {
    const r = request.value;
    if (!r) throw new Error('no valid graph');
    const document: LatexSelection = latexSource.value === 'coproduct' ? 'coproduct' : 'counterterm';
    const out = await run({ kind: 'latex', theory: doc.theory, notation: r.notation, document, target: 'document' });
    if (!out.ok || out.result.kind !== 'latex') throw new Error(out.ok ? 'unexpected answer' : out.error.message);
    return out.result.text;
  }

  watch(tab, (t) => {
    if (t === 'latex') void loadLatex();
    focus.value = null;
    hover.value = null;
  });

  return {
    tab, status, stage, error, key, deferred, result, current, request, forestMode, forestIndex, forestTotal, pages, pageError, currentForest,
    focus, hover, marks, latexSource, latex, latexError, latexPreview, fillMs,
    analyse, cancel, goToForest, nextForest, prevForest, setForestMode, ensurePage, setLatexSource, loadLatex, texDocument,
  };
});
