/**
 * Largest span per mode (METHODS §11 v2): the largest s in [1 mm, 100 m] with FS(s) ≥ target in
 * every layer, all else fixed, found by bracketing and bisection to 1 mm; the bracket continues
 * down to 1 mm, so a mode that holds only at very short spans reports that span, and 0 only
 * when it fails even at 1 mm. Every value is therefore in [0, 100] or null (mode not
 * applicable). Tension: only layers not cross-jointed at the current span take part (every
 * layer of a cantilever), with their strengths held at the current-span values; a layer with
 * cross-joints limits its tension span to its joint spacing (beyond it the layer is cracked),
 * and a cross-jointed overhang has its uncracked strength min(block, mass) up to its spacing.
 * Snap-through: the largest s with a voussoir solution in every layer. Deflection: δ/t ≤
 * limit. Sliding never limits the span from above (null). For a slab the aspect ratio is held
 * fixed. governing = the smallest non-null value (tension excluded when the basis is
 * "jointed", except for a cantilever).
 */
import type { MaxSpanReport, Mode } from '../model/types';
import { largestPassingSpan } from '../mechanics/span-search';
import { deflectionFs, targetFor } from './checks';
import type { State } from './evaluate';
import { elasticBeam } from '../mechanics/beam';
import { solveVoussoir } from '../mechanics/voussoir';
import type { ProjectSI } from './inputs';

export const SPAN_CAP_M = 100;
/** Required accuracy is 1 mm; the search bisects ten times finer so the reported value is well inside it. */
export const SPAN_TOLERANCE_M = 1e-3;
/** Smallest span tried (METHODS §11 v2: the bracket continues down to 1 mm). */
export const SPAN_FLOOR_M = 1e-3;
const PASS = 1e12;

export type SpanFs = Record<Mode, number | null>;

/**
 * Governing FS per mode at a span, strengths and cross-jointing held at the current-span state.
 * null: the mode does not apply. snapThrough: 1 stands, 0 snaps. Loads, moduli and plate
 * coefficients do not depend on the span, so they are taken from the current state once and
 * only the span-dependent kernels run per call (this is the span search's hot path).
 */
export function spanFsFunction(p: ProjectSI, current: State): (span: number) => SpanFs {
  const limit = p.design.deflectionLimitRatio;
  const cantilever = current.ends === 'cantilever';
  const beds = current.layers.map((layer, i) => {
    const input = p.layers[i];
    return {
      eligible: !layer.chain.crossJointed || cantilever,
      // beyond its joint spacing a layer is cracked: no tension capacity (METHODS §11)
      spacing: input.crossJointSpacing ?? Infinity,
      design: layer.chain.crossJointed ? Math.min(layer.chain.block, layer.chain.mass) : layer.chain.design,
      load: layer.load,
      thickness: input.thickness,
      modulusBeam: layer.modulusBeam,
      modulusMass: layer.modulusMass,
      beta: layer.plate ? layer.plate.coefficients.beta : null,
      voussoir: !cantilever && layer.effectiveUnitWeight > 0 ? { thickness: input.thickness, unitWeight: layer.effectiveUnitWeight, modulus: layer.modulusMass, ucs: input.ucs, frictionDeg: input.jointFriction } : null,
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
      if (b.eligible) {
        if (span > b.spacing) least('tension', 0);
        else {
          const tension =
            b.beta !== null
              ? (b.beta * b.load * span * span) / (b.thickness * b.thickness) - p.horizontalStress
              : elasticBeam({ ends: current.ends, span, thickness: b.thickness, load: b.load, modulus: b.modulusBeam, horizontalStress: p.horizontalStress }).maxTension;
          least('tension', tension > 0 ? b.design / tension : PASS);
        }
      }
      if (!b.voussoir) continue;
      const v = solveVoussoir({ span, ...b.voussoir });
      if (v.snapThrough) {
        least('snapThrough', 0);
        least('crushing', 0);
        least('sliding', 0);
        least('deflection', 0);
      } else {
        least('snapThrough', 1);
        least('crushing', v.fsCrushing ?? PASS);
        least('sliding', v.fsSliding ?? PASS);
        least('deflection', deflectionFs(v.deflectionRatio, limit) ?? PASS);
      }
    }
    cache.set(span, out);
    return out;
  };
}

export function maxSpans(p: ProjectSI, current: State, fsAt: (span: number) => SpanFs = spanFsFunction(p, current)): MaxSpanReport {
  const here = fsAt(current.span);
  const find = (mode: Mode): number | null => {
    if (here[mode] === null) return null;
    const target = targetFor(mode, p.design);
    return largestPassingSpan(
      (s) => {
        const fs = fsAt(s)[mode];
        return fs === null ? PASS : fs / target;
      },
      { cap: SPAN_CAP_M, tolerance: SPAN_TOLERANCE_M / 10, floor: SPAN_FLOOR_M },
    );
  };
  const tension = find('tension');
  const crushing = find('crushing');
  const snapThrough = find('snapThrough');
  const deflection = find('deflection');
  const tensionCounts = p.design.basis === 'intact' || current.ends === 'cantilever';
  const candidates = [tensionCounts ? tension : null, crushing, snapThrough, deflection].filter((v): v is number => v !== null);
  return {
    tension,
    crushing,
    sliding: null,
    snapThrough,
    deflection,
    governing: candidates.length ? Math.min(...candidates) : null,
  };
}
