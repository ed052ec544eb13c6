/**
 * analyse(project): the whole check of a roof or overhang — strength chain, layering, elastic
 * beam, plate, voussoir, governing mode, largest spans — as the public report (DESIGN.md) plus
 * the per-layer details the charts and the report need, with a calculation trace for every
 * reported number and every warning found on the way.
 */
import type { LayerReport, Project, Report, VoussoirReport, Warning } from '../model/types';
import type { Analysis, GroupDetail, GroupingDetail, LabDetail, LayerDetail, StrengthStep } from './types';
import { evaluate, groupingSteps, plateAspect, voussoirInputFor, type LayerState, type State } from './evaluate';
import { groupingTable, leverArmSteps, voussoirSearchSteps } from './iteration-trace';
import { projectToSI, type LayerSI, type ProjectSI } from './inputs';
import { allCountedMeet, BLOCK_RATIO, checkTable, DEEP_BEAM_RATIO, governingOf } from './check-table';
import { MODE_SHORT } from './check-labels';
import { maxSpans, spanFsFunction, SPAN_CAP_M, SPAN_FLOOR_M } from './span-finder';
import { SOURCES, TraceBuilder } from './trace';
import { beamCoefficients } from '../mechanics/beam';
import { specimenOutcomes } from '../strength/specimens';
import { empiricalReport, supportReport } from './support-report';
import { suspensionOf } from './support';
import { supportNeeded } from './support-needed';
import type { StrengthChain } from '../strength/chain';
import { inOpeningWords } from '../model/span-wording';

const MPa = 1e-6;
const kPa = 1e-3;
const GPa = 1e-9;
const mm = 1e3;

/** δ/t beyond which the small-deflection voussoir solution is past its range (METHODS §3a; Sofianos 1996). */
const LARGE_DEFLECTION_RATIO = 0.1;

export function analyse(project: Project): Analysis {
  return analyseWithState(project).analysis;
}

/** The analysis and the strength chains it used (the support-needed searches hold them fixed). */
function analyseWithState(project: Project): { analysis: Analysis; chains: StrengthChain[] } {
  const p = projectToSI(project);
  const state = evaluate(p);
  const warnings: Warning[] = [];
  const trace = new TraceBuilder(project.opening.type);

  const groups: GroupDetail[] = state.shared.groups.map((g) => ({
    first: g.first,
    last: g.last,
    weight_kPa: g.weight * kPa,
    stiffness_GPam3: g.stiffness * GPa,
    extra_kPa: g.extra * kPa,
  }));

  const layers: LayerReport[] = [];
  const details: LayerDetail[] = [];
  state.layers.forEach((ls, i) => {
    const { report, detail } = layerResults(p, state, i, ls, trace, warnings);
    layers.push(report);
    details.push(detail);
  });

  groupWarnings(p, state, warnings);
  const grouping = traceGrouping(p, state, trace);
  traceGroups(p, state, groups, trace);
  supportWarnings(p, state, warnings);

  // The opening as analysed: an intersection is checked on its diagonal (METHODS §14).
  const opening = {
    type: p.type,
    span_m: p.entrySpan,
    designSpan_m: p.span,
    basis: p.type === 'intersection' ? ('diagonal' as const) : ('span' as const),
  };
  if (p.type === 'intersection') {
    trace.add('opening.designSpan_m', 'Design span of the intersection (diagonal)', 'sqrt(w1^2 + w2^2)', { w1: [p.entrySpan, 'm'], w2: [p.entrySpan * Math.sqrt(p.spanScale ** 2 - 1), 'm'] },
      p.span, 'm', SOURCES.intersection, 'An intersection rests on pillar corners: it is checked as a beam spanning the diagonal of the entry widths.');
    warnings.push({ code: 'INTERSECTION_DIAGONAL', path: 'opening', message: `Intersection: checked as a beam (${p.ends} ends) spanning the diagonal ${round(p.span)} m of the ${round(p.entrySpan)} m and ${round(p.entrySpan * Math.sqrt(p.spanScale ** 2 - 1))} m entries; the largest spans are entry widths w1 with w2/w1 held.` });
  }

  // The check table and the governing check at the current span.
  const checks = checkTable(p, state);
  const governing = governingOf(checks);
  if (governing) {
    trace.add(
      'governing.fs',
      `Governing check: ${MODE_SHORT[governing.mode]} in ${governing.layer} (layer ${governing.layerIndex + 1})`,
      'FS',
      { FS: [governing.fs, ''] },
      governing.fs,
      '',
      SOURCES.lamina,
      `The smallest FS/target of the checks that count: FS ${round(governing.fs)} against a target of ${round(governing.target)}. ` +
        'A layer that does not crack counts its tension check; a cracked layer (cross-jointed, or basis "jointed") counts its voussoir checks; a block (s/t < 2) never counts its voussoir.',
    );
  }

  // Largest spans.
  const maxSpan = maxSpans(p, state, spanFsFunction(p, state));
  for (const mode of ['tension', 'crushing', 'snapThrough', 'deflection'] as const) {
    const value = maxSpan[mode];
    if (value === null) continue;
    trace.add(
      `maxSpan_m.${mode}`,
      `Largest ${p.type === 'cantilever' ? 'overhang' : p.type === 'intersection' ? 'entry width' : 'span'} for ${MODE_SHORT[mode]}`,
      's_max',
      { s_max: [value, 'm'] },
      value,
      'm',
      SOURCES.lamina,
      (value >= SPAN_CAP_M
        ? `The target holds at every span up to the ${SPAN_CAP_M} m search cap.`
        : value === 0
          ? `The ${MODE_SHORT[mode]} target is not met at any span down to ${SPAN_FLOOR_M * 1e3} mm, the smallest span searched.`
          : `Largest span with the ${MODE_SHORT[mode]} target met in every layer in which it counts at the current span, by bracketing and bisection to 1 mm; all else fixed.`) +
        (mode === 'tension' ? ' Strengths held at the current-span values; a layer with cross-joints is limited to its joint spacing (beyond it the layer is cracked).' : '') +
        (p.type === 'slab' ? ' Slab: the aspect ratio is held fixed.' : '') +
        (p.type === 'intersection' ? ' Intersection: the value is the entry width w1, with w2/w1 held and the diagonal analysed.' : ''),
    );
  }
  if (maxSpan.governing !== null) {
    trace.add('maxSpan_m.governing', 'Largest span meeting every counted target', 's_max', { s_max: [maxSpan.governing, 'm'] }, maxSpan.governing, 'm', SOURCES.lamina,
      'The smallest of the per-mode largest spans (each over the layers in which the mode counts).');
  }
  if (state.ends !== 'cantilever') {
    warnings.push({
      code: 'SLIDING_SPAN',
      path: 'maxSpan_m.sliding',
      message: 'FS sliding rises with span (fc grows as s²), so sliding never limits the span from above; a sliding shortfall is reported at the current span.',
    });
  }
  if (p.horizontalStress > 0 && state.ends !== 'cantilever') {
    warnings.push({
      code: 'HORIZONTAL_STRESS_VOUSSOIR',
      path: 'loads.horizontalStress_MPa',
      message: `The voussoir model (Diederichs & Kaiser 1999) has no in-situ horizontal stress. Lamina adds σh = ${round(p.horizontalStress * MPa)} MPa to the arch thrust in the crushing check (demand fc + σh) and gives it no credit in sliding or snap-through, which may relax once the roof cracks (METHODS §3a).`,
    });
  }
  if (p.type === 'slab' && p.length !== null && p.length / p.span > plateAspect(p)) {
    warnings.push({
      code: 'SLAB_STRIP',
      path: 'opening.length_m',
      message: `Slab: length/span ${round(p.length / p.span)} is above ${plateAspect(p)}; the plate is solved at length/span ${plateAspect(p)}, where it has reached its plane-strain strip limit (β and α change by less than 0.05 % beyond it).`,
    });
  }
  if (p.type === 'slab') {
    warnings.push({
      code: 'SLAB_PLANE_STRAIN',
      path: 'opening',
      message: 'Slab: the voussoir and span checks use the short span as a plane-strain beam (conservative); tension uses the plate stress; the largest spans keep the aspect ratio fixed.',
    });
  }

  const separations: Array<[number, number]> = [];
  for (let i = 1; i < state.layers.length; i++) if (state.layers[i].group !== state.layers[i - 1].group) separations.push([i - 1, i]);

  const report: Report = {
    schema: 'lamina-report/2',
    opening,
    layers,
    checks,
    governing,
    maxSpan_m: maxSpan,
    // The support needed is a separate search (`withSupportNeeded`): the plain analysis stays one pass.
    support: supportReport(project, p, state, trace, warnings, { needed: null, reason: null }),
    empirical: empiricalReport(project, p, state, trace),
    warnings: warnings.map((w) => ({ ...w, message: inOpeningWords(w.message, project.opening.type) })),
    trace: trace.entries,
  };
  return { analysis: { report, layers: details, groups, grouping, separations }, chains: state.layers.map((l) => l.chain) };
}

