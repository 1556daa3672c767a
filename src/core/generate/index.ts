export { generateGraphs, type GenerateLimits, type GenerateOptions, type GeneratedGraph, type GenerationResult } from './generate-graphs.ts';
export { hasScalelessPart } from './scaleless-parts.ts';
// Group factors live in src/core/group; re-exported here so the engine entry needs one line.
export * from '../group/index.ts';
