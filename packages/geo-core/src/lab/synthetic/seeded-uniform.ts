/**
 * mulberry32, a small well-mixed 32-bit PRNG, so a seed always draws the same
 * noise (Ettinger, T. (2017), public-domain reference implementation).
 *
 * @param seed any integer; only its low 32 bits count.
 * @returns a function giving uniform numbers in [0, 1).
 * @example seededUniform(1)() // 0.6270739405881613
 */
export function seededUniform(seed: number): () => number {
  let state = seed >>> 0;
  return () => {
    state = (state + 0x6d2b79f5) >>> 0;
    let t = state;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}
