/**
 * Largest span per mode (METHODS §11 v2): the largest s in [1 mm, 100 m] with FS(s) ≥ target
 * in every layer in which that mode counts at the current span (the check table's rule, §10),
 * all else fixed, found by bracketing and bisection to 1 mm; the bracket continues down to
 * 1 mm, so a mode that holds only at very short spans reports that span, and 0 only when it
 * fails even at 1 mm. Every value is therefore in [0, 100] or null (the mode counts in no
 * layer). Tension: strengths are held at the current-span values, and a layer with
 * cross-joints limits its tension span to its joint spacing (beyond it the layer is cracked);
 * a cross-jointed overhang has its uncracked strength up to its spacing. Snap-through: the
 * largest s with a voussoir solution. Deflection: δ/t ≤ limit. Sliding never limits the span
 * from above (null). For a slab the aspect ratio is held fixed; for an intersection the ratio
 * of the entry widths, and every value is an entry width w1 (the design span is the diagonal).
 * governing = the smallest non-null value.
 */
import type { MaxSpanReport, Mode } from '../model/types';
import { largestPassingSpan } from '../mechanics/span-search';
import { countedModesAt, deflectionFs, targetFor } from './check-table';
import type { State } from './evaluate';
import { elasticBeam } from '../mechanics/beam';
import { solveVoussoir, type VoussoirResult } from '../mechanics/voussoir';
import type { ProjectSI } from './inputs';

export const SPAN_CAP_M = 100;
/** Required accuracy is 1 mm; the search bisects ten times finer so the reported value is well inside it. */
export const SPAN_TOLERANCE_M = 1e-3;
/** Smallest span tried (METHODS §11 v2: the bracket continues down to 1 mm). */
export const SPAN_FLOOR_M = 1e-3;
const PASS = 1e12;

export type SpanFs = Record<Mode, number | null>;

/** Which layers take part in each mode: include(layerIndex, mode). */
export type SpanInclude = (layer: number, mode: Mode) => boolean;

/** The layers and modes counted at the current span (the check table's rule). */
export function countedInclude(p: ProjectSI, current: State): SpanInclude {
  const counted = countedModesAt(p, current);
  return (i, mode) => counted[i][mode];
}

type VoussoirMode = 'crushing' | 'sliding' | 'snapThrough' | 'deflection';
const VOUSSOIR: readonly VoussoirMode[] = ['crushing', 'sliding', 'snapThrough', 'deflection'];

/** FS of one layer in one voussoir mode (PASS where the value is null: no demand). */
function voussoirModeFs(v: VoussoirResult, mode: VoussoirMode, limit: number): number {
  if (v.snapThrough) return 0;
  switch (mode) {
    case 'snapThrough': return 1;
    case 'crushing': return v.fsCrushing ?? PASS;
    case 'sliding': return v.fsSliding ?? PASS;
    case 'deflection': return deflectionFs(v.deflectionRatio, limit) ?? PASS;
  }
}

/**
 * The span-dependent part of every layer, with the loads, moduli, strengths and plate
 * coefficients taken from the current state once (they do not depend on the span). Each
 * layer's voussoir solution is kept per span, so the modes share it. Spans here are DESIGN
 * spans (the diagonal for an intersection).
 */
function spanBeds(p: ProjectSI, current: State, include: SpanInclude) {
  const cantilever = current.ends === 'cantilever';
  return current.layers.map((layer, i) => {
    const input = p.layers[i];
    const beta = layer.plate ? layer.plate.coefficients.beta : null;
    const voussoirInput =
      !cantilever && layer.effectiveUnitWeight > 0
        ? { thickness: input.thickness, unitWeight: layer.effectiveUnitWeight, modulus: layer.modulusMass, ucs: layer.crushingStrength, frictionDeg: input.jointFriction, horizontalStress: p.horizontalStress }
        : null;
    const solved = new Map<number, VoussoirResult>();
    const modes = VOUSSOIR.filter((m) => include(i, m));
    return {
      tensionIncluded: include(i, 'tension'),
      voussoirIncluded: (mode: VoussoirMode) => voussoirInput !== null && modes.includes(mode),
      // beyond its joint spacing a layer is cracked: no tension capacity (METHODS §11)
      spacing: input.crossJointSpacing ?? Infinity,
      // a layer cross-jointed at the current span is tested with the strength it has below its spacing
      design: layer.chain.crossJointed ? layer.chain.designUncracked : layer.chain.design,
      /** FS tension at a span (PASS where there is no net tension). */
      tension(span: number): number {
        if (span > this.spacing) return 0;
        const t = input.thickness;
        const net =
          beta !== null
            ? (beta * layer.load * span * span) / (t * t) - p.horizontalStress
            : elasticBeam({ ends: current.ends, span, thickness: t, load: layer.load, modulus: layer.modulusBeam, horizontalStress: p.horizontalStress }).maxTension;
        return net > 0 ? this.design / net : PASS;
      },
      voussoir(span: number): VoussoirResult {
        let v = solved.get(span);
        if (!v) {
          v = solveVoussoir({ span, ...voussoirInput! });
          solved.set(span, v);
        }
        return v;
      },
    };
  });
}

