import { canonicalNotation } from '../../core/canon/canonical-form.ts';
import { countertermDiagrams } from '../../core/hopf/counterterm-diagrams.ts';
import { unlabelledLegsClassifier } from '../../core/hopf/default-classifier.ts';
import { buildFormulaTree, nodeName, unfoldedTermCount, unfoldFormulaTree } from '../../core/hopf/formula-tree.ts';
import { HopfAlgebra } from '../../core/hopf/hopf-algebra.ts';
import { jsonCount } from '../../core/inspect/graph-report.ts';
import { bindGraph } from '../../core/theory/bind-graph.ts';
import { flag, hasFlag, intFlag } from '../args.ts';
import { EXIT, type Command } from '../command.ts';
import { readGraph, resolveTheory } from '../inputs.ts';
import { latexHooks } from '../latex-hooks.ts';
import { runValues } from './counterterm-values.ts';

const usage = `coppice counterterm --theory <name|file.json> --scheme <ms|msbar|g|mom> --graph "<notation>" [--json] [--latex]
coppice counterterm --symbolic --theory <name|file.json> --graph "<notation>" [--json] [--latex]

Without --symbolic: the counterterm S_R(Γ) of the graph alone (no coupling, sign, symmetry or
group factor; for two-point graphs the coefficient of p²) as an exact Laurent series in ε, with
the renormalized value as a polynomial in ln(p²/μ²) and the checks: finiteness, locality,
routing independence and (minimal schemes) the renormalization-group pole relations.
Infrared-unsafe routings are made usable by the infrared R*; a two-point graph whose integral is
stuck goes through □_p (the method says so): then only the pole part is known, and the JSON has
"finite": null, "renormalized": null and "poleOnly" with the reason.
Schemes: ms (d^Dk/π^{D/2} per loop), msbar (× e^{γε} per loop), g (per-loop normalization
making the one-loop log-divergent propagator integral exactly 1/ε), mom (momentum subtraction).

The counterterm as a formula tree of the twisted antipode,
  S_R(Γ) = −R[ Γ + Σ_γ S_R(γ) Γ/γ ],
with a symbolic renormalization map R, unfolded into one term per forest (BPHZ forest formula),
and the marked counterterm diagrams of renormalized perturbation theory with their symmetry factors.

  --max-forest-terms   largest number of unfolded terms to list (default 2000; the tree is always given)
  --supply "<graph>=<expression>"   the counterterm of a graph class given by hand (exact, or approximate
                       like 1.2345(6)*eps^-1); used wherever that class appears; repeatable
`;

export const countertermCommand: Command = {
  name: 'counterterm',
  summary: 'counterterm of a graph: exact value in a scheme, or the formula tree and forest terms (--symbolic)',
  usage,
  flags: { booleans: ['json', 'latex', 'symbolic'], values: ['theory', 'graph', 'max-forest-terms', 'scheme', 'compare-routings', 'supply'] },
  run(args, io) {
    if (!hasFlag(args, 'symbolic')) return runValues(args, io);
    const theory = resolveTheory(flag(args, 'theory'), io);
    const bg = bindGraph(readGraph(flag(args, 'graph'), io), theory);
    const H = new HopfAlgebra(theory, unlabelledLegsClassifier);
    const a = H.analyze(bg);
    const tree = buildFormulaTree(bg, a.subgraphs, a.divergent);
    const count = unfoldedTermCount(tree);
    const maxTerms = intFlag(args, 'max-forest-terms', 2000);
    const terms = count <= BigInt(maxTerms) ? unfoldFormulaTree(tree, maxTerms) : null;
    const diagrams = countertermDiagrams(bg, a.subgraphs, a.admissible);
    if (hasFlag(args, 'latex')) {
      io.out(latexHooks.counterterm(H, bg, tree) + '\n');
      return EXIT.ok;
    }
    const names = (forest: readonly number[]) => forest.map((id) => nodeName(tree, id));
    if (hasFlag(args, 'json')) {
      io.out(
        JSON.stringify({
          graph: canonicalNotation(bg.graph, { defaultField: theory.defaultField }),
          divergent: a.divergent,
          subgraphs: a.subgraphs.map((s, i) => ({ name: `g${i}`, edges: [...s.edgeList], loops: s.loops, omega: s.omega, residue: [...s.residue] })),
          tree: {
            root: tree.root,
            nodes: tree.nodes.map((n) => ({ id: n.id, name: nodeName(tree, n.id), edges: [...n.edges], loops: n.loops, omega: n.omega, residue: [...n.residue], terms: n.terms.map((t) => ({ children: [...t.children] })) })),
          },
          forestTerms: jsonCount(count),
          terms: terms ? terms.map((t) => ({ forest: names(t.forest), sign: t.sign, expression: t.expression })) : null,
          countertermDiagrams: diagrams.map((d) => ({
            diagram: d.notation,
            insertions: d.insertions.map((x) => ({ residue: [...x.residue], structure: x.structure, loops: x.loops })),
            multiplicity: d.multiplicity,
            symmetryFactor: jsonCount(d.symmetryFactor),
          })),
        }) + '\n',
      );
      return EXIT.ok;
    }
    const lines = [`graph  ${canonicalNotation(bg.graph, { defaultField: theory.defaultField })}   [theory ${theory.name}; R symbolic]`];
    a.subgraphs.forEach((s, i) => lines.push(`  g${i} = lines ${s.edgeList.map((e) => e + 1).join(',')}  (L=${s.loops}, ω=${s.omega}, residue ${s.residue.join(' ')})`));
    lines.push('', `formula tree (${count} unfolded term${count === 1n ? '' : 's'}, one per forest):`);
    const seen = new Set<number>();
    const walk = (id: number, depth: number) => {
      const n = tree.nodes[id]!;
      const head = `${'  '.repeat(depth)}S_R(${nodeName(tree, id)}) = ${id === tree.root && !a.divergent ? '' : '−R['}${n.terms
        .map((t) => (t.children.length ? `${t.children.map((c) => `S_R(${nodeName(tree, c)})`).join(' ')} ${nodeName(tree, id)}/(${t.children.map((c) => nodeName(tree, c)).join(' ')})` : nodeName(tree, id)))
        .join(' + ')}${id === tree.root && !a.divergent ? '' : ']'}`;
      lines.push(head);
      for (const t of n.terms) for (const c of t.children) if (!seen.has(c)) {
        seen.add(c);
        walk(c, depth + 1);
      }
    };
    walk(tree.root, 1);
    if (terms) {
      lines.push('', 'forest terms:');
      for (const t of terms) lines.push(`  ${t.sign > 0 ? '+' : '−'}  {${names(t.forest).join(', ')}}   ${t.expression}`);
    } else lines.push('', `(${count} forest terms: more than --max-forest-terms ${maxTerms}, not listed)`);
    if (diagrams.length) {
      lines.push('', 'counterterm diagrams (marked vertices are counterterm insertions):');
      for (const d of diagrams) lines.push(`  ${String(d.multiplicity).padStart(3)} × ${d.notation}   1/S = 1/${d.symmetryFactor}   inserting ${d.insertions.map((x) => `δ(${x.residue.join(',')})${x.structure ? '·' + x.structure : ''} at ${x.loops} loop${x.loops === 1 ? '' : 's'}`).join(', ')}`);
    }
    io.out(lines.join('\n') + '\n');
    return EXIT.ok;
  },
};
