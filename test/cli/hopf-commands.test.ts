import { describe, expect, it } from 'vitest';
import { cli } from '../helpers/cli.ts';

describe('coppice coproduct', () => {
  it('JSON: multiplicities sum to the admissible count (massless theory)', async () => {
    const r = await cli('coproduct', '--theory', 'phi4', '--graph', '1-2 1-2 1-3 2-3 3-4 3-4 / 1 2 4 4', '--json');
    expect(r.code).toBe(0);
    const j = JSON.parse(r.out);
    expect(j.admissible).toBe(4); // g0, g1, g2, and g0·g1 (vertex-disjoint)
    expect(j.terms.reduce((s: number, t: { multiplicity: number }) => s + t.multiplicity, 0)).toBe(j.admissible);
    for (const t of j.terms) {
      expect(Array.isArray(t.subgraph) && t.subgraph.every(Array.isArray)).toBe(true);
      expect(typeof t.cograph).toBe('string');
    }
    expect(j.terms.find((t: { subgraph: number[][] }) => t.subgraph.length === 2).subgraph).toEqual([[0, 1], [4, 5]]);
  });
  it('sunset: one class, three times, the cograph a tadpole', async () => {
    const j = JSON.parse((await cli('coproduct', '--theory', 'phi4', '--graph', '1-2 1-2 1-2 / 1 2', '--json')).out);
    expect(j).toMatchObject({ admissible: 3, terms: [{ subgraph: [[0, 1]], cograph: '1-1 / 1 1', multiplicity: 3 }] });
  });
  it('bad input exits 2', async () => {
    expect((await cli('coproduct', '--theory', 'phi4', '--graph', '1-2 / 1 1')).code).toBe(2);
  });
});

describe('coppice counterterm --symbolic', () => {
  it('forestTerms equals the number of proper forests', async () => {
    const g = '1-2 1-2 1-3 2-3 3-4 3-4 / 1 2 4 4';
    const ct = JSON.parse((await cli('counterterm', '--symbolic', '--theory', 'phi4', '--graph', g, '--json')).out);
    const ins = JSON.parse((await cli('inspect', '--theory', 'phi4', '--graph', g, '--json')).out);
    expect(ct.forestTerms).toBe(ins.forests.proper);
    expect(ct.terms).toHaveLength(ct.forestTerms);
    expect(ct.tree.nodes[ct.tree.root].name).toBe('G');
    expect(ct.countertermDiagrams.reduce((s: number, d: { multiplicity: number }) => s + d.multiplicity, 0)).toBe(4);
  });
  it('without --symbolic gives the value (MS-bar by default)', async () => {
    const r = await cli('counterterm', '--theory', 'phi4', '--graph', '1-2 1-2 / 1 1 2 2', '--json');
    expect(r.code).toBe(0);
    expect(JSON.parse(r.out)).toMatchObject({ scheme: 'msbar', counterterm: { '-1': '-1' } });
  });
  it('human output shows the tree and the forest terms', async () => {
    const r = await cli('counterterm', '--symbolic', '--theory', 'qed', '--graph', '1>4 4>5 5>2 4-5 2>3 1-3 / >1 2 3>');
    expect(r.code).toBe(0);
    expect(r.out).toMatch(/S_R\(G\) = −R\[G \+ S_R\(g0\) G\/\(g0\)\]/);
    expect(r.out).toMatch(/pslash/);
  });
});
