/**
 * The invented demo projects shipped in `presets/`, bundled as JSON imports so that the app,
 * the report and the CLI know them without reading files. Each one says "invented data" in
 * its title and description (DEVELOPERS.md: demo data is invented and says so).
 */
import coalRoom from '../../presets/coal-room-shale.lamina.json';
import driftLimestone from '../../presets/drift-limestone.lamina.json';
import quarryBench from '../../presets/quarry-bench-overhang.lamina.json';
import intersectionRoof from '../../presets/intersection-limestone.lamina.json';

export interface DemoPreset {
  id: string;
  label: string;
  /** The file's JSON as shipped (unvalidated); take a copy before changing it. */
  data: unknown;
}

export const DEMO_PRESETS: readonly DemoPreset[] = [
  { id: 'coal-room-shale', label: 'Coal room, laminated shale roof (beam, 3 layers)', data: coalRoom },
  { id: 'drift-limestone', label: 'Drift in thin-bedded limestone', data: driftLimestone },
  { id: 'quarry-bench-overhang', label: 'Sandstone quarry bench overhang (cantilever)', data: quarryBench },
  { id: 'intersection-limestone', label: 'Four-way intersection in limestone (6 × 6 m entries, diagonal span)', data: intersectionRoof },
];
