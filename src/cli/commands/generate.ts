import { InputError } from '../../core/errors.ts';
import { generateGraphs, type GeneratedGraph } from '../../core/generate/index.ts';
import { groupFactor, hasGroupFactors } from '../../core/group/index.ts';
import type { Theory } from '../../core/theory/types.ts';
import { flag, hasFlag, intFlag, requireFlag } from '../args.ts';
import { EXIT, type Command } from '../command.ts';
import { terminalProgress } from '../progress.ts';
import { resolveTheory } from '../inputs.ts';

const usage = `coppice generate --theory <name|file.json> --legs <n | fields> --loops L [--all] [--json] [--max-graphs N]

Every one-particle-irreducible graph with the given external legs (labelled 1..n in the order
given) and loop number, once per isomorphism class, with its symmetry factor S (the graph
carries 1/S) and, in theories with an internal symmetry, its group factor.

  --legs        a number n (n legs of the theory's default field) or the legs' field labels,
                comma-separated, e.g. phi,phi,phi,phi or psi,psibar,phi (a leg labelled psi
                brings the particle into the graph, psibar takes it out); --residue is the same
  --loops       loop number L
  --all         keep graphs with scaleless tadpole parts (self-loops, parts hanging at one
                vertex), which vanish in massless dimensional regularization; they are marked
  --max-graphs  refuse requests whose estimated number of graphs exceeds N (default 3000000)
  --json        {"theory", "legs", "loops", "all", "count", "weight": "<exact Σ 1/S>",
                 "graphs": [{"notation", "symmetryFactor", "groupFactor" (theories with a
                 tensor), "vanishes", "vertices"}]}
`;

/** `--legs 4` or `--legs phi,phi,phi,phi`. */
function readLegs(spec: string, theory: Theory): string[] {
  if (/^\d+$/.test(spec)) {
    const n = Number(spec);
    const f = theory.fields.find((x) => x.name === theory.defaultField)!;
    if (f.antiparticle) throw new InputError(`--legs ${spec}: the default field ${f.name} has an antiparticle, so say which legs are which`, undefined, `e.g. --legs ${f.name},${f.antiparticle}`);
    if (n > 64) throw new InputError(`--legs ${spec}: too many legs`);
    return Array<string>(n).fill(f.name);
  }
  return spec.split(',').map((s) => s.trim()).filter(Boolean);
}

const jsonCount = (x: bigint): number | string => (x <= BigInt(Number.MAX_SAFE_INTEGER) ? Number(x) : x.toString());

export const generateCommand: Command = {
  name: 'generate',
  summary: 'all 1PI graphs of a theory for given legs and loop number, with symmetry and group factors',
  usage,
  flags: { booleans: ['json', 'all'], values: ['theory', 'legs', 'residue', 'loops', 'max-graphs'] },
  run(args, io) {
    const theory = resolveTheory(flag(args, 'theory'), io);
    const legSpec = flag(args, 'legs') ?? flag(args, 'residue');
    if (legSpec === undefined) throw new InputError('missing --legs', undefined, 'e.g. --legs 4 or --legs phi,phi,phi,phi');
    const residue = readLegs(legSpec, theory);
    const loops = intFlag(args, 'loops', -1);
    if (loops < 0) requireFlag(args, 'loops', 'e.g. --loops 2');
    const all = hasFlag(args, 'all');
    const maxGraphs = intFlag(args, 'max-graphs', 3_000_000);
    const progress = terminalProgress(io, 'generating');
    const result = generateGraphs(theory, { residue, loops, all, limits: { maxGraphs }, cancel: io.cancel, ...(progress ? { progress } : {}) });
    const tensors = hasGroupFactors(theory);
    const factor = (g: GeneratedGraph) => (tensors ? groupFactor(theory, g.graph)!.text : undefined);
    const vertexText = (g: GeneratedGraph) =>
      g.vertexCounts.map((c, i) => ({ c, v: theory.vertices[i]! })).filter((x) => x.c > 0).map((x) => `${x.c}×(${x.v.fields.join(',')})`).join(' ');

    if (hasFlag(args, 'json')) {
      const graphs = result.graphs.map((g) => {
        io.cancel.throwIfCancelled();
        const gf = factor(g);
        return {
          notation: g.notation,
          symmetryFactor: jsonCount(g.symmetryFactor),
          ...(gf === undefined ? {} : { groupFactor: gf }),
          vanishes: g.vanishes,
          vertices: g.vertexCounts,
        };
      });
      io.out(JSON.stringify({ theory: theory.name, legs: residue, loops, all, count: graphs.length, weight: result.weight.toString(), graphs }) + '\n');
      return EXIT.ok;
    }
    const lines: string[] = [];
    const kept = all ? 'all 1PI graphs, scaleless tadpole parts included (marked "vanishes")' : '1PI graphs without scaleless tadpole parts (--all keeps them)';
    lines.push(`${theory.title}`);
    lines.push(`legs ${residue.map((f, i) => `${i + 1}:${f}`).join(' ')}   loops ${loops}   ${kept}`);
    lines.push(`${result.graphs.length} graph${result.graphs.length === 1 ? '' : 's'}, Σ 1/S = ${result.weight.toString()}`);
    const width = Math.max(1, ...result.graphs.map((g) => String(g.symmetryFactor).length));
    let group = '';
    for (const g of result.graphs) {
      const here = vertexText(g);
      if (theory.vertices.length > 1 && here !== group) {
        lines.push('', `  vertices ${here}`);
        group = here;
      }
      const gf = factor(g);
      lines.push(`  1/${String(g.symmetryFactor).padEnd(width)}  ${g.notation}${gf === undefined ? '' : `   group ${gf}`}${g.vanishes ? '   vanishes' : ''}`);
    }
    io.out(lines.join('\n') + '\n');
    return EXIT.ok;
  },
};
