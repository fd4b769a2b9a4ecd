import type { Finding, ResolvedPathway } from '../profile/types.ts';

/** Enthalpy and entropy of a point relative to the reference: G(T) = H − T·S. */
export interface PointThermo {
  hJ: number;
  sJPerK: number;
}

/**
 * The pathway with G(T) = H − T·S for every point when ΔH and ΔS are given for all of them
 * (ΔH, ΔS taken constant, as in a van 't Hoff or Eyring-plot treatment). Otherwise the same
 * pathway with its G held, plus a finding naming the points that lack ΔH/ΔS.
 */
export function pathwayAtTemperature(
  pathway: ResolvedPathway,
  temperatureK: number,
  thermo: Readonly<Record<string, PointThermo>> | undefined,
): { pathway: ResolvedPathway; held: boolean; findings: Finding[] } {
  if (thermo === undefined) return { pathway, held: true, findings: [] };
  const lacking = pathway.points.filter((q) => thermo[q.id] === undefined);
  if (lacking.length > 0) {
    const names = lacking.map((q) => `"${q.label}"`).join(', ');
    return { pathway, held: true, findings: [{ severity: 'warning', code: 'thermo-incomplete', message: `pathway "${pathway.name}": ΔH/ΔS missing for ${names}; its G values are held constant instead`, pathway: pathway.id, point: lacking[0]?.id }] };
  }
  const points = pathway.points.map((q) => {
    const h = thermo[q.id]!;
    return { id: q.id, label: q.label, kind: q.kind, provenance: q.provenance, energyJ: h.hJ - temperatureK * h.sJPerK };
  });
  return { pathway: { ...pathway, points }, held: false, findings: [] };
}
