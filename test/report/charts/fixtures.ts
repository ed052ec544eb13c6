/**
 * Hand-made inputs for the chart tests (fixed, so snapshots are stable). Values are invented
 * but plausible: a 6 m clamped room under a shale / sandstone / mudstone roof.
 */
import type { Analysis, BeamProfile, DesignChart, LabDetail, SlabField, SpanCurve, StrengthStep } from '../../../src/analysis/types';
import type { Layer, LayerReport, MaxSpanReport, Project, Report } from '../../../src/model/types';

export const EVIL = '<img src=x onerror=alert(1)>';

function layer(name: string, thickness_m: number, rockClass: Layer['rockClass'], youngModulus_GPa: number): Layer {
  return {
    name,
    thickness_m,
    unitWeight_kNm3: 25,
    youngModulus_GPa,
    modulusBasis: 'mass',
    poisson: 0.25,
    ucs_MPa: 40,
    rockClass,
    tensile: { value_MPa: 3, method: 'brazilian', specimens: [] },
    jointing: { crossJointSpacing_m: 8, fractureFrequency_per_m: 3, rqd: null, jointCondition: 20, jointFriction_deg: 35 },
    hoekBrown: { mi: 7, disturbance: 0 },
  };
}

export function project(name0 = 'Shale'): Project {
  return {
    schema: 'lamina/2',
    title: 'Fixture room',
    opening: { type: 'beam', span_m: 6, length_m: null, ends: 'clamped', edges: null },
    loads: { surcharge_kPa: 10, horizontalStress_MPa: 0 },
    support: { standing_kPa: 0, bolts: null },
    empirical: { q: null },
    layers: [layer(name0, 0.45, 'sedimentary', 8), layer('Sandstone', 1.8, 'igneous', 20), layer('Mudstone', 0.9, 'metamorphic', 6)],
    design: { fsTarget: { tension: 4, crushing: 2, sliding: 1.5, bolt: 1.5 }, deflectionLimitRatio: 0.1, characteristic: 'mean', basis: 'intact', tensileBasis: 'rockMass', crushingStrength: 'rockMass', planeStrainModulus: false },
  };
}

function layerReport(name: string, thickness_m: number, group: number): LayerReport {
  return {
    name,
    thickness_m,
    group,
    load_kPa: 11.25,
    strength: { lab_MPa: 3, direct_MPa: 2.1, characteristic_MPa: 2.1, block_MPa: 1.659, mass_MPa: 0.404, design_MPa: 0.404, rqd: 96.3, gsi: 78.2, crossJointed: false },
    elastic: { abutmentTension_MPa: 1, midspanTension_MPa: 0.5, maxTension_MPa: 1, at: 'abutment', deflection_mm: 0.625, fsTension: 0.404, bucklingStress_MPa: 148 },
    voussoir: { n: 0.74, leverArm_m: 0.2256, maxCompression_MPa: 1.348, deflection_mm: 2.36, deflectionRatio: 0.0052, fsCrushing: 29.7, fsSliding: 4.65, snapThrough: false },
    plate: null,
  };
}

export const MAX_SPAN: MaxSpanReport = { tension: 1.908, crushing: 15.35, sliding: null, snapThrough: 15.46, deflection: 12.58, governing: 1.908 };

export function analysis(p: Project = project()): Analysis {
  const report: Report = {
    schema: 'lamina-report/2',
    opening: { type: 'beam', span_m: 6, designSpan_m: 6, basis: 'span' },
    layers: [layerReport(p.layers[0].name, 0.45, 0), layerReport('Sandstone', 1.8, 1), layerReport('Mudstone', 0.9, 1)],
    checks: [],
    governing: { layerIndex: 0, layer: p.layers[0].name, mode: 'tension', fs: 0.404, target: 4 },
    maxSpan_m: MAX_SPAN,
    support: null,
    empirical: null,
    warnings: [],
    trace: [],
  };
  return {
    report,
    layers: [],
    grouping: [],
    groups: [
      { first: 0, last: 0, weight_kPa: 11.25, stiffness_GPam3: 0.729, extra_kPa: 0 },
      { first: 1, last: 2, weight_kPa: 67.5, stiffness_GPam3: 121.01, extra_kPa: 10 },
    ],
    separations: [[0, 1]],
  };
}

export function lab(id0 = 'B1'): LabDetail {
  const raw: Array<[string, number, boolean, string | null]> = [
    [id0, 4.37, true, null],
    ['B2', 4.1, true, null],
    ['B3', 3.2, false, 'not a central diametral fracture'],
    ['B4', 4.8, true, null],
    ['B5', 3.9, true, null],
  ];
  const specimens = raw.map(([id, b, accepted, reason], index) => ({
    index,
    id,
    diameter_mm: 54,
    thickness_mm: 27,
    peakLoad_kN: b * Math.PI * 54 * 27 / 2000,
    brazilian_MPa: b,
    direct_MPa: b * 0.7,
    accepted,
    reason,
    warnings: index === 3 ? ['L/D 0.15 below 0.2 (ASTM D3967)'] : [],
  }));
  return { source: 'specimens', method: 'brazilian', directFactor: 0.7, specimens, n: 4, mean_MPa: 2.996, sd_MPa: 0.22, cov: 0.073, kn: 2.63, characteristic_MPa: 2.42, rule: 'lower5' };
}

