export * from './graph-report.ts';
