import type { BenchCase } from '../bench-case.ts';
import { parseNotation } from '../../src/core/graph/notation-parse.ts';
import { bindGraph } from '../../src/core/theory/bind-graph.ts';
import { builtinTheory } from '../../src/core/theory/builtin/index.ts';
import { divergentSubgraphs } from '../../src/core/subgraphs/divergent-subgraphs.ts';
import { countForests, countMaximalForests } from '../../src/core/subgraphs/count-forests.ts';
import { fullEdgeSet } from '../../src/core/graph/edge-set.ts';

/** A chain of k one-loop bubbles (s-channel): every contiguous sub-chain is divergent, neighbours touch. */
function bubbleChain(k: number): string {
  const edges: string[] = [];
  for (let i = 1; i <= k; i++) edges.push(`${i}-${i + 1}`, `${i}-${i + 1}`);
  return `${edges.join(' ')} / 1 1 ${k + 1} ${k + 1}`;
}

/**
 * Nested vertex corrections: start from the bubble, then repeatedly join two legs on different
 * vertices to a new vertex that carries two new legs — each step wraps the previous graph in one
 * more loop, so G1 ⊂ G2 ⊂ … are nested divergent subgraphs (with overlapping bubbles besides).
 */
function nestedBubbles(loops: number): string {
  const edges = ['1-2', '1-2'];
  let legs = [1, 1, 2, 2];
  for (let v = 3; v <= loops + 1; v++) {
    const a = legs[0]!;
    const bIndex = legs.findIndex((x) => x !== a);
    const b = legs[bIndex]!;
    legs = legs.filter((_, i) => i !== 0 && i !== bIndex);
    edges.push(`${a}-${v}`, `${b}-${v}`);
    legs.push(v, v);
  }
  return `${edges.join(' ')} / ${legs.join(' ')}`;
}

/** The 4-regular circulant C_n(1,2) cut open at one vertex into a four-point graph (many overlapping divergences). */
function openCirculant(n: number): string {
  const edges: string[] = [];
  const legs: string[] = [];
  for (let i = 0; i < n; i++) for (const s of [1, 2]) {
    const j = (i + s) % n;
    if (i === 0 || j === 0) legs.push(String(i === 0 ? j + 1 : i + 1));
    else edges.push(`${i + 1}-${j + 1}`);
  }
  return `${edges.join(' ')} / ${legs.join(' ')}`;
}

const phi4 = builtinTheory('phi4');

function inspectCase(name: string, text: string): BenchCase {
  const bg = bindGraph(parseNotation(text), phi4);
  const E = bg.graph.edges.length;
  return {
    name: `${name} (${E} edges)`,
    targetMs: E <= 20 ? 50 : undefined,
    run() {
      const full = fullEdgeSet(E);
      const proper = divergentSubgraphs(bg).filter((s) => s.edges !== full);
      countForests(proper);
      countMaximalForests(proper);
    },
  };
}

export const cases: BenchCase[] = [
  inspectCase('subgraphs+forests: chain of 4 bubbles, 4 loops', bubbleChain(4)),
  inspectCase('subgraphs+forests: chain of 7 bubbles, 7 loops', bubbleChain(7)),
  inspectCase('subgraphs+forests: nested vertex corrections, 7 loops', nestedBubbles(7)),
  inspectCase('subgraphs+forests: nested vertex corrections, 10 loops', nestedBubbles(10)),
  inspectCase('subgraphs+forests: open circulant C8(1,2), 5 loops', openCirculant(8)),
  inspectCase('subgraphs+forests: open circulant C11(1,2), 8 loops', openCirculant(11)),
  inspectCase('subgraphs+forests: chain of 10 bubbles, 10 loops', bubbleChain(10)),
];
