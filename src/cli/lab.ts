/** `lamina lab`: Brazilian test reduction of a specimen table (CSV). */
import { parseSpecimensCsv } from '../model/specimens-csv';
import { ROCK_CLASSES } from '../model/validate';
import type { RockClass } from '../model/types';
import { reduceSpecimens, specimenOutcomes } from '../strength/specimens';
import { directFactor } from '../strength/direct-factor';
import { characteristicValue } from '../strength/statistics';
import { formatQuantity, type UnitSystem } from '../model/units';
import { numberText } from '../report/number-text';
import { UsageError, type ParsedArgs } from './args';
import { EXIT_MEETS, type ExitCode } from './exit-codes';
import { InputError, onePath, unitsFlag } from './input';
import { expandInputs, readSource } from './inputs';
import type { Io } from './io';
import { caution } from './text-report';

export function runLab(args: ParsedArgs, io: Io): ExitCode {
  const path = onePath(args, 'specimen CSV file');
  const units: UnitSystem = unitsFlag(args);
  const rock = (args.flags['--rock'] ?? 'sedimentary') as string;
  if (!(ROCK_CLASSES as readonly string[]).includes(rock)) throw new UsageError(`--rock must be one of ${ROCK_CLASSES.join(', ')}, got "${rock}"`);
  const text = readSource(expandInputs([path])[0], io);
  const parsed = parseSpecimensCsv(text);
  if (parsed.errors.length) {
    throw new InputError(`${path}:\n` + parsed.errors.map((e) => `  ${e.message}`).join('\n'));
  }
  if (parsed.specimens.length === 0) throw new InputError(`${path}: no specimen rows found (columns id, diameter_mm, thickness_mm, peakLoad_kN, valid)`);
  const reduction = reduceSpecimens(
    parsed.specimens.map((s) => ({ id: s.id, diameter: s.diameter_mm / 1e3, thickness: s.thickness_mm / 1e3, peakLoad: s.peakLoad_kN * 1e3, valid: s.valid })),
  );
  if (reduction.accepted.length === 0) throw new InputError(`${path}: no specimen is usable (all marked invalid or thicker than their diameter)`);
  const f = directFactor(rock as RockClass);
  const direct = reduction.accepted.map((a) => a.brazilian * f);
  const mean = characteristicValue(direct, 'mean');
  const lower5 = characteristicValue(direct, 'lower5');
  const MPa = (pa: number) => pa * 1e-6;
  const outcome = specimenOutcomes(reduction, parsed.specimens.length);
  const specimens = parsed.specimens.map((s, index) => {
    const a = outcome.accepted[index];
    const r = outcome.rejected[index];
    const brazilian = (2 * s.peakLoad_kN * 1e3) / (Math.PI * (s.diameter_mm / 1e3) * (s.thickness_mm / 1e3));
    return {
      id: s.id,
      diameter_mm: s.diameter_mm,
      thickness_mm: s.thickness_mm,
      peakLoad_kN: s.peakLoad_kN,
      ratioLD: s.thickness_mm / s.diameter_mm,
      brazilian_MPa: MPa(brazilian),
      accepted: Boolean(a),
      reason: r ? r.reason : null,
      warnings: outcome.warnings[index].map((w) => w.message),
    };
  });
  const result = {
    schema: 'lamina-lab/1',
    rockClass: rock,
    directFactor: f,
    specimens,
    accepted: reduction.accepted.length,
    brazilianMean_MPa: MPa(reduction.accepted.reduce((s, a) => s + a.brazilian, 0) / reduction.accepted.length),
    directMean_MPa: MPa(mean.mean),
    directSd_MPa: MPa(mean.sd),
    cov: mean.cov,
    kn: lower5.kn,
    characteristicMean_MPa: MPa(mean.value),
    characteristicLower5_MPa: MPa(lower5.value),
    warnings: [...(lower5.warning ? [lower5.warning] : [])],
  };
  if (args.flags['--json']) {
    io.out(JSON.stringify(result, null, 2) + '\n');
    return EXIT_MEETS;
  }
  const S = (v: number) => formatQuantity(v, 'stress', units);
  const D = (v: number) => formatQuantity(v, 'smallLength', units);
  const lines = [`Lamina lab — ${path} (${rock}, Brazilian → direct × ${f})`, caution(), ''];
  lines.push('  id          D            L            P            L/D     Brazilian     status');
  for (const s of specimens) {
    lines.push(
      `  ${s.id.padEnd(11)} ${D(s.diameter_mm).padEnd(12)} ${D(s.thickness_mm).padEnd(12)} ${formatQuantity(s.peakLoad_kN, 'force', units).padEnd(12)} ${numberText(s.ratioLD, 3).padEnd(7)} ${S(s.brazilian_MPa).padEnd(13)} ${s.accepted ? 'used' : `not used: ${s.reason}`}`,
    );
    for (const w of s.warnings) lines.push(`      warning: ${w}`);
  }
  lines.push(
    '',
    `Accepted specimens: ${result.accepted} of ${specimens.length}`,
    `Brazilian mean: ${S(result.brazilianMean_MPa)}`,
    `Direct tensile strength: mean ${S(result.directMean_MPa)}, standard deviation ${S(result.directSd_MPa)}, CoV ${numberText(result.cov, 3)}`,
    `Characteristic value: mean rule ${S(result.characteristicMean_MPa)}; lower 5 % fractile ${result.kn === null ? 'needs ≥ 3 specimens (mean used)' : `${S(result.characteristicLower5_MPa)} (kn ${result.kn}, EN 1990 Annex D)`}`,
    '',
    caution(),
    '',
  );
  io.out(lines.join('\n'));
  return EXIT_MEETS;
}
