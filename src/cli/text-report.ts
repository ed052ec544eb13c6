/** The human-readable `check` and `span` output: every number with its unit. */
import type { Analysis } from '../analysis/types';
import type { MaxSpanReport, Project, Report } from '../model/types';
import { CAUTION } from '../model/caution';
import { formatQuantity, type UnitSystem } from '../model/units';
import { modeLabel, STATUS_TEXT } from '../analysis/check-labels';
import { buildVerdict } from '../analysis/verdict';
import { openingWords, qSpanWord } from '../model/span-wording';
import { numberText } from '../report/number-text';

const fs = (x: number | null) => (x === null ? '—' : numberText(x, 3));

function pad(text: string, width: number): string {
  return text.length >= width ? text + ' ' : text + ' '.repeat(width - text.length);
}

export function caution(): string {
  return `CAUTION: ${CAUTION}`;
}

export function spanLines(maxSpan: MaxSpanReport | null, units: UnitSystem, word = 'span'): string[] {
  // An overhang has no arch, so sliding is not applicable to it at all.
  const slidingWhy = word === 'overhang' ? ' (an overhang forms no arch)' : ` (FS sliding rises with ${word}: never limits it)`;
  if (!maxSpan) return [`Largest ${word}: not computed.`];
  const q = (v: number | null) => (v === null ? 'n/a' : formatQuantity(v, 'length', units));
  return [
    `Largest ${word} meeting the targets (modes counted at the current ${word}; all else fixed, to 1 mm; search cap 100 m):`,
    `  tension       ${q(maxSpan.tension)}`,
    `  crushing      ${q(maxSpan.crushing)}`,
    `  sliding       ${q(maxSpan.sliding)}${maxSpan.sliding === null ? slidingWhy : ''}`,
    `  snap-through  ${q(maxSpan.snapThrough)}`,
    `  deflection    ${q(maxSpan.deflection)}`,
    `  governing     ${q(maxSpan.governing)}`,
  ];
}

/** The support results and the empirical cross-check, as the report holds them (nothing re-derived). */
export function supportLines(project: Project, report: Report, units: UnitSystem): string[] {
  const lines: string[] = [];
  const words = openingWords(project.opening.type);
  const s = report.support;
  const b = project.support.bolts;
  if (s && b) {
    const layerName = (i: number) => `${i + 1} ${project.layers[i].name}`;
    lines.push(
      `Bolts: ${formatQuantity(b.length_m, 'length', units)} long, ${formatQuantity(b.capacity_kN, 'boltForce', units)} each at ${formatQuantity(b.spacingAcross_m, 'length', units)} × ${formatQuantity(b.spacingAlong_m, 'length', units)}, anchorage ${formatQuantity(b.anchorage_m, 'length', units)}, ${b.action === 'suspension' ? 'suspension' : 'beam building'}`,
    );
    const r = s.bolts;
    if (r) {
      lines.push(`  anchor layer: ${r.anchorLayer === null ? 'none credited (the anchorage zone crosses an interface)' : layerName(r.anchorLayer)}`);
      if (r.suspended.length) {
        lines.push(`  suspended: ${r.suspended.map(layerName).join(', ')}; load per bolt ${formatQuantity(r.load_kN, 'boltForce', units)}, FS per bolt ${fs(r.fsBolt)} (target ${numberText(project.design.fsTarget.bolt, 3)})`);
      }
      if (r.composite) {
        lines.push(`  composite beam: ${r.composite.credited ? 'credited (bonded tension counts)' : 'not credited (unbonded tension counts)'}; least interlayer shear FS ${fs(r.composite.fsShear)} (target ${numberText(project.design.fsTarget.bolt, 3)})`);
      }
    }
  } else if (s && project.support.standing_kPa > 0) {
    lines.push(`Standing support: ${formatQuantity(project.support.standing_kPa, 'pressure', units)}`);
  }
  if (s?.neededReason) lines.push(`Support needed: ${s.neededReason}.`);
  if (s?.needed) {
    const n = s.needed;
    const q = (v: number | null, kind: 'length' | 'pressure') => (v === null ? 'none found' : formatQuantity(v, kind, units));
    lines.push(
      'Support needed (every other input held; every counted check meets its target):',
      `  smallest standing support       ${q(n.standing_kPa, 'pressure')}`,
      `  largest square bolt spacing     ${q(n.boltSpacing_m, 'length')}`,
      `  shortest bolt length            ${q(n.boltLength_m, 'length')}`,
      `  ${`largest ${words.span} with this support`.padEnd(32)}${q(n.maxSpan_m, 'length')}`,
      ...n.reasons.map((x) => `  ${x}`),
    );
  }
  const e = report.empirical;
  if (e) {
    lines.push(
      `Empirical cross-check (Q system, not counted): Q ${numberText(e.q, 3)}; largest unsupported ${qSpanWord(project.opening.type)} ${formatQuantity(e.unsupportedSpan_m, 'length', units)}; bolt length ${formatQuantity(e.boltLength_m, 'length', units)}.`,
      `  ${e.note}`,
    );
  }
  return lines;
}

