/**
 * The demo presets shipped in `presets/` (invented data), bundled as Vite JSON imports. They go
 * through the model's validation like any opened file.
 */
import coalRoom from '../../../presets/coal-room-shale.lamina.json';
import driftLimestone from '../../../presets/drift-limestone.lamina.json';
import quarryBench from '../../../presets/quarry-bench-overhang.lamina.json';
import intersectionRoof from '../../../presets/intersection-limestone.lamina.json';

export interface Preset {
  id: string;
  label: string;
  data: unknown;
}

export const PRESETS: readonly Preset[] = [
  { id: 'coal-room-shale', label: 'Coal room, laminated shale roof (beam, 3 layers)', data: coalRoom },
  { id: 'drift-limestone', label: 'Drift in thin-bedded limestone', data: driftLimestone },
  { id: 'quarry-bench-overhang', label: 'Sandstone quarry bench overhang (cantilever)', data: quarryBench },
  { id: 'intersection-limestone', label: 'Four-way intersection in limestone (6 × 6 m entries, diagonal span)', data: intersectionRoof },
];

/** The preset loaded on a first visit. */
export const DEMO_PRESET = PRESETS[0];

/** A fresh copy of a preset's JSON (never hand out the bundled object itself). */
export const presetData = (preset: Preset): unknown => structuredClone(preset.data);
