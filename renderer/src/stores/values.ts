/**
 * The Values panel: the active graph's counterterm in a chosen scheme (a worker job with progress
 * and cancel), values entered by hand (for the graph's class or a named subgraph) that flow into
 * the evaluation, and — for primitive graphs — the period estimate whose −P/(Lε) is then used as
 * the graph's counterterm. Results are frozen and kept out of Vue's deep reactivity.
 */
import { defineStore } from 'pinia';
import { computed, markRaw, ref, shallowRef } from 'vue';
import { CoppiceError, printNotation } from '../../../src/core/index.ts';
import {
  decodeTagged, encodeTagged, parseSupplied,
  type JobOutcome, type JobRequest, type PeriodResult, type SeriesInfo, type SuppliedValue, type ValuesResult,
} from '../../../src/core/project/index.ts';
import type { SchemeName } from '../../../src/core/schemes/scheme.ts';
import { useDocumentStore } from './document.ts';
import { createJobRunner } from './jobs.ts';

export const SCHEME_CHOICES: readonly { id: SchemeName; label: string }[] = [
  { id: 'ms', label: 'MS' },
  { id: 'msbar', label: 'MS-bar' },
  { id: 'g', label: 'G-scheme' },
  { id: 'mom', label: 'momentum subtraction' },
];

export const PERIOD_SAMPLES: readonly number[] = [20_000, 100_000, 1_000_000, 10_000_000];

export type ValuesStatus = 'idle' | 'running' | 'done' | 'failed' | 'cancelled';

export interface SuppliedEntry extends SuppliedValue {
  readonly id: number;
  /** How the panel names the target: Γ or γ₁ … (at the time it was entered). */
  readonly label: string;
}

/** How far a period's −P/(Lε) lies from the exact simple pole, in standard errors. */
export function periodAgreement(period: PeriodResult, exact: SeriesInfo | null): { exact: number; sigmas: number } | null {
  if (!exact || !exact.exact) return null;
  const simple = exact.terms.find((t) => t.power === -1);
  if (!simple || simple.value === undefined || exact.terms.some((t) => t.power < -1)) return null;
  return { exact: simple.value, sigmas: Math.abs(period.counterterm.approx - simple.value) / period.counterterm.error };
}

