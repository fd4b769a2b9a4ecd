import { randomLcg, randomNormal } from 'd3';

/**
 * Standard normal deviates from a seeded generator: d3-random's linear congruential
 * generator (randomLcg) feeding its normal sampler (Marsaglia's polar method, SIAM Review 6,
 * 260 (1964), from memory). The same seed gives the same sequence on every platform.
 */
export function normalSampler(seed: number): () => number {
  return randomNormal.source(randomLcg(seed >>> 0))(0, 1);
}
