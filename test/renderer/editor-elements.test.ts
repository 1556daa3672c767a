import cytoscape from 'cytoscape';
import { describe, expect, it } from 'vitest';
import { builtinTheory, parseNotation } from '../../src/core/index.ts';
import { fromEngineGraph, idSource } from '../../src/core/project/index.ts';
import { controlPoints, graphElements, LEG_END, legEnds } from '../../renderer/src/editor/elements.ts';
import { syncElements } from '../../renderer/src/editor/sync.ts';
import { canvasStyle } from '../../renderer/src/editor/style.ts';

const qed = builtinTheory('qed');
const graph = (n: string) => fromEngineGraph(parseNotation(n), 'g', idSource());

describe('canvas elements', () => {
  it('draws each field by its convention: arrowed fermions, wavy photons', () => {
    const els = graphElements(graph('1>2 2>3 1-3 / >1 3> 2'), qed);
    const edges = els.filter((e) => e.group === 'edges');
    expect(edges.filter((e) => String(e.classes).includes('line-arrow')).length).toBe(4); // 2 lines + 2 fermion legs
    expect(edges.filter((e) => String(e.classes).includes('line-wavy')).length).toBe(2);
    expect(edges.filter((e) => String(e.classes).includes('oriented')).length).toBe(4);
  });

  it('parallel lines bow apart symmetrically, loops turn around the vertex', () => {
    const els = graphElements(graph('1-2 1-2 1-2 3-3 / 1 2'), builtinTheory('phi4'));
    const bows = els.filter((e) => e.data.kind === 'line' && e.data.cpd).map((e) => (e.data.cpd as number[])[0]);
    expect(bows).toEqual([-56, 0, 56]);
    expect(els.find((e) => String(e.classes).includes('loop'))?.data.loopDirection).toBe('0deg');
  });

  it('a wave is a zigzag of control points around the bow, clear of the ends', () => {
    const { distances, weights } = controlPoints('wavy', 0, 150);
    expect(distances.length).toBeGreaterThan(8);
    expect(distances.every((d) => Math.abs(Math.abs(d) - 6) < 1e-9)).toBe(true);
    expect(Math.min(...weights)).toBeGreaterThan(0.05);
    expect(Math.max(...weights)).toBeLessThan(0.95);
  });

  it('legs point away from the rest of the graph and are numbered in order', () => {
    const g = graph('1-2 1-2 / 1 1 2 2');
    const ends = legEnds(g);
    const v1 = g.vertices[0]!.position;
    for (const l of g.legs.slice(0, 2)) expect(ends.get(l.id)!.x).toBeLessThan(v1.x);
    const labels = graphElements(g, builtinTheory('phi4')).filter((e) => e.data.kind === 'leg-end').map((e) => e.data.label);
    expect(labels).toEqual(['1', '2', '3', '4']);
  });

  it('syncs into headless Cytoscape, touching only what changed', () => {
    const cy = cytoscape({ headless: true, styleEnabled: true, style: canvasStyle() });
    const phi4 = builtinTheory('phi4');
    const g = graph('1-2 1-2 / 1 1 2 2');
    syncElements(cy, graphElements(g, phi4));
    expect(cy.nodes().length).toBe(2 + 4);
    expect(cy.edges().length).toBe(2 + 4);
    const kept = cy.getElementById(g.vertices[0]!.id);
    const g2 = { ...g, legs: g.legs.slice(1) };
    syncElements(cy, graphElements(g2, phi4, { invalid: new Set([g.vertices[0]!.id]) }));
    expect(cy.getElementById(g.vertices[0]!.id)).toBe(kept);
    expect(kept.hasClass('invalid')).toBe(true);
    expect(cy.getElementById(`${g.legs[0]!.id}${LEG_END}`).empty()).toBe(true);
    expect(cy.edges().length).toBe(2 + 3);
    cy.destroy();
  });
});
