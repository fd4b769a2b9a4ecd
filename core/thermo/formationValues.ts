/**
 * Standard formation data of one species at the table temperature (298.15 K), in the units
 * of the NIST-JANAF tables: ΔfH° and ΔfG° in kJ/mol, S° in J/(mol K). Each may be absent.
 */
export interface FormationValues {
  dfH?: number;
  S?: number;
  dfG?: number;
}

/** Which formation value. */
export type FormationKey = keyof FormationValues;

/** Formation values per species name (formula + phase, e.g. "H2O(l)"). */
export type FormationData = ReadonlyMap<string, FormationValues>;

/** Human names of the formation keys with their units, for messages. */
export const FORMATION_LABELS: Readonly<Record<FormationKey, string>> = {
  dfH: 'ΔfH° (kJ/mol)',
  S: 'S° (J/(mol K))',
  dfG: 'ΔfG° (kJ/mol)',
};
