/**
 * The uncertainty run of `lamina check` (METHODS §16): when a project file has an
 * `uncertainty` block, or `--samples`/`--seed` are given for one that does, the run adds the
 * report's `uncertainty` block (JSON) and a short section to the text output. A progress line
 * is drawn on stderr only when stderr is a terminal.
 */
import { MODE_NAME } from '../analysis/check-labels';
import type { Mode, Project, UncertaintyReport } from '../model/types';
import { MAX_SAMPLES, MIN_SAMPLES } from '../model/validate';
import { numberText } from '../report/number-text';
import { runUncertainty } from '../uncertainty/run';
import { UsageError, type ParsedArgs } from './args';
import type { Io } from './io';

export interface SamplingFlags {
  samples?: number;
  seed?: number;
}

/** `--samples N` (100 … 1e6) and `--seed S` (0 … 2³¹ − 1), whole numbers. */
export function samplingFlags(args: ParsedArgs): SamplingFlags {
  const out: SamplingFlags = {};
  const whole = (flag: string, lo: number, hi: number): number | undefined => {
    const raw = args.flags[flag];
    if (raw === undefined) return undefined;
    const n = Number(raw);
    if (raw === true || !(Number.isInteger(n) && n >= lo && n <= hi)) throw new UsageError(`${flag} must be a whole number from ${lo} to ${hi}, got "${String(raw)}"`);
    return n;
  };
  const samples = whole('--samples', MIN_SAMPLES, MAX_SAMPLES);
  const seed = whole('--seed', 0, 2 ** 31 - 1);
  if (samples !== undefined) out.samples = samples;
  if (seed !== undefined) out.seed = seed;
  return out;
}

/** Draws "uncertainty 12000/20000 (60 %)" on a terminal's stderr at most every 200 ms. */
function progress(io: Io, file: string): { tick: (done: number, total: number) => void; end: () => void } {
  if (!io.errIsTty) return { tick: () => {}, end: () => {} };
  let last = 0;
  return {
    tick: (done, total) => {
      const now = Date.now();
      if (now - last < 200 && done < total) return;
      last = now;
      io.err(`\rlamina: ${file}: uncertainty ${done}/${total} samples (${Math.floor((100 * done) / total)} %)`);
    },
    end: () => io.err('\r\x1b[K'),
  };
}

/**
 * The run for one file, or null when the file has no uncertainty block (a note on stderr
 * when sampling flags were given for it). Bad variables throw ProjectError (input refused).
 */
export function uncertaintyFor(project: Project, flags: SamplingFlags, io: Io, file: string): UncertaintyReport | null {
  if (!project.uncertainty || project.uncertainty.variables.length === 0) {
    if (flags.samples !== undefined || flags.seed !== undefined) io.err(`lamina: ${file}: no uncertainty variables in the file: --samples and --seed ignored\n`);
    return null;
  }
  const bar = progress(io, file);
  try {
    return runUncertainty(project, { ...flags, onProgress: bar.tick });
  } finally {
    bar.end();
  }
}

const pct = (p: number) => (p === 0 ? '0' : p < 1e-3 ? numberText(p, 2) : `${numberText(100 * p, 3)} %`);

/** The text section: P_f with its interval and β, per mode, FORM, sensitivity. */
export function uncertaintyLines(u: UncertaintyReport): string[] {
  const lines = [
    `Uncertainty (${u.method === 'latinHypercube' ? 'Latin hypercube' : 'Monte Carlo'}, ${u.evaluated} samples, seed ${u.seed}):`,
    `  P_f = ${pct(u.pf)} (95 % interval ${pct(u.pfInterval[0])} – ${pct(u.pfInterval[1])}${u.intervalMethod === 'ruleOfThree' ? ', rule of three' : ''})` +
      `, β = ${u.beta === null ? '—' : numberText(u.beta, 3)}${u.pfCov === null ? '' : `, CoV of the estimate ${numberText(u.pfCov, 2)}`}`,
  ];
  if (u.betaNote) lines.push(`  ${u.betaNote}`);
  lines.push(`  P(below a target) = ${pct(u.pBelowTarget)}`);
  const modes = (Object.keys(u.byMode) as Mode[]).filter((m) => (u.byMode[m] ?? 0) > 0);
  if (modes.length) lines.push(`  by mode: ${modes.map((m) => `${MODE_NAME[m]} ${pct(u.byMode[m] as number)}`).join(', ')}`);
  if (u.form) lines.push(`  FORM on the governing check: β = ${u.form.beta === null ? '—' : numberText(u.form.beta, 3)}, P_f = ${u.form.pf === null ? '—' : pct(u.form.pf)}${u.form.converged ? '' : ' (not converged)'}`);
  const ranked = u.sensitivity.filter((s) => s.rankCorrelation !== null).sort((a, b) => Math.abs(b.rankCorrelation as number) - Math.abs(a.rankCorrelation as number));
  if (ranked.length) lines.push(`  sensitivity (rank correlation with the governing FS): ${ranked.map((s) => `${s.path} ${numberText(s.rankCorrelation as number, 2)}`).join(', ')}`);
  if (u.acceptablePf !== null) lines.push(`  acceptable P_f ${pct(u.acceptablePf)} (the file's): ${u.meetsAcceptablePf ? 'met ✓' : 'not shown to be met ✗'} (judged by the interval's upper end; a counted row of the check table)`);
  if (u.plateInterpolation) lines.push(`  slab plate coefficients interpolated: largest relative error ${numberText(100 * u.plateInterpolation.maxRelativeError, 2)} %`);
  lines.push('  P_f is the chance that some counted check has FS < 1 given the stated input distributions only; it does not cover the model\'s own error or inputs not varied.');
  return lines;
}
