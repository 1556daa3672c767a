/** The structure workbench's store and panels in happy-dom (jobs in-process; canvas and worker are tested end to end). */
import { flushPromises, mount } from '@vue/test-utils';
import { createPinia, setActivePinia } from 'pinia';
import { beforeEach, describe, expect, it, vi } from 'vitest';
import CoproductPanel from '../../renderer/src/components/workbench/CoproductPanel.vue';
import CountertermPanel from '../../renderer/src/components/workbench/CountertermPanel.vue';
import ForestStepper from '../../renderer/src/components/workbench/ForestStepper.vue';
import LatexPanel from '../../renderer/src/components/workbench/LatexPanel.vue';
import SubgraphsPanel from '../../renderer/src/components/workbench/SubgraphsPanel.vue';
import { browserPlatform } from '../../renderer/src/platform/platform.ts';
import { useDocumentStore } from '../../renderer/src/stores/document.ts';
import { useStructureStore } from '../../renderer/src/stores/structure.ts';
import { inspectGraph } from '../../src/core/inspect/graph-report.ts';
import { parseNotation } from '../../src/core/graph/notation-parse.ts';
import { parseGraphLink } from '../../src/core/project/ipc-contract.ts';
import { bindGraph } from '../../src/core/theory/bind-graph.ts';
import { builtinTheory } from '../../src/core/theory/builtin/index.ts';

const SUNSET = '1-2 1-2 1-2 / 1 2';
const CHAIN3 = '1-2 1-2 2-3 2-3 3-4 3-4 / 1 1 4 4';

async function opened(notation: string) {
  const doc = useDocumentStore();
  doc.newProject('phi4');
  const st = useStructureStore();
  doc.applyNotation(notation);
  await vi.waitFor(() => expect(st.current).not.toBeNull(), { timeout: 5000 });
  await vi.waitFor(() => expect(st.currentForest).not.toBeNull(), { timeout: 5000 });
  return { doc, st };
}

