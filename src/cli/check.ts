/**
 * `lamina check` (one or many project files, patterns, `-` for standard input) and
 * `lamina span`. Each file is checked on its own: a refused file is reported and the others
 * still run; the exit code is the worst over the files and a summary line goes to stderr.
 */
import { version } from '../../package.json';
import { analyse, analyseWithSupportNeeded, meetsTargets } from '../analysis/analyse';
import { spanCurve } from '../analysis/span-curve';
import { withUncertainty } from '../analysis/probability-row';
import { minimumThickness, THICKNESS_MIN_M } from '../analysis/thickness';
import type { Analysis } from '../analysis/types';
import type { Project } from '../model/types';
import { formatQuantity, type UnitSystem } from '../model/units';
import { resultsCsv, spanCurveCsv } from '../report/results-csv';
import { UsageError, type ParsedArgs } from './args';
import { EXIT_BELOW, EXIT_INTERNAL, EXIT_MEETS, EXIT_REFUSED, worstExit, type ExitCode } from './exit-codes';
import { InputError, onePath, parseProjectText, printWarnings, unitsFlag } from './input';
import { expandInputs, readSource, type InputSource } from './inputs';
import type { Io } from './io';
import { writeOutput } from './output';
import { caution, checkText, spanLines, supportLines } from './text-report';
import { samplingFlags, uncertaintyFor, uncertaintyLines, type SamplingFlags } from './uncertainty';
import { ProjectError } from '../model/validate';
import { openingWords } from '../model/span-wording';

export function laminaVersion(): string {
  return version;
}

/** The FS-versus-span curve goes beside the results table: OUT.csv → OUT-span.csv. */
export function spanCsvPath(out: string): string {
  return out.toLowerCase().endsWith('.csv') ? `${out.slice(0, -4)}-span.csv` : `${out}-span.csv`;
}

type Format = 'text' | 'markdown' | 'json' | 'jsonl';

/** One file's entry in `--json` (several files) and `--jsonl` output. */
export interface CheckEntry {
  file: string;
  status: 'meets' | 'below' | 'refused' | 'internal error';
  exit: ExitCode;
  report?: Analysis['report'];
  errors?: ReadonlyArray<{ path: string; message: string }>;
}

function outputFormat(args: ParsedArgs): Format {
  const chosen = (['--json', '--jsonl', '--markdown'] as const).filter((f) => args.flags[f]);
  if (chosen.length > 1) throw new UsageError(`choose one of --json, --jsonl and --markdown (got ${chosen.join(' and ')})`);
  return chosen.length ? (chosen[0].slice(2) as Format) : 'text';
}

const plural = (n: number, word: string) => `${n} ${word}${n === 1 ? '' : 's'}`;

