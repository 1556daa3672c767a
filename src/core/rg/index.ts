/** Z-factors and renormalization-group functions of whole theories (DESIGN §7). */
export { GSeries } from './g-series.ts';
export { INSERTION_FIELD, insertionTheory, insertOnLines, type InsertedGraph } from './mass-insertion.ts';
export { collectGraphTerms, treeFactor, zWeight, type GraphTerm, type ZKind } from './graph-terms.ts';
export { rgFunctions, type RgSeries, type ZFactors } from './rg-functions.ts';
export { requireSupported, unsupportedReason } from './theory-support.ts';
export { computeRg, type NotEvaluableGraph, type RgComputation, type RgOptions } from './compute-rg.ts';
export { rgConventions } from './rg-conventions.ts';
export { rgReport, type RgCoefficients, type RgReport, type RgValue } from './rg-report.ts';
