/**
 * Projects for the analysis tests: the DESIGN.md report example, the three presets, and a
 * seeded generator of valid random projects (invented data, for property tests).
 */
import { readFileSync, readdirSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { dirname, join } from 'node:path';
import { parseProject } from '../../src/model/validate';
import { readProjectText } from '../../src/model/project-file';
import type { Project } from '../../src/model/types';
import { seeded as rng } from '../helpers/seeded';

const root = join(dirname(fileURLToPath(import.meta.url)), '../..');

/**
 * The one-layer example of DESIGN.md ("Project file" and "Report" sections). DESIGN's report
 * numbers were computed with crushing against the UCS as given (FS crushing 29.7), so the
 * fixture sets crushingStrength "lab" and keeps the file's tension target of 4.
 */
export function designExample(): Project {
  return parseProject({
    schema: 'lamina/2',
    title: 'DESIGN.md example',
    opening: { type: 'beam', span_m: 6.0, ends: 'clamped' },
    loads: { surcharge_kPa: 0, horizontalStress_MPa: 0 },
    support: { standing_kPa: 0 },
    layers: [
      {
        name: 'Shale',
        thickness_m: 0.45,
        unitWeight_kNm3: 25,
        youngModulus_GPa: 8,
        modulusBasis: 'mass',
        poisson: 0.25,
        ucs_MPa: 40,
        rockClass: 'sedimentary',
        tensile: { value_MPa: 3.0, method: 'brazilian', specimens: [] },
        jointing: { crossJointSpacing_m: 8.0, fractureFrequency_per_m: 3, rqd: null, jointCondition: 20, jointFriction_deg: 35 },
        hoekBrown: { mi: 7, disturbance: 0 },
      },
    ],
    design: { fsTarget: { tension: 4, crushing: 2, sliding: 1.5 }, deflectionLimitRatio: 0.1, characteristic: 'mean', basis: 'intact', crushingStrength: 'lab' },
  }).project;
}

export function presetFiles(): string[] {
  return readdirSync(join(root, 'presets')).filter((f) => f.endsWith('.lamina.json')).map((f) => join(root, 'presets', f));
}

export function presets(): { file: string; project: Project }[] {
  return presetFiles().map((file) => ({ file, project: readProjectText(readFileSync(file, 'utf8')).project }));
}


/** A random valid project: 1–5 layers, any opening type and options (invented values). */
export function randomProject(seed: number, overrides: { type?: 'beam' | 'slab' | 'cantilever' | 'intersection' } = {}): Project {
  const r = rng(seed);
  const between = (lo: number, hi: number) => lo + (hi - lo) * r();
  const pick = <T>(xs: readonly T[]): T => xs[Math.floor(r() * xs.length)];
  const type = overrides.type ?? pick(['beam', 'beam', 'slab', 'cantilever'] as const);
  const span = type === 'cantilever' ? between(0.5, 4) : between(2, 14);
  const nLayers = 1 + Math.floor(r() * 5);
  const layers = Array.from({ length: nLayers }, (_, i) => {
    const useSpecimens = r() < 0.5;
    const specimens = useSpecimens
      ? Array.from({ length: 2 + Math.floor(r() * 8) }, (_, k) => {
          const d = pick([42, 54, 61, 63.5]);
          return { id: `S${k + 1}`, diameter_mm: d, thickness_mm: d * between(0.3, 0.7), peakLoad_kN: between(3, 25), valid: r() > 0.1 };
        })
      : [];
    specimens.push({ id: 'S0', diameter_mm: 54, thickness_mm: 27, peakLoad_kN: between(4, 20), valid: true });
    return {
      name: `Bed ${i + 1}`,
      thickness_m: between(0.15, 2.5),
      unitWeight_kNm3: between(20, 28),
      youngModulus_GPa: between(2, 40),
      modulusBasis: pick(['mass', 'intact'] as const),
      poisson: between(0.1, 0.35),
      ucs_MPa: between(15, 150),
      rockClass: pick(['sedimentary', 'igneous', 'metamorphic'] as const),
      tensile: { value_MPa: between(1, 12), method: pick(['brazilian', 'direct'] as const), specimens: useSpecimens ? specimens : [] },
      jointing: {
        crossJointSpacing_m: r() < 0.3 ? null : between(0.5, 20),
        fractureFrequency_per_m: r() < 0.5 ? between(0.5, 15) : null,
        rqd: r() < 0.2 ? between(20, 100) : null,
        jointCondition: between(5, 30),
        jointFriction_deg: between(20, 45),
      },
      hoekBrown: { mi: between(4, 25), disturbance: r() < 0.7 ? 0 : between(0, 1) },
    };
  });
  return parseProject({
    schema: 'lamina/2',
    title: `Generated ${seed} (invented)`,
    opening: { type, span_m: span, ...(type === 'slab' || type === 'intersection' ? { length_m: span * between(1, 3) } : {}), ends: pick(['clamped', 'simple'] as const) },
    loads: { surcharge_kPa: r() < 0.5 ? 0 : between(0, 60), horizontalStress_MPa: r() < 0.5 ? 0 : between(0, 6) },
    support: { standing_kPa: r() < 0.6 ? 0 : between(0, 20) },
    layers,
    design: {
      fsTarget: { tension: between(2, 8), crushing: between(1.5, 3), sliding: between(1.2, 2) },
      deflectionLimitRatio: pick([0.1, 0.1, 0.25]),
      characteristic: pick(['mean', 'lower5', 'cautiousMean', 'lower5Log'] as const),
      basis: pick(['intact', 'jointed'] as const),
      tensileBasis: pick(['rockMass', 'lab'] as const),
      crushingStrength: pick(['rockMass', 'lab'] as const),
      planeStrainModulus: r() < 0.2,
    },
  }).project;
}
