export * from './doc-graph.ts';
export * from './edit-graph.ts';
export * from './validate-graph.ts';
export * from './tagged-json.ts';
export * from './project-file.ts';
export * from './jobs.ts';
export * from './ipc-contract.ts';
