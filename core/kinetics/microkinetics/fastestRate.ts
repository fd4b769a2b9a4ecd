import type { MassActionNetwork } from './network.ts';

/** Largest pseudo-first-order rate k·c^(m−1) of the network at concentration scale c, s⁻¹. */
export function fastestRate(network: MassActionNetwork, scale: number): number {
  let fastest = 0;
  for (const r of network.reactions) {
    const order = (side: { count: number }[]): number => side.reduce((n, s) => n + s.count, 0);
    fastest = Math.max(fastest, r.kf * scale ** (order(r.reactants) - 1), r.kr * scale ** (Math.max(order(r.products), 1) - 1));
  }
  return fastest;
}
