export * from './types.ts';
export * from './conventions.ts';
export * from './parse-theory.ts';
export * from './bind-graph.ts';
export * from './power-counting.ts';
export * from './builtin/index.ts';
