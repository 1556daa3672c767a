/**
 * The one typed job contract (DESIGN §1): a request names the job and carries plain data;
 * a runner answers with a result or an error, reporting progress on the way. The renderer
 * runs jobs in a Web Worker, tests run them in-process through `runJob` directly.
 */
import { CoppiceError } from '../errors.ts';
import { parseNotation } from '../graph/notation-parse.ts';
import { graphReportToJSON, inspectGraph } from '../inspect/graph-report.ts';
import { bindGraph } from '../theory/bind-graph.ts';
import { parseTheory } from '../theory/parse-theory.ts';
import type { Theory } from '../theory/types.ts';
import { neverCancel, type CancelToken } from '../util/cancel.ts';
import { runRg, type RgJob, type RgResult } from './rg-job.ts';
import { runForestPage, runLatex, runStructure, type ForestPageJob, type ForestPageResult, type LatexJob, type LatexResult, type StructureJob, type StructureResult } from './structure-job.ts';

import { runPeriod, runValues, type PeriodJob, type PeriodResult, type ValuesJob, type ValuesResult } from './values-job.ts';

export type * from './structure-job.ts';
export type * from './values-job.ts';
export type * from './rg-job.ts';

/** Power counting and divergent subgraphs of one graph (what `coppice inspect` reports). */
export interface InspectJob {
  readonly kind: 'inspect';
  readonly theory: Theory;
  readonly notation: string;
}

export type JobRequest = InspectJob | StructureJob | ForestPageJob | LatexJob | ValuesJob | PeriodJob | RgJob;

/** `coppice inspect --json`'s stable shape (counts beyond 2^53 − 1 as decimal strings). */
export interface InspectSummary {
  readonly loops: number;
  readonly vertices: number;
  readonly edges: number;
  readonly legs: number;
  readonly onePI: boolean;
  readonly omega: number;
  readonly residue: readonly string[];
  readonly divergent: boolean;
  readonly divergentSubgraphs: readonly { edges: number[]; loops: number; omega: number; residue: string[] }[];
  readonly overlapping: readonly [number, number][];
  readonly forests: { readonly proper: number | string; readonly maximal: number | string };
  readonly warnings: readonly string[];
}

export interface InspectResult {
  readonly kind: 'inspect';
  readonly summary: InspectSummary;
}

export type JobResult = InspectResult | StructureResult | ForestPageResult | LatexResult | ValuesResult | PeriodResult | RgResult;

export type JobOutcome =
  | { readonly ok: true; readonly result: JobResult }
  | { readonly ok: false; readonly error: { readonly name: string; readonly message: string; readonly hint?: string } };

export interface JobProgress {
  /** 0..1, or null when the job cannot say. */
  readonly fraction: number | null;
  readonly stage: string;
}

export interface JobContext {
  readonly cancel?: CancelToken;
  readonly progress?: (p: JobProgress) => void;
}

/** Runs a job in the current thread. Never throws: errors come back as `{ ok: false }`. */
export function runJob(req: JobRequest, ctx: JobContext = {}): JobOutcome {
  const cancel = ctx.cancel ?? neverCancel;
  try {
    switch (req.kind) {
      case 'inspect': {
        ctx.progress?.({ fraction: 0, stage: 'binding the graph to its theory' });
        const theory = parseTheory(req.theory, `theory ${req.theory.name}`);
        const bound = bindGraph(parseNotation(req.notation), theory);
        ctx.progress?.({ fraction: 0.2, stage: 'divergent subgraphs and forests' });
        const report = inspectGraph(bound, { cancel });
        ctx.progress?.({ fraction: 1, stage: 'done' });
        return { ok: true, result: { kind: 'inspect', summary: { ...(graphReportToJSON(report) as unknown as InspectSummary), divergent: report.divergent } } };
      }
      case 'structure':
        return { ok: true, result: runStructure(req, cancel, (fraction, stage) => ctx.progress?.({ fraction, stage })) };
      case 'forest-page':
        return { ok: true, result: runForestPage(req, cancel) };
      case 'latex':
        return { ok: true, result: runLatex(req) };
      case 'values':
        return { ok: true, result: runValues(req, cancel, (fraction, stage) => ctx.progress?.({ fraction, stage })) };
      case 'period':
        return { ok: true, result: runPeriod(req, cancel, (fraction, stage) => ctx.progress?.({ fraction, stage })) };
      case 'rg':
        return { ok: true, result: runRg(req, cancel, (fraction, stage) => ctx.progress?.({ fraction, stage })) };
    }
  } catch (e) {
    if (e instanceof CoppiceError) return { ok: false, error: e.hint ? { name: e.name, message: e.message, hint: e.hint } : { name: e.name, message: e.message } };
    return { ok: false, error: { name: 'Error', message: String((e as Error)?.message ?? e) } };
  }
}

/** What a job runner offers (worker, worker thread or in-process). */
export interface JobRunner {
  run(req: JobRequest, onProgress?: (p: JobProgress) => void): Promise<JobOutcome>;
  /** Stops the running job: cooperatively if possible, by termination otherwise. */
  cancel(): void;
}
