/** Usage text of the command line, with the caution (DESIGN.md). */
import { CAUTION } from '../model/caution';

export const USAGE = `Lamina — roof and overhang checks for excavations in bedded rock

Usage:
  lamina check FILE... [--json | --jsonl | --markdown] [--html OUT.html] [--no-trace] [--csv OUT.csv]
               [--units SI|US] [--samples N] [--seed S]
      Full analysis of each project file: strength chain, elastic / layered / voussoir /
      slab checks, governing mode and the largest span per mode. FILE may be a pattern
      ("presets/*.lamina.json", expanded by lamina itself) or - for standard input.
  lamina span FILE [--json] [--units SI|US] [--layer N]
      Largest span per mode, and the minimum thickness of layer N (1 = immediate roof).
  lamina support FILE [--json] [--units SI|US]
      The support results (bolt load and FS, suspended and bonded layers) and the support
      needed: smallest standing support, largest square bolt spacing, shortest bolt length,
      largest span with the support as given — or "no support needed".
  lamina lab SPECIMENS.csv [--rock sedimentary|igneous|metamorphic] [--json]
      Brazilian test reduction of a specimen table (columns id, diameter_mm,
      thickness_mm, peakLoad_kN, valid).
  lamina openings FILE OPENINGS.csv [--csv OUT.csv] [--json | --jsonl] [--units SI|US]
      Checks every opening of the table under the strata, loads and targets of FILE and
      writes one results row per opening. Columns: name, type (beam|slab|cantilever|intersection),
      span_m, and optionally length_m (slab long side, intersection w2), ends (clamped|simple), surcharge_kPa,
      support_kPa (standing support), horizontalStress_MPa (or span_ft, length_ft, surcharge_psf,
      support_psf, horizontalStress_psi); a blank cell takes the value in FILE.
  lamina help
  (From a clone without the command installed: npm run lamina -- check FILE …)

Options:
  --json           check: the lamina-report/2 JSON of one file; with several files an
                   array of {file, status, exit, report | errors}; openings: an array
  --jsonl          as --json, one JSON document per line (per file, or per opening)
  --markdown       print the calculation report as Markdown: a summary (verdict, inputs,
                   check table, key charts, warnings), then the appendix (layer results,
                   strength chain, the full calculation trace, methods)
  --html OUT.html  write the self-contained HTML calculation report (one file)
  --no-trace       with --markdown or --html: the summary alone, without the appendix
  --csv OUT.csv    check: write the per-layer results to OUT.csv and the FS-versus-span
                   curve to OUT-span.csv (one file); openings: the results table
  --units SI|US    units for human-readable output and CSV (default SI)
  --rock CLASS     rock class for the Brazilian-to-direct factor (default sedimentary)
  --layer N        span: the layer whose minimum thickness is found (default 1)
  --samples N      check: samples of the uncertainty run (100 to 1000000) of a file with
                   uncertainty variables; overrides the file's uncertainty.samples
  --seed S         check: seed of the uncertainty run (0 to 2147483647), overrides the file's

check and openings print a summary line on stderr (files or openings checked, how many
meet the targets, are below and were refused). Over several files or openings the exit
code is the worst one.

Exit codes: 0 all checks meet their targets; 1 at least one is below its target;
            2 the input was refused (the message names the field, or the row and column)
              or an output file could not be written (the message names the option and path);
            3 an internal error: a bug in Lamina, never caused by the input — please report it.

CAUTION: ${CAUTION}
`;
