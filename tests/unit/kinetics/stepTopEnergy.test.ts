import { describe, expect, it } from 'vitest';
import { analyseSteps, cycleStates, stepTopEnergy } from '../../../core/kinetics/index.ts';
import { networkFromPathway } from '../../../core/kinetics/microkinetics/networkFromPathway.ts';
import { cycle, kcal, pathway, rel } from './build.ts';

const T = 298.15;
const KBT_H = 6.212437991620116e12; // REFERENCE.md §1/§2, k_BT/h at 298.15 K (CODATA 2018, exact)

describe('stepTopEnergy', () => {
  // Raising a TS below a minimum to that minimum (a barrierless step) is common practice.
  it('keeps a TS above both minima and raises one below either to the higher minimum', () => {
    expect(stepTopEnergy(0, 12, -3)).toBe(12);
    expect(stepTopEnergy(0, -1, -3)).toBe(0);
    expect(stepTopEnergy(-3, 1, 4)).toBe(4);
    expect(stepTopEnergy(5, 5, 2)).toBe(5);
  });

  it('stands at the higher minimum when a step has no TS', () => {
    expect(stepTopEnergy(-2, null, 3)).toBe(3);
    expect(stepTopEnergy(3, null, -2)).toBe(3);
  });

  it('step rates, energetic span input and microkinetics all pass over the same raised TS', () => {
    // TS1 at 4 kcal/mol lies below I2 at 6: the step I1 → I2 runs over 6, i.e. k₊ = (k_BT/h)·e^(−6 kcal/mol / RT).
    const energies = [0, 4, 6, 14, -1];
    const { steps } = analyseSteps(cycle(energies), { temperatureK: T });
    const { states } = cycleStates(cycle(energies));
    const net = networkFromPathway(cycle(energies), { temperatureK: T });
    if (!net.ok) throw new Error('fixture');
    const expected = KBT_H * Math.exp(-kcal(6) / (8.31446261815324 * T)); // REFERENCE.md §1, R = N_A·k_B (CODATA 2018, exact)
    expect(rel(steps[0]!.kForward!, expected)).toBeLessThan(1e-9);
    expect(rel(net.network.reactions[0]!.kf, expected)).toBeLessThan(1e-9);
    expect(states!.transitionStates[0]).toMatchObject({ id: 'T1', origin: 'raised', energyJ: kcal(6) });
    // A TS below the starting minimum gives the ceiling κk_BT/h, never more.
    const down = pathway([['A', 'min', 2], ['T', 'ts', 1], ['B', 'min', -5]]);
    expect(rel(analyseSteps(down, { temperatureK: T }).steps[0]!.kForward!, KBT_H)).toBeLessThan(1e-12);
  });
});
