/**
 * The pseudo-random numbers of the sampler: xoshiro128** (Blackman & Vigna, "Scrambled linear
 * pseudorandom number generators", ACM TOMS 47 (2021), arXiv:1805.01407), 32-bit arithmetic
 * only, so it is fast and identical on every JavaScript engine.
 *
 * Reproducibility whatever the number of workers: samples are drawn in blocks of fixed size and
 * block k gets its own generator seeded from (seed, k) through a splitmix-style hash, so a
 * block's samples depend on nothing but the seed and the block index.
 */
export class Xoshiro128 {
  private s0: number;
  private s1: number;
  private s2: number;
  private s3: number;

  constructor(s0: number, s1: number, s2: number, s3: number) {
    this.s0 = s0 | 0;
    this.s1 = s1 | 0;
    this.s2 = s2 | 0;
    this.s3 = s3 | 0;
    if ((this.s0 | this.s1 | this.s2 | this.s3) === 0) this.s0 = 1; // the all-zero state is a fixed point
  }

  /** Next 32-bit output, as an unsigned integer. */
  nextUint32(): number {
    const result = Math.imul(rotl(Math.imul(this.s1, 5), 7), 9);
    const t = this.s1 << 9;
    this.s2 ^= this.s0;
    this.s3 ^= this.s1;
    this.s1 ^= this.s2;
    this.s0 ^= this.s3;
    this.s2 ^= t;
    this.s3 = rotl(this.s3, 11);
    return result >>> 0;
  }

  /** Uniform in the open interval (0, 1), with 53 random bits (never exactly 0 or 1). */
  uniform(): number {
    const hi = this.nextUint32() >>> 5; // 27 bits
    const lo = this.nextUint32() >>> 6; // 26 bits
    return (hi * 67108864 + lo + 0.5) / 9007199254740992;
  }
}

function rotl(x: number, k: number): number {
  return (x << k) | (x >>> (32 - k));
}

/** Murmur3's 32-bit finalizer: a bijective avalanche mix. */
function mix32(x: number): number {
  x ^= x >>> 16;
  x = Math.imul(x, 0x85ebca6b);
  x ^= x >>> 13;
  x = Math.imul(x, 0xc2b2ae35);
  x ^= x >>> 16;
  return x >>> 0;
}

/**
 * The generator of block `block` for a user seed (a non-negative integer below 2^53).
 * Distinct (seed, block) pairs give unrelated streams.
 */
export function blockGenerator(seed: number, block: number): Xoshiro128 {
  const lo = seed >>> 0;
  const hi = Math.floor(seed / 4294967296) >>> 0;
  const b = block >>> 0;
  const bh = Math.floor(block / 4294967296) >>> 0;
  // Four independent hash chains over all the input words: a 128-bit state, so distinct
  // (seed, block) pairs practically never share a stream.
  const words: number[] = [];
  for (let i = 0; i < 4; i++) {
    const c = Math.imul(0x9e3779b9, i + 1);
    let x = mix32(lo ^ c);
    x = mix32(x ^ hi ^ 0x7f4a7c15);
    x = mix32(x ^ b ^ Math.imul(0x85a308d3, i + 1));
    x = mix32(x ^ bh ^ 0x2545f491);
    words.push(mix32(x + c));
  }
  const rng = new Xoshiro128(words[0]!, words[1]!, words[2]!, words[3]!);
  for (let i = 0; i < 8; i++) rng.nextUint32(); // decorrelate nearby seeds
  return rng;
}
