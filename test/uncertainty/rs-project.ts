/** The R − S arrangement of METHODS §16 as a project (shared by the run, check-table and CLI tests). */
import { analyse } from '../../src/analysis/analyse';
import { parseProject } from '../../src/model/validate';
import type { Project, Uncertainty } from '../../src/model/types';

/**
 * One intact clamped bed, no surcharge, no horizontal stress, lab tensile basis: the tension
 * check is the only counted check (uncracked, s/t > 4: the voussoir rows are reserve), and
 *   FS = R/S, R = design strength = k_R · tensile value (direct test, size factor fixed by t),
 *              S = q s²/(2t²) = γ s²/(2t) (Obert & Duvall clamped beam, q = γt),
 * so R is linear in the sampled tensile value and S linear in the sampled unit weight, and
 * P(FS < 1) = P(R − S < 0). The tensile value is chosen so that μR = 2 μS.
 */
export function rsProject(distribution: 'normal' | 'lognormal', samples: number, seed = 1, acceptablePf: number | null = null): Project {
  const raw = {
    schema: 'lamina/2', title: 'R − S arrangement (invented)',
    opening: { type: 'beam', span_m: 6, ends: 'clamped' },
    layers: [{ name: 'Bed', thickness_m: 0.5, unitWeight_kNm3: 25, youngModulus_GPa: 20, ucs_MPa: 60,
      tensile: { value_MPa: 1, method: 'direct' }, jointing: { crossJointSpacing_m: null } }],
    design: { tensileBasis: 'lab', characteristic: 'mean' },
  };
  const base = parseProject(raw).project;
  const row = analyse(base).report.checks.find((r) => r.mode === 'tension')!;
  const muS = row.demand as number; // MPa at γ = 25 kN/m³
  const kR = (row.capacity as number) / 1; // design MPa per MPa of tensile value
  const value = (2 * muS) / kR;
  const uncertainty: Uncertainty = {
    samples, seed, method: 'latinHypercube', acceptablePf,
    variables: [
      { path: 'layers[0].tensile.value_MPa', distribution, mean: value, cov: 0.25 },
      { path: 'layers[0].unitWeight_kNm3', distribution, mean: 25, cov: 0.1 },
    ],
  };
  const project = structuredClone(base);
  project.layers[0].tensile.value_MPa = value;
  project.uncertainty = uncertainty;
  return project;
}

