import { describe, expect, it } from 'vitest';
import { energyDecimals } from '../../../core/format/energyDecimals.ts';
import { layoutFigure } from '../../../core/figure/layoutFigure.ts';
import { pointsTable } from '../../../core/export/tables.ts';
import { fontMetrics } from '../figure/fontFixture.ts';
import { fixture } from '../figure/profileFixture.ts';
import { textOf, texts } from '../figure/sceneQueries.ts';

// Check values computed outside the app from CODATA 2018: Eₕ = 4.3597447222071 × 10⁻¹⁸ J,
// e = 1.602176634 × 10⁻¹⁹ C, N_A = 6.02214076 × 10²³ mol⁻¹; 1 kcal = 4184 J (thermochemical).
// 20 kcal/mol = 0.0318720288 Eₕ = 0.867282085 eV; −5 kcal/mol = −0.0079680072 Eₕ = −0.216820521 eV.

describe('energyDecimals', () => {
  it('keeps the Decimals setting for kcal/mol, kJ/mol and cm⁻¹; at least 6 for hartree and 3 for eV', () => {
    expect(energyDecimals({ decimals: 1 }, 'kcal/mol')).toBe(1);
    expect(energyDecimals({ decimals: 2 }, 'kJ/mol')).toBe(2);
    expect(energyDecimals({ decimals: 0 }, 'cm-1')).toBe(0);
    expect(energyDecimals({ decimals: 1 }, 'hartree')).toBe(6);
    expect(energyDecimals({ decimals: 1 }, 'eV')).toBe(3);
    expect(energyDecimals({ decimals: 5 }, 'eV')).toBe(5);
  });
});

describe('energies in hartree and eV stay readable with Decimals 1', () => {
  const route = [{ id: 'p', name: 'route', points: [['A', 'min', 0], ['TS', 'ts', 20], ['B', 'min', -5]] as [string, 'min' | 'ts', number][] }];
  const labelTexts = (unit: 'hartree' | 'eV') => {
    const { doc, profile } = fixture(route.map((p) => ({ ...p, points: p.points.map(([l, k, e]) => [l, k, e * (unit === 'hartree' ? 0.0318720288 / 20 : 0.867282085 / 20)] as [string, 'min' | 'ts', number]) })), {}, unit, 1);
    return { doc, profile, labels: texts(layoutFigure(profile, doc, { metrics: fontMetrics() }), 'label').map(textOf).join(' | ') };
  };

  it('figure labels: "+0.031872" Eₕ and "+0.867" eV, not "0.0"', () => {
    expect(labelTexts('hartree').labels).toContain('+0.031872');
    expect(labelTexts('hartree').labels).toContain('−0.007968');
    expect(labelTexts('eV').labels).toContain('+0.867');
    expect(labelTexts('eV').labels).toContain('−0.217');
  });

  it('points table cells: 0.031872 Eₕ and 0.867 eV', () => {
    const { doc: dh, profile: ph } = labelTexts('hartree');
    expect(pointsTable(ph, energyDecimals(dh.settings, ph.unit)).rows.map((r) => r[4])).toEqual([0, 0.031872, -0.007968]);
    const { doc: de, profile: pe } = labelTexts('eV');
    expect(pointsTable(pe, energyDecimals(de.settings, pe.unit)).rows.map((r) => r[4])).toEqual([0, 0.867, -0.217]);
  });
});
