/**
 * Largest span per mode (METHODS §11, v2): the largest s in (0, 100 m] with FS(s) ≥ target in
 * every layer in which that mode counts at the current span (the check table's rule, §10), all
 * else fixed, found by bracketing and bisection to 1 mm. Tension: strengths are held at the
 * current-span values, and a layer with cross-joints limits its tension span to its joint
 * spacing (beyond it the layer is cracked: no tensile strength). Snap-through: the largest s
 * with a voussoir solution. Deflection: δ/t ≤ limit. Sliding never limits the span from above
 * (null). For a slab the aspect ratio is held fixed; for an intersection the ratio of the entry
 * widths, and every value is an entry width w1 (the design span is the diagonal).
 * governing = the smallest non-null value.
 */
import type { MaxSpanReport, Mode } from '../model/types';
import { largestPassingSpan } from '../mechanics/span-search';
import { countedModesAt, deflectionFs, targetFor } from './check-table';
import type { State } from './evaluate';
import { elasticBeam } from '../mechanics/beam';
import { solveVoussoir } from '../mechanics/voussoir';
import type { ProjectSI } from './inputs';

export const SPAN_CAP_M = 100;
/** Required accuracy is 1 mm; the search bisects ten times finer so the reported value is well inside it. */
export const SPAN_TOLERANCE_M = 1e-3;
const PASS = 1e12;

export type SpanFs = Record<Mode, number | null>;

/** Which layers take part in each mode: include(layerIndex, mode). */
export type SpanInclude = (layer: number, mode: Mode) => boolean;

/** The layers and modes counted at the current span (the check table's rule). */
export function countedInclude(p: ProjectSI, current: State): SpanInclude {
  const counted = countedModesAt(p, current);
  return (i, mode) => counted[i][mode];
}

/**
 * Least FS per mode over the included layers at a DESIGN span (the diagonal for an
 * intersection), strengths held at the current-span state. null: no included layer has the
 * mode. snapThrough: 1 stands, 0 snaps. Loads, moduli and plate coefficients do not depend on
 * the span, so they are taken from the current state once and only the span-dependent kernels
 * run per call (the span search's hot path).
 */
export function spanFsFunction(p: ProjectSI, current: State, include: SpanInclude = countedInclude(p, current)): (span: number) => SpanFs {
  const limit = p.design.deflectionLimitRatio;
  const cantilever = current.ends === 'cantilever';
  const beds = current.layers.map((layer, i) => {
    const input = p.layers[i];
    return {
      tension: include(i, 'tension'),
      voussoirModes: (['crushing', 'sliding', 'deflection', 'snapThrough'] as Mode[]).filter((m) => include(i, m)),
      // A layer cross-jointed at the current span is tested with the strength it has below its joint spacing.
      design: layer.chain.crossJointed ? layer.chain.designUncracked : layer.chain.design,
      jointSpacing: input.crossJointSpacing,
      load: layer.load,
      thickness: input.thickness,
      modulusBeam: layer.modulusBeam,
      beta: layer.plate ? layer.plate.coefficients.beta : null,
      voussoir: !cantilever && layer.effectiveUnitWeight > 0
        ? { thickness: input.thickness, unitWeight: layer.effectiveUnitWeight, modulus: layer.modulusMass, ucs: layer.crushingStrength, frictionDeg: input.jointFriction, horizontalStress: p.horizontalStress }
        : null,
    };
  });
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
      if (b.tension) {
        if (b.jointSpacing !== null && b.jointSpacing < span) least('tension', 0); // cracked: no tensile strength
        else {
          const tension =
            b.beta !== null
              ? (b.beta * b.load * span * span) / (b.thickness * b.thickness) - p.horizontalStress
              : elasticBeam({ ends: current.ends, span, thickness: b.thickness, load: b.load, modulus: b.modulusBeam, horizontalStress: p.horizontalStress }).maxTension;
          least('tension', tension > 0 ? b.design / tension : PASS);
        }
      }
      if (!b.voussoir || b.voussoirModes.length === 0) continue;
      const v = solveVoussoir({ span, ...b.voussoir });
      for (const m of b.voussoirModes) {
        if (v.snapThrough) least(m, 0);
        else if (m === 'snapThrough') least(m, 1);
        else if (m === 'crushing') least(m, v.fsCrushing ?? PASS);
        else if (m === 'sliding') least(m, v.fsSliding ?? PASS);
        else least(m, deflectionFs(v.deflectionRatio, limit) ?? PASS);
      }
    }
    cache.set(span, out);
    return out;
  };
}

/**
 * Largest span per mode, as the entered span (entry width w1 for an intersection); `fsAt`
 * takes the design span. Modes counted in no layer are null.
 */
export function maxSpans(p: ProjectSI, current: State, fsAt: (span: number) => SpanFs = spanFsFunction(p, current)): MaxSpanReport {
  const here = fsAt(current.span);
  const find = (mode: Mode): number | null => {
    if (here[mode] === null) return null;
    const target = targetFor(mode, p.design);
    return largestPassingSpan(
      (w) => {
        const fs = fsAt(w * p.spanScale)[mode];
        return fs === null ? PASS : fs / target;
      },
      { cap: SPAN_CAP_M, tolerance: SPAN_TOLERANCE_M / 10 },
    );
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