export async function runCheck(args: ParsedArgs, io: Io): Promise<ExitCode> {
  const units = unitsFlag(args);
  const format = outputFormat(args);
  const sampling = samplingFlags(args);
  if (args.positional.length === 0) throw new UsageError('check needs at least one project file (or - for standard input)');
  const sources = expandInputs(args.positional);
  // One named file keeps the single-report output (--json prints the report itself).
  const single = args.positional.length === 1 && sources.length === 1 && sources[0].name === args.positional[0];
  const html = args.flags['--html'];
  const csv = args.flags['--csv'];
  if ((typeof html === 'string' || typeof csv === 'string') && !single) {
    throw new UsageError('--html and --csv write the report of one project file; give exactly one file');
  }
  // --no-trace prints the summary report without its appendix (the calculation trace).
  const trace = !args.flags['--no-trace'];
  if (!trace && format !== 'markdown' && typeof html !== 'string') {
    throw new UsageError('--no-trace shortens the calculation report: use it with --markdown or --html');
  }
  // The calculation report renders trace formulas with mathjs: load it only when asked for.
  const reports = format === 'markdown' || typeof html === 'string' ? await import('./report-output') : null;

  const tally = { meets: 0, below: 0, refused: 0, internal: 0 };
  let worst: ExitCode = EXIT_MEETS;
  let entries = 0;
  const emit = (entry: CheckEntry) => {
    if (format === 'jsonl') io.out(JSON.stringify(entry) + '\n');
    else if (format === 'json' && !single) io.out(`${entries === 0 ? '[\n' : ',\n'}${JSON.stringify(entry)}`);
    entries++;
  };

  for (const source of sources) {
    const entry = checkOne(source, io, { units, format, single, html, csv, reports, sampling, trace });
    worst = worstExit(worst, entry.exit);
    if (entry.status === 'meets') tally.meets++;
    else if (entry.status === 'below') tally.below++;
    else if (entry.status === 'refused') tally.refused++;
    else tally.internal++;
    emit(entry);
  }
  if (format === 'json' && !single) io.out(entries === 0 ? '[]\n' : '\n]\n');
  io.err(
    `lamina: ${plural(sources.length, 'file')} checked: ${tally.meets} meet${tally.meets === 1 ? 's' : ''} the targets, ${tally.below} below, ${tally.refused} refused` +
      `${tally.internal ? `, ${tally.internal} internal error${tally.internal === 1 ? '' : 's'}` : ''}\n`,
  );
  return worst;
}

interface CheckOptions {
  /** Include the report's appendix (strength chain, calculation trace, methods). */
  trace: boolean;
  units: UnitSystem;
  format: Format;
  single: boolean;
  html: string | true | undefined;
  csv: string | true | undefined;
  reports: typeof import('./report-output') | null;
  sampling: SamplingFlags;
}

function checkOne(source: InputSource, io: Io, o: CheckOptions): CheckEntry {
  const file = source.name;
  let parsed: { project: Project; text: string };
  try {
    const { project, text, warnings } = parseProjectText(file, readSource(source, io));
    printWarnings(io.err, file, warnings);
    parsed = { project, text };
  } catch (e) {
    if (!(e instanceof InputError)) throw e;
    io.err(`lamina: input refused: ${e.message}\n`);
    return { file, status: 'refused', exit: EXIT_REFUSED, errors: e.issues };
  }
  const { project, text } = parsed;
  let analysis: Analysis;
  try {
    analysis = analyse(project);
  } catch (e) {
    // A file the validator accepted must analyse: this is a bug in Lamina, not the user's input.
    io.err(`lamina: internal error: ${file}: ${e instanceof Error ? e.message : String(e)}\n`);
    return { file, status: 'internal error', exit: EXIT_INTERNAL, errors: [{ path: '', message: `internal error: ${e instanceof Error ? e.message : String(e)}` }] };
  }
  // The uncertainty run (METHODS §16): a bad variable refuses the file with its field path.
  try {
    const block = uncertaintyFor(project, o.sampling, io, file);
    // The run's block in the report and, with an acceptable P_f, its counted row in the check table.
    if (block) analysis = withUncertainty(analysis, block);
  } catch (e) {
    if (!(e instanceof ProjectError)) throw e;
    io.err(`lamina: input refused: ${file}: ${e.issues.map((i) => i.message).join('; ')}\n`);
    return { file, status: 'refused', exit: EXIT_REFUSED, errors: e.issues };
  }
  const u = analysis.report.uncertainty;
  // From the check table alone: an acceptable P_f not shown to be met is a counted row below → exit 1.
  const exit = meetsTargets(project, analysis.report) ? EXIT_MEETS : EXIT_BELOW;
  const curve = o.reports || typeof o.csv === 'string' ? spanCurve(project) : null;
  const doc = () => o.reports!.reportDocument({ project, analysis, curve: curve!, text, units: o.units, version: laminaVersion(), trace: o.trace });
  if (typeof o.html === 'string') writeOutput(io, '--html', o.html, o.reports!.renderHtml(doc()));
  if (typeof o.csv === 'string') {
    writeOutput(io, '--csv', o.csv, resultsCsv(analysis, o.units, project));
    writeOutput(io, '--csv', spanCsvPath(o.csv), spanCurveCsv(curve!, o.units));
  }
  if (o.format === 'json' && o.single) io.out(JSON.stringify(analysis.report, null, 2) + '\n');
  else if (o.format === 'markdown') io.out(o.reports!.renderMarkdown(doc()));
  else if (o.format === 'text') {
    const text = checkText(project, analysis, o.units);
    io.out((o.single ? '' : `File: ${file}\n`) + (u ? insertBeforeCaution(text, uncertaintyLines(u)) : text));
  }
  return { file, status: exit === EXIT_MEETS ? 'meets' : 'below', exit, report: analysis.report };
}

