import pkg from '../../package.json' with { type: 'json' };

/** Version printed by `passline --version` (from package.json). */
export const VERSION: string = pkg.version;

/** Each command's usage and options, printed by `passline COMMAND --help` (and all together by `passline --help`). */
export const COMMAND_HELP: Record<string, string> = {
  analyze: `  passline analyze FILE [--json] [--unit U] [--temperature K] [--strict] [--uncertainty N [--seed S]]
      Resolve every pathway of a .passline document or a CSV/TSV table of points
      (header: pathway,label,kind,G [kcal/mol],cycle) and print the points with
      their energies and provenance, and the consistency findings.
      --json           machine-readable output
      --unit U         kcal/mol, kJ/mol, eV, hartree or cm-1
      --temperature K  temperature in kelvin
      --strict         exit 1 when a finding has severity error
      --uncertainty N  Monte Carlo over the σ entered beside values (or the document's
                       default σ): median and 95 % interval of every number, P(TDTS),
                       P(faster), and which inputs matter most; N samples (e.g. 10000)
      --seed S         seed of the generator (default: the document's, else 1)
`,
  thermo: `  passline thermo TABLE --reaction "CH4(g) + 2 O2(g) -> CO2(g) + 2 H2O(l)" [--temperature K] [--json]
      Reaction thermochemistry by Hess's law from a CSV table of standard formation
      data (header: species,dfH [kJ/mol],S [J/(mol K)],dfG [kJ/mol]; any value column
      may be absent): ΔrH°, ΔrS°, ΔrG° both ways, K and the crossover temperature.
      --solve SPECIES --given dH=VALUE  back-solve one species' ΔfH° (dH), S° (dS) or
      ΔfG° (dG) from a known reaction value in kJ/mol or J/(mol K).
`,
  simulate: `  passline simulate FILE [--species] [--until SECONDS] [--points N] [--init LABEL=CONC ...] [--pathway NAME] [--temperature K]
      Microkinetic simulation of one pathway (default: the first catalytic cycle) as a
      chain of its minima with Eyring rate constants; prints CSV of concentrations
      (mol/L) vs time (s) and, for a cycle at steady state, the simulated TOF.
      Defaults: 3600 s, 50 log-spaced times, the first minimum at 1 mol/L.
      --species: simulate the document's species instead (states need compositions;
      A + B ⇌ C steps are second order), starting from --init SPECIES=CONC; adds
      conversion of each substrate, yield of each product and TON (product per
      catalyst), read from what the first and last states consume, form and regenerate.
`,
  render: `  passline render FILE -o OUT.svg|OUT.pdf|OUT.png [--width-mm W] [--preset single|double|slide]
                 [--theme colour|greyscale|dark] [--dpi N] [--unit U] [--temperature K] [--strict] [--watch]
  passline render FILE... --out-dir DIR --format svg|pdf|png [same options]
      Draw the profile figure: SVG with editable text, vector PDF with the font
      embedded, or PNG at N dots per inch (default 300).
      --out-dir DIR    render every FILE in one run to DIR/NAME.FORMAT (NAME = the
                       file's name without its extension); a bad input is reported and
                       the rest still rendered; exit status 1 if any failed
      --watch          stay running and render again whenever an input changes
                       (Ctrl+C to stop); each output is replaced in one step
      --strict         exit 1 (and write nothing) when a finding has severity error
`,
  report: `  passline report FILE -o OUT.pdf [--unit U] [--temperature K] [--uncertainty N [--seed S]]
      A PDF report: the figure, energies with provenance, steps, effective barriers,
      energetic span, comparisons, settings, methods with sources, findings, cautions.
      --uncertainty N  add a Monte Carlo section (as analyze): N, seed and every σ,
                       median and 95 % interval of each number, probabilities, and
                       which inputs matter for the rate; figure.errorBars in the
                       document also draws error bars (its samples and seed)
      --seed S         seed of the generator (default: the document's, else 1)
`,
  tables: `  passline tables FILE -o OUT.csv|OUT.md [--unit U] [--temperature K] [--uncertainty N [--seed S]]
      The points and the analysis as CSV or Markdown tables, units in every header.
      --uncertainty N  add median, 2.5 % and 97.5 % columns beside each number, the
                       run's N, seed and input σ, and the probabilities (as analyze)
      --seed S         seed of the generator (default: the document's, else 1)
`,
  scan: `  passline scan FILE [--from K] [--to K] [--count N]
      Rate constants, equilibrium constants, TOFs and product shares over a temperature
      range (default 273.15–373.15 K, 11 values) as CSV; states how G(T) was obtained.
`,
  species: `  passline species FILE... [--json] [--temperature K] [--quasi-harmonic grimme|truhlar|off] [--cutoff CM1]
      Read Gaussian logs, ORCA outputs and XYZ files (one species per file, or a
      single point NAME_sp.* with its frequency file NAME_freq.*: E from the first,
      corrections from the second) and print E, the thermal corrections recomputed
      from the frequencies at K (default 298.15, 1 atm), imaginary counts and what
      each file lacks. Low modes: harmonic (off, default), Grimme's entropy
      interpolation or Truhlar's raise, below CM1 (default 100 cm⁻¹).
`,
};

const EXIT_STATUS = 'Exit status: 0 success, 1 bad input (the message names the file, field or row), 2 bad usage.\n'
  + 'Numbers outside the limits of core/model/bounds.ts are refused with the bound named (see README).\n';

/** Text printed by `passline --help`. */
export const HELP = `passline ${VERSION} — reaction-coordinate energy profiles from the command line

Usage:
${Object.values(COMMAND_HELP).join('\n')}
  passline --help | --version | COMMAND --help

${EXIT_STATUS}`;

/** Text printed by `passline COMMAND --help`: that command's usage and options only. */
export function commandHelp(name: string): string {
  return `Usage:\n${COMMAND_HELP[name] ?? ''}\n${EXIT_STATUS}`;
}
