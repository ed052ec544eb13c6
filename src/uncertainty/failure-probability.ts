/**
 * What a count of failures in N independent samples says about the probability of failure.
 * - estimate P̂ = k/N;
 * - 95 % interval: Wilson's score interval (E. B. Wilson, JASA 22 (1927) 209–212),
 *   (P̂ + z²/2N ± z·√(P̂(1 − P̂)/N + z²/4N²))/(1 + z²/N), z = Φ⁻¹(0.975) = 1.95996; with no
 *   failure the rule of three, [0, 3/N] (Hanley & Lippman-Hand, JAMA 249 (1983) 1743–1745),
 *   and with every sample failed its mirror [1 − 3/N, 1];
 * - the estimate's coefficient of variation √((1 − P̂)/(N·P̂)) (common practice, e.g.
 *   Melchers & Beck, Structural Reliability Analysis and Prediction, 3rd ed., 2018, §3.3);
 * - the reliability index β = −Φ⁻¹(P̂), which is infinite when P̂ is 0 or 1: then β is null
 *   with the reason, and with no failure `betaAtLeast` = −Φ⁻¹(3/N), the index at the rule of
 *   three's bound.
 *     failureProbability(249, 10000) // pf 0.0249, interval [0.02201, 0.02816], beta 1.9614
 */
import { normalQuantile } from './standard-normal';

export const Z_95 = 1.959963984540054;

export interface FailureProbability {
  failures: number;
  samples: number;
  pf: number;
  interval: [number, number];
  intervalMethod: 'wilson' | 'ruleOfThree';
  /** √((1 − P̂)/(N·P̂)); null with no failure */
  cov: number | null;
  /** −Φ⁻¹(P̂); null when P̂ is 0 or 1 (see `betaNote`) */
  beta: number | null;
  /** with no failure: −Φ⁻¹(3/N), a lower bound on β at 95 % */
  betaAtLeast: number | null;
  betaNote: string | null;
}

export function failureProbability(failures: number, samples: number): FailureProbability {
  if (!(Number.isInteger(samples) && samples >= 1)) throw new RangeError(`samples must be a whole number ≥ 1, got ${samples}`);
  if (!(Number.isInteger(failures) && failures >= 0 && failures <= samples)) {
    throw new RangeError(`failures must be a whole number from 0 to ${samples}, got ${failures}`);
  }
  const n = samples;
  const pf = failures / n;
  const bound = Math.min(1, 3 / n);
  if (failures === 0) {
    const betaAtLeast = bound < 1 ? -normalQuantile(bound) : null;
    return {
      failures, samples, pf: 0, interval: [0, bound], intervalMethod: 'ruleOfThree', cov: null, beta: null, betaAtLeast,
      betaNote: `no failure in ${n} samples: β is unbounded by the estimate${betaAtLeast === null ? '' : `; P_f ≤ 3/N = ${bound.toPrecision(3)} (rule of three), so β ≥ ${betaAtLeast.toFixed(2)}`}`,
    };
  }
  const cov = Math.sqrt((1 - pf) / (n * pf));
  if (failures === n) {
    return {
      failures, samples, pf: 1, interval: [1 - bound, 1], intervalMethod: 'ruleOfThree', cov, beta: null, betaAtLeast: null,
      betaNote: `every one of the ${n} samples failed: β is unbounded below`,
    };
  }
  const z2 = Z_95 * Z_95;
  const centre = pf + z2 / (2 * n);
  const half = Z_95 * Math.sqrt((pf * (1 - pf)) / n + z2 / (4 * n * n));
  const scale = 1 + z2 / n;
  const lo = Math.max(0, (centre - half) / scale);
  const hi = Math.min(1, (centre + half) / scale);
  return {
    failures, samples, pf, interval: [lo, hi], intervalMethod: 'wilson', cov,
    beta: pf < 0.5 ? -normalQuantile(pf) : normalQuantile(1 - pf), betaAtLeast: null, betaNote: null,
  };
}
