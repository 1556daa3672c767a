import { canonicalForm, findIsomorphism } from '../../core/canon/index.ts';
import { InputError } from '../../core/errors.ts';
import type { Graph } from '../../core/graph/types.ts';
import { bindGraph } from '../../core/theory/bind-graph.ts';
import { flag, flagAll, hasFlag } from '../args.ts';
import { EXIT, type Command } from '../command.ts';
import { readGraph, resolveTheory } from '../inputs.ts';

const usage = `coppice iso [--theory <name|file.json>] --graph "<A>" --graph "<B>" [--unlabelled-legs] [--json]

Whether two graphs are isomorphic: exit 0 when they are, 1 when they are not.

  --theory            built-in theory (phi4, phi4-on, phi3, yukawa, qed) or a theory file; default phi4
  --graph             give it twice; compact notation, nickel:<index>, or @file
  --unlabelled-legs   legs of one field and direction may be exchanged (default: leg i goes to leg i)
  --json              {"isomorphic": bool, "mapping": {"vertices": {nameA: nameB}, "edges": [edge of B for
                      each edge of A, 0-based], "legs": [leg of B for each leg of A]} or null,
                      "canonical": [canonical notation of A, of B]}
`;

export const isoCommand: Command = {
  name: 'iso',
  summary: 'whether two graphs are isomorphic, and the mapping',
  usage,
  flags: { booleans: ['json', 'unlabelled-legs'], values: ['theory', 'graph'] },
  run(args, io) {
    const theory = resolveTheory(flag(args, 'theory') ?? 'phi4', io);
    const specs = flagAll(args, 'graph');
    if (specs.length !== 2) {
      throw new InputError(`coppice iso compares two graphs, but --graph was given ${specs.length} time${specs.length === 1 ? '' : 's'}`, undefined, 'e.g. --graph "1-2 1-2 / 1 1 2 2" --graph "b-a a-b / b b a a"');
    }
    const [a, b] = specs.map((s) => bindGraph(readGraph(s, io), theory).graph) as [Graph, Graph];
    const opts = { legs: hasFlag(args, 'unlabelled-legs') ? ('unlabelled' as const) : ('labelled' as const), defaultField: theory.defaultField, cancel: io.cancel };
    const iso = findIsomorphism(a, b, opts);
    const canonical = [canonicalForm(a, opts).notation, canonicalForm(b, opts).notation];
    if (hasFlag(args, 'json')) {
      const mapping = iso && {
        vertices: Object.fromEntries(iso.vertices.map((w, v) => [a.vertices[v]!.name, b.vertices[w]!.name])),
        edges: iso.edges,
        legs: iso.legs,
      };
      io.out(JSON.stringify({ isomorphic: iso !== null, mapping, canonical }) + '\n');
    } else if (iso) {
      const lines = ['isomorphic', `canonical ${canonical[0]}`, `vertices  ${iso.vertices.map((w, v) => `${a.vertices[v]!.name}→${b.vertices[w]!.name}`).join(' ')}`];
      if (a.edges.length) lines.push(`lines     ${iso.edges.map((j, i) => `${i + 1}→${j + 1}`).join(' ')}   (numbered from 1 in input order)`);
      if (opts.legs === 'unlabelled' && a.legs.length) lines.push(`legs      ${iso.legs.map((j, i) => `${i + 1}→${j + 1}`).join(' ')}`);
      io.out(lines.join('\n') + '\n');
    } else {
      io.out(`not isomorphic\ncanonical A ${canonical[0]}\ncanonical B ${canonical[1]}\n`);
    }
    return iso ? EXIT.ok : EXIT.checkFailed;
  },
};
