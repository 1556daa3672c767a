/** The Values and Theory-run panels: their stores' logic and the panels in happy-dom (jobs in-process; the worker is tested end to end). */
import { flushPromises, mount } from '@vue/test-utils';
import { createPinia, setActivePinia } from 'pinia';
import { beforeEach, describe, expect, it, vi } from 'vitest';
import TheoryRunPanel from '../../renderer/src/components/workbench/TheoryRunPanel.vue';
import ValuesPanel from '../../renderer/src/components/workbench/ValuesPanel.vue';
import { browserPlatform } from '../../renderer/src/platform/platform.ts';
import { betaCurve, firstPositiveZero, niceTicks } from '../../renderer/src/stores/beta-plot.ts';
import { useDocumentStore } from '../../renderer/src/stores/document.ts';
import { useStructureStore } from '../../renderer/src/stores/structure.ts';
import { useTheoryRunStore } from '../../renderer/src/stores/theory-run.ts';
import { periodAgreement, useValuesStore } from '../../renderer/src/stores/values.ts';
import type { RgFunctionInfo, RgResult } from '../../src/core/project/index.ts';

const SUNSET = '1-2 1-2 1-2 / 1 2';
const CHAIN = '1-2 1-2 2-3 2-3 / 1 1 3 3';
const WHEEL3 = '1-2 1-3 1-4 2-3 2-4 3-4 / 1 2 3 4';
const BUBBLE = '1-2 1-2 / 1 1 2 2';

function opened(notation: string) {
  const doc = useDocumentStore();
  doc.newProject('phi4');
  doc.applyNotation(notation);
  return { doc, vs: useValuesStore() };
}
const check = (r: { checks: readonly { id: string; status: string }[] } | null, id: string) => r?.checks.find((c) => c.id === id)?.status;

describe('values store', () => {
  beforeEach(() => {
    setActivePinia(createPinia());
  });

  it('evaluates the sunset in MS-bar: counterterm, renormalized value, checks; a changed scheme makes the result stale', async () => {
    const { vs } = opened(SUNSET);
    expect(vs.current).toBeNull();
    const r = await vs.evaluate();
    expect(r).not.toBeNull();
    expect(vs.status).toBe('done');
    expect(vs.current!.counterterm!.text).toBe('(1/4)*eps^-1');
    expect(vs.current!.renormalized!.coefficients).toEqual(['-13/8', '1/2']);
    expect(check(vs.current, 'finite')).toBe('pass');
    expect(check(vs.current, 'local')).toBe('pass');
    expect(check(vs.current, 'rg')).toBe('pass');
    expect(vs.finite?.status).toBe('pass');
    expect(vs.current!.method).toMatch(/routing/);
    expect(vs.current!.conventions.map(([k]) => k)).toContain('scheme');
    vs.scheme = 'ms';
    expect(vs.current).toBeNull();
    expect(vs.stale).not.toBeNull();
    await vs.evaluate();
    // MS and MS-bar counterterms agree graph by graph (DESIGN §6); finite parts differ.
    expect(vs.current!.counterterm!.text).toBe('(1/4)*eps^-1');
    expect(vs.current!.renormalized!.coefficients[0]).not.toBe('-13/8');
  });

  it('a value entered by hand for a subgraph flows into the graph: a wrong bubble makes the chain non-local', async () => {
    const { vs } = opened(CHAIN);
    await vs.evaluate();
    expect(check(vs.current, 'local')).toBe('pass');
    expect(vs.supply(BUBBLE, 'not a number ((', 'γ₁')).toMatch(/./);
    expect(vs.supplied).toHaveLength(0);
    expect(vs.supply(BUBBLE, '-2*eps^-1', 'γ₁')).toBeNull();
    await vi.waitFor(() => expect(vs.status).toBe('done'));
    await vi.waitFor(() => expect(vs.current).not.toBeNull());
    expect(vs.current!.suppliedUsed).toEqual([{ notation: BUBBLE, forGraph: false, exact: true }]);
    expect(check(vs.current, 'local')).toBe('fail');
    expect(vs.current!.checks.find((c) => c.id === 'local')!.detail).toMatch(/ln p²/);
    // The right value restores the checks.
    vs.supply(BUBBLE, '-eps^-1', 'γ₁');
    await vi.waitFor(() => expect(check(vs.current, 'local')).toBe('pass'));
    vs.removeSupplied(vs.supplied[0]!.id);
    expect(vs.supplied).toHaveLength(0);
  });

  it('a value for the graph itself replaces its evaluation and says what cannot be checked', async () => {
    const { vs } = opened(SUNSET);
    vs.supply(SUNSET, '0.25(1)*eps^-1', 'Γ');
    await vi.waitFor(() => expect(vs.current).not.toBeNull());
    expect(vs.current!.suppliedForGraph).toBe(true);
    expect(vs.current!.counterterm!.exact).toBe(false);
    expect(vs.current!.renormalized).toBeNull();
    expect(check(vs.current, 'finite')).toBe('unchecked');
  });

  it('computes the period of a primitive graph and uses −P/(Lε), compared with the exact 6ζ(3)', async () => {
    const { vs } = opened(WHEEL3);
    await vs.evaluate();
    expect(vs.current!.primitive).toBe(true);
    expect(vs.current!.period.possible).toBe(true);
    vs.samples = 20_000;
    const p = await vs.computePeriod();
    expect(p!.loops).toBe(3);
    expect(Math.abs(p!.value - 6 * 1.2020569031595942)).toBeLessThan(5 * p!.error);
    expect(vs.supplied[0]!.expression).toMatch(/^-2\.\d+\(\d+\)\*eps\^-1$/);
    await vi.waitFor(() => expect(vs.current?.suppliedForGraph).toBe(true));
    expect(vs.agreement!.sigmas).toBeLessThan(4);
    expect(vs.agreement!.exact).toBeCloseTo(-2 * 1.2020569031595942, 10);
  });

  it('says why a graph has no period and why momentum subtraction refuses an infrared-unsafe point', async () => {
    const { vs } = opened(SUNSET);
    vs.scheme = 'mom';
    await vs.evaluate();
    expect(vs.current!.period.possible).toBe(false);
    expect(vs.current!.period.reason).toMatch(/ω = 2/);
    expect(vs.current!.evaluable).toBe(false);
    expect(vs.current!.reason).toMatch(/infrared/);
  });

  it('periodAgreement needs an exact simple pole', () => {
    const period = { kind: 'period' as const, value: 7.2, error: 0.01, samples: 1, heppBound: 84, loops: 3, counterterm: { approx: -2.4, error: 0.004 }, expression: '' };
    expect(periodAgreement(period, { text: '', tex: '', exact: true, terms: [{ power: -1, text: '-2*zeta(3)', value: -2.404113806, error: 0 }] })!.sigmas).toBeCloseTo(1.03, 2);
    expect(periodAgreement(period, { text: '', tex: '', exact: false, terms: [] })).toBeNull();
    expect(periodAgreement(period, null)).toBeNull();
  });
});

