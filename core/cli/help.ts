import pkg from '../../package.json' with { type: 'json' };

/** Version printed by `passline --version` (from package.json). */
export const VERSION: string = pkg.version;

/** Text printed by `passline --help`. */
export const HELP = `passline ${VERSION} — reaction-coordinate energy profiles from the command line

Usage:
  passline analyze FILE [--json] [--unit U] [--temperature K]
      Resolve every pathway of a .passline document or a CSV/TSV table of points
      (header: pathway,label,kind,G [kcal/mol],cycle) and print the points with
      their energies and provenance, and the consistency findings.
      --json           machine-readable output
      --unit U         kcal/mol, kJ/mol, eV, hartree or cm-1
      --temperature K  temperature in kelvin

  passline --help | --version

Exit status: 0 success, 1 bad input (the message names the file, field or row), 2 bad usage.
`;
