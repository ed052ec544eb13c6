/** `lamina check` and `lamina span`. */
import { readFileSync } from 'node:fs';
import { analyse, meetsTargets, minimumThickness, spanCurve } from '../analysis';
import { buildReportDocument, renderHtml, renderMarkdown, resultsCsv, spanCurveCsv } from '../report';
import { formatQuantity } from '../model/units';
import type { ParsedArgs } from './args';
import { UsageError } from './args';
import { loadProject, onePath, unitsFlag } from './input';
import type { Io } from './main';
import { caution, checkText, spanLines } from './text-report';

export function laminaVersion(): string {
  try {
    const pkg = JSON.parse(readFileSync(new URL('../../package.json', import.meta.url), 'utf8')) as { version?: string };
    return pkg.version ?? 'unknown';
  } catch {
    return 'unknown';
  }
}

function printWarnings(io: Io, path: string, warnings: { path: string; message: string }[]): void {
  for (const w of warnings) io.err(`lamina: warning: ${path}: ${w.message.startsWith(w.path) ? w.message : `${w.path}: ${w.message}`}\n`);
}

/** The FS-versus-span curve goes beside the results table: OUT.csv → OUT-span.csv. */
export function spanCsvPath(out: string): string {
  return out.toLowerCase().endsWith('.csv') ? `${out.slice(0, -4)}-span.csv` : `${out}-span.csv`;
}

export function runCheck(args: ParsedArgs, io: Io): number {
  const path = onePath(args, 'project file');
  const units = unitsFlag(args);
  const { project, text, warnings } = loadProject(path, io.readFile);
  printWarnings(io, path, warnings);
  const analysis = analyse(project);
  const needsCurve = args.flags['--markdown'] || args.flags['--html'] || args.flags['--csv'];
  const curve = needsCurve ? spanCurve(project) : null;
  const doc = () => buildReportDocument({ project, analysis, curve, projectText: text, units, version: laminaVersion(), date: new Date().toISOString().slice(0, 10) });
  if (typeof args.flags['--html'] === 'string') io.writeFile(args.flags['--html'], renderHtml(doc()));
  if (typeof args.flags['--csv'] === 'string') {
    const out = args.flags['--csv'];
    io.writeFile(out, resultsCsv(analysis, units, project));
    io.writeFile(spanCsvPath(out), spanCurveCsv(curve!, units));
  }
  if (args.flags['--json'] && args.flags['--markdown']) throw new UsageError('choose one of --json and --markdown');
  if (args.flags['--json']) io.out(JSON.stringify(analysis.report, null, 2) + '\n');
  else if (args.flags['--markdown']) io.out(renderMarkdown(doc()));
  else io.out(checkText(project, analysis, units));
  return meetsTargets(project, analysis.report) ? 0 : 1;
}

export function runSpan(args: ParsedArgs, io: Io): number {
  const path = onePath(args, 'project file');
  const units = unitsFlag(args);
  const { project, warnings } = loadProject(path, io.readFile);
  printWarnings(io, path, warnings);
  const layerFlag = args.flags['--layer'];
  const layer = layerFlag === undefined ? 1 : Number(layerFlag);
  if (!(Number.isInteger(layer) && layer >= 1 && layer <= project.layers.length)) {
    throw new UsageError(`--layer must be a layer number from 1 to ${project.layers.length}, got "${String(layerFlag)}"`);
  }
  const analysis = analyse(project);
  const minT = minimumThickness(project, layer - 1);
  const maxSpan = analysis.report.maxSpan_m;
  if (args.flags['--json']) {
    io.out(JSON.stringify({ schema: 'lamina-span/1', span_m: project.opening.span_m, maxSpan_m: maxSpan, minimumThickness: { layer: project.layers[layer - 1].name, thickness_m: minT } }, null, 2) + '\n');
  } else {
    const lines = [
      `Lamina span — ${project.title}`,
      caution(),
      '',
      `Current span: ${formatQuantity(project.opening.span_m, 'length', units)}${project.opening.type === 'slab' ? ' (slab: aspect ratio held fixed)' : ''}`,
      ...spanLines(maxSpan, units),
      '',
      `Minimum thickness of layer ${layer} (${project.layers[layer - 1].name}) at the current span: ${minT === null ? 'none up to the search limit meets every target' : formatQuantity(minT, 'length', units)} (now ${formatQuantity(project.layers[layer - 1].thickness_m, 'length', units)})`,
      '',
      caution(),
      '',
    ];
    io.out(lines.join('\n'));
  }
  return meetsTargets(project, analysis.report) ? 0 : 1;
}
