import type { Document, Quantity, Unit } from '../model/schema.ts';
import type { Finding, Provenance, ResolvedProfile } from '../profile/types.ts';
import { fromJoulesPerMol } from '../units/energy.ts';

/** A point as printed by `analyze --json`: energy in the display unit. */
export interface ReportPoint {
  label: string;
  kind: 'min' | 'ts';
  energy: number | null;
  provenance: Provenance;
}

export interface ReportPathway {
  name: string;
  cycle: boolean;
  points: ReportPoint[];
}

/** The machine-readable analysis of a document (the `analyze --json` contract). */
export interface AnalysisReport {
  title: string;
  quantity: Quantity;
  unit: Unit;
  temperatureK: number;
  pathways: ReportPathway[];
  checks: Finding[];
}

/** Builds the analysis report of a resolved document, energies in its display unit. */
export function analysisReport(doc: Document, profile: ResolvedProfile): AnalysisReport {
  const unit = profile.unit;
  const toUnit = (j: number | null) => (j === null ? null : fromJoulesPerMol(j, unit));
  return {
    title: doc.title,
    quantity: profile.quantity,
    unit,
    temperatureK: profile.temperatureK,
    pathways: profile.pathways.map((pathway) => ({
      name: pathway.name,
      cycle: pathway.cycle,
      points: pathway.points.map((p) => ({ label: p.label, kind: p.kind, energy: toUnit(p.energyJ), provenance: p.provenance })),
    })),
    checks: profile.findings,
  };
}
