/** Usage text of the command line, with the caution (DESIGN.md). */
import { CAUTION } from '../model/caution';

export const USAGE = `Lamina — roof and overhang checks for excavations in bedded rock

Usage:
  npm run lamina -- check <file.lamina.json> [--json] [--markdown] [--html OUT.html] [--csv OUT.csv] [--units SI|US]
      Full analysis: strength chain, elastic / layered / voussoir / slab checks,
      governing mode and the largest span per mode.
  npm run lamina -- span  <file.lamina.json> [--json] [--units SI|US] [--layer N]
      Largest span per mode, and the minimum thickness of layer N (1 = immediate roof).
  npm run lamina -- lab   <specimens.csv> [--rock sedimentary|igneous|metamorphic] [--json]
      Brazilian test reduction of a specimen table (columns id, diameter_mm,
      thickness_mm, peakLoad_kN, valid).
  npm run lamina -- help

Options:
  --json           print the machine-readable result (check: the lamina-report/1 JSON)
  --markdown       print the calculation report as Markdown
  --html OUT.html  write the self-contained HTML calculation report to OUT.html
  --csv OUT.csv    write the per-layer results table to OUT.csv and the FS-versus-span
                   curve to OUT-span.csv
  --units SI|US    units for human-readable output (default SI)
  --rock CLASS     rock class for the Brazilian-to-direct factor (default sedimentary)

Exit codes: 0 all checks meet their targets; 1 at least one is below its target;
            2 the input was refused (the message names the field).

CAUTION: ${CAUTION}
`;