export function steps(reason0 = 'Brazilian mean of the accepted specimens.'): StrengthStep[] {
  return [
    { key: 'lab', label: 'lab', value_MPa: 3, reason: reason0, source: 'ISRM (1978)' },
    { key: 'direct', label: 'direct', value_MPa: 2.1, reason: 'Brazilian overstates direct tension; f = 0.7 for sedimentary rock.', source: 'Perras & Diederichs (2014)' },
    { key: 'characteristic', label: 'characteristic', value_MPa: 2.1, reason: 'Mean rule.', source: 'EN 1990 Annex D' },
    { key: 'block', label: 'block', value_MPa: 1.659, reason: 'Size effect to the block size.', source: 'Hoek & Brown (1980)' },
    { key: 'mass', label: 'rock mass', value_MPa: 0.404, reason: 'Hoek–Brown scaling with GSI 78.', source: 'Hoek, Carranza-Torres & Corkum (2002)' },
    { key: 'design', label: 'design', value_MPa: 0.404, reason: 'Least of block and rock mass.', source: 'METHODS §10' },
  ];
}

/** Clamped beam, q = 11.25 kPa, s = 6 m, t = 0.45 m, E = 8 GPa (hand formulas, Obert & Duvall). */
export function profile(): BeamProfile {
  const s = 6, t = 0.45, q = 11.25e3, E = 8e9;
  const I = t ** 3 / 12;
  const x_m: number[] = [];
  const top: number[] = [];
  const bottom: number[] = [];
  const defl: number[] = [];
  for (let i = 0; i <= 30; i++) {
    const x = (s * i) / 30;
    const M = (q / 12) * (6 * s * x - 6 * x * x - s * s); // sagging positive
    const sigma = (M * t) / 2 / I / 1e6;
    x_m.push(x);
    top.push(-sigma);
    bottom.push(sigma);
    defl.push(((q * x * x * (s - x) ** 2) / (24 * E * I)) * 1000);
  }
  return { layer: 0, x_m, topTension_MPa: top, bottomTension_MPa: bottom, deflection_mm: defl };
}

export function curve(): SpanCurve {
  const spans_m = Array.from({ length: 40 }, (_, i) => 0.5 + i * 0.5);
  return {
    spans_m,
    fs: {
      // FS ∝ 1/s² (Obert & Duvall); 0.404 at 6 m, so FS/target = 1 at 6·√(0.404/4) = 1.907 m
      tension: spans_m.map((s) => 0.404 * (6 / s) ** 2),
      crushing: spans_m.map((s) => 29.7 * (6 / s) ** 2),
      sliding: spans_m.map((s) => 4.65 * (s / 6)),
      deflection: spans_m.map((s) => (s < 16 ? 0.1 / (0.0052 * (s / 6) ** 3) : null)),
      snapThrough: spans_m.map((s) => (s <= 15.46 ? 1 : 0)),
    },
    targets: { tension: 4, crushing: 2, sliding: 1.5, deflection: 1, snapThrough: 1 },
    counts: { tension: true, crushing: true, sliding: true, deflection: true, snapThrough: true },
    currentSpan_m: 6,
  };
}

export function slab(): SlabField {
  const x_m = Array.from({ length: 19 }, (_, i) => (9 * i) / 18);
  const y_m = Array.from({ length: 13 }, (_, j) => (6 * j) / 12);
  const stress_MPa: number[] = [];
  for (const y of y_m) for (const x of x_m) stress_MPa.push(1.2 * Math.sin((Math.PI * x) / 9) * Math.sin((Math.PI * y) / 6));
  return { layer: 0, x_m, y_m, stress_MPa, maxTension_MPa: 1.2, at: 'centre' };
}

export function design(): DesignChart {
  const spans_m = Array.from({ length: 15 }, (_, i) => 2 + i);
  const thicknesses_m = Array.from({ length: 11 }, (_, j) => 0.2 + 0.1 * j);
  const grid = (f: (s: number, t: number) => number | null) => thicknesses_m.map((t) => spans_m.map((s) => f(s, t)));
  return {
    layer: 0,
    spans_m,
    thicknesses_m,
    fs: {
      tension: grid((s, t) => 0.404 * (6 / s) ** 2 * (t / 0.45)),
      crushing: grid((s, t) => 29.7 * (6 / s) ** 2 * (t / 0.45)),
      sliding: grid(() => null),
      deflection: grid((s, t) => 0.1 / (0.0052 * (s / 6) ** 3 * (0.45 / t) ** 2)),
      snapThrough: grid((s, t) => (s / t < 30 ? 1 : 0)),
    },
    targets: { tension: 4, crushing: 2, sliding: 1.5, deflection: 1, snapThrough: 1 },
    counts: { tension: true, crushing: true, sliding: true, deflection: true, snapThrough: true },
  };
}
