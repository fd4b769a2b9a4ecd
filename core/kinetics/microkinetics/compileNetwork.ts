import type { MassActionNetwork, SpeciesCount } from './network.ts';
import type { JacobianFunction, RhsFunction } from './solverTypes.ts';

/** A network turned into index arrays, with its mass-action right-hand side and analytic Jacobian. */
export interface CompiledNetwork {
  /** Species count, plus one trailing component for the turnover tally when the network has one. */
  size: number;
  speciesCount: number;
  /** Index of the tally component (net extent of the turnover reaction, mol/L), or −1. */
  tallyIndex: number;
  rhs: RhsFunction;
  jacobian: JacobianFunction;
  /** Net change of every component per unit extent of each reaction (species, then the tally). */
  netChanges: Float64Array[];
  /** Net rate (forward − reverse, mol L⁻¹ s⁻¹) of reaction r at state y. */
  netRate: (r: number, y: Float64Array) => number;
}

interface Side { index: Int32Array; power: Int32Array }

function side(list: SpeciesCount[], position: Map<string, number>): Side {
  const index = list.map((s) => {
    const i = position.get(s.species);
    if (i === undefined) throw new Error(`compileNetwork: unknown species ${s.species}`);
    return i;
  });
  return { index: Int32Array.from(index), power: Int32Array.from(list.map((s) => s.count)) };
}

function rate(k: number, s: Side, y: Float64Array): number {
  let r = k;
  for (let a = 0; a < s.index.length; a++) r *= y[s.index[a]!]! ** s.power[a]!;
  return r;
}

/** ∂rate/∂y[s.index[a]]: the power rule on one factor, the others unchanged. */
function rateDerivative(k: number, s: Side, y: Float64Array, a: number): number {
  let r = k * s.power[a]! * y[s.index[a]!]! ** (s.power[a]! - 1);
  for (let b = 0; b < s.index.length; b++) if (b !== a) r *= y[s.index[b]!]! ** s.power[b]!;
  return r;
}

/**
 * Builds dc/dt = Σ_r ν_r (r_f − r_r) for a mass-action network, with ν_r the net change
 * (products − reactants) of each species, and its exact Jacobian from the power rule.
 * Throws only on a malformed network (programmer error): build networks with
 * `networkFromReactions` or `networkFromPathway`, which check user input.
 */
export function compileNetwork(network: MassActionNetwork): CompiledNetwork {
  const position = new Map(network.species.map((s, i) => [s, i] as const));
  const m = network.species.length;
  const tallyIndex = network.turnoverReaction === undefined ? -1 : m;
  const size = m + (tallyIndex >= 0 ? 1 : 0);
  const steps = network.reactions.map((reaction, r) => {
    const net = new Float64Array(size);
    for (const s of reaction.reactants) net[position.get(s.species) ?? 0]! -= s.count;
    for (const s of reaction.products) net[position.get(s.species) ?? 0]! += s.count;
    if (r === network.turnoverReaction) net[m] = 1;
    const rows = Int32Array.from([...net.keys()].filter((i) => net[i] !== 0));
    return { forward: side(reaction.reactants, position), reverse: side(reaction.products, position), kf: reaction.kf, kr: reaction.kr, net, rows };
  });
  const netRate = (r: number, y: Float64Array): number => {
    const st = steps[r]!;
    return rate(st.kf, st.forward, y) - rate(st.kr, st.reverse, y);
  };
  const rhs: RhsFunction = (y, dydt) => {
    dydt.fill(0);
    for (let r = 0; r < steps.length; r++) {
      const st = steps[r]!;
      const v = rate(st.kf, st.forward, y) - rate(st.kr, st.reverse, y);
      for (const i of st.rows) dydt[i]! += st.net[i]! * v;
    }
  };
  const jacobian: JacobianFunction = (y, out) => {
    for (const st of steps) {
      for (const [k, s, sign] of [[st.kf, st.forward, 1], [st.kr, st.reverse, -1]] as const) {
        if (k === 0) continue;
        for (let a = 0; a < s.index.length; a++) {
          const d = sign * rateDerivative(k, s, y, a);
          const col = s.index[a]!;
          for (const i of st.rows) out[i * size + col]! += st.net[i]! * d;
        }
      }
    }
  };
  return { size, speciesCount: m, tallyIndex, rhs, jacobian, netRate, netChanges: steps.map((st) => st.net) };
}
