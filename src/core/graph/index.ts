export * from './types.ts';
export * from './edge-set.ts';
export * from './connectivity.ts';
export * from './notation-parse.ts';
export * from './notation-print.ts';
export * from './contract.ts';
export * from './extract-subgraph.ts';
