import cytoscape from 'cytoscape';
import type { BenchCase } from '../bench-case.ts';
import { graphElements } from '../../renderer/src/editor/elements.ts';
import { syncElements } from '../../renderer/src/editor/sync.ts';
import { canvasStyle } from '../../renderer/src/editor/style.ts';
import { parseNotation } from '../../src/core/graph/notation-parse.ts';
import { addEdge, addVertex, deleteElements, moveVertices } from '../../src/core/project/edit-graph.ts';
import { fromEngineGraph, idSource, type DocGraph } from '../../src/core/project/doc-graph.ts';
import { validateGraph } from '../../src/core/project/validate-graph.ts';
import { builtinTheory } from '../../src/core/theory/builtin/index.ts';

const phi4 = builtinTheory('phi4');

/** A 60-vertex 4-regular φ⁴ graph: a ring with chords to the next-but-one vertex (120 lines). */
export function ringWithChords(n = 60): string {
  const lines: string[] = [];
  for (let i = 0; i < n; i++) lines.push(`${i + 1}-${((i + 1) % n) + 1}`, `${i + 1}-${((i + 2) % n) + 1}`);
  return `${lines.join(' ')} /`;
}
const NOTATION = ringWithChords();

/**
 * The editor's work without pixels (issue 10's benchmark; the drawn canvas is timed in the
 * end-to-end test): Cytoscape (headless, with the stylesheet) gets the 60-vertex graph's
 * elements and lays them out; then 100 edits (add, join, move, delete), each validated and
 * synced into the canvas as the editor does on every change.
 */
export const cases: BenchCase[] = [
  {
    name: 'editor: elements and force layout of a 60-vertex graph (headless Cytoscape)',
    run() {
      const g = fromEngineGraph(parseNotation(NOTATION), 'ring', idSource());
      const cy = cytoscape({ headless: true, styleEnabled: true, style: canvasStyle() });
      syncElements(cy, graphElements(g, phi4));
      cy.elements().layout({ name: 'cose', animate: false, randomize: false, fit: false, nodeRepulsion: () => 60_000, idealEdgeLength: () => 110 } as cytoscape.LayoutOptions).run();
      cy.destroy();
    },
  },
  {
    name: 'editor: 100 edits of a 60-vertex graph, each validated and synced (per edit)',
    perRun: 100,
    run() {
      const ids = idSource();
      let g: DocGraph = fromEngineGraph(parseNotation(NOTATION), 'ring', ids);
      const cy = cytoscape({ headless: true, styleEnabled: true, style: canvasStyle() });
      syncElements(cy, graphElements(g, phi4));
      const choice = { field: null, oriented: false };
      let lastVertex = g.vertices[0]!.id;
      for (let k = 0; k < 100; k++) {
        switch (k % 4) {
          case 0: {
            const r = addVertex(g, ids, { x: 40 * k, y: 300 });
            g = r.graph;
            lastVertex = r.id;
            break;
          }
          case 1:
            g = addEdge(g, ids, lastVertex, g.vertices[k % 60]!.id, choice).graph;
            break;
          case 2:
            g = moveVertices(g, new Map([[g.vertices[k % 60]!.id, { x: k, y: -k }]]));
            break;
          case 3:
            g = deleteElements(g, [g.edges.at(-1)!.id]);
            break;
        }
        const v = validateGraph(g, phi4);
        const invalid = new Set(v.ok ? [] : v.issues.map((i) => i.element));
        syncElements(cy, graphElements(g, phi4, { invalid }));
      }
      cy.destroy();
    },
  },
];