/**
 * The analysis with `report.support.needed` filled by the searches of `support-needed.ts`
 * (METHODS §12): for the CLI's support command and the report's support section.
 */
export function analyseWithSupportNeeded(project: Project): Analysis {
  const { analysis: a, chains } = analyseWithState(project);
  const n = supportNeeded(project, { chains, rows: a.report.checks });
  const support = a.report.support ?? { bolts: null, needed: null, neededReason: null };
  return { ...a, report: { ...a.report, support: { ...support, needed: n.needed, neededReason: n.reason } } };
}

export function analyseProject(project: Project): Report {
  return analyse(project).report;
}

/** True when every counted check meets its target (CLI exit code 0; 1 otherwise). */
export function meetsTargets(_project: Project, report: Report): boolean {
  return allCountedMeet(report.checks);
}

// ------------------------------------------------------------------ per layer

function layerResults(p: ProjectSI, state: State, i: number, ls: LayerState, trace: TraceBuilder, warnings: Warning[]): { report: LayerReport; detail: LayerDetail } {
  const layer = p.layers[i];
  const base = `layers[${i}]`;
  const chain = ls.chain;
  for (const w of chain.warnings) warnings.push({ code: w.code, path: `${base}.${w.path}`, message: `${layer.name}: ${w.message}` });

  const lab = labDetail(layer, ls, p);
  const steps = strengthSteps(layer, ls, p);
  traceStrength(base, layer, ls, p, lab, trace);

  // Moduli.
  const E_in = layer.modulus;
  if (layer.modulusBasis === 'intact') {
    trace.add(`detail.${base}.modulusMass_GPa`, `Rock-mass modulus of ${layer.name}`, 'Ei * (0.02 + (1 - D / 2) / (1 + exp((60 + 15 * D - GSI) / 11)))',
      { Ei: [E_in * GPa, 'GPa'], D: [layer.disturbance, ''], GSI: [chain.gsi, ''] }, ls.modulusMass * GPa, 'GPa', SOURCES.hoekDiederichs,
      'modulusBasis "intact": the intact modulus is reduced to the rock mass with GSI.');
  }
  if (p.design.planeStrainModulus) {
    trace.add(`detail.${base}.modulusUsed_GPa`, `Plane-strain modulus of ${layer.name}`, 'Em / (1 - nu^2)', { Em: [ls.modulusMass * GPa, 'GPa'], nu: [layer.poisson, ''] },
      ls.modulusBeam * GPa, 'GPa', SOURCES.obertDuvall, 'Option planeStrainModulus: E/(1 − ν²) in the elastic beam and layering.');
  }

  // Load.
  const g = state.shared.groups[ls.group];
  if (suspensionOf(p)?.suspended.includes(i)) {
    trace.add(`${base}.load_kPa`, `Load carried by ${layer.name} over the opening (suspended)`, '0 kPa', {}, 0, 'kPa', 'Suspension principle (Obert & Duvall 1967); statics',
      'This layer hangs from the bolts: its weight goes to the bolts and from them to the anchor layer’s group; over the opening it carries nothing (its skin between bolts is checked instead).');
  } else if (g.first === g.last) {
    trace.add(`${base}.load_kPa`, `Load carried by ${layer.name}`, 'gamma * t + p_x', { gamma: [layer.unitWeight * kPa, 'kN/m^3'], t: [layer.thickness, 'm'], p_x: [g.extra * kPa, 'kPa'] },
      ls.load * kPa, 'kPa', SOURCES.obertDuvall, extraNote(p, state, ls.group, state.shared.groups.length));
  } else {
    trace.add(`${base}.load_kPa`, `Load carried by ${layer.name} (shared in group ${ls.group + 1})`, 'Ei * t^3 * (W + p_x) / S',
      { Ei: [ls.modulusBeam * GPa, 'GPa'], t: [layer.thickness, 'm'], W: [g.weight * kPa, 'kPa'], p_x: [g.extra * kPa, 'kPa'], S: [g.stiffness * GPa, 'GPa m^3'] },
      ls.load * kPa, 'kPa', SOURCES.obertDuvall, `Layers ${g.first + 1}–${g.last + 1} bend together and share the load in proportion to E t³. ${extraNote(p, state, ls.group, state.shared.groups.length)}`);
  }
  if (!(ls.load > 0) && !(state.shared.supportExcess > 0) && !suspensionOf(p)?.suspended.includes(i)) {
    warnings.push({ code: 'NO_NET_LOAD', path: `${base}`, message: `${layer.name}: no net load on this layer (q = ${round(ls.load * kPa)} kPa); bending and voussoir checks show no demand.` });
  }
  const slenderness = state.span / layer.thickness;
  if (slenderness <= DEEP_BEAM_RATIO) {
    const block = slenderness < BLOCK_RATIO && state.ends !== 'cantilever';
    warnings.push({
      code: 'DEEP_BEAM',
      path: `${base}.thickness_m`,
      message: `${layer.name}: ${state.ends === 'cantilever' ? 'overhang' : 'span'}/thickness ${round(slenderness)} ≤ ${DEEP_BEAM_RATIO}, a deep beam: beam theory and the voussoir arch assume a slender layer, so its beam${state.ends === 'cantilever' ? '' : ' and voussoir'} results are approximate.` +
        (block ? ` With s/t < ${BLOCK_RATIO} it is a block rather than a beam: its voussoir checks are shown but not counted. A block cut by joints must be checked as a block (joint geometry, in-situ stress), which Lamina does not model.` : ''),
    });
  }

  const elastic = elasticReport(base, layer, ls, state, p, trace, warnings);
  const voussoir = voussoirReport(base, layer, ls, state, p, trace, warnings);
  const plate = plateReport(base, layer, ls, p, trace);

  // FS tension.
  if (ls.fsTension !== null && ls.fsTensionNote === null) {
    const demandPath = plate ? `${base}.plate.maxTension_MPa` : `${base}.elastic.maxTension_MPa`;
    trace.add(`${base}.elastic.fsTension`, `FS tension of ${layer.name}`, 'sigma_d / sigma_max', { sigma_d: [chain.design * MPa, 'MPa'], sigma_max: [ls.maxTension * MPa, 'MPa'] },
      ls.fsTension, '', SOURCES.lamina, `Design tensile strength over the net maximum tension (${demandPath}).`);
  } else if (ls.fsTensionNote === 'crossJointed') {
    // The strength chain has already warned (CROSS_JOINTED) with the spacing and the span.
  } else if (ls.fsTensionNote === 'jointedOverhang') {
    trace.add(`${base}.elastic.fsTension`, `FS tension of ${layer.name}`, '0', {}, 0, '', SOURCES.crossJoint, 'A cross-jointed overhang has no tensile strength and no arch to fall back on: no capacity.');
    warnings.push({ code: 'JOINTED_OVERHANG', path: `${base}.jointing.crossJointSpacing_m`, level: 'error',
      message: `${layer.name}: cross-joints cut the overhang; a jointed cantilever has no capacity (FS 0). Remove or support the overhang.` });
  } else if (ls.fsTensionNote === 'noNetTension') {
    warnings.push({ code: 'NO_NET_TENSION', path: `${base}.elastic.fsTension`,
      message: `${layer.name}: no net tension (horizontal stress ${round(p.horizontalStress * MPa)} MPa ≥ bending tension ${round((ls.maxTension + p.horizontalStress) * MPa)} MPa); FS tension not applicable.` });
  }

  const report: LayerReport = {
    name: layer.name,
    thickness_m: layer.thickness,
    group: ls.group,
    load_kPa: ls.load * kPa,
    strength: {
      lab_MPa: chain.lab * MPa,
      direct_MPa: chain.direct * MPa,
      characteristic_MPa: chain.characteristic * MPa,
      block_MPa: chain.block * MPa,
      mass_MPa: chain.mass * MPa,
      design_MPa: chain.design * MPa,
      rqd: chain.rqd,
      gsi: chain.gsi,
      crossJointed: chain.crossJointed,
    },
    elastic,
    voussoir,
    plate,
  };
  const v = ls.voussoir;
  const detail: LayerDetail = {
    lab,
    steps,
    modulusUsed_GPa: ls.modulusBeam * GPa,
    modulusMass_GPa: ls.modulusMass * GPa,
    effectiveUnitWeight_kNm3: ls.effectiveUnitWeight * kPa,
    hoekBrown: { mb: chain.mb, s: chain.s, a: chain.a, massUcs_MPa: chain.massUcs * MPa },
    blockSize: { dLab_mm: chain.dLab_mm, dEffRaw_mm: chain.dEffRaw_mm, dEff_mm: chain.dEff_mm, clamped: chain.sizeClamped, factor: chain.sizeFactor },
    voussoirSteps:
      v && !v.snapThrough && v.initialLeverArm !== null && v.arcLength !== null && v.averageStress !== null && v.shortening !== null
        ? { initialLeverArm_m: v.initialLeverArm, arcLength_m: v.arcLength, averageStress_MPa: v.averageStress * MPa, shortening_mm: v.shortening * mm }
        : null,
    fractureFrequency_per_m: chain.fractureFrequency,
  };
  return { report, detail };
}

