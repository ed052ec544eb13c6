/**
 * The demo presets shipped in `presets/` (invented data; the list lives in
 * `model/demo-presets.ts`). They go through the model's validation like any opened file.
 */
import { DEMO_PRESETS, type DemoPreset } from '../../model/demo-presets';

export type Preset = DemoPreset;

export const PRESETS: readonly Preset[] = DEMO_PRESETS;

/** The preset loaded on a first visit. */
export const DEMO_PRESET = PRESETS[0];

/** A fresh copy of a preset's JSON (never hand out the bundled object itself). */
export const presetData = (preset: Preset): unknown => structuredClone(preset.data);
