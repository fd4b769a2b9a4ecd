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
      --strict         exit 1 when a finding has severity error

  passline thermo TABLE --reaction "CH4(g) + 2 O2(g) -> CO2(g) + 2 H2O(l)" [--temperature K] [--json]
      Reaction thermochemistry by Hess's law from a CSV table of standard formation
      data (header: species,dfH [kJ/mol],S [J/(mol K)],dfG [kJ/mol]; any value column
      may be absent): ΔrH°, ΔrS°, ΔrG° both ways, K and the crossover temperature.
      --solve SPECIES --given dH=VALUE  back-solve one species' ΔfH° (dH), S° (dS) or
      ΔfG° (dG) from a known reaction value in kJ/mol or J/(mol K).

  passline simulate FILE [--species] [--until SECONDS] [--points N] [--init LABEL=CONC ...] [--pathway NAME] [--temperature K]
      Microkinetic simulation of one pathway (default: the first catalytic cycle) as a
      chain of its minima with Eyring rate constants; prints CSV of concentrations
      (mol/L) vs time (s) and, for a cycle at steady state, the simulated TOF.
      Defaults: 3600 s, 50 log-spaced times, the first minimum at 1 mol/L.
      --species: simulate the document's species instead (states need compositions;
      A + B ⇌ C steps are second order), starting from --init SPECIES=CONC.

  passline render FILE -o OUT.svg|OUT.pdf|OUT.png [--width-mm W] [--preset single|double|slide]
                 [--theme colour|greyscale|dark] [--dpi N] [--unit U] [--temperature K]
      Draw the profile figure: SVG with editable text, vector PDF with the font
      embedded, or PNG at N dots per inch (default 300).

  passline report FILE -o OUT.pdf [--unit U] [--temperature K]
      A PDF report: the figure, energies with provenance, steps, effective barriers,
      energetic span, comparisons, settings, methods with sources, findings, cautions.

  passline tables FILE -o OUT.csv|OUT.md [--unit U] [--temperature K]
      The points and the analysis as CSV or Markdown tables, units in every header.

  passline scan FILE [--from K] [--to K] [--count N]
      Rate constants, equilibrium constants, TOFs and product shares over a temperature
      range (default 273.15–373.15 K, 11 values) as CSV; states how G(T) was obtained.

  passline --help | --version

Exit status: 0 success, 1 bad input (the message names the file, field or row), 2 bad usage.
Numbers outside the limits of core/model/bounds.ts are refused with the bound named (see README).
`;