export function checkText(project: Project, analysis: Analysis, units: UnitSystem): string {
  const r = analysis.report;
  const o = project.opening;
  const L = (v: number) => formatQuantity(v, 'length', units);
  const S = (v: number | null) => formatQuantity(v, 'stress', units);
  const P = (v: number) => formatQuantity(v, 'pressure', units);
  const lines: string[] = [];
  lines.push(`Lamina check — ${project.title}`, caution(), '');
  lines.push(
    o.type === 'intersection'
      ? `Opening: intersection, entries ${L(o.span_m)} × ${L(o.length_m ?? o.span_m)}, checked as a beam on the diagonal ${L(r.opening.designSpan_m)}, ${o.ends} ends`
      : `Opening: ${o.type}, ${o.type === 'cantilever' ? 'overhang' : 'span'} ${L(o.span_m)}${o.type === 'slab' && o.length_m !== null ? ` × length ${L(o.length_m)}` : ''}${o.type === 'cantilever' ? '' : `, ${o.ends} ${o.type === 'slab' ? 'edges' : 'ends'}`}${o.type === 'slab' && o.edges ? ` (short edges ${o.edges.short}, long edges ${o.edges.long})` : ''}`,
    `Loads: surcharge ${P(project.loads.surcharge_kPa)}, standing support ${P(project.support.standing_kPa)}, horizontal stress ${S(project.loads.horizontalStress_MPa)}`,
    `Design basis: ${project.design.basis}; tensile basis: ${project.design.tensileBasis}; crushing strength: ${project.design.crushingStrength}; characteristic value: ${project.design.characteristic}`,
    '',
  );
  const verdict = buildVerdict(project, r, units);
  const g = r.governing;
  r.layers.forEach((layer, i) => {
    const st = layer.strength;
    lines.push(`Layer ${i + 1}: ${layer.name} — thickness ${L(layer.thickness_m)}, bending group ${layer.group + 1}, load ${P(layer.load_kPa)}`);
    lines.push(
      `  Strength: lab ${S(st.lab_MPa)} → direct ${S(st.direct_MPa)} → characteristic ${S(st.characteristic_MPa)} → block ${S(st.block_MPa)}; rock mass ${S(st.mass_MPa)} → design ${S(st.design_MPa)}`,
      `            RQD ${numberText(st.rqd, 3)} %, GSI ${numberText(st.gsi, 3)}${st.crossJointed ? `, cross-jointed across the ${verdict.spanWord} (no tensile strength)` : ''}`,
    );
    const e = layer.elastic;
    lines.push(
      `  Elastic beam: net tension ${S(e.maxTension_MPa)} at the ${e.at}${e.midspanTension_MPa !== null ? `, midspan ${S(e.midspanTension_MPa)}` : ''}; deflection ${formatQuantity(e.deflection_mm, 'deflection', units)}; Euler stress ${S(e.bucklingStress_MPa)}`,
    );
    if (layer.plate) {
      lines.push(`  Plate: net tension ${S(layer.plate.maxTension_MPa)} at the ${layer.plate.at} (β ${numberText(layer.plate.beta, 4)}, α ${numberText(layer.plate.alpha, 4)}); deflection ${formatQuantity(layer.plate.deflection_mm, 'deflection', units)}`);
    }
    const v = layer.voussoir;
    if (v === null) lines.push('  Voussoir: not applicable (a jointed overhang has no capacity)');
    else if (v.snapThrough) lines.push('  Voussoir: SNAP-THROUGH — no compression arch can form');
    else if (v.n === null) lines.push('  Voussoir: no net load on this layer');
    else
      lines.push(
        `  Voussoir: n ${numberText(v.n, 3)}, lever arm ${L(v.leverArm_m ?? 0)}, fc ${S(v.maxCompression_MPa)}, deflection ${formatQuantity(v.deflection_mm, 'deflection', units)} (δ/t ${numberText(v.deflectionRatio, 3)})`,
      );
    lines.push(`  ${pad('check', 42)}${pad('FS', 9)}${pad('target', 8)}status`);
    for (const row of r.checks.filter((x) => x.layerIndex === i)) {
      const governs = g !== null && g.layerIndex === row.layerIndex && g.mode === row.mode;
      const why = row.reason ? `  (${row.reason})` : '';
      lines.push(`  ${pad(modeLabel(row.mode, r.opening.type), 42)}${pad(fs(row.fs), 9)}${pad(numberText(row.target, 3), 8)}${STATUS_TEXT[row.status]}${governs ? '  ← governing' : why}`);
    }
    lines.push('');
  });
  // The whole roof's row: an uncertainty run's P_f against the file's acceptable P_f (METHODS §16).
  const roof = r.checks.filter((x) => x.layerIndex === null);
  if (roof.length) {
    lines.push('Whole roof:', `  ${pad('check', 42)}${pad('FS', 9)}${pad('target', 8)}status`);
    for (const row of roof) lines.push(`  ${pad(modeLabel(row.mode, r.opening.type), 42)}${pad(fs(row.fs), 9)}${pad(numberText(row.target, 3), 8)}${STATUS_TEXT[row.status]}`, `    ${row.note}`);
    lines.push('');
  }
  lines.push('Verdict:');
  for (const s of verdict.sentences) lines.push(`  ${s.text}`);
  lines.push('', ...spanLines(r.maxSpan_m, units, verdict.spanWord));
  const support = supportLines(project, r, units);
  if (support.length) lines.push('', ...support);
  if (r.warnings.length) {
    lines.push('', 'Warnings:');
    for (const w of r.warnings) lines.push(`  ${w.level === 'error' ? '!!' : ' -'} [${w.code}] ${w.path ? `${w.path}: ` : ''}${w.message}`);
  }
  lines.push('', caution(), '');
  return lines.join('\n');
}
