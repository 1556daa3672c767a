import { toNickel } from '../../core/canon/nickel-index.ts';
import { printNotation } from '../../core/graph/notation-print.ts';
import { graphReportToJSON, inspectGraph, type GraphReport } from '../../core/inspect/graph-report.ts';
import { bindGraph, type BoundGraph } from '../../core/theory/bind-graph.ts';
import { flag, hasFlag, intFlag } from '../args.ts';
import { EXIT, type Command } from '../command.ts';
import { readGraph, resolveTheory } from '../inputs.ts';

const usage = `coppice inspect --theory <name|file.json> --graph "<notation>" [--json]

Power counting, divergent subgraphs, overlaps and forest counts of one graph.

  --theory    built-in theory (phi4, phi4-on, phi3, yukawa, qed) or a theory file
  --graph     the graph in compact notation, e.g. "1-2 1-2 / 1 1 2 2"; @file reads it from a file
  --json      machine-readable output (stable shape)
  --nickel    also give the graph's Nickel index (φ⁴-type graphs: one self-conjugate field)
  --max-vertex-subsets, --max-forest-search-steps   raise the work limits
`;

export const inspectCommand: Command = {
  name: 'inspect',
  summary: 'power counting, divergent subgraphs and forests of a graph',
  usage,
  flags: { booleans: ['json', 'nickel'], values: ['theory', 'graph', 'max-vertex-subsets', 'max-forest-search-steps'] },
  run(args, io) {
    const theory = resolveTheory(flag(args, 'theory'), io);
    const graph = readGraph(flag(args, 'graph'), io);
    const bg = bindGraph(graph, theory);
    const limits = {
      ...(args.flags.has('max-vertex-subsets') ? { maxVertexSubsets: intFlag(args, 'max-vertex-subsets', 0) } : {}),
      ...(args.flags.has('max-forest-search-steps') ? { maxForestSearchSteps: intFlag(args, 'max-forest-search-steps', 0) } : {}),
    };
    const report = inspectGraph(bg, { limits, cancel: io.cancel });
    if (hasFlag(args, 'json')) {
      const json = graphReportToJSON(report);
      for (const extra of inspectExtensions) Object.assign(json, extra(bg, report));
      if (hasFlag(args, 'nickel')) Object.assign(json, { nickel: toNickel(bg.graph).index });
      io.out(JSON.stringify(json) + '\n');
    } else {
      io.out(humanReport(bg, report) + (hasFlag(args, 'nickel') ? `nickel    ${toNickel(bg.graph).index}\n` : ''));
    }
    return EXIT.ok;
  },
};

/** Later modules (canonical form, symmetry factor) add fields to the JSON here. */
export const inspectExtensions: ((bg: BoundGraph, r: GraphReport) => Record<string, unknown>)[] = [];

function humanReport(bg: BoundGraph, r: GraphReport): string {
  const t = bg.theory;
  const lines: string[] = [];
  const res = (x: readonly string[]) => (x.length ? x.join(' ') : 'none (vacuum)');
  lines.push(`graph     ${printNotation(bg.graph, { defaultField: t.defaultField })}   [theory ${t.name}, D0 = ${t.dimension}]`);
  lines.push(`size      ${r.loops} loop${r.loops === 1 ? '' : 's'}, ${r.vertices} vertices, ${r.edges} lines, ${r.legs} legs; ${r.onePI ? '1PI' : 'not 1PI'}`);
  lines.push(`counting  ω = ${r.omega} (${r.divergent ? (r.omega === 0 ? 'logarithmically divergent' : `divergent, degree ${r.omega}`) : r.loops === 0 ? 'tree' : 'superficially convergent'}), residue ${res(r.residue)}`);
  lines.push('');
  if (r.divergentSubgraphs.length === 0) lines.push('no proper divergent subgraphs (primitive)');
  else {
    lines.push(`proper divergent subgraphs: ${r.divergentSubgraphs.length}`);
    r.divergentSubgraphs.forEach((s, i) => {
      lines.push(`  #${i}  lines ${s.edgeList.map((e) => e + 1).join(',').padEnd(14)} L=${s.loops}  ω=${s.omega}  residue ${res(s.residue)}`);
    });
  }
  if (r.overlapping.length) lines.push(`overlapping pairs: ${r.overlapping.map(([i, j]) => `#${i}/#${j}`).join(' ')}`);
  lines.push(`forests: ${r.forests.proper} of proper subgraphs (empty one included), ${r.forests.maximal} maximal`);
  if (r.warnings.length) {
    lines.push('');
    for (const w of r.warnings) lines.push(`warning: ${w}`);
  }
  lines.push('(lines are numbered from 1 in input order here; JSON uses 0-based indices)');
  return lines.join('\n') + '\n';
}
