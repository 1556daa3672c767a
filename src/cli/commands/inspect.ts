import type { Command } from '../command.ts';
// placeholder replaced below in this session
export const inspectCommand: Command = { name: 'inspect', summary: 'power counting, divergent subgraphs and forests of a graph', usage: 'coppice inspect', flags: { booleans: ['json'], values: ['theory', 'graph'] }, run: () => 0 };