function extraNote(p: ProjectSI, state: State, group: number, count: number): string {
  const parts: string[] = [];
  if (group === count - 1 && p.surcharge !== 0) parts.push(`surcharge ${round(p.surcharge * kPa)} kPa on the top group`);
  if (group === 0 && p.support !== 0) {
    const applied = state.shared.supportApplied;
    parts.push(applied < p.support
      ? `standing support ${round(p.support * kPa)} kPa on group 1, capped at the ${round(applied * kPa)} kPa it can relieve`
      : `standing support ${round(p.support * kPa)} kPa (upward) on group 1`);
  }
  return parts.length ? `p_x: ${parts.join(', ')}.` : 'No surcharge or support on this group (p_x = 0).';
}

/** Standing support beyond the load it relieves is dropped (METHODS §12). */
function supportWarnings(p: ProjectSI, state: State, warnings: Warning[]): void {
  const excess = state.shared.supportExcess;
  if (!(excess > 0)) return;
  warnings.push({
    code: 'SUPPORT_EXCEEDS_LOAD',
    path: 'support.standing_kPa',
    message: `Standing support ${round(p.support * kPa)} kPa exceeds the ${round(state.shared.supportApplied * kPa)} kPa of load it can relieve on the lowest bending group; the excess ${round(excess * kPa)} kPa is dropped (it would lift the roof). The loads it relieves are taken as 0, never negative.`,
  });
}

function labDetail(layer: LayerSI, ls: LayerState, p: ProjectSI): LabDetail {
  const chain = ls.chain;
  const factor = chain.directFactor;
  const red = chain.reduction;
  const outcome = specimenOutcomes(red, layer.specimens.length);
  const specimens = layer.specimens.map((sp, index) => {
    const accepted = outcome.accepted[index];
    const rejected = outcome.rejected[index];
    const brazilian = (2 * sp.peakLoad) / (Math.PI * sp.diameter * sp.thickness);
    return {
      index,
      id: sp.id,
      diameter_mm: sp.diameter * 1e3,
      thickness_mm: sp.thickness * 1e3,
      peakLoad_kN: sp.peakLoad * 1e-3,
      brazilian_MPa: (accepted ? accepted.brazilian : brazilian) * MPa,
      direct_MPa: (accepted ? accepted.brazilian : brazilian) * MPa * factor,
      accepted: Boolean(accepted),
      reason: rejected ? rejected.reason : null,
      warnings: outcome.warnings[index].map((w) => w.message),
    };
  });
  return {
    source: chain.source,
    method: chain.labMethod,
    directFactor: factor,
    specimens,
    n: chain.stats ? chain.stats.n : 0,
    mean_MPa: chain.stats ? chain.stats.mean * MPa : null,
    sd_MPa: chain.stats ? chain.stats.sd * MPa : null,
    cov: chain.stats ? chain.stats.cov : null,
    kn: chain.kn,
    characteristic_MPa: chain.characteristic * MPa,
    rule: p.design.characteristic,
  };
}

