import { describe, expect, it } from 'vitest';
import { cli } from '../helpers/cli.ts';

describe('coppice generate', () => {
  it('JSON shape of issue 8: count, exact weight Σ 1/S, graphs with notation, symmetryFactor, groupFactor', async () => {
    const r = await cli('generate', '--theory', 'phi4-on', '--legs', '4', '--loops', '1', '--json');
    expect(r.code).toBe(0);
    const j = JSON.parse(r.out);
    expect(j).toMatchObject({ theory: 'phi4-on', legs: ['phi', 'phi', 'phi', 'phi'], loops: 1, all: false, count: 3, weight: '3/2' });
    expect(j.graphs[0]).toEqual({ notation: '1-2 1-2 / 1 1 2 2', symmetryFactor: 2, groupFactor: '8/9 + 1/9*N', vanishes: false, vertices: [2] });
  });
  it('--all keeps and marks vanishing graphs; single-field theories have no groupFactor key', async () => {
    const j = JSON.parse((await cli('generate', '--theory', 'phi4', '--residue', 'phi,phi', '--loops', '2', '--all', '--json')).out);
    expect(j.count).toBe(2);
    expect(j.weight).toBe('5/12');
    expect(j.graphs.map((g: { vanishes: boolean }) => g.vanishes)).toEqual([false, true]);
    expect('groupFactor' in j.graphs[0]).toBe(false);
  });
  it('human output names the theory, the legs and Σ 1/S, and lists each graph with 1/S', async () => {
    const r = await cli('generate', '--theory', 'yukawa', '--legs', 'psi,psibar', '--loops', '1');
    expect(r.code).toBe(0);
    expect(r.out).toMatch(/Yukawa/);
    expect(r.out).toMatch(/1 graph, Σ 1\/S = 1/);
    expect(r.out).toMatch(/1\/1 +1-2 1>2:psi \/ >1:psi 2>:psi/);
  });
  it('refuses 12 loops with exit 3 naming the limit; bad legs exit 2', async () => {
    const r = await cli('generate', '--theory', 'phi4', '--legs', '4', '--loops', '12');
    expect(r.code).toBe(3);
    expect(r.err).toMatch(/maxGraphs/);
    expect((await cli('generate', '--theory', 'qed', '--legs', 'psi,chi', '--loops', '1')).code).toBe(2);
    expect((await cli('generate', '--theory', 'phi4', '--legs', '4')).code).toBe(2);
  });
});