describe('theory-run store', () => {
  beforeEach(() => {
    setActivePinia(createPinia());
    useDocumentStore().newProject('phi4');
  });

  it('generates the graphs, then computes β, γ_φ, γ_{m²} of φ⁴ at two loops', async () => {
    const tr = useTheoryRunStore();
    expect(tr.theories.find((t) => t.name === 'qed')!.reason).toMatch(/fermion|scalar/);
    tr.loops = 2;
    const g = await tr.generate();
    expect(g!.evaluated).toBe(false);
    expect(g!.graphs.every((x) => x.status === 'pending')).toBe(true);
    expect(g!.classes).toBe(16);
    const r = await tr.compute();
    expect(r!.evaluated).toBe(true);
    const beta = r!.functions.find((f) => f.id === 'beta')!;
    const coef = (f: RgFunctionInfo, p: number | 'eps') => f.terms.find((t) => (p === 'eps' ? t.eps : !t.eps && t.power === p))?.text;
    expect(coef(beta, 'eps')).toBe('-2');
    expect(coef(beta, 2)).toBe('3');
    expect(coef(beta, 3)).toBe('-17/3');
    expect(coef(r!.functions[1]!, 2)).toBe('1/12');
    expect(coef(r!.functions[2]!, 2)).toBe('-5/6');
    expect(r!.report!.checks.rgConsistent).toBe(true);
    expect(r!.latex).toMatch(/longtable/);
    expect(tr.curve!.fixedPoint).not.toBeNull();
    expect(tr.current).toBe(r);
    tr.loops = 1;
    expect(tr.current).toBeNull();
  });

  it('follows the chosen conventions: β = −μ dg/dμ flips its sign, D = 4 − ε halves the ε term', async () => {
    const tr = useTheoryRunStore();
    tr.loops = 1;
    tr.conventionChoice = { dimension: 'D0-eps', betaSign: -1, gammaPhiHalf: true };
    const r = await tr.compute();
    const beta = r!.functions[0]!;
    expect(beta.terms.find((t) => t.eps)!.text).toBe('1');
    expect(beta.terms.find((t) => !t.eps && t.power === 2)!.text).toBe('-3');
    expect(r!.dimension).toBe('D0-eps');
  });

  it('opens a generated graph in the editor, or selects it when the project has it', async () => {
    const tr = useTheoryRunStore();
    const doc = useDocumentStore();
    tr.loops = 1;
    const r = (await tr.generate()) as RgResult;
    const n = doc.graphs.length;
    const bubble = r.graphs.find((g) => g.kind === 'vertex')!;
    const id = tr.openGraph(bubble);
    expect(doc.graphs.length).toBe(n + 1);
    expect(doc.activeId).toBe(id);
    expect(tr.openGraph(bubble)).toBe(id);
    expect(doc.graphs.length).toBe(n + 1);
    const mass = r.graphs.find((g) => g.kind === 'mass')!;
    tr.openGraph(mass);
    expect(doc.notation).toBe(mass.openNotation);
  });

  it('refuses a theory it cannot run, with the reason', async () => {
    const tr = useTheoryRunStore();
    tr.setTheory('qed');
    expect(await tr.compute()).toBeNull();
    expect(tr.status).toBe('failed');
    expect(tr.error!.message).toMatch(/qed/);
  });
});

