/**
 * An independent, deliberately plain implementation of METHODS.md §1–§3a, §5–§12 (standing
 * support), §14 and §15 (v2), written from the formulas alone and sharing no code with src/
 * (only the project types; Student t from jstat). It is slow on purpose: Diederichs & Kaiser's
 * 0.01 sweep with the fixed-point lever-arm iteration, and a linear scan plus bisection for the
 * spans. The reference test compares Lamina's report with it, including which checks count
 * and which governs. Plates are not re-derived here (their check is the series solution in the
 * plate tests).
 */
import jStat from 'jstat';
import type { Mode, Project } from '../../src/model/types';

const KN_TABLE: [number, number][] = [[3, 3.37], [4, 2.63], [5, 2.33], [6, 2.18], [8, 2.0], [10, 1.92], [20, 1.76], [30, 1.73]];

function kn(n: number): number | null {
  if (n < 3) return null;
  let k = KN_TABLE[0][1];
  for (const [m, v] of KN_TABLE) if (n >= m) k = v;
  return k; // the larger kn between tabulated n (value at the next lower tabulated n)
}

export interface RefLayer {
  lab: number; direct: number; characteristic: number; block: number; mass: number; design: number;
  rqd: number; gsi: number; crossJointed: boolean; group: number; load: number;
  abutment: number; midspan: number | null; maxTension: number; deflection: number; fsTension: number | null; buckling: number;
  voussoir: null | { snap: boolean; n: number; z: number; fc: number; delta: number; ratio: number; fsCrushing: number; fsSliding: number };
}

export interface RefReport {
  layers: RefLayer[];
  /** Design span (the diagonal for an intersection). */
  designSpan: number;
  /** Per layer: which modes count at the current span (METHODS §10). */
  counts: Record<Mode, boolean>[];
  governing: { layerIndex: number; mode: Mode; fs: number } | null;
  maxSpan: { tension: number | null; crushing: number | null; snapThrough: number | null; deflection: number | null };
}

/** D&K 0.01 sweep with the published fixed-point iteration (METHODS §3); σh adds to the crushing demand only (§3a). */
export function refVoussoir(s: number, t: number, g: number, E: number, ucs: number, phiDeg: number, sh = 0) {
  let best: { n: number; z: number; fc: number; z0: number } | null = null;
  for (let k = 1; k <= 99; k++) {
    const n = k / 100;
    const z0 = t * (1 - (2 * n) / 3);
    const L = s + (8 * z0 * z0) / (3 * s);
    let z = z0;
    let ok = true;
    for (let it = 0; it < 2000; it++) {
      const fc = (g * s * s) / (4 * n * z);
      const fav = (fc * (2 / 3 + n)) / 3;
      const dL = (fav * L) / E;
      const rad = ((3 * s) / 8) * ((8 * z0 * z0) / (3 * s) - dL);
      if (!(rad > 0)) { ok = false; break; }
      const zn = Math.sqrt(rad);
      if (Math.abs(zn - z) < 1e-12 * t) { z = zn; break; }
      z = zn;
    }
    if (!ok) continue;
    const fc = (g * s * s) / (4 * n * z);
    if (!best || fc < best.fc) best = { n, z, fc, z0 };
  }
  if (!best) return { snap: true as const, n: 0, z: 0, fc: 0, delta: 0, ratio: 0, fsCrushing: 0, fsSliding: 0 };
  const delta = best.z0 - best.z;
  return {
    snap: false as const, n: best.n, z: best.z, fc: best.fc, delta, ratio: delta / t,
    fsCrushing: ucs / (best.fc + Math.max(0, sh)), fsSliding: (best.fc * best.n * Math.tan((phiDeg * Math.PI) / 180)) / (g * s),
  };
}

