/** The human-readable `check` and `span` output: every number with its unit. */
import type { Analysis } from '../analysis/types';
import type { MaxSpanReport, Project } from '../model/types';
import { CAUTION } from '../model/caution';
import { formatQuantity, type UnitSystem } from '../model/units';
import { MODE_LABEL, STATUS_TEXT } from '../analysis/check-labels';
import { buildVerdict } from '../analysis/verdict';
import { numberText } from '../report/number-text';

const fs = (x: number | null) => (x === null ? '—' : numberText(x, 3));

function pad(text: string, width: number): string {
  return text.length >= width ? text + ' ' : text + ' '.repeat(width - text.length);
}

export function caution(): string {
  return `CAUTION: ${CAUTION}`;
}

export function spanLines(maxSpan: MaxSpanReport | null, units: UnitSystem, word = 'span'): string[] {
  if (!maxSpan) return [`Largest ${word}: not computed.`];
  const q = (v: number | null) => (v === null ? 'n/a' : formatQuantity(v, 'length', units));
  return [
    `Largest ${word} meeting the targets (modes counted at the current ${word}; all else fixed, to 1 mm; search cap 100 m):`,
    `  tension       ${q(maxSpan.tension)}`,
    `  crushing      ${q(maxSpan.crushing)}`,
    `  sliding       ${q(maxSpan.sliding)}${maxSpan.sliding === null ? ' (FS sliding rises with span: never limits it)' : ''}`,
    `  snap-through  ${q(maxSpan.snapThrough)}`,
    `  deflection    ${q(maxSpan.deflection)}`,
    `  governing     ${q(maxSpan.governing)}`,
  ];
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
      `            RQD ${numberText(st.rqd, 3)} %, GSI ${numberText(st.gsi, 3)}${st.crossJointed ? ', cross-jointed across the span (no tensile strength)' : ''}`,
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
      lines.push(`  ${pad(MODE_LABEL[row.mode], 42)}${pad(fs(row.fs), 9)}${pad(numberText(row.target, 3), 8)}${STATUS_TEXT[row.status]}${governs ? '  ← governing' : why}`);
    }
    lines.push('');
  });
  lines.push('Verdict:');
  for (const s of verdict.sentences) lines.push(`  ${s.text}`);
  lines.push('', ...spanLines(r.maxSpan_m, units, verdict.spanWord));
  if (r.warnings.length) {
    lines.push('', 'Warnings:');
    for (const w of r.warnings) lines.push(`  ${w.level === 'error' ? '!!' : ' -'} [${w.code}] ${w.path ? `${w.path}: ` : ''}${w.message}`);
  }
  lines.push('', caution(), '');
  return lines.join('\n');
}