function strengthSteps(layer: LayerSI, ls: LayerState, p: ProjectSI): StrengthStep[] {
  const c = ls.chain;
  const steps: StrengthStep[] = [
    {
      key: 'lab',
      label: c.labMethod === 'brazilian' ? 'Lab (Brazilian)' : 'Lab (direct)',
      value_MPa: c.lab * MPa,
      reason: c.source === 'specimens' ? `Mean of ${c.stats?.n ?? 0} accepted Brazilian discs, 2P/(πDL).` : `Tensile strength given (${c.labMethod}).`,
      source: c.source === 'specimens' ? SOURCES.brazilian : 'Project input',
    },
    {
      key: 'direct',
      label: 'Direct tension',
      value_MPa: c.direct * MPa,
      reason: c.directFactor === 1 ? 'Already a direct tensile strength (factor 1).' : `Brazilian overestimates direct tension: × ${c.directFactor} for ${layer.rockClass} rock.`,
      source: SOURCES.perras,
    },
    {
      key: 'characteristic',
      label: 'Characteristic',
      value_MPa: c.characteristic * MPa,
      reason:
        c.kn === null
          ? 'Mean value used.'
          : p.design.characteristic === 'lower5'
            ? `5 % fractile m(1 − kn V), kn = ${c.kn}, V = ${round(c.stats?.cov ?? 0)}.`
            : p.design.characteristic === 'cautiousMean'
              ? `Cautious mean m(1 − t V/√n), t/√n = ${round(c.kn)}, V = ${round(c.stats?.cov ?? 0)}.`
              : `Lognormal 5 % fractile exp(m_y − kn s_y), kn = ${c.kn}.`,
      source: c.kn === null ? SOURCES.statistics : p.design.characteristic === 'cautiousMean' ? SOURCES.en1997 : p.design.characteristic === 'lower5Log' ? SOURCES.en1990Log : SOURCES.en1990,
    },
    {
      key: 'block',
      label: 'Block scale',
      value_MPa: c.block * MPa,
      reason: `Size effect (d_lab/d_eff)^0.18 with d_lab ${round(c.dLab_mm)} mm, d_eff ${round(c.dEff_mm)} mm${c.sizeClamped ? ` (raw ${round(c.dEffRaw_mm)} mm clamped to the law's 200 mm range)` : ''}.`,
      source: SOURCES.sizeEffect,
    },
    {
      key: 'mass',
      label: 'Rock mass',
      value_MPa: c.mass * MPa,
      reason: `Hoek–Brown scaling s·mi/mb with GSI ${round(c.gsi)} (RQD ${round(c.rqd)}).`,
      source: SOURCES.hoekBrown,
    },
    {
      key: 'design',
      label: 'Design',
      value_MPa: c.design * MPa,
      reason: c.crossJointed
        ? 'Cross-jointed across the span: no tensile strength across joints.'
        : c.tensileBasis === 'lab'
          ? 'Tensile basis "lab": the block-scale strength.'
          : 'Tensile basis "rockMass": the smaller of block-scale and rock-mass strength.',
      source: c.crossJointed ? SOURCES.crossJoint : SOURCES.lamina,
    },
  ];
  return steps;
}

function traceStrength(base: string, layer: LayerSI, ls: LayerState, p: ProjectSI, lab: LabDetail, trace: TraceBuilder): void {
  const c = ls.chain;
  const accepted = lab.specimens.filter((s) => s.accepted);
  for (const sp of lab.specimens) {
    trace.add(`detail.${base}.lab.specimens[${sp.index}].brazilian_MPa`, `Brazilian strength of disc ${sp.id}`, '2 * P / (pi * D * L)',
      { P: [sp.peakLoad_kN, 'kN'], D: [sp.diameter_mm, 'mm'], L: [sp.thickness_mm, 'mm'] }, sp.brazilian_MPa, 'MPa', SOURCES.brazilian,
      sp.accepted ? undefined : `Not used: ${sp.reason}.`);
  }
  if (c.source === 'specimens') {
    const symbols = accepted.map((_, k) => `B${k + 1}`);
    const values = Object.fromEntries(accepted.map((sp, k) => [`B${k + 1}`, [sp.brazilian_MPa, 'MPa'] as [number, string]]));
    trace.add(`${base}.strength.lab_MPa`, `Lab tensile strength of ${layer.name}`, `(${symbols.join(' + ')}) / ${accepted.length}`, values, c.lab * MPa, 'MPa', SOURCES.brazilian,
      `Mean of the ${accepted.length} accepted Brazilian discs.`);
  } else {
    trace.add(`${base}.strength.lab_MPa`, `Lab tensile strength of ${layer.name}`, 'sigma_lab', { sigma_lab: [c.lab * MPa, 'MPa'] }, c.lab * MPa, 'MPa', 'Project input', `Given value (${c.labMethod}).`);
  }
  trace.add(`${base}.strength.direct_MPa`, `Direct tensile strength of ${layer.name}`, 'f * sigma_lab', { f: [c.directFactor, ''], sigma_lab: [c.lab * MPa, 'MPa'] },
    c.direct * MPa, 'MPa', SOURCES.perras, c.directFactor === 1 ? 'Direct test: factor 1.' : `Brazilian → direct factor for ${layer.rockClass} rock.`);
  if (c.source === 'specimens' && c.stats) {
    const values = Object.fromEntries(c.directValues.map((v, k) => [`T${k + 1}`, [v * MPa, 'MPa'] as [number, string]]));
    const symbols = c.directValues.map((_, k) => `T${k + 1}`);
    trace.add(`detail.${base}.lab.mean_MPa`, `Mean direct strength of ${layer.name}`, `(${symbols.join(' + ')}) / ${symbols.length}`, values, c.stats.mean * MPa, 'MPa', SOURCES.statistics);
    if (c.stats.n > 1) {
      const dev = symbols.map((s) => `(${s} - m)^2`).join(' + ');
      trace.add(`detail.${base}.lab.sd_MPa`, `Standard deviation of ${layer.name}`, `sqrt((${dev}) / ${symbols.length - 1})`, { ...values, m: [c.stats.mean * MPa, 'MPa'] }, c.stats.sd * MPa, 'MPa', SOURCES.statistics, 'Sample standard deviation (n − 1).');
      trace.add(`detail.${base}.lab.cov`, `Coefficient of variation of ${layer.name}`, 'sd / m', { sd: [c.stats.sd * MPa, 'MPa'], m: [c.stats.mean * MPa, 'MPa'] }, c.stats.cov, '', SOURCES.statistics);
    }
    const rule = p.design.characteristic;
    if (rule === 'lower5' && c.kn !== null) {
      const raw = c.stats.mean * (1 - c.kn * c.stats.cov);
      trace.add(`${base}.strength.characteristic_MPa`, `Characteristic (5 % fractile) of ${layer.name}`, raw >= 0 ? 'm * (1 - kn * V)' : 'max(m * (1 - kn * V), 0 MPa)',
        { m: [c.stats.mean * MPa, 'MPa'], kn: [c.kn, ''], V: [c.stats.cov, ''] }, c.characteristic * MPa, 'MPa', SOURCES.en1990, `kn for n = ${c.stats.n} (table value; the larger kn between tabulated n).`);
    } else if (rule === 'cautiousMean' && c.kn !== null) {
      const raw = c.stats.mean * (1 - c.kn * c.stats.cov);
      trace.add(`${base}.strength.characteristic_MPa`, `Characteristic (cautious mean) of ${layer.name}`, raw >= 0 ? 'm * (1 - k * V)' : 'max(m * (1 - k * V), 0 MPa)',
        { m: [c.stats.mean * MPa, 'MPa'], k: [c.kn, ''], V: [c.stats.cov, ''] }, c.characteristic * MPa, 'MPa', SOURCES.en1997, `k = t(0.95, n − 1)/√n for n = ${c.stats.n}: the cautious estimate of the mean for a failure involving a large volume of ground.`);
    } else if (rule === 'lower5Log' && c.kn !== null && c.logStats) {
      trace.add(`${base}.strength.characteristic_MPa`, `Characteristic (lognormal 5 % fractile) of ${layer.name}`, 'exp(m_y - kn * s_y) * 1 MPa',
        { m_y: [c.logStats.mean - Math.log(1e6), ''], kn: [c.kn, ''], s_y: [c.logStats.sd, ''] }, c.characteristic * MPa, 'MPa', SOURCES.en1990Log, `y = ln(strength in MPa); kn for n = ${c.stats.n} (Table D1, V unknown).`);
    } else {
      trace.add(`${base}.strength.characteristic_MPa`, `Characteristic strength of ${layer.name}`, 'm', { m: [c.characteristic * MPa, 'MPa'] }, c.characteristic * MPa, 'MPa', SOURCES.statistics,
        rule !== 'mean' ? `Too few accepted specimens for rule "${rule}": the mean is used.` : 'Rule "mean": the mean direct strength.');
    }
  } else {
    trace.add(`${base}.strength.characteristic_MPa`, `Characteristic strength of ${layer.name}`, 'sigma_direct', { sigma_direct: [c.direct * MPa, 'MPa'] }, c.characteristic * MPa, 'MPa', 'Project input',
      'A given value is used as the characteristic value.');
  }
  trace.add(`${base}.strength.block_MPa`, `Block-scale strength of ${layer.name}`, 'sigma_k * (d_lab / d_eff)^0.18',
    { sigma_k: [c.characteristic * MPa, 'MPa'], d_lab: [c.dLab_mm, 'mm'], d_eff: [c.dEff_mm, 'mm'] }, c.block * MPa, 'MPa', SOURCES.sizeEffect,
    `d_eff = min(thickness, cross-joint spacing, span) = ${round(c.dEffRaw_mm)} mm` + (c.sizeClamped ? `, clamped to [d_lab, 200 mm] (the range the law was fitted on) = ${round(c.dEff_mm)} mm.` : '.'));

  // RQD, GSI, Hoek–Brown.
  if (c.rqdSource === 'given') {
    trace.add(`${base}.strength.rqd`, `RQD of ${layer.name}`, 'RQD', { RQD: [c.rqd, ''] }, c.rqd, '', 'Project input (core logging)');
  } else if (c.rqdSource === 'none') {
    trace.add(`${base}.strength.rqd`, `RQD of ${layer.name}`, '100', {}, c.rqd, '', SOURCES.priestHudson, 'No RQD, fracture frequency or cross-joint spacing given: RQD 100.');
  } else {
    trace.add(`${base}.strength.rqd`, `RQD of ${layer.name}`, '100 * exp(-0.1 * lambda) * (0.1 * lambda + 1)', { lambda: [c.fractureFrequency ?? 0, ''] }, c.rqd, '', SOURCES.priestHudson,
      c.rqdSource === 'spacing' ? 'λ (per metre) = 1 / cross-joint spacing.' : 'λ: fractures per metre from core logging.');
  }
  trace.add(`${base}.strength.gsi`, `GSI of ${layer.name}`, 'min(max(1.5 * JCond89 + RQD / 2, 0), 100)', { JCond89: [layer.jointCondition, ''], RQD: [c.rqd, ''] }, c.gsi, '', SOURCES.gsi);
  trace.add(`detail.${base}.hoekBrown.mb`, `Hoek–Brown mb of ${layer.name}`, 'mi * exp((GSI - 100) / (28 - 14 * D))', { mi: [layer.mi, ''], GSI: [c.gsi, ''], D: [layer.disturbance, ''] }, c.mb, '', SOURCES.hoekBrown);
  trace.add(`detail.${base}.hoekBrown.s`, `Hoek–Brown s of ${layer.name}`, 'exp((GSI - 100) / (9 - 3 * D))', { GSI: [c.gsi, ''], D: [layer.disturbance, ''] }, c.s, '', SOURCES.hoekBrown);
  trace.add(`detail.${base}.hoekBrown.a`, `Hoek–Brown a of ${layer.name}`, '1 / 2 + (exp(-GSI / 15) - exp(-20 / 3)) / 6', { GSI: [c.gsi, ''] }, c.a, '', SOURCES.hoekBrown);
  trace.add(`detail.${base}.hoekBrown.massUcs_MPa`, `Rock-mass UCS of ${layer.name}`, 'sigma_ci * s^a', { sigma_ci: [layer.ucs * MPa, 'MPa'], s: [c.s, ''], a: [c.a, ''] }, c.massUcs * MPa, 'MPa', SOURCES.hoekBrown,
    p.design.crushingStrength === 'rockMass' ? 'Used as the crushing strength of the voussoir (crushingStrength "rockMass").' : undefined);
  trace.add(`${base}.strength.mass_MPa`, `Rock-mass tensile strength of ${layer.name}`, 'sigma_k * s * mi / mb', { sigma_k: [c.characteristic * MPa, 'MPa'], s: [c.s, ''], mi: [layer.mi, ''], mb: [c.mb, ''] },
    c.mass * MPa, 'MPa', SOURCES.hoekBrown, 'The measured tensile strength scaled by the Hoek–Brown ratio of rock-mass to intact tensile strength, (s σci/mb)/(σci/mi).');
  if (c.crossJointed) {
    trace.add(`${base}.strength.design_MPa`, `Design tensile strength of ${layer.name}`, '0 MPa', {}, 0, 'MPa', SOURCES.crossJoint,
      `Cross-joint spacing ${round(layer.crossJointSpacing ?? 0)} m < span ${round(p.span)} m: no tensile strength across the joints.`);
  } else {
    if (p.design.tensileBasis === 'lab') {
      trace.add(`${base}.strength.design_MPa`, `Design tensile strength of ${layer.name}`, 'sigma_block', { sigma_block: [c.block * MPa, 'MPa'] },
        c.design * MPa, 'MPa', SOURCES.lamina, 'Tensile basis "lab": the characteristic direct strength with the size effect, the basis on which Obert & Duvall’s tension factors of 4–8 were set.');
    } else {
      trace.add(`${base}.strength.design_MPa`, `Design tensile strength of ${layer.name}`, 'min(sigma_block, sigma_mass)', { sigma_block: [c.block * MPa, 'MPa'], sigma_mass: [c.mass * MPa, 'MPa'] },
        c.design * MPa, 'MPa', SOURCES.lamina, 'Tensile basis "rockMass": the lab strength scaled to the rock mass.');
    }
  }
}

function elasticReport(base: string, layer: LayerSI, ls: LayerState, state: State, p: ProjectSI, trace: TraceBuilder, warnings: Warning[]): LayerReport['elastic'] {
  const b = ls.beam;
  const ends = state.ends;
  const c = beamCoefficients(ends);
  const common = { q: [ls.load * kPa, 'kPa'] as [number, string], s: [state.span, 'm'] as [number, string], t: [layer.thickness, 'm'] as [number, string], sigma_h: [p.horizontalStress * MPa, 'MPa'] as [number, string] };
  const where = { clamped: 'at the abutment (top fibre)', simple: 'at the abutment (no end moment)', cantilever: 'at the root (top fibre)' }[ends];
  const abutmentFormula = ends === 'clamped' ? 'q * s^2 / (2 * t^2) - sigma_h' : ends === 'simple' ? '-sigma_h' : '3 * q * s^2 / t^2 - sigma_h';
  const abutmentValues = ends === 'simple' ? { sigma_h: common.sigma_h } : common;
  trace.add(`${base}.elastic.abutmentTension_MPa`, `Net tension ${where}, ${layer.name}`, abutmentFormula, abutmentValues, b.abutmentTension * MPa, 'MPa', SOURCES.obertDuvall,
    'Bending tension less the horizontal stress (compression positive), superposed as a uniform compression.');
  if (b.midspanTension !== null) {
    const midFormula = ends === 'clamped' ? 'q * s^2 / (4 * t^2) - sigma_h' : '3 * q * s^2 / (4 * t^2) - sigma_h';
    trace.add(`${base}.elastic.midspanTension_MPa`, `Net tension at midspan (bottom fibre), ${layer.name}`, midFormula, common, b.midspanTension * MPa, 'MPa', SOURCES.obertDuvall);
  }
  const maxFormula = b.at === 'midspan' ? (ends === 'clamped' ? 'q * s^2 / (4 * t^2) - sigma_h' : '3 * q * s^2 / (4 * t^2) - sigma_h') : abutmentFormula;
  trace.add(`${base}.elastic.maxTension_MPa`, `Maximum net tension of the beam, ${layer.name}`, maxFormula, b.at === 'midspan' || ends !== 'simple' ? common : abutmentValues, b.maxTension * MPa, 'MPa', SOURCES.obertDuvall,
    `Occurs ${b.at === 'midspan' ? 'at midspan (bottom fibre)' : where}.` + (p.type === 'slab' ? ' Beam value on the short span; FS tension of a slab uses the plate stress.' : ''));
  const g = state.shared.groups[ls.group];
  const defFormula = ends === 'clamped' ? 'q * s^4 / (32 * Ei * t^3)' : ends === 'simple' ? '5 * q * s^4 / (32 * Ei * t^3)' : '3 * q * s^4 / (2 * Ei * t^3)';
  trace.add(`${base}.elastic.deflection_mm`, `Maximum elastic deflection, ${layer.name}`, defFormula, { q: common.q, s: common.s, t: common.t, Ei: [ls.modulusBeam * GPa, 'GPa'] }, b.deflection * mm, 'mm', SOURCES.obertDuvall,
    g.first === g.last ? undefined : `Same as the group's deflection with the group load and Σ E t³ (layers ${g.first + 1}–${g.last + 1} share curvature).`);
  const eulerFormula = `pi^2 * Ei * t^2 / (${c.euler} * s^2)`;
  trace.add(`${base}.elastic.bucklingStress_MPa`, `Euler stress of ${layer.name}`, eulerFormula, { Ei: [ls.modulusBeam * GPa, 'GPa'], t: common.t, s: common.s }, b.bucklingStress * MPa, 'MPa', SOURCES.euler,
    'Reported for comparison with the horizontal stress; no P-δ amplification is applied to the bending stress.');
  if (p.horizontalStress >= b.bucklingStress) {
    warnings.push({ code: 'BUCKLING', level: 'error', path: `${base}.elastic.bucklingStress_MPa`,
      message: `${layer.name}: horizontal stress ${round(p.horizontalStress * MPa)} MPa ≥ Euler stress ${round(b.bucklingStress * MPa)} MPa: the bed can buckle; the beam results do not apply.` });
  } else if (p.horizontalStress >= b.bucklingStress / 2) {
    warnings.push({ code: 'BUCKLING_RISK', path: `${base}.elastic.bucklingStress_MPa`,
      message: `${layer.name}: horizontal stress ${round(p.horizontalStress * MPa)} MPa ≥ half the Euler stress (${round(b.bucklingStress * MPa)} MPa): risk of bed buckling and guttering.` });
  }
  return {
    abutmentTension_MPa: b.abutmentTension * MPa,
    midspanTension_MPa: b.midspanTension === null ? null : b.midspanTension * MPa,
    maxTension_MPa: b.maxTension * MPa,
    at: b.at,
    deflection_mm: b.deflection * mm,
    fsTension: ls.fsTension,
    bucklingStress_MPa: b.bucklingStress * MPa,
  };
}

function voussoirReport(base: string, layer: LayerSI, ls: LayerState, state: State, p: ProjectSI, trace: TraceBuilder, warnings: Warning[]): VoussoirReport | null {
  if (state.ends === 'cantilever') {
    if (base === 'layers[0]') {
      warnings.push({ code: 'NO_VOUSSOIR_OVERHANG', path: 'opening.type', message: 'Cantilever: a jointed or cracked overhang cannot form a voussoir arch and has no capacity; only the intact-beam tension check applies.' });
    }
    return null;
  }
  const v = ls.voussoir;
  const empty: VoussoirReport = { n: null, leverArm_m: null, maxCompression_MPa: null, deflection_mm: null, deflectionRatio: null, fsCrushing: null, fsSliding: null, snapThrough: false };
  if (!v) return empty;
  if (v.snapThrough || v.n === null || v.leverArm === null || v.initialLeverArm === null || v.arcLength === null || v.maxCompression === null || v.averageStress === null || v.shortening === null || v.deflection === null || v.deflectionRatio === null) {
    warnings.push({ code: 'SNAP_THROUGH', level: 'error', path: `${base}.voussoir.snapThrough`,
      message: `${layer.name}: as a jointed (voussoir) beam it snaps through — no compression arch can form at a ${round(state.span)} m span.` });
    return { ...empty, snapThrough: true };
  }
  const s: [number, string] = [state.span, 'm'];
  const t: [number, string] = [layer.thickness, 'm'];
  const n: [number, string] = [v.n, ''];
  const note = p.type === 'slab' ? 'Slab: plane-strain beam on the short span (conservative).' : undefined;
  const nEntry = trace.add(`${base}.voussoir.n`, `Compression-zone depth ratio of ${layer.name}`, 'n', { n }, v.n, '', SOURCES.voussoir,
    'The equilibrium n minimises fc over (0, 1) (bracketed search, same minimum as a 0.01 sweep or better).');
  const input = voussoirInputFor(layer, state.span, layer.thickness, ls.effectiveUnitWeight, ls.modulusMass, ls.crushingStrength, p.horizontalStress);
  const search = voussoirSearchSteps(input);
  // The recorded search is the reported one (same kernel, same input); attach it only then.
  if (search && search.n === v.n) nEntry.steps = search.steps;
  trace.add(`detail.${base}.voussoirSteps.initialLeverArm_m`, `Initial lever arm z0, ${layer.name}`, 't * (1 - 2 * n / 3)', { t, n }, v.initialLeverArm, 'm', SOURCES.voussoir);
  trace.add(`detail.${base}.voussoirSteps.arcLength_m`, `Arch length L, ${layer.name}`, 's + 8 * z0^2 / (3 * s)', { s, z0: [v.initialLeverArm, 'm'] }, v.arcLength, 'm', SOURCES.voussoir);
  trace.add(`${base}.voussoir.maxCompression_MPa`, `Maximum arch compression fc, ${layer.name}`, 'gamma_e * s^2 / (4 * n * z)', { gamma_e: [ls.effectiveUnitWeight * kPa, 'kN/m^3'], s, n, z: [v.leverArm, 'm'] },
    v.maxCompression * MPa, 'MPa', SOURCES.voussoir, `γ' = q/t = ${round(ls.load * kPa)} kPa / ${round(layer.thickness)} m (shared load, surcharge and support included).` + (note ? ` ${note}` : ''));
  trace.add(`detail.${base}.voussoirSteps.averageStress_MPa`, `Average arch stress fav, ${layer.name}`, 'fc * (2 / 3 + n) / 3', { fc: [v.maxCompression * MPa, 'MPa'], n }, v.averageStress * MPa, 'MPa', SOURCES.voussoir);
  trace.add(`detail.${base}.voussoirSteps.shortening_mm`, `Elastic arch shortening ΔL, ${layer.name}`, 'fav * L / Em', { fav: [v.averageStress * MPa, 'MPa'], L: [v.arcLength, 'm'], Em: [ls.modulusMass * GPa, 'GPa'] },
    v.shortening * mm, 'mm', SOURCES.voussoir, layer.modulusBasis === 'intact' ? 'Em: rock-mass modulus (Hoek & Diederichs 2006).' : 'Em: modulus as given (rock mass).');
  const zEntry = trace.add(`${base}.voussoir.leverArm_m`, `Lever arm z, ${layer.name}`, 'sqrt((3 * s / 8) * (8 * z0^2 / (3 * s) - dL))', { s, z0: [v.initialLeverArm, 'm'], dL: [v.shortening * mm, 'mm'] }, v.leverArm, 'm', SOURCES.voussoir,
    'Converged value of the iteration (the largest root of z³ − z0² z + K = 0).');
  if (nEntry.steps) zEntry.steps = leverArmSteps(input, v.n);
  trace.add(`${base}.voussoir.deflection_mm`, `Voussoir midspan deflection, ${layer.name}`, 'z0 - z', { z0: [v.initialLeverArm, 'm'], z: [v.leverArm, 'm'] }, v.deflection * mm, 'mm', SOURCES.voussoir);
  trace.add(`${base}.voussoir.deflectionRatio`, `Deflection ratio δ/t, ${layer.name}`, 'delta / t', { delta: [v.deflection * mm, 'mm'], t }, v.deflectionRatio, '', SOURCES.voussoir,
    `Limit ${p.design.deflectionLimitRatio}: δ/t ≈ 0.1 marks the onset of non-linear response, ≈ 0.25 is ultimate.`);
  if (v.deflectionRatio > LARGE_DEFLECTION_RATIO) {
    warnings.push({ code: 'LARGE_DEFLECTION', path: `${base}.voussoir.deflectionRatio`,
      message: `${layer.name}: voussoir δ/t = ${round(v.deflectionRatio)} > ${LARGE_DEFLECTION_RATIO}: the small-deflection solution is past its range (Sofianos 1996; Brady & Brown §8.5), so the other voussoir numbers of this layer are no longer reliable.` });
  }
  const shUsed = Math.max(0, p.horizontalStress);
  trace.add(`${base}.voussoir.fsCrushing`, `FS crushing, ${layer.name}`, 'sigma_c / (fc + sigma_h)',
    { sigma_c: [ls.crushingStrength * MPa, 'MPa'], fc: [v.maxCompression * MPa, 'MPa'], sigma_h: [shUsed * MPa, 'MPa'] }, v.fsCrushing ?? 0, '', SOURCES.voussoirCrushing,
    (p.design.crushingStrength === 'lab' ? 'σc: the layer UCS as given (crushingStrength "lab").' : 'σc: the rock-mass UCS σci·s^a (crushingStrength "rockMass").') +
      ' The in-situ horizontal stress is added to the arch thrust (the voussoir model has none; conservative)' +
      (p.horizontalStress < 0 ? '; a tensile σh is taken as 0.' : '.') + ' Sliding and snap-through take no credit for σh.');
  trace.add(`${base}.voussoir.fsSliding`, `FS sliding at the abutment, ${layer.name}`, 'fc * n * tan(phi) / (gamma_e * s)', { fc: [v.maxCompression * MPa, 'MPa'], n, phi: [layer.jointFriction, 'deg'], gamma_e: [ls.effectiveUnitWeight * kPa, 'kN/m^3'], s },
    v.fsSliding ?? 0, '', SOURCES.voussoir);
  return {
    n: v.n,
    leverArm_m: v.leverArm,
    maxCompression_MPa: v.maxCompression * MPa,
    deflection_mm: v.deflection * mm,
    deflectionRatio: v.deflectionRatio,
    fsCrushing: v.fsCrushing,
    fsSliding: v.fsSliding,
    snapThrough: false,
  };
}

function plateReport(base: string, layer: LayerSI, ls: LayerState, p: ProjectSI, trace: TraceBuilder): LayerReport['plate'] {
  const pl = ls.plate;
  if (!pl) return null;
  const c = pl.coefficients;
  const ratio = (p.length ?? p.span) / p.span;
  const strip = ratio > plateAspect(p) ? ` (solved at b/a = ${plateAspect(p)}: a longer plate has reached its plane-strain strip limit)` : '';
  const note = `β, α from Lamina's plate solution for b/a = ${round(ratio)}${strip}, ${p.ends} edges, ν = ${layer.poisson} (${c.method}; estimated error ${(c.errorEstimate * 100).toFixed(2)} %).`;
  trace.add(`${base}.plate.beta`, `Plate stress coefficient β, ${layer.name}`, 'beta', { beta: [c.beta, ''] }, c.beta, '', SOURCES.plate, note);
  trace.add(`${base}.plate.alpha`, `Plate deflection coefficient α, ${layer.name}`, 'alpha', { alpha: [c.alpha, ''] }, c.alpha, '', SOURCES.plate, note);
  trace.add(`${base}.plate.maxTension_MPa`, `Maximum net plate tension, ${layer.name}`, 'beta * q * a^2 / t^2 - sigma_h',
    { beta: [c.beta, ''], q: [ls.load * kPa, 'kPa'], a: [p.span, 'm'], t: [layer.thickness, 'm'], sigma_h: [p.horizontalStress * MPa, 'MPa'] }, pl.maxTension * MPa, 'MPa', SOURCES.plate, `At the ${c.at} (${c.face} face).`);
  trace.add(`${base}.plate.deflection_mm`, `Plate deflection, ${layer.name}`, 'alpha * q * a^4 / (Em * t^3)', { alpha: [c.alpha, ''], q: [ls.load * kPa, 'kPa'], a: [p.span, 'm'], Em: [ls.modulusMass * GPa, 'GPa'], t: [layer.thickness, 'm'] },
    pl.deflection * mm, 'mm', SOURCES.plate);
  return { maxTension_MPa: pl.maxTension * MPa, at: c.at, deflection_mm: pl.deflection * mm, beta: c.beta, alpha: c.alpha };
}

function groupWarnings(p: ProjectSI, state: State, warnings: Warning[]): void {
  for (let i = 1; i < state.layers.length; i++) {
    if (state.layers[i].group !== state.layers[i - 1].group) {
      warnings.push({ code: 'BED_SEPARATION', path: `layers[${i}]`,
        message: `Bed separation predicted between ${p.layers[i - 1].name} and ${p.layers[i].name}: the upper bed is stiffer and does not load the layers below (it starts bending group ${state.layers[i].group + 1}).` });
    }
  }
}

/** Each test of the group formation as a trace entry: the load on the group's lowest layer with the next layer added. */
function traceGrouping(p: ProjectSI, state: State, trace: TraceBuilder): GroupingDetail[] {
  const steps = groupingSteps(p, state.layers.map((ls) => ({ beam: ls.modulusBeam })));
  const names = p.layers.map((l) => l.name);
  steps.forEach((st, j) => {
    const idx = Array.from({ length: st.layer - st.first + 1 }, (_, k) => st.first + k);
    const values: Record<string, [number, string]> = {};
    idx.forEach((i, k) => {
      values[`g${k + 1}`] = [p.layers[i].unitWeight * kPa, 'kN/m^3'];
      values[`t${k + 1}`] = [p.layers[i].thickness, 'm'];
      values[`E${k + 1}`] = [state.layers[i].modulusBeam * GPa, 'GPa'];
    });
    const weight = idx.map((_, k) => `g${k + 1} * t${k + 1}`).join(' + ');
    const stiffness = idx.map((_, k) => `E${k + 1} * t${k + 1}^3`).join(' + ');
    const lowest = names[st.first];
    const entry = trace.add(`detail.grouping[${j}].with_kPa`, `Does ${names[st.layer]} bend with the group of ${lowest}? Load on ${lowest} with it`,
      `E1 * t1^3 * (${weight}) / (${stiffness})`, values, st.with * kPa, 'kPa', SOURCES.obertDuvall,
      `Load on ${lowest} without it ${round(st.without * kPa)} kPa, with it ${round(st.with * kPa)} kPa. ` +
        (st.joins ? `${round(st.with * kPa)} ≥ ${round(st.without * kPa)}: ${names[st.layer]} loads the layers below and bends with them.` : `${round(st.with * kPa)} < ${round(st.without * kPa)}: ${names[st.layer]} is stiffer, separates and starts the next group.`) +
        ' Self-weights only (METHODS §2).');
    if (j === 0) entry.steps = groupingTable(steps, names);
  });
  return steps.map((st) => ({ layer: st.layer, first: st.first, without_kPa: st.without * kPa, with_kPa: st.with * kPa, joins: st.joins }));
}

function traceGroups(p: ProjectSI, state: State, groups: GroupDetail[], trace: TraceBuilder): void {
  groups.forEach((g, k) => {
    if (g.first === g.last) return;
    const idx = Array.from({ length: g.last - g.first + 1 }, (_, j) => g.first + j);
    const wValues = Object.fromEntries(idx.flatMap((i, j) => [[`g${j + 1}`, [p.layers[i].unitWeight * kPa, 'kN/m^3']], [`t${j + 1}`, [p.layers[i].thickness, 'm']]])) as Record<string, [number, string]>;
    trace.add(`detail.groups[${k}].weight_kPa`, `Self-weight of group ${k + 1}`, idx.map((_, j) => `g${j + 1} * t${j + 1}`).join(' + '), wValues, g.weight_kPa, 'kPa', SOURCES.obertDuvall);
    const sValues = Object.fromEntries(idx.flatMap((i, j) => [[`E${j + 1}`, [state.layers[i].modulusBeam * GPa, 'GPa']], [`t${j + 1}`, [p.layers[i].thickness, 'm']]])) as Record<string, [number, string]>;
    trace.add(`detail.groups[${k}].stiffness_GPam3`, `Bending stiffness Σ E t³ of group ${k + 1}`, idx.map((_, j) => `E${j + 1} * t${j + 1}^3`).join(' + '), sValues, g.stiffness_GPam3, 'GPa m^3', SOURCES.obertDuvall);
  });
}

function round(x: number): string {
  if (!Number.isFinite(x)) return String(x);
  const a = Math.abs(x);
  return a >= 100 ? x.toFixed(0) : a >= 10 ? x.toFixed(1) : a >= 1 ? x.toFixed(2) : x.toPrecision(3);
}
