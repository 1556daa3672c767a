/**
 * Shared pieces of the reliability fuzzers: the seed, the case count, the "only our own error
 * classes" check with a per-case time bound, and grammar-aware string builders that mix valid
 * fragments with junk so random inputs reach deep into the parsers.
 */
import fc from 'fast-check';
import { CoppiceError } from '../../src/core/errors.ts';

/** One fixed seed for every fuzzer (override with COPPICE_FUZZ_SEED to explore). */
export const SEED = Number(process.env.COPPICE_FUZZ_SEED ?? 20_240_613);
/** Cases per parser: at least 10⁴ (the requirement); COPPICE_FUZZ_RUNS raises it. */
export const RUNS = Math.max(10_000, Number(process.env.COPPICE_FUZZ_RUNS ?? 10_000));
/** Longest time one case may take before it counts as a hang. */
export const CASE_MS = Number(process.env.COPPICE_FUZZ_CASE_MS ?? 1000);

/** What a case did: succeeded, or threw one of our error classes (named). */
export type Outcome = { ok: true } | { ok: false; error: CoppiceError };

/**
 * Runs one case; passes if it returns or throws a CoppiceError, fails (by throwing an
 * assertion error carrying the input) on any other exception — RangeError from a stack
 * overflow and TypeError included — or when the case takes longer than `CASE_MS`.
 */
export function onlyCoppiceErrors(input: unknown, f: () => unknown, caseMs = CASE_MS): Outcome {
  const t0 = performance.now();
  let outcome: Outcome;
  try {
    f();
    outcome = { ok: true };
  } catch (e) {
    if (!(e instanceof CoppiceError)) {
      const what = e instanceof Error ? `${e.name}: ${e.message}` : String(e);
      throw new Error(`non-Coppice error ${what} for input ${preview(input)}`, { cause: e });
    }
    outcome = { ok: false, error: e };
  }
  const ms = performance.now() - t0;
  if (ms > caseMs) throw new Error(`case took ${ms.toFixed(0)} ms (more than ${caseMs}) for input ${preview(input)}`);
  return outcome;
}

/** The same for an async case. */
export async function onlyCoppiceErrorsAsync(input: unknown, f: () => Promise<unknown>, caseMs = CASE_MS): Promise<Outcome> {
  const t0 = performance.now();
  let outcome: Outcome;
  try {
    await f();
    outcome = { ok: true };
  } catch (e) {
    if (!(e instanceof CoppiceError)) {
      const what = e instanceof Error ? `${e.name}: ${e.message}` : String(e);
      throw new Error(`non-Coppice error ${what} for input ${preview(input)}`, { cause: e });
    }
    outcome = { ok: false, error: e };
  }
  const ms = performance.now() - t0;
  if (ms > caseMs) throw new Error(`case took ${ms.toFixed(0)} ms (more than ${caseMs}) for input ${preview(input)}`);
  return outcome;
}

export function preview(x: unknown): string {
  let s: string;
  try {
    s = typeof x === 'string' ? JSON.stringify(x) : JSON.stringify(x, (_k, v: unknown) => (typeof v === 'bigint' ? `${v}n` : v));
  } catch {
    s = String(x);
  }
  s ??= String(x);
  return s.length > 300 ? `${s.slice(0, 300)}… (${s.length} chars)` : s;
}

/** Junk: any code points (lone surrogates, NUL, controls, emoji), short. */
export const junk = fc.string({ unit: 'binary', maxLength: 12 });

/**
 * A token soup: a list of tokens drawn mostly from `valid` fragments, sometimes from junk
 * and punctuation, joined by random separators.
 */
export function soup(valid: fc.Arbitrary<string>, opts: { maxTokens?: number; separators?: readonly string[] } = {}): fc.Arbitrary<string> {
  const separators = opts.separators ?? [' ', ' ', ' ', '', '  ', '\t', '\n'];
  const token = fc.oneof({ weight: 8, arbitrary: valid }, { weight: 1, arbitrary: junk }, { weight: 1, arbitrary: fc.constantFrom('(', ')', '{', '}', '|', '/', ':', ',', ';', '-', '>', '<', '=', '"', '\\', '\u0000', '\uD800', 'é', '٣') });
  return fc
    .array(fc.tuple(token, fc.constantFrom(...separators)), { maxLength: opts.maxTokens ?? 14 })
    .map((parts) => parts.map(([t, s]) => t + s).join(''));
}

/** Mutates a valid string: deletes, duplicates or inserts characters at random places. */
export function mutate(valid: fc.Arbitrary<string>, alphabet: string): fc.Arbitrary<string> {
  const edit = fc.tuple(fc.nat(), fc.constantFrom('delete', 'insert', 'duplicate', 'swap'), fc.constantFrom(...alphabet));
  return fc.tuple(valid, fc.array(edit, { minLength: 1, maxLength: 4 })).map(([s, edits]) => {
    let t = s;
    for (const [at, kind, ch] of edits) {
      const i = t.length ? at % (t.length + 1) : 0;
      if (kind === 'delete') t = t.slice(0, i) + t.slice(i + 1);
      else if (kind === 'insert') t = t.slice(0, i) + ch + t.slice(i);
      else if (kind === 'duplicate') t = t.slice(0, i) + t.slice(i, i + 3) + t.slice(i);
      else if (i + 1 < t.length) t = t.slice(0, i) + t[i + 1] + t[i] + t.slice(i + 2);
    }
    return t;
  });
}

/** fast-check parameters shared by every fuzzer. */
export function params(numRuns = RUNS): { seed: number; numRuns: number; endOnFailure: true } {
  return { seed: SEED, numRuns, endOnFailure: true };
}