export function reference(project: Project): RefReport {
  const o = project.opening;
  const ends = o.type === 'cantilever' ? 'cantilever' : o.ends;
  const sh = project.loads.horizontalStress_MPa * 1e6;
  const d = project.design;
  // Intersection: the design span is the diagonal of the entry widths (METHODS §14).
  const scale = o.type === 'intersection' ? Math.sqrt(o.span_m ** 2 + (o.length_m ?? o.span_m) ** 2) / o.span_m : 1;
  const span0 = o.span_m * scale;

  const layers0 = project.layers.map((l) => {
    const acc = l.tensile.specimens.filter((sp) => sp.valid && sp.thickness_mm <= sp.diameter_mm);
    const classF = { sedimentary: 0.7, igneous: 0.8, metamorphic: 0.9 }[l.rockClass];
    let lab: number, direct: number, characteristic: number, dLab: number;
    if (acc.length > 0) {
      const bz = acc.map((sp) => (2 * sp.peakLoad_kN * 1e3) / (Math.PI * sp.diameter_mm * 1e-3 * sp.thickness_mm * 1e-3));
      lab = bz.reduce((a, b) => a + b, 0) / bz.length;
      direct = classF * lab;
      const dv = bz.map((b) => classF * b);
      const mean = dv.reduce((a, b) => a + b, 0) / dv.length;
      const k = kn(dv.length);
      const n = dv.length;
      const sd = n > 1 ? Math.sqrt(dv.reduce((a, b) => a + (b - mean) ** 2, 0) / (n - 1)) : 0;
      if (d.characteristic === 'lower5' && k !== null) {
        characteristic = Math.max(0, mean * (1 - k * (sd / mean)));
      } else if (d.characteristic === 'cautiousMean' && n >= 2) {
        // EN 1997-1 §2.4.5.2: m(1 − t(0.95, n − 1)·V/√n)
        characteristic = Math.max(0, mean * (1 - (jStat.studentt.inv(0.95, n - 1) * (sd / mean)) / Math.sqrt(n)));
      } else if (d.characteristic === 'lower5Log' && k !== null) {
        // EN 1990 D7.3: exp(m_y − kn s_y), y = ln x
        const y = dv.map((x) => Math.log(x));
        const my = y.reduce((a, b) => a + b, 0) / n;
        const sy = Math.sqrt(y.reduce((a, b) => a + (b - my) ** 2, 0) / (n - 1));
        characteristic = Math.exp(my - k * sy);
      } else characteristic = mean;
      dLab = acc.reduce((a, sp) => a + sp.diameter_mm, 0) / acc.length;
    } else {
      lab = l.tensile.value_MPa! * 1e6;
      direct = (l.tensile.method === 'direct' ? 1 : classF) * lab;
      characteristic = direct;
      dLab = 54;
    }
    const j = l.jointing;
    const raw = Math.min(l.thickness_m, j.crossJointSpacing_m ?? Infinity, span0) * 1000;
    const dEff = Math.max(dLab, Math.min(raw, 200));
    const block = characteristic * Math.pow(dLab / dEff, 0.18);
    let rqd: number;
    if (j.rqd !== null) rqd = j.rqd;
    else {
      const lam = j.fractureFrequency_per_m ?? (j.crossJointSpacing_m !== null ? 1 / j.crossJointSpacing_m : null);
      rqd = lam === null ? 100 : 100 * Math.exp(-0.1 * lam) * (0.1 * lam + 1);
    }
    const gsi = Math.min(100, Math.max(0, 1.5 * j.jointCondition + rqd / 2));
    const D = l.hoekBrown.disturbance;
    const mb = l.hoekBrown.mi * Math.exp((gsi - 100) / (28 - 14 * D));
    const s = Math.exp((gsi - 100) / (9 - 3 * D));
    const a = 0.5 + (Math.exp(-gsi / 15) - Math.exp(-20 / 3)) / 6;
    const mass = (characteristic * s * l.hoekBrown.mi) / mb;
    const crossJointed = j.crossJointSpacing_m !== null && j.crossJointSpacing_m < span0;
    const uncracked = d.tensileBasis === 'lab' ? block : Math.min(block, mass);
    const design = crossJointed ? 0 : uncracked;
    const ucs = l.ucs_MPa * 1e6;
    const crushStrength = d.crushingStrength === 'lab' ? ucs : ucs * Math.pow(s, a);
    const Ei = l.youngModulus_GPa * 1e9;
    const Em = l.modulusBasis === 'intact' ? Ei * (0.02 + (1 - D / 2) / (1 + Math.exp((60 + 15 * D - gsi) / 11))) : Ei;
    const Eb = d.planeStrainModulus ? Em / (1 - l.poisson ** 2) : Em;
    return { l, lab, direct, characteristic, block, mass, design, uncracked, crushStrength, rqd, gsi, crossJointed, Em, Eb, t: l.thickness_m, g: l.unitWeight_kNm3 * 1e3 };
  });

  // Groups (self-weights only), then loads with surcharge on the top group and support on group 0.
  const groups: number[] = [];
  let start = 0;
  let gi = 0;
  const q1 = (a: number, b: number) => {
    let w = 0, k = 0;
    for (let i = a; i <= b; i++) { w += layers0[i].g * layers0[i].t; k += layers0[i].Eb * layers0[i].t ** 3; }
    return (layers0[a].Eb * layers0[a].t ** 3 * w) / k;
  };
  for (let i = 0; i < layers0.length; i++) {
    if (i > start && q1(start, i) < q1(start, i - 1)) { gi++; start = i; }
    groups.push(gi);
  }
  const nG = gi + 1;
  const loads = layers0.map((L, i) => {
    const g = groups[i];
    const idx = groups.map((x, k) => (x === g ? k : -1)).filter((k) => k >= 0);
    const down = idx.reduce((a, k) => a + layers0[k].g * layers0[k].t, 0) + (g === nG - 1 ? project.loads.surcharge_kPa * 1e3 : 0);
    // Standing support relieves at most the load on group 0 (METHODS §12).
    const w = down - (g === 0 ? Math.min(project.support.standing_kPa * 1e3, down) : 0);
    const k = idx.reduce((a, k) => a + layers0[k].Eb * layers0[k].t ** 3, 0);
    return (L.Eb * L.t ** 3 * w) / k;
  });

  const beamAt = (i: number, s: number) => {
    const { t, Eb } = layers0[i];
    const q = loads[i];
    const c = { clamped: [1 / 2, 1 / 4, 1 / 32, 3], simple: [0, 3 / 4, 5 / 32, 12], cantilever: [3, 0, 3 / 2, 48] }[ends];
    const abut = (c[0] * q * s * s) / (t * t) - sh;
    const mid = ends === 'cantilever' ? null : (c[1] * q * s * s) / (t * t) - sh;
    const max = ends === 'clamped' ? Math.max(abut, mid!) : ends === 'simple' ? mid! : abut;
    return { abut, mid, max, defl: (c[2] * q * s ** 4) / (Eb * t ** 3), buck: (Math.PI ** 2 * Eb * t * t) / (c[3] * s * s) };
  };

  const layers: RefLayer[] = layers0.map((L, i) => {
    const b = beamAt(i, span0);
    const fsTension = ends === 'cantilever' && L.crossJointed ? 0 : L.crossJointed || !(b.max > 0) ? null : L.design / b.max;
    const gEff = loads[i] / L.t;
    const v = ends === 'cantilever' || !(gEff > 0) ? null : refVoussoir(span0, L.t, gEff, L.Em, L.crushStrength, L.l.jointing.jointFriction_deg, sh);
    return {
      lab: L.lab, direct: L.direct, characteristic: L.characteristic, block: L.block, mass: L.mass, design: L.design,
      rqd: L.rqd, gsi: L.gsi, crossJointed: L.crossJointed, group: groups[i], load: loads[i],
      abutment: b.abut, midspan: b.mid, maxTension: b.max, deflection: b.defl, fsTension, buckling: b.buck, voussoir: v,
    };
  });

  // Which checks count (METHODS §10): cantilever → tension; otherwise an uncracked layer counts
  // tension, a cracked one (cross-jointed or basis "jointed") its voussoir unless a block (s/t < 2).
  const counts = layers0.map((L) => {
    const cracked = ends !== 'cantilever' && (L.crossJointed || d.basis === 'jointed');
    const arch = ends !== 'cantilever' && cracked && span0 / L.t >= 2;
    return { tension: !cracked, crushing: arch, sliding: arch, deflection: arch, snapThrough: arch } as Record<Mode, boolean>;
  });
  const target = (m: Mode) => (m === 'tension' ? d.fsTarget.tension : m === 'crushing' ? d.fsTarget.crushing : m === 'sliding' ? d.fsTarget.sliding : 1);
  let governing: RefReport['governing'] = null;
  let best = Infinity;
  layers.forEach((L, i) => {
    const v = L.voussoir;
    const fs: Record<Mode, number | null> = {
      tension: L.fsTension,
      crushing: v && !v.snap ? v.fsCrushing : null,
      sliding: v && !v.snap ? v.fsSliding : null,
      deflection: v && !v.snap ? (v.ratio > d.deflectionLimitRatio / 1e6 ? d.deflectionLimitRatio / v.ratio : 1e6) : null,
      snapThrough: v && v.snap ? 0 : null,
    };
    for (const m of ['tension', 'crushing', 'sliding', 'deflection', 'snapThrough'] as Mode[]) {
      const f = fs[m];
      if (!counts[i][m] || f === null) continue;
      if (f / target(m) < best) { best = f / target(m); governing = { layerIndex: i, mode: m, fs: f }; }
    }
  });

  // Largest spans (as entry widths w; design span w·scale): a plain scan from the top (0.25 m
  // steps, 0.02 m below 2 m, 1 mm below 0.02 m) and bisection to 0.1 mm, over the layers in
  // which the mode counts at the current span; a jointed layer's tension stops at its spacing.
  const ratioAt = (mode: 'tension' | 'crushing' | 'snapThrough' | 'deflection', w: number): number => {
    const s = w * scale;
    let r = Infinity;
    layers0.forEach((L, i) => {
      if (!counts[i][mode]) return;
      if (mode === 'tension') {
        const c = L.l.jointing.crossJointSpacing_m;
        if (c !== null && c < s) { r = 0; return; }
        const b = beamAt(i, s);
        const fs = b.max > 0 ? L.uncracked / b.max : Infinity;
        r = Math.min(r, fs / d.fsTarget.tension);
        return;
      }
      const gEff = loads[i] / L.t;
      if (!(gEff > 0)) return;
      const v = refVoussoir(s, L.t, gEff, L.Em, L.crushStrength, L.l.jointing.jointFriction_deg, sh);
      if (v.snap) { r = 0; return; }
      if (mode === 'crushing') r = Math.min(r, v.fsCrushing / d.fsTarget.crushing);
      if (mode === 'deflection') r = Math.min(r, d.deflectionLimitRatio / v.ratio);
    });
    return r;
  };
  const applies = (mode: 'tension' | 'crushing' | 'snapThrough' | 'deflection') =>
    mode === 'tension' ? counts.some((c) => c.tension) : counts.some((c, i) => c[mode] && loads[i] > 0);
  const largest = (mode: 'tension' | 'crushing' | 'snapThrough' | 'deflection'): number | null => {
    if (!applies(mode)) return null;
    const grid: number[] = [];
    for (let s = 0.001; s < 0.02; s += 0.001) grid.push(s);
    for (let s = 0.02; s < 2; s += 0.02) grid.push(s);
    for (let s = 2; s < 100; s += 0.25) grid.push(s);
    grid.push(100);
    if (ratioAt(mode, 100) >= 1) return 100;
    let pass = -1;
    for (let k = grid.length - 1; k >= 0; k--) if (ratioAt(mode, grid[k]) >= 1) { pass = k; break; }
    if (pass < 0) return 0;
    let lo = grid[pass], hi = grid[pass + 1];
    while (hi - lo > 1e-4) { const m = (lo + hi) / 2; if (ratioAt(mode, m) >= 1) lo = m; else hi = m; }
    return lo;
  };
  return { layers, designSpan: span0, counts, governing, maxSpan: { tension: largest('tension'), crushing: largest('crushing'), snapThrough: largest('snapThrough'), deflection: largest('deflection') } };
}
