/**
 * The engine's public surface. Renderer and CLI import from here (or from a module's index).
 */
export * from './errors.ts';
export * from './util/cancel.ts';
export * from './graph/index.ts';
export * from './theory/index.ts';
export * from './subgraphs/index.ts';
export * from './inspect/index.ts';
export * from './periods/index.ts';
export * from './canon/index.ts';
export * from './hopf/index.ts';
export * from './export/index.ts';
export * from './generate/index.ts';
export * from './rg/index.ts';