describe('β(g) plot numbers', () => {
  const oneLoop: RgFunctionInfo = {
    id: 'beta', tex: '', knownThrough: 2, missing: [], formula: '',
    terms: [
      { power: 1, eps: true, text: '-2', tex: '', exact: true, numeric: { terms: [{ value: -2, error: 0, symbols: {} }] } },
      { power: 2, eps: false, text: '(N+8)/3', tex: '', exact: true, numeric: { terms: [{ value: 1 / 3, error: 0, symbols: { N: 1 } }, { value: 8 / 3, error: 0, symbols: {} }] } },
    ],
  };
  it('finds g* = 2ε/3 · 9/(N+8) at one loop, with slope 2ε, and none at ε = 0', () => {
    const c = betaCurve(oneLoop, 0.25, { N: 1 });
    expect(c.fixedPoint!.g).toBeCloseTo((2 * 0.25) / 3, 9);
    expect(c.fixedPoint!.slope).toBeCloseTo(0.5, 9);
    expect(betaCurve(oneLoop, 0.25, { N: 4 }).fixedPoint!.g).toBeCloseTo((2 * 0.25 * 3) / 12, 9);
    expect(betaCurve(oneLoop, 0).fixedPoint).toBeNull();
    expect(c.points[0]).toEqual([0, 0]);
    expect(c.yMin).toBeLessThan(0);
  });
  it('roots and ticks', () => {
    expect(firstPositiveZero([-1, 0, 1], 3)).toBeCloseTo(1, 9);
    expect(firstPositiveZero([1, 0, 1], 3)).toBeNull();
    expect(niceTicks(0, 1, 5)).toEqual([0, 0.2, 0.4, 0.6, 0.8, 1]);
    expect(niceTicks(-0.013, 0.021, 5)).toContain(0);
  });
});

describe('panels', () => {
  beforeEach(() => {
    setActivePinia(createPinia());
  });

  it('Values panel: evaluate, the finiteness check as pass, export through the platform', async () => {
    const { vs } = opened(SUNSET);
    const st = useStructureStore();
    await vi.waitFor(() => expect(st.current).not.toBeNull(), { timeout: 5000 });
    const exported: { suggestedName: string; text: string }[] = [];
    const platform = { ...browserPlatform(undefined), exportFile: async (r: { text: string; suggestedName: string; format: string }) => (exported.push(r), r.suggestedName) };
    const w = mount(ValuesPanel, { props: { platform } });
    expect(w.find('[data-testid=scheme-select]').exists()).toBe(true);
    await w.find('[data-testid=scheme-select]').setValue('msbar');
    await w.find('[data-testid=evaluate]').trigger('click');
    await vi.waitFor(() => expect(vs.status).toBe('done'));
    await flushPromises();
    expect(w.find('[data-testid=finite-check]').attributes('data-status')).toBe('pass');
    expect(w.find('[data-testid=values-counterterm] .katex').exists()).toBe(true);
    expect(w.findAll('.katex-error')).toHaveLength(0);
    // The subgraph targets: Γ and the bubble class (three bubbles, one notation).
    expect(w.findAll('[data-testid=supply-target] option').length).toBe(2);
    await w.find('[data-testid=values-export-tex]').trigger('click');
    await flushPromises();
    expect(exported[0]!.suggestedName).toMatch(/values-msbar\.tex$/);
    expect(exported[0]!.text).toMatch(/\\begin\{document\}/);
    w.unmount();
  });

  it('Theory-run panel: the result, coefficients by power, the plot and the graph list', async () => {
    useDocumentStore().newProject('phi4');
    const tr = useTheoryRunStore();
    const w = mount(TheoryRunPanel, { props: { platform: browserPlatform(undefined) } });
    await w.find('[data-testid=rg-loops]').setValue('2');
    await w.find('[data-testid=rg-run]').trigger('click');
    await vi.waitFor(() => expect(tr.status).toBe('done'));
    await flushPromises();
    const res = w.find('[data-testid=rg-result]');
    expect(res.exists()).toBe(true);
    expect(res.find('[data-testid=rg-coef-beta][data-power="3"] code').text()).toBe('-17/3');
    expect(w.find('[data-testid=beta-plot] path.bp-curve').attributes('d')).toMatch(/^M/);
    expect(w.find('[data-testid=beta-fixed-point]').exists()).toBe(true);
    expect(w.findAll('[data-testid=rg-graph]').length).toBe(18);
    expect(w.findAll('.katex-error')).toHaveLength(0);
    w.unmount();
  });
});
