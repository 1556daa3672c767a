export * from './limits.ts';
export * from './divergent-subgraphs.ts';
export * from './compatibility.ts';
export * from './count-forests.ts';
export * from './list-forests.ts';
