import { describe, expect, it } from 'vitest';
import { TheoryError } from '../../../src/core/errors.ts';
import { parseNotation } from '../../../src/core/graph/notation-parse.ts';
import { bindGraph } from '../../../src/core/theory/bind-graph.ts';
import { builtinTheory, builtinTheoryNames } from '../../../src/core/theory/builtin/index.ts';
import { parseTheory } from '../../../src/core/theory/parse-theory.ts';

const bind = (theory: string, text: string) => bindGraph(parseNotation(text), builtinTheory(theory));
const errorOf = (f: () => unknown): TheoryError => {
  try {
    f();
  } catch (e) {
    if (e instanceof TheoryError) return e;
    throw e;
  }
  throw new Error('expected a TheoryError');
};

describe('graphs are checked against their theory', () => {
  it('knows the five built-in theories', () => {
    expect(builtinTheoryNames().sort()).toEqual(['phi3', 'phi4', 'phi4-on', 'qed', 'yukawa']);
  });

  it('wrong valence names the vertex', () => {
    const e = errorOf(() => bind('phi4', '1-2 1-2 / 1 1 2'));
    expect(e.where).toBe('vertex "2"');
    expect(e.message).toMatch(/\(phi,phi,phi\).*not a vertex of theory phi4/);
    expect(e.hint).toMatch(/join 4 lines/);
  });

  it('unknown field names the edge', () => {
    const e = errorOf(() => bind('phi4', '1-2:chi 1-2 / 1 1 2 2'));
    expect(e.where).toMatch(/^edge 1/);
    expect(e.hint).toMatch(/known fields: phi/);
  });

  it('fermion lines must be oriented', () => {
    const e = errorOf(() => bind('qed', '1-2:psi 1-2 / >1 2>'));
    expect(e.where).toMatch(/^edge 1/);
    expect(e.hint).toBe('write 1>2:psi');
  });

  it('inconsistent fermion arrows are caught at the vertex', () => {
    const e = errorOf(() => bind('qed', '1>2 2<1 1-2 / >1 2>'.replace('2<1', '1>2')));
    expect(e.where).toMatch(/^vertex "/);
    expect(e.hint).toMatch(/arrows/);
  });

  it('self-conjugate fields carry no arrow', () => {
    expect(errorOf(() => bind('phi4', '1>2 1-2 / 1 1 2 2')).where).toMatch(/^edge 1/);
  });

  it('an antiparticle-named edge is the particle running the other way', () => {
    const bg = bind('qed', '2>1:psibar 1-2 / >1 2>');
    // Vertex "2" is mentioned first, so it has index 0: psi runs from "1" (index 1) to "2" (index 0).
    expect(bg.graph.edges[0]).toEqual({ a: 1, b: 0, field: 'psi', oriented: true });
  });

  it('counterterm vertices must match their residue and need a structure when two-point', () => {
    expect(errorOf(() => bind('phi4', '1-c{phi,phi} c-2 1-2 / 1 1 2 2')).hint).toMatch(/c\{phi,phi;p2\}/);
    expect(errorOf(() => bind('phi4', '1-c{phi,phi,phi;p2} c-2 1-2 / 1 1 2 2')).message).toMatch(/residue says/);
    expect(errorOf(() => bind('phi4', '1-c{phi,phi;q3} c-2 1-2 / 1 1 2 2')).message).toMatch(/unknown counterterm structure/);
    expect(bind('qed', '1>c{psi,psibar;pslash} c>2 1-2 / >1 2>').vertexDerivatives[1]).toBe(1);
  });
});

describe('theory files', () => {
  const base = {
    name: 'mine',
    dimension: 4,
    fields: [{ name: 'phi', statistics: 'boson', propagatorWeight: 2, line: 'plain' }],
    vertices: [{ fields: ['phi', 'phi', 'phi', 'phi'], coupling: 'lambda', normalization: '1/24' }],
    couplings: [{ name: 'lambda' }],
  };
  it('accepts a minimal file and fills defaults', () => {
    const t = parseTheory(JSON.stringify(base));
    expect(t.defaultField).toBe('phi');
    expect(t.conventions.dimension).toBe('D0-2eps');
  });
  it('names the JSON path of a bad entry', () => {
    const bad = { ...base, vertices: [{ ...base.vertices[0], fields: ['phi', 'chi'] }] };
    expect(errorOf(() => parseTheory(bad, 'mine.json')).where).toBe('mine.json: vertices[0].fields[1]');
    expect(errorOf(() => parseTheory({ ...base, dimension: 'four' }, 'mine.json')).where).toBe('mine.json: dimension');
    expect(errorOf(() => parseTheory({ ...base, colour: 'red' }, 'mine.json')).message).toMatch(/colour|unrecognized/i);
  });
  it('rejects invalid JSON and fermions without antiparticles', () => {
    expect(() => parseTheory('{"name": ', 'x.json')).toThrow(TheoryError);
    const f = { ...base, fields: [{ name: 'chi', statistics: 'fermion', propagatorWeight: 1, line: 'arrow' }] };
    expect(errorOf(() => parseTheory(f)).hint).toMatch(/antiparticle/);
  });
  it('rejects vertices that do not conserve fermion number', () => {
    const t = {
      ...base,
      fields: [...base.fields, { name: 'psi', antiparticle: 'psibar', statistics: 'fermion', propagatorWeight: 1, line: 'arrow' }],
      vertices: [{ fields: ['psi', 'psi', 'phi'], coupling: 'lambda' }],
    };
    expect(errorOf(() => parseTheory(t)).message).toMatch(/conserve psi-number/);
  });
});
