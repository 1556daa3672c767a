import { canonicalNotation } from '../../core/canon/canonical-form.ts';
import { unlabelledLegsClassifier } from '../../core/hopf/default-classifier.ts';
import { HopfAlgebra } from '../../core/hopf/hopf-algebra.ts';
import { bindGraph } from '../../core/theory/bind-graph.ts';
import { flag, hasFlag } from '../args.ts';
import { EXIT, type Command } from '../command.ts';
import { readGraph, resolveTheory } from '../inputs.ts';
import { latexHooks } from '../latex-hooks.ts';

const usage = `coppice coproduct --theory <name|file.json> --graph "<notation>" [--json] [--latex]

The Connes–Kreimer coproduct Δ(Γ) = Γ⊗1 + 1⊗Γ + Σ γ⊗Γ/γ over the proper admissible subgraphs γ
(for a superficially convergent graph: the coaction, without Γ⊗1). Terms are collected by the
isomorphism class of the pair (γ, Γ/γ), external legs unlabelled.
`;

export const coproductCommand: Command = {
  name: 'coproduct',
  summary: 'Hopf-algebra coproduct of a graph: subgraphs γ ⊗ cographs Γ/γ with multiplicities',
  usage,
  flags: { booleans: ['json', 'latex'], values: ['theory', 'graph'] },
  run(args, io) {
    const theory = resolveTheory(flag(args, 'theory'), io);
    const bg = bindGraph(readGraph(flag(args, 'graph'), io), theory);
    const H = new HopfAlgebra(theory, unlabelledLegsClassifier);
    const a = H.analyze(bg);
    const show = (key: string) => canonicalNotation(H.representative(key).graph, { legs: 'unlabelled', defaultField: theory.defaultField });
    if (hasFlag(args, 'latex')) {
      io.out(latexHooks.coproduct(H, bg) + '\n');
      return EXIT.ok;
    }
    if (hasFlag(args, 'json')) {
      io.out(
        JSON.stringify({
          admissible: a.admissible.length,
          divergent: a.divergent,
          terms: a.terms.map((t) => ({
            subgraph: t.components.map((c) => [...c]),
            cograph: show(t.right),
            multiplicity: t.multiplicity,
            subgraphClasses: t.left.map(show),
          })),
        }) + '\n',
      );
      return EXIT.ok;
    }
    const lines = [`graph       ${show(H.classOf(bg))}   [theory ${theory.name}]`];
    lines.push(`${a.divergent ? 'coproduct' : 'coaction (superficially convergent: no Γ⊗1 term)'}: ${a.admissible.length} proper admissible subgraphs in ${a.terms.length} classes`);
    if (a.divergent) lines.push('  Γ ⊗ 1');
    lines.push('  1 ⊗ Γ');
    for (const t of a.terms) {
      const left = t.left.map((k) => `[${show(k)}]`).join(' ');
      lines.push(`  ${String(t.multiplicity).padStart(3)} × ${left} ⊗ [${show(t.right)}]    e.g. lines ${t.components.map((c) => c.map((e) => e + 1).join(',')).join(' | ')}`);
    }
    io.out(lines.join('\n') + '\n');
    return EXIT.ok;
  },
};
