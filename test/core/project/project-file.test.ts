import { describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import { builtinTheory, printNotation } from '../../../src/core/index.ts';
import { addEdge, addLeg, addVertex, deleteElements, fromEngineGraph, idSource, parseGraphLink, graphLink, ProjectFileError, readProject, resolveTheory, runJob, toEngineGraph, validateGraph, writeProject, decodeTagged, encodeTagged } from '../../../src/core/project/index.ts';
import { parseNotation } from '../../../src/core/index.ts';

const demo = (f: string) => readFileSync(new URL(`../../../assets/demo/${f}`, import.meta.url), 'utf8');

describe('project file', () => {
  it('reads the demo projects, and every demo graph is valid in its theory', () => {
    for (const f of ['phi4-course.coppice.json', 'qed-one-loop.coppice.json']) {
      const p = readProject(demo(f));
      const t = resolveTheory(p.theory);
      expect(p.graphs.length).toBeGreaterThan(3);
      for (const g of p.graphs) expect(validateGraph(g, t).ok, g.name).toBe(true);
    }
  });

  it('round-trips through write and read (names, notation, positions)', () => {
    const p = readProject(demo('phi4-course.coppice.json'));
    const again = readProject(writeProject(p));
    expect(again.name).toBe(p.name);
    expect(again.graphs.map((g) => [g.name, printNotation(toEngineGraph(g).graph), g.vertices.map((v) => v.position)])).toEqual(
      p.graphs.map((g) => [g.name, printNotation(toEngineGraph(g).graph), g.vertices.map((v) => v.position)]),
    );
  });

  it.each([
    ['not json', '{', ''],
    ['wrong format', '{"format":"x","version":1,"name":"a","theory":{"builtin":"phi4"},"graphs":[]}', 'format'],
    ['missing graphs', '{"format":"coppice-project","version":1,"name":"a","theory":{"builtin":"phi4"}}', 'graphs'],
    ['bad layout', '{"format":"coppice-project","version":1,"name":"a","theory":{"builtin":"phi4"},"graphs":[{"name":"g","notation":"/","layout":{"1":[0]}}]}', 'graphs[0].layout.1'],
    ['bad notation', '{"format":"coppice-project","version":1,"name":"a","theory":{"builtin":"phi4"},"graphs":[{"name":"g","notation":"1-"}]}', 'graphs[0].notation'],
    ['unknown theory', '{"format":"coppice-project","version":1,"name":"a","theory":{"builtin":"phi5"},"graphs":[]}', 'theory.builtin'],
    ['newer version', '{"format":"coppice-project","version":7,"name":"a","theory":{"builtin":"phi4"},"graphs":[]}', 'version'],
  ])('names the broken field: %s', (_what, text, field) => {
    try {
      readProject(text);
      expect.unreachable();
    } catch (e) {
      expect(e).toBeInstanceOf(ProjectFileError);
      expect((e as ProjectFileError).field).toBe(field);
    }
  });
});

describe('document graph', () => {
  const phi4 = builtinTheory('phi4');
  it('keeps ids stable: deleting a line renumbers nothing', () => {
    const ids = idSource();
    const g0 = fromEngineGraph(parseNotation('1-2 1-2 2-3 / 1 1 3 3'), 'g', ids);
    const ids0 = g0.edges.map((e) => e.id);
    const g1 = deleteElements(g0, [ids0[1]!]);
    expect(g1.edges.map((e) => e.id)).toEqual([ids0[0], ids0[2]]);
    expect(g1.vertices).toBe(g0.vertices);
  });
  it('reports every offending vertex with the engine message', () => {
    const ids = idSource();
    let g = fromEngineGraph(parseNotation('/'), 'g', ids);
    const a = addVertex(g, ids, { x: 0, y: 0 });
    const b = addVertex(a.graph, ids, { x: 100, y: 0 });
    g = addEdge(b.graph, ids, a.id, b.id, { field: 'phi', oriented: false }).graph;
    const v = validateGraph(g, phi4);
    expect(v.ok).toBe(false);
    if (v.ok) return;
    expect(v.issues.map((i) => i.element).sort()).toEqual([a.id, b.id].sort());
    expect(v.issues[0]!.message).toMatch(/not a vertex of theory phi4/);
    expect(v.issues[0]!.message).not.toMatch(/\(at /);
  });
  it('blames a wrong line and a wrong leg themselves', () => {
    const qed = builtinTheory('qed');
    const ids = idSource();
    let g = fromEngineGraph(parseNotation('1>2 2>1 / 1 2'), 'g', ids);
    g = addEdge(g, ids, g.vertices[0]!.id, g.vertices[1]!.id, { field: 'psi', oriented: false }).graph;
    g = addLeg(g, ids, g.vertices[0]!.id, { field: 'A', oriented: true }, 'in').graph;
    const v = validateGraph(g, qed);
    expect(v.ok).toBe(false);
    if (v.ok) return;
    expect(v.issues.find((i) => i.kind === 'edge')?.message).toMatch(/must be oriented/);
  });
});

describe('jobs, codec and links', () => {
  it('runs inspect in-process with the stable JSON shape', () => {
    const out = runJob({ kind: 'inspect', theory: builtinTheory('phi4'), notation: '1-2 1-2 / 1 1 2 2' });
    expect(out.ok && out.result.kind === 'inspect' && out.result.summary).toMatchObject({ loops: 1, omega: 0, divergent: true, residue: ['phi', 'phi', 'phi', 'phi'] });
  });
  it('returns errors instead of throwing', () => {
    const out = runJob({ kind: 'inspect', theory: builtinTheory('phi4'), notation: '1-2 / 1' });
    expect(out.ok).toBe(false);
  });
  it('tags BigInt losslessly', () => {
    const v = { n: 12345678901234567890n, s: 'x' };
    expect(decodeTagged(encodeTagged(v))).toEqual(v);
    expect(encodeTagged(v)).toContain('"$bigint":"12345678901234567890"');
  });
  it('parses and builds graph links', () => {
    const link = { notation: '1-2 1-2 / 1 1 2 2', theory: 'phi4', name: 'bubble' };
    expect(parseGraphLink(graphLink(link))).toEqual(link);
    expect(parseGraphLink('https://graph?notation=x')).toBeNull();
    expect(parseGraphLink('coppice://other?notation=x')).toBeNull();
    expect(parseGraphLink('coppice://graph?notation=1-2&theory=../../x')).toEqual({ notation: '1-2' });
  });
});