/**
 * Least FS per mode over the included layers at a DESIGN span (the diagonal for an
 * intersection), strengths held at the current-span state. null: no included layer has the
 * mode. snapThrough: 1 stands, 0 snaps.
 */
export function spanFsFunction(p: ProjectSI, current: State, include: SpanInclude = countedInclude(p, current)): (span: number) => SpanFs {
  const limit = p.design.deflectionLimitRatio;
  const beds = spanBeds(p, current, include);
  const cache = new Map<number, SpanFs>();
  return (span: number): SpanFs => {
    const hit = cache.get(span);
    if (hit) return hit;
    const out: SpanFs = { tension: null, crushing: null, sliding: null, snapThrough: null, deflection: null };
    const least = (mode: Mode, value: number) => {
      const prev = out[mode];
      out[mode] = prev === null ? value : Math.min(prev, value);
    };
    for (const b of beds) {
      if (b.tensionIncluded) least('tension', b.tension(span));
      for (const mode of VOUSSOIR) if (b.voussoirIncluded(mode)) least(mode, voussoirModeFs(b.voussoir(span), mode, limit));
    }
    cache.set(span, out);
    return out;
  };
}

/**
 * Pass/fail of one mode at a design span for the search: the same minimum over the included
 * layers as `spanFsFunction`, but it stops at the first layer that fails, starting from the
 * layer that failed last (above the largest span most layers fail, so most samples cost one layer).
 */
function modePasses(p: ProjectSI, current: State, include: SpanInclude): (mode: Exclude<Mode, 'sliding'>, span: number) => boolean {
  const limit = p.design.deflectionLimitRatio;
  const beds = spanBeds(p, current, include);
  const lastFail: Partial<Record<Mode, number>> = {};
  return (mode, span) => {
    const target = targetFor(mode, p.design);
    const n = beds.length;
    const start = lastFail[mode] ?? 0;
    for (let k = 0; k < n; k++) {
      const i = (start + k) % n;
      const b = beds[i];
      let fs: number;
      if (mode === 'tension') {
        if (!b.tensionIncluded) continue;
        fs = b.tension(span);
      } else {
        if (!b.voussoirIncluded(mode)) continue;
        fs = voussoirModeFs(b.voussoir(span), mode, limit);
      }
      if (!(fs / target >= 1)) {
        lastFail[mode] = i;
        return false;
      }
    }
    return true;
  };
}

/**
 * Largest span per mode, as the entered span (entry width w1 for an intersection, with w2/w1
 * held); `fsAt` takes the design span. Modes counted in no layer are null.
 */
export function maxSpans(p: ProjectSI, current: State, fsAt: (span: number) => SpanFs = spanFsFunction(p, current)): MaxSpanReport {
  const here = fsAt(current.span);
  const passes = modePasses(p, current, countedInclude(p, current));
  const find = (mode: Exclude<Mode, 'sliding'>): number | null => {
    if (here[mode] === null) return null;
    return largestPassingSpan((w) => (passes(mode, w * p.spanScale) ? 1 : 0), { cap: SPAN_CAP_M, tolerance: SPAN_TOLERANCE_M / 10, floor: SPAN_FLOOR_M });
  };
  const tension = find('tension');
  const crushing = find('crushing');
  const snapThrough = find('snapThrough');
  const deflection = find('deflection');
  const candidates = [tension, crushing, snapThrough, deflection].filter((v): v is number => v !== null);
  return {
    tension,
    crushing,
    sliding: null,
    snapThrough,
    deflection,
    governing: candidates.length ? Math.min(...candidates) : null,
  };
}
