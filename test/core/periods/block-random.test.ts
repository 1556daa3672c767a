import { describe, expect, it } from 'vitest';
import { blockGenerator, Xoshiro128 } from '../../../src/core/periods/block-random.ts';

describe('block-seeded xoshiro128**', () => {
  it('follows the reference xoshiro128** steps from state (1, 2, 3, 4)', () => {
    // The reference algorithm (Blackman & Vigna, arXiv:1805.01407) stepped by hand from s = {1, 2, 3, 4}:
    // rotl(2·5, 7)·9 = 11520; then s1 = 0, so 0; then s1 = 1029: rotl(5145, 7)·9 = 5927040.
    const r = new Xoshiro128(1, 2, 3, 4);
    expect([r.nextUint32(), r.nextUint32(), r.nextUint32()]).toEqual([11520, 0, 5927040]);
  });

  it('a block stream depends only on (seed, block)', () => {
    const draw = (seed: number, block: number) => {
      const g = blockGenerator(seed, block);
      return Array.from({ length: 5 }, () => g.uniform());
    };
    expect(draw(7, 3)).toEqual(draw(7, 3));
    expect(draw(7, 3)).not.toEqual(draw(7, 4));
    expect(draw(7, 3)).not.toEqual(draw(8, 3));
    expect(draw(2 ** 40, 0)).not.toEqual(draw(0, 0));
  });

  it('uniform() stays in the open interval (0, 1) and has mean 1/2, variance 1/12', () => {
    const g = blockGenerator(1, 0);
    let s = 0;
    let s2 = 0;
    const n = 200_000;
    for (let i = 0; i < n; i++) {
      const u = g.uniform();
      expect(u > 0 && u < 1).toBe(true);
      s += u;
      s2 += u * u;
    }
    expect(Math.abs(s / n - 0.5)).toBeLessThan(4 * Math.sqrt(1 / 12 / n));
    expect(Math.abs(s2 / n - (s / n) ** 2 - 1 / 12)).toBeLessThan(2e-3);
  });
});
