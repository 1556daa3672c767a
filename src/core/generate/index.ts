export { generateGraphs, type GenerateLimits, type GenerateOptions, type GeneratedGraph, type GenerationResult } from './generate-graphs.ts';
export { hasScalelessPart } from './scaleless-parts.ts';
