import { isSubset } from '../graph/edge-set.ts';
import type { FormulaTree } from './formula-tree.ts';

/** A forest seen as a rooted tree of nested subgraphs (children: members maximal inside). */
export interface RootedTree {
  readonly node: number;
  readonly loops: number;
  readonly children: readonly RootedTree[];
}

/** The rooted tree of a forest that contains the tree's root graph. */
export function forestToRootedTree(tree: FormulaTree, forest: readonly number[]): RootedTree {
  const build = (id: number): RootedTree => {
    const inside = forest.filter((m) => m !== id && isSubset(tree.nodes[m]!.edgeSet, tree.nodes[id]!.edgeSet));
    const maximal = inside.filter((m) => !inside.some((o) => o !== m && isSubset(tree.nodes[m]!.edgeSet, tree.nodes[o]!.edgeSet)));
    return { node: id, loops: tree.nodes[id]!.loops, children: maximal.sort((a, b) => a - b).map(build) };
  };
  return build(tree.root);
}

/** The tree factorial t! = Π over nodes of the size of the subtree below (and including) it. */
export function treeFactorial(t: RootedTree): bigint {
  const walk = (x: RootedTree): [size: number, fact: bigint] => {
    let size = 1;
    let fact = 1n;
    for (const c of x.children) {
      const [s, f] = walk(c);
      size += s;
      fact *= f;
    }
    return [size, fact * BigInt(size)];
  };
  return walk(t)[1];
}

/** The loop-weighted tree factorial: Π over nodes of the loop number of that node's subgraph. */
export function loopWeightedTreeFactorial(t: RootedTree): bigint {
  let f = BigInt(t.loops);
  for (const c of t.children) f *= loopWeightedTreeFactorial(c);
  return f;
}

/** Bracket notation of a rooted tree, e.g. `G(g0 g2(g1))`. */
export function rootedTreeText(t: RootedTree, name: (node: number) => string): string {
  return t.children.length ? `${name(t.node)}(${t.children.map((c) => rootedTreeText(c, name)).join(' ')})` : name(t.node);
}
