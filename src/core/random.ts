/**
 * Seeded pseudo-random generator: xoshiro128** 1.1 (32-bit state, 32-bit output),
 * seeded through splitmix32 so that nearby seeds give unrelated streams.
 * Source: D. Blackman and S. Vigna, "Scrambled linear pseudorandom number generators",
 * ACM Trans. Math. Softw. 47(4), 2021; reference code at prng.di.unimi.it.
 * Only 32-bit integer operations (Math.imul, >>>), so a seed gives the same stream,
 * bit for bit, in every JavaScript engine. Returns floats in [0, 1) with 32 bits of resolution.
 * @example randomSource(1)() // => 0.09156953264027834 (first draw for seed 1; pinned in test/core/random.test.ts)
 */
export function randomSource(seed: number): () => number {
  if (!Number.isInteger(seed)) throw new Error(`invalid seed: ${seed}`);
  let z = seed >>> 0;
  const splitmix32 = (): number => {
    z = (z + 0x9e3779b9) | 0; // golden-ratio increment, as in splitmix
    let t = z ^ (z >>> 16);
    t = Math.imul(t, 0x21f0aaad);
    t ^= t >>> 15;
    t = Math.imul(t, 0x735a2d97);
    return (t ^ (t >>> 15)) >>> 0;
  };
  let a = splitmix32();
  let b = splitmix32();
  let c = splitmix32();
  let d = splitmix32();
  if ((a | b | c | d) === 0) a = 1; // the all-zero state is a fixed point
  return () => {
    const result = Math.imul(rotl(Math.imul(b, 5), 7), 9) >>> 0;
    const t = b << 9;
    c ^= a;
    d ^= b;
    b ^= c;
    a ^= d;
    c ^= t;
    d = rotl(d, 11);
    return result / 4294967296;
  };
}

function rotl(x: number, k: number): number {
  return (x << k) | (x >>> (32 - k));
}

/** Fisher–Yates shuffle of 0..n-1 driven by `random` (Knuth, TAOCP vol. 2, Algorithm P). O(n). */
export function shuffledOrder(n: number, random: () => number): Uint32Array {
  const order = new Uint32Array(n);
  for (let i = 0; i < n; ++i) order[i] = i;
  for (let i = n - 1; i > 0; --i) {
    const j = Math.floor(random() * (i + 1));
    const t = order[i]!;
    order[i] = order[j]!;
    order[j] = t;
  }
  return order;
}