describe('structure workbench', () => {
  beforeEach(() => {
    setActivePinia(createPinia());
  });

  it('computes the sunset: power counting, subgraphs, overlaps, coproduct, formula tree, diagrams', async () => {
    const { st } = await opened(SUNSET);
    const r = st.current!;
    expect(r).toMatchObject({ loops: 2, omega: 2, divergent: true, symmetryFactor: 6, forests: { proper: 4, maximal: 3 } });
    expect(r.subgraphs.map((s) => s.edges)).toEqual([[0, 1], [0, 2], [1, 2]]);
    expect(r.subgraphs[0]!.overlaps).toEqual([1, 2]);
    expect(r.overlapping).toHaveLength(3);
    expect(r.coproduct.terms).toHaveLength(1);
    expect(r.coproduct.terms[0]!.multiplicity).toBe(3);
    expect(r.tree.termCount).toBe(4);
    expect(r.tree.nodes).toHaveLength(4);
    expect(r.diagrams).toHaveLength(1);
    expect(r.diagrams[0]!.symmetryFactor).toBe(2);
    expect(r.root.svg).toMatch(/^<svg/);
  });

  it('pages the forests and steps within the engine count; maximal forests apart', async () => {
    const { st } = await opened(CHAIN3);
    const engine = inspectGraph(bindGraph(parseNotation(CHAIN3), builtinTheory('phi4')));
    expect(st.forestTotal).toBe(Number(engine.forests.proper));
    expect(st.currentForest!.members).toEqual([]);
    expect(st.currentForest!.tex).toMatch(/\\Rmap/);
    st.prevForest();
    expect(st.forestIndex).toBe(0);
    const seen = new Set<string>();
    for (let k = 0; k < st.forestTotal; k++) {
      st.goToForest(k);
      await vi.waitFor(() => expect(st.currentForest?.index).toBe(k));
      seen.add(st.currentForest!.members.join(','));
    }
    expect(seen.size).toBe(st.forestTotal);
    // Only a few pages are kept: the list is never held whole.
    expect(st.pages.size).toBeLessThanOrEqual(8);
    st.nextForest();
    expect(st.forestIndex).toBe(st.forestTotal - 1);
    st.setForestMode('maximal');
    expect(st.forestTotal).toBe(Number(engine.forests.maximal));
    await vi.waitFor(() => expect(st.currentForest).not.toBeNull());
    expect(st.forestIndex).toBe(0);
  });

  it('marks nested forests on the canvas by depth, the innermost member naming each line', async () => {
    const { doc, st } = await opened(CHAIN3);
    st.tab = 'forests';
    st.setForestMode('maximal');
    const r = st.current!;
    let nested = -1;
    for (let k = 0; k < st.forestTotal && nested < 0; k++) {
      st.goToForest(k);
      await vi.waitFor(() => expect(st.currentForest?.index).toBe(k));
      const m = st.currentForest!.members;
      if (m.some((a) => m.some((b) => r.subgraphs[a]!.contains.includes(b)))) nested = k;
    }
    expect(nested).toBeGreaterThanOrEqual(0);
    const f = st.currentForest!;
    const inner = f.members.find((a) => f.members.some((b) => r.subgraphs[b]!.contains.includes(a)))!;
    const edgeIds = doc.activeGraph!.edges.map((e) => e.id);
    const marks = st.marks!;
    for (const e of r.subgraphs[inner]!.edges) {
      expect(marks.depth[edgeIds[e]!]).toBeGreaterThanOrEqual(2);
      expect(marks.label[edgeIds[e]!]).toBe(`γ${String(inner + 1).replace(/\d/g, (d) => '₀₁₂₃₄₅₆₇₈₉'[Number(d)]!)}`);
    }
    expect(f.rootedTree.children.length).toBeGreaterThan(0);
    expect(f.walk).toHaveLength(f.members.length + 1);
    // Pointing at a subgraph overrides the forest; the root node marks the whole graph.
    st.hover = { kind: 'subgraphs', indices: [0] };
    expect(Object.keys(st.marks!.label)).toHaveLength(r.subgraphs[0]!.edges.length);
    st.hover = { kind: 'node', id: r.tree.root };
    expect(Object.keys(st.marks!.depth)).toHaveLength(doc.activeGraph!.edges.length + doc.activeGraph!.vertices.length);
    st.hover = null;
    st.tab = 'power';
    expect(st.marks).toBeNull();
  });

  it('the forest stepper: buttons, position "k / n" and arrow keys', async () => {
    await opened(SUNSET);
    const w = mount(ForestStepper, { attachTo: document.body });
    await flushPromises();
    expect(w.get('[data-testid=forest-position]').text()).toBe('1 / 4');
    expect(w.get('[data-testid=forest-prev]').attributes('disabled')).toBeDefined();
    await w.get('[data-testid=forest-next]').trigger('click');
    await vi.waitFor(() => expect(w.get('[data-testid=forest-position]').text()).toBe('2 / 4'));
    window.dispatchEvent(new KeyboardEvent('keydown', { key: 'ArrowRight' }));
    await flushPromises();
    expect(w.get('[data-testid=forest-position]').text()).toBe('3 / 4');
    window.dispatchEvent(new KeyboardEvent('keydown', { key: 'ArrowLeft' }));
    await flushPromises();
    expect(w.get('[data-testid=forest-position]').text()).toBe('2 / 4');
    await vi.waitFor(() => expect(w.findAll('[data-testid=forest-walk] li')).toHaveLength(2));
    expect(w.find('[data-testid=forest-term] .katex').exists()).toBe(true);
    expect(w.find('[data-testid=rooted-tree]').exists()).toBe(true);
    w.unmount();
  });

  it('subgraph list: hover and select point the canvas at a subgraph; overlapping pairs listed', async () => {
    const { st } = await opened(SUNSET);
    const w = mount(SubgraphsPanel);
    await flushPromises();
    const items = w.findAll('[data-testid=subgraph-item]');
    expect(items).toHaveLength(3);
    await items[1]!.trigger('mouseenter');
    expect(st.hover).toEqual({ kind: 'subgraphs', indices: [1] });
    await items[1]!.trigger('mouseleave');
    await items[1]!.trigger('click');
    expect(st.focus).toEqual({ kind: 'subgraphs', indices: [1] });
    await items[1]!.trigger('click');
    expect(st.focus).toBeNull();
    expect(w.findAll('[data-testid=overlap-pair]')).toHaveLength(3);
    expect(w.find('.katex-error').exists()).toBe(false);
  });

  it('coproduct terms and the collapsible formula tree with counterterm diagrams', async () => {
    const { st } = await opened(SUNSET);
    const c = mount(CoproductPanel);
    await flushPromises();
    expect(c.findAll('[data-testid=coproduct-term]')).toHaveLength(1);
    expect(c.get('[data-testid=coproduct-multiplicity]').text()).toBe('3 ×');
    await c.get('[data-testid=coproduct-term]').trigger('click');
    expect(st.focus).toEqual({ kind: 'term', index: 0 });
    const t = mount(CountertermPanel);
    await flushPromises();
    expect(t.findAll('[data-testid=formula-node]')).toHaveLength(4);
    await t.get('[data-testid=formula-toggle]').trigger('click');
    expect(t.findAll('[data-testid=formula-node]')).toHaveLength(1);
    await t.get('.ft-formula').trigger('click');
    expect(st.focus).toEqual({ kind: 'node', id: st.current!.tree.root });
    expect(t.findAll('[data-testid=counterterm-diagram]')).toHaveLength(1);
    expect(t.get('[data-testid=diagram-symmetry]').text()).toMatch(/2/);
    expect(t.find('.katex-error').exists()).toBe(false);
  });

  it('LaTeX preview of each source typesets without KaTeX errors; .tex export goes through the platform', async () => {
    const { st } = await opened(SUNSET);
    st.tab = 'latex';
    const exported: { text: string; suggestedName: string; format: string }[] = [];
    const platform = { ...browserPlatform(undefined), exportFile: async (r: { text: string; suggestedName: string; format: string }) => (exported.push(r), r.suggestedName) };
    const w = mount(LatexPanel, { props: { platform, canvasPng: () => null } });
    for (const source of ['coproduct', 'counterterm', 'forest'] as const) {
      await w.get(`[data-testid=latex-source-${source}]`).trigger('click');
      await vi.waitFor(() => expect(w.find('[data-testid=latex-preview] .katex').exists()).toBe(true));
      expect(w.find('[data-testid=latex-preview] .katex-error').exists()).toBe(false);
      expect(st.latexPreview!.pictures.length).toBeGreaterThan(0);
    }
    expect(st.latexPreview!.tex).toMatch(/\\Rmap/);
    await w.get('[data-testid=latex-source-coproduct]').trigger('click');
    await w.get('[data-testid=latex-export-tex]').trigger('click');
    await vi.waitFor(() => expect(exported).toHaveLength(1));
    expect(exported[0]!.format).toBe('latex');
    expect(exported[0]!.text).toMatch(/\\documentclass[\s\S]*\\begin\{tikzpicture\}[\s\S]*\\end\{document\}/);
    await w.get('[data-testid=export-svg]').trigger('click');
    await vi.waitFor(() => expect(exported).toHaveLength(2));
    expect(exported[1]!.text).toMatch(/<svg/);
  });

  it('graph links take ?theory=&graph= (and the older notation=)', () => {
    expect(parseGraphLink(`coppice://graph?theory=phi4&graph=${encodeURIComponent(SUNSET)}`)).toEqual({ theory: 'phi4', notation: SUNSET });
    expect(parseGraphLink(`coppice://graph?notation=${encodeURIComponent(SUNSET)}`)).toEqual({ notation: SUNSET });
  });
});
