import { describe, expect, it } from 'vitest';
import { cli } from '../helpers/cli.ts';

describe('coppice iso', () => {
  it('isomorphic graphs: exit 0 and the mapping of vertices and edges', async () => {
    const r = await cli('iso', '--theory', 'phi4', '--graph', '1-2 1-2 2-3 2-3 / 1 1 3 3', '--graph', 'b-c a-b c-b b-a / a a c c', '--json');
    expect(r.code).toBe(0);
    const j = JSON.parse(r.out);
    expect(j.isomorphic).toBe(true);
    expect(j.mapping.vertices).toEqual({ 1: 'a', 2: 'b', 3: 'c' });
    // Edges 0,1 (1-2) go to B's a-b lines (1 and 3), edges 2,3 (2-3) to B's b-c lines (0 and 2).
    expect([...j.mapping.edges.slice(0, 2)].sort()).toEqual([1, 3]);
    expect([...j.mapping.edges.slice(2)].sort()).toEqual([0, 2]);
    expect(j.canonical[0]).toBe(j.canonical[1]);
  });

  it('not isomorphic: exit 1, mapping null (s- and t-channel bubbles with labelled legs)', async () => {
    const r = await cli('iso', '--graph', '1-2 1-2 / 1 1 2 2', '--graph', '1-2 1-2 / 1 2 1 2', '--json');
    expect(r.code).toBe(1);
    expect(JSON.parse(r.out)).toMatchObject({ isomorphic: false, mapping: null });
  });

  it('--unlabelled-legs identifies them, and maps legs too', async () => {
    const r = await cli('iso', '--graph', '1-2 1-2 / 1 1 2 2', '--graph', '1-2 1-2 / 1 2 1 2', '--unlabelled-legs', '--json');
    expect(r.code).toBe(0);
    const j = JSON.parse(r.out);
    expect(j.isomorphic).toBe(true);
    expect([...j.mapping.legs].sort()).toEqual([0, 1, 2, 3]);
  });

  it('respects fermion arrows (QED) and accepts the Nickel index as input', async () => {
    const same = await cli('iso', '--theory', 'qed', '--graph', '1>2:psi 2>1:psi 1-2 /', '--graph', '2>1:psi 2>1:psibar 2-1:A /');
    expect(same.code).toBe(0);
    expect(same.out).toMatch(/^isomorphic/);
    const nickel = await cli('iso', '--graph', 'nickel:e111|e|', '--graph', '1-2 2-1 1-2 / 2 1', '--json');
    expect(nickel.code).toBe(0);
  });

  it('human output for different graphs shows both canonical forms', async () => {
    const r = await cli('iso', '--graph', '1-2 1-2 1-2 / 1 2', '--graph', '1-1 1-2 2-2 / 1 2');
    expect(r.code).toBe(1);
    expect(r.out).toMatch(/not isomorphic\ncanonical A 1-2 1-2 1-2 \/ 1 2\ncanonical B /);
  });

  it('bad input is exit 2: one graph only, a malformed Nickel index, a graph outside the theory', async () => {
    expect((await cli('iso', '--graph', '1-2 / 1 2')).code).toBe(2);
    const bad = await cli('iso', '--graph', 'nickel:e1x|', '--graph', '1-1 / 1 1');
    expect(bad.code).toBe(2);
    expect(bad.err).toMatch(/Nickel index.*character 3/);
    expect((await cli('iso', '--theory', 'phi3', '--graph', '1-2 1-2 / 1 1 2 2', '--graph', '1-2 1-2 / 1 1 2 2')).code).toBe(2);
  });
});

describe('coppice inspect: canonical form, symmetry factor, Nickel index', () => {
  it('adds "symmetryFactor" and "canonical" to the JSON (sunset: S = 6, a textbook value; see REFERENCES.md)', async () => {
    const r = await cli('inspect', '--theory', 'phi4', '--graph', 'b-a a-b b-a / b a', '--json');
    expect(r.code).toBe(0);
    const j = JSON.parse(r.out);
    expect(j.symmetryFactor).toBe(6);
    expect(j.canonical).toBe('1-2 1-2 1-2 / 1 2');
    expect(j).not.toHaveProperty('nickel');
  });

  it('--nickel adds "nickel" to the JSON and a line to the human output', async () => {
    const j = JSON.parse((await cli('inspect', '--theory', 'phi4', '--graph', '1-2 1-2 2-3 2-3 / 1 1 3 3', '--json', '--nickel')).out);
    expect(j.nickel).toBe('ee11|22|ee|');
    expect(j.symmetryFactor).toBe(4);
    const human = await cli('inspect', '--theory', 'phi4', '--graph', 'nickel:ee0|', '--nickel');
    expect(human.code).toBe(0);
    expect(human.out).toMatch(/\nnickel {4}ee0\|\n/);
  });

  it('--nickel on a graph outside its scope (QED) is bad input, exit 2', async () => {
    const r = await cli('inspect', '--theory', 'qed', '--graph', '1>2:psi 2>1:psi / 1 2', '--nickel');
    expect(r.code).toBe(2);
    expect(r.err).toMatch(/Nickel index/);
  });
});
