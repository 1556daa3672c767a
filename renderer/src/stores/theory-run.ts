/**
 * The Theory-run panel: a theory, its conventions, loops and scheme; the graphs generated for the
 * Z-factors (a browsable list, each openable in the editor); the RG computation in the worker with
 * progress and cancel; and what the plot of β(g) needs (ε, values of free symbols).
 */
import { defineStore } from 'pinia';
import { computed, markRaw, ref, shallowRef } from 'vue';
import { builtinTheory, builtinTheoryNames, canonicalNotation, parseNotation, unsupportedReason, type Theory } from '../../../src/core/index.ts';
import { decodeTagged, encodeTagged, toEngineGraph, type JobRequest, type RgGraphInfo, type RgResult, type SuppliedValue } from '../../../src/core/project/index.ts';
import type { SchemeName } from '../../../src/core/schemes/scheme.ts';
import { betaCurve, type BetaCurve } from './beta-plot.ts';
import { useDocumentStore } from './document.ts';
import { createJobRunner } from './jobs.ts';

export type RunStatus = 'idle' | 'running' | 'done' | 'failed' | 'cancelled';
export const MAX_RUN_LOOPS = 5;

export interface ConventionChoice {
  readonly dimension: Theory['conventions']['dimension'];
  readonly betaSign: 1 | -1;
  readonly gammaPhiHalf: boolean;
}

export const KIND_LABEL: Readonly<Record<RgGraphInfo['kind'], string>> = {
  vertex: 'four-point (Z_λ)',
  field: 'two-point (Z_φ)',
  mass: 'φ² insertion (Z_m²)',
};

export const useTheoryRunStore = defineStore('theory-run', () => {
  const doc = useDocumentStore();
  const runner = createJobRunner();

  const theories = builtinTheoryNames().map((name) => ({ name, reason: unsupportedReason(builtinTheory(name)) }));
  const initial = theories.find((t) => t.name === doc.theory.name && !t.reason)?.name ?? 'phi4';
  const theoryName = ref(initial);
  const loops = ref(2);
  const scheme = ref<SchemeName>('msbar');
  const base = computed(() => builtinTheory(theoryName.value));
  const conventionChoice = ref<ConventionChoice>({ ...pick(base.value) });
  const status = ref<RunStatus>('idle');
  const stage = ref('');
  const fraction = ref<number | null>(null);
  const error = shallowRef<{ message: string; hint?: string } | null>(null);
  /** The last answer: the graph list (generated) or the whole computation (evaluated). */
  const result = shallowRef<RgResult | null>(null);
  const resultKey = ref<string | null>(null);
  const eps = ref(0.1);
  const symbolValues = ref<Record<string, number>>({ N: 1 });
  const supplied = shallowRef<readonly SuppliedValue[]>([]);
  /** Seconds the last evaluated run took. */
  const seconds = ref<number | null>(null);
  let ticket = 0;

  function pick(t: Theory): ConventionChoice {
    return { dimension: t.conventions.dimension, betaSign: t.conventions.betaSign, gammaPhiHalf: t.conventions.gammaPhiHalf };
  }
  function setTheory(name: string): void {
    theoryName.value = name;
    conventionChoice.value = pick(builtinTheory(name));
  }
  /** The theory with the chosen conventions. */
  const theory = computed<Theory>(() => ({ ...base.value, conventions: { ...base.value.conventions, ...conventionChoice.value } }));
  const unsupported = computed(() => unsupportedReason(theory.value));
  const settingsKey = computed(() => JSON.stringify([theoryName.value, conventionChoice.value, loops.value, scheme.value, supplied.value]));
  /** The result when it answers the settings shown. */
  const current = computed(() => (result.value && resultKey.value === settingsKey.value ? result.value : null));
  const beta = computed(() => current.value?.functions.find((f) => f.id === 'beta') ?? null);
  const curve = computed<BetaCurve | null>(() => (beta.value ? betaCurve(beta.value, eps.value, symbolValues.value) : null));
  const missing = computed(() => current.value?.graphs.filter((g) => g.status === 'missing') ?? []);

  async function run(evaluate: boolean): Promise<RgResult | null> {
    if (unsupported.value) {
      error.value = { message: `theory ${theoryName.value}: ${unsupported.value}` };
      status.value = 'failed';
      return null;
    }
    if (status.value === 'running') cancel();
    const mine = ++ticket;
    const k = settingsKey.value;
    status.value = 'running';
    stage.value = evaluate ? 'starting' : 'generating the graphs';
    fraction.value = 0;
    error.value = null;
    const started = performance.now();
    const req: JobRequest = { kind: 'rg', theory: theory.value, loops: loops.value, scheme: scheme.value, evaluate, supplied: [...supplied.value] };
    let out;
    try {
      out = await runner.run(decodeTagged(encodeTagged(req)) as JobRequest, (p) => {
        if (mine !== ticket) return;
        stage.value = p.stage;
        fraction.value = p.fraction;
      });
    } catch (e) {
      out = { ok: false as const, error: { name: (e as Error)?.name ?? 'Error', message: String((e as Error)?.message ?? e) } };
    }
    if (mine !== ticket) return null;
    if (!out.ok || out.result.kind !== 'rg') {
      status.value = !out.ok && out.error.name === 'CancelledError' ? 'cancelled' : 'failed';
      error.value = out.ok ? { message: 'unexpected answer' } : out.error.hint ? { message: out.error.message, hint: out.error.hint } : { message: out.error.message };
      return null;
    }
    result.value = markRaw(Object.freeze(out.result));
    resultKey.value = k;
    status.value = 'done';
    if (evaluate) seconds.value = (performance.now() - started) / 1000;
    return out.result;
  }
  const generate = () => run(false);
  const compute = () => run(true);

  function cancel(): void {
    if (status.value !== 'running') return;
    ticket++;
    runner.cancel();
    status.value = 'cancelled';
    stage.value = '';
    fraction.value = null;
  }

  /** A counterterm entered by hand for a graph the engine could not evaluate (canonical notation). */
  function supply(notation: string, expression: string): void {
    supplied.value = [...supplied.value.filter((s) => s.notation !== notation), { notation, expression: expression.trim() }];
  }
  function removeSupplied(notation: string): void {
    supplied.value = supplied.value.filter((s) => s.notation !== notation);
  }

  /** Opens a generated graph in the editor (the existing graph when the project has it already). */
  function openGraph(g: RgGraphInfo): string {
    if (doc.theory.name !== theoryName.value) doc.setTheory(theoryName.value);
    const target = g.openNotation;
    const field = { defaultField: doc.theory.defaultField };
    const wanted = canonicalNotation(parseNotation(target), field);
    const existing = doc.graphs.find((x) => {
      try {
        return x.edges.length > 0 && canonicalNotation(toEngineGraph(x).graph, field) === wanted;
      } catch {
        return false;
      }
    });
    if (existing) {
      doc.selectGraph(existing.id);
      return existing.id;
    }
    const name = `${g.loops}-loop ${g.kind === 'vertex' ? 'vertex' : 'self-energy'}${g.insertionLine ? ` (φ² on line ${g.insertionLine})` : ''}`;
    return doc.newGraph(target, name);
  }

  return {
    theories, theoryName, loops, scheme, conventionChoice, status, stage, fraction, error, result, eps, symbolValues, supplied, seconds,
    theory, unsupported, settingsKey, current, beta, curve, missing,
    setTheory, generate, compute, cancel, supply, removeSupplied, openGraph,
  };
});

