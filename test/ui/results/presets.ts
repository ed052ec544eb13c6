/** The three demo presets, read through the model and analysed, for the results-view tests. */
import { readFileSync } from 'node:fs';
import { dirname, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import { readProjectText } from '../../../src/model/project-file';
import type { Project } from '../../../src/model/types';

const root = resolve(dirname(fileURLToPath(import.meta.url)), '../../..');

export const PRESET_NAMES = ['coal-room-shale', 'drift-limestone', 'quarry-bench-overhang'] as const;

export function loadPreset(name: (typeof PRESET_NAMES)[number]): Project {
  return readProjectText(readFileSync(resolve(root, 'presets', `${name}.lamina.json`), 'utf8')).project;
}

/** A deep copy to edit in a test. */
export const copy = <T>(x: T): T => JSON.parse(JSON.stringify(x)) as T;