export async function runSpan(args: ParsedArgs, io: Io): Promise<ExitCode> {
  const path = onePath(args, 'project file');
  const units = unitsFlag(args);
  const [source] = expandInputs([path]);
  const { project, warnings } = parseProjectText(path, readSource(source, io));
  printWarnings(io.err, path, warnings);
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
    const words = openingWords(project.opening.type);
    const lines = [
      `Lamina span — ${project.title}`,
      caution(),
      '',
      `Current ${words.span}: ${formatQuantity(project.opening.span_m, 'length', units)}${project.opening.type === 'slab' ? ' (slab: aspect ratio held fixed)' : ''}`,
      ...spanLines(maxSpan, units, words.span),
      '',
      `Minimum thickness of layer ${layer} (${project.layers[layer - 1].name}) at the current ${words.span}: ${
        minT === null
          ? 'none up to the search limit meets every target'
          : minT <= THICKNESS_MIN_M
            ? `every thickness down to ${formatQuantity(THICKNESS_MIN_M, 'length', units)} (the thinnest searched) meets every target: its thickness does not limit this design`
            : formatQuantity(minT, 'length', units)
      } (now ${formatQuantity(project.layers[layer - 1].thickness_m, 'length', units)})`,
      '',
      caution(),
      '',
    ];
    io.out(lines.join('\n'));
  }
  return meetsTargets(project, analysis.report) ? EXIT_MEETS : EXIT_BELOW;
}

/** The uncertainty section goes above the closing caution of the text report. */
function insertBeforeCaution(text: string, lines: string[]): string {
  const tail = `${caution()}\n`;
  const at = text.lastIndexOf(tail);
  return at < 0 ? `${text}${lines.join('\n')}\n` : `${text.slice(0, at)}${lines.join('\n')}\n\n${text.slice(at)}`;
}

/**
 * `lamina support FILE [--json] [--units SI|US]`: the support results and the support needed
 * (METHODS §12) — smallest standing support, largest square bolt spacing, shortest bolt length,
 * largest span with the support as given — or "no support needed". Exit code as `check` for
 * the project as given.
 */
export async function runSupport(args: ParsedArgs, io: Io): Promise<ExitCode> {
  const path = onePath(args, 'project file');
  const units = unitsFlag(args);
  const [source] = expandInputs([path]);
  const { project, warnings } = parseProjectText(path, readSource(source, io));
  printWarnings(io.err, path, warnings);
  const analysis = analyseWithSupportNeeded(project);
  const r = analysis.report;
  if (args.flags['--json']) {
    io.out(JSON.stringify({ schema: 'lamina-support/1', span_m: project.opening.span_m, governing: r.governing, support: r.support, empirical: r.empirical }, null, 2) + '\n');
  } else {
    const lines = supportLines(project, r, units);
    io.out([
      `Lamina support — ${project.title}`,
      caution(),
      '',
      `${openingWords(project.opening.type).Span}: ${formatQuantity(project.opening.span_m, 'length', units)}`,
      ...(lines.length ? lines : ['No support given and none searched.']),
      '',
      caution(),
      '',
    ].join('\n'));
  }
  return meetsTargets(project, r) ? EXIT_MEETS : EXIT_BELOW;
}
