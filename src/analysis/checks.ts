/**
 * Checks per layer and mode, and the governing one (METHODS §10): of all applicable checks,
 * the smallest FS/target. Deflection enters with FS = limit/(δ/t) against 1; snap-through
 * counts as FS 0. With `design.basis` "jointed" the roof is taken as cracked: tension is
 * reported but excluded (except for a cantilever, which has no post-cracking reserve).
 */
import type { Design, Mode } from '../model/types';
import type { LayerState, State } from './evaluate';

export interface Check {
  layer: number;
  mode: Mode;
  fs: number;
  target: number;
  /** fs / target: below 1 fails. */
  ratio: number;
  /** Counted in `governing` (tension is not when basis is "jointed"). */
  counts: boolean;
}

export function targetFor(mode: Mode, design: Design): number {
  switch (mode) {
    case 'tension':
      return design.fsTarget.tension;
    case 'crushing':
      return design.fsTarget.crushing;
    case 'sliding':
      return design.fsTarget.sliding;
    default:
      return 1;
  }
}

/** FS per mode of one layer; null where the mode does not apply. */
export function layerFs(layer: LayerState, design: Design): Record<Mode, number | null> {
  const v = layer.voussoir;
  const fs: Record<Mode, number | null> = { tension: layer.fsTension, crushing: null, sliding: null, snapThrough: null, deflection: null };
  if (v) {
    if (v.snapThrough) {
      fs.snapThrough = 0;
    } else {
      fs.snapThrough = 1;
      fs.crushing = v.fsCrushing;
      fs.sliding = v.fsSliding;
      fs.deflection = deflectionFs(v.deflectionRatio, design.deflectionLimitRatio);
    }
  }
  return fs;
}

/** limit/(δ/t); a beam that does not deflect (δ = 0) has an unbounded margin, capped at 1e6. */
export function deflectionFs(ratio: number | null, limit: number): number | null {
  if (ratio === null) return null;
  return ratio > limit / 1e6 ? limit / ratio : 1e6;
}

export function layerChecks(state: State, design: Design): Check[] {
  const checks: Check[] = [];
  const cantilever = state.ends === 'cantilever';
  state.layers.forEach((layer, i) => {
    const fs = layerFs(layer, design);
    for (const mode of ['tension', 'crushing', 'sliding', 'snapThrough', 'deflection'] as Mode[]) {
      const value = fs[mode];
      if (value === null) continue;
      // Snap-through is a check only when it happens (FS 0); a standing arch is shown by the others.
      if (mode === 'snapThrough' && value > 0) continue;
      const target = targetFor(mode, design);
      const counts = mode !== 'tension' || design.basis === 'intact' || cantilever;
      checks.push({ layer: i, mode, fs: value, target, ratio: value / target, counts });
    }
  });
  return checks;
}

export function governingCheck(checks: readonly Check[]): Check | null {
  let best: Check | null = null;
  for (const c of checks) if (c.counts && (best === null || c.ratio < best.ratio)) best = c;
  return best;
}