export const useValuesStore = defineStore('values', () => {
  const doc = useDocumentStore();
  const runner = createJobRunner();

  const scheme = ref<SchemeName>('msbar');
  const status = ref<ValuesStatus>('idle');
  const stage = ref('');
  const fraction = ref<number | null>(null);
  const error = shallowRef<{ message: string; hint?: string } | null>(null);
  const result = shallowRef<ValuesResult | null>(null);
  const key = ref<string | null>(null);
  const supplied = shallowRef<readonly SuppliedEntry[]>([]);
  const supplyError = ref<string | null>(null);
  const samples = ref(100_000);
  const period = shallowRef<PeriodResult | null>(null);
  const periodKey = ref<string | null>(null);
  const periodStatus = ref<ValuesStatus>('idle');
  const periodError = ref<string | null>(null);
  /** The graph's exact counterterm before a period replaced it (for the comparison). */
  const exactBeforePeriod = shallowRef<SeriesInfo | null>(null);
  let nextId = 1;
  let ticket = 0;

  const notation = computed(() => {
    const v = doc.validation;
    if (!v || !v.ok || !doc.activeGraph?.vertices.length) return null;
    return printNotation(v.view.graph);
  });
  const graphKey = computed(() => (notation.value ? `${doc.theory.name}\n${notation.value}` : null));
  const requestKey = computed(() => (graphKey.value ? `${graphKey.value}\n${scheme.value}\n${JSON.stringify(supplied.value.map((s) => [s.notation, s.expression]))}` : null));
  /** The result, when it answers the current graph, scheme and values entered. */
  const current = computed(() => (result.value && key.value === requestKey.value ? result.value : null));
  /** A result for this graph under other settings (shown dimmed until evaluated again). */
  const stale = computed(() => (result.value && key.value !== requestKey.value && key.value?.startsWith(`${graphKey.value}\n`) ? result.value : null));
  const currentPeriod = computed(() => (period.value && periodKey.value === graphKey.value ? period.value : null));
  const busy = computed(() => status.value === 'running' || periodStatus.value === 'running');
  const finite = computed(() => current.value?.checks.find((c) => c.id === 'finite') ?? null);
  const agreement = computed(() => (currentPeriod.value ? periodAgreement(currentPeriod.value, current.value?.suppliedForGraph ? exactBeforePeriod.value : (current.value?.counterterm ?? null)) : null));

  const plain = (req: JobRequest) => decodeTagged(encodeTagged(req)) as JobRequest;
  async function run(req: JobRequest): Promise<JobOutcome> {
    try {
      return await runner.run(plain(req), (p) => {
        stage.value = p.stage;
        fraction.value = p.fraction;
      });
    } catch (e) {
      return { ok: false, error: { name: (e as Error)?.name ?? 'Error', message: String((e as Error)?.message ?? e) } };
    }
  }

  async function evaluate(): Promise<ValuesResult | null> {
    const n = notation.value;
    const k = requestKey.value;
    if (!n || !k) return null;
    if (busy.value) cancel();
    const mine = ++ticket;
    status.value = 'running';
    stage.value = 'starting';
    fraction.value = 0;
    error.value = null;
    const out = await run({ kind: 'values', theory: doc.theory, notation: n, scheme: scheme.value, supplied: supplied.value.map(({ notation: sn, expression, note }) => ({ notation: sn, expression, ...(note ? { note } : {}) })) });
    if (mine !== ticket) return null;
    if (!out.ok || out.result.kind !== 'values') {
      status.value = !out.ok && out.error.name === 'CancelledError' ? 'cancelled' : 'failed';
      error.value = out.ok ? { message: 'unexpected answer' } : out.error.hint ? { message: out.error.message, hint: out.error.hint } : { message: out.error.message };
      return null;
    }
    result.value = markRaw(Object.freeze(out.result));
    key.value = k;
    status.value = 'done';
    if (!out.result.suppliedForGraph && out.result.counterterm?.exact) exactBeforePeriod.value = out.result.counterterm;
    return out.result;
  }

  function cancel(): void {
    if (!busy.value) return;
    ticket++;
    runner.cancel();
    if (status.value === 'running') status.value = 'cancelled';
    if (periodStatus.value === 'running') periodStatus.value = 'cancelled';
    stage.value = '';
    fraction.value = null;
  }

  /** Enters a value by hand for a graph class (checked here first); re-evaluates. Returns the error, or null. */
  function supply(target: string, expression: string, label: string, note?: string): string | null {
    try {
      parseSupplied(expression);
    } catch (e) {
      supplyError.value = e instanceof CoppiceError ? `${e.message}${e.hint ? ` — ${e.hint}` : ''}` : String((e as Error).message ?? e);
      return supplyError.value;
    }
    supplyError.value = null;
    const entry: SuppliedEntry = { id: nextId++, notation: target, expression: expression.trim(), label, ...(note ? { note } : {}) };
    supplied.value = [...supplied.value.filter((s) => s.notation !== target), entry];
    if (notation.value) void evaluate();
    return null;
  }
  function removeSupplied(id: number): void {
    supplied.value = supplied.value.filter((s) => s.id !== id);
    if (notation.value && (result.value || stale.value)) void evaluate();
  }

  /** The period of the (primitive) graph in the worker; its −P/(Lε) then becomes the graph's counterterm. */
  async function computePeriod(): Promise<PeriodResult | null> {
    const n = notation.value;
    const gk = graphKey.value;
    if (!n || !gk) return null;
    if (busy.value) cancel();
    const mine = ++ticket;
    periodStatus.value = 'running';
    periodError.value = null;
    stage.value = 'starting';
    fraction.value = 0;
    const out = await run({ kind: 'period', theory: doc.theory, notation: n, samples: samples.value, seed: 1 });
    if (mine !== ticket) return null;
    if (!out.ok || out.result.kind !== 'period') {
      periodStatus.value = !out.ok && out.error.name === 'CancelledError' ? 'cancelled' : 'failed';
      periodError.value = out.ok ? 'unexpected answer' : `${out.error.message}${out.error.hint ? ` — ${out.error.hint}` : ''}`;
      return null;
    }
    period.value = markRaw(Object.freeze(out.result));
    periodKey.value = gk;
    periodStatus.value = 'done';
    const p = out.result;
    supply(n, p.expression, 'Γ', `period estimate: −P/(Lε) with P = ${p.value.toPrecision(6)} ± ${p.error.toPrecision(2)} (${p.samples.toLocaleString('en-US')} samples, approximate)`);
    return p;
  }

  return {
    scheme, status, stage, fraction, error, result, key, supplied, supplyError, samples, period, periodStatus, periodError, exactBeforePeriod,
    notation, graphKey, requestKey, current, stale, currentPeriod, busy, finite, agreement,
    evaluate, cancel, supply, removeSupplied, computePeriod,
  };
});
