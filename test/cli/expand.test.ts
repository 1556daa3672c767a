import { execFileSync, spawnSync } from 'node:child_process';
import { describe, expect, it } from 'vitest';
import { cli } from '../helpers/cli.ts';

const G11 = 'Gamma(eps)*Gamma(1-eps)^2/Gamma(2-2*eps)*exp(euler_gamma*eps)';

describe('coppice expand', () => {
  it('--json: every power from the leading pole through n, in order, zeros as "0"', async () => {
    const r = await cli('expand', G11, '--order', '2', '--json');
    expect(r.code).toBe(0);
    expect(r.out).toBe('{"series":{"-1":"1","0":"2","1":"4 - 1/12*pi^2","2":"8 - 1/6*pi^2 - 7/3*zeta(3)"},"order":2}\n');
    const z = JSON.parse((await cli('expand', 'eps^-2 + eps', '--order', '1', '--json')).out);
    expect(z).toEqual({ series: { '-2': '1', '-1': '0', '0': '0', '1': '1' }, order: 1 });
    expect(JSON.parse((await cli('expand', '0', '--json')).out)).toEqual({ series: { '0': '0' }, order: 0 });
  });

  it('marks approximate coefficients', async () => {
    const r = await cli('expand', '1.234(5)/eps + 1', '--json');
    expect(JSON.parse(r.out).approximate).toEqual(['-1']);
    const h = await cli('expand', '1.234(5)/eps + 1');
    expect(h.out).toMatch(/approximate coefficients \(the rest are exact\): eps\^-1/);
  });

  it('prints one line per power for humans, and LaTeX on request', async () => {
    const r = await cli('expand', G11, '--order', '1');
    expect(r.out.split('\n')).toContain('  eps^-1:  1    (≈ 1)');
    expect((await cli('expand', 'Gamma(1+eps)', '--order', '1', '--latex')).out).toBe('1 - \\gamma_E\\,\\varepsilon + \\mathcal{O}(\\varepsilon^{2})\n');
  });

  it('refuses orders above 40 with exit 3, naming the limit', async () => {
    const r = await cli('expand', '1', '--order', '41');
    expect(r.code).toBe(3);
    expect(r.err).toMatch(/maxOrder = 40/);
  });

  it('bad expressions exit 2 with one line naming the position', async () => {
    const r = await cli('expand', '1 + * eps');
    expect(r.code).toBe(2);
    expect(r.err).toMatch(/at character 5/);
    expect(r.err.trim().split('\n')).toHaveLength(1);
    expect((await cli('expand', '1/(1+N)')).code).toBe(2);
    expect((await cli('expand')).code).toBe(2);
    expect((await cli('expand', '1', '--order', 'x')).code).toBe(2);
  });

  it('works through the built binary', () => {
    execFileSync('node', ['scripts/build-cli.mjs']);
    const ok = spawnSync('node', ['bin/coppice.mjs', 'expand', 'Gamma(1+eps)*Gamma(1-eps)', '--order', '4', '--json'], { encoding: 'utf8' });
    expect(ok.status).toBe(0);
    expect(JSON.parse(ok.stdout)).toEqual({ series: { '0': '1', '1': '0', '2': '1/6*pi^2', '3': '0', '4': '7/360*pi^4' }, order: 4 });
    const bad = spawnSync('node', ['bin/coppice.mjs', 'expand', '1', '--order', '99'], { encoding: 'utf8' });
    expect(bad.status).toBe(3);
  });
});
