/** `coppice rg`: the JSON contract of issue 8, human output, refusals, Ctrl-C. Values: ../shared/REFERENCES.md ([KSF] ch. 11). */
import { describe, expect, it } from 'vitest';
import { runCli } from '../../src/cli/run.ts';
import { cancelSource } from '../../src/core/util/cancel.ts';
import { cli } from '../helpers/cli.ts';

describe('coppice rg', () => {
  it('JSON shape: couplings, beta, gamma, gammaMass, conventions, graphs, notEvaluable, approximate (φ⁴, two loops)', async () => {
    const r = await cli('rg', '--theory', 'phi4', '--loops', '2', '--scheme', 'ms', '--json');
    expect(r.code).toBe(0);
    const j = JSON.parse(r.out);
    for (const k of ['couplings', 'beta', 'gamma', 'gammaMass', 'conventions', 'graphs', 'notEvaluable', 'approximate']) expect(j, k).toHaveProperty(k);
    expect(j.couplings).toEqual(['g']);
    // [KSF] ch. 11: β = −2εg + 3g² − (17/3)g³, γ_φ = g²/12, γ_{m²} = g − (5/6)g².
    expect(j.beta).toEqual({ g: { 'eps*g': '-2', 'g^2': '3', 'g^3': '-17/3' } });
    expect(j.gamma).toEqual({ phi: { 'g^2': '1/12' } });
    expect(j.gammaMass).toEqual({ g: '1', 'g^2': '-5/6' });
    expect(j.notEvaluable).toEqual([]);
    expect(j.approximate).toEqual([]);
    expect(typeof j.graphs).toBe('number');
    expect(j.conventions).toMatchObject({ dimension: 'D = 4 - 2*eps', scheme: 'ms' });
    expect(j.conventions.gammaPhi).toMatch(/1\/2/);
    expect(j.checks.rgConsistent).toBe(true);
  });
  it('O(N): values are canonical polynomials in N', async () => {
    const j = JSON.parse((await cli('rg', '--theory', 'phi4-on', '--loops', '2', '--scheme', 'msbar', '--json')).out);
    expect(j.beta.g).toEqual({ 'eps*g': '-2', 'g^2': '8/3 + 1/3*N', 'g^3': '-14/3 - N' });
    expect(j.gamma.phi).toEqual({ 'g^2': '1/18 + 1/36*N' });
    expect(j.gammaMass).toEqual({ g: '2/3 + 1/3*N', 'g^2': '-5/9 - 5/18*N' });
  });
  it('mom: the graphs refused at the exceptional point are named with reasons, their coefficients listed as incomplete', async () => {
    const r = await cli('rg', '--theory', 'phi4', '--loops', '1', '--scheme', 'mom', '--json');
    expect(r.code).toBe(0);
    const j = JSON.parse(r.out);
    expect(j.notEvaluable).toContain('1-2 1-2 / 1 1 2 2');
    expect(j.reasons['1-2 1-2 / 1 1 2 2']).toMatch(/infrared/);
    expect(j.beta.g).toEqual({ 'eps*g': '-2' });
    expect(j.incomplete.beta.g).toEqual(['g^2']);
  });
  it('human output: the three functions, the pole check and the conventions', async () => {
    const r = await cli('rg', '--theory', 'phi4', '--loops', '1');
    expect(r.code).toBe(0);
    expect(r.out).toMatch(/beta\(g\) += \(-2\)\*eps\*g \+ \(3\)\*g\^2/);
    expect(r.out).toMatch(/RG pole relations .*: hold/);
    expect(r.out).toMatch(/zDefinitions: phi_0 = Z_phi\^\{1\/2\} phi/);
  });
  it('Yukawa and QED are refused with the reason (fermion lines are outside the exact evaluator); missing --loops is bad input', async () => {
    for (const t of ['yukawa', 'qed']) {
      const r = await cli('rg', '--theory', t, '--loops', '1');
      expect(r.code).toBe(2);
      expect(r.err).toMatch(/fermion/);
    }
    expect((await cli('rg', '--theory', 'phi4')).code).toBe(2);
    expect((await cli('rg', '--theory', 'phi4', '--loops', '1', '--scheme', 'xx')).code).toBe(2);
  });
  it('--supply: a value for a graph, used and (when approximate) listed', async () => {
    const box = '1-2 1-2 / 1 2 1 2';
    const j = JSON.parse((await cli('rg', '--theory', 'phi4', '--loops', '1', '--scheme', 'ms', '--json', '--supply', `${box}=-1.0000(1)*eps^-1`)).out);
    expect(j.approximate).toEqual([box]);
    expect(j.beta.g['g^2']).toMatchObject({ approx: expect.any(Number), error: expect.any(Number) });
    expect(Math.abs(j.beta.g['g^2'].approx - 3)).toBeLessThan(1e-3);
  });
  it('Ctrl-C (a cancelled token) stops with exit 130', async () => {
    const cancel = cancelSource();
    cancel.cancel();
    let err = '';
    const code = await runCli(['rg', '--theory', 'phi4-on', '--loops', '3'], { out: () => {}, err: (t) => (err += t), readFile: () => '', cancel });
    expect(code).toBe(130);
    expect(err).toMatch(/interrupted/);
  });
});
