/**
 * Geological Strength Index from core logging: GSI = 1.5·JCond89 + RQD/2, clamped to [0, 100].
 * JCond89 is Bieniawski's 1989 joint-condition rating (0–30), RQD in percent (0–100).
 * Source: Hoek, Carter & Diederichs (2013), 47th US Rock Mechanics Symposium (ARMA).
 * For in-range inputs the result stays within 0–95; the clamp is a guard only.
 *     gsiFromJointing(20, 80) // 70
 */
export function gsiFromJointing(jointCondition: number, rqd: number): number {
  if (!(jointCondition >= 0 && jointCondition <= 30)) {
    throw new RangeError(`jointCondition (JCond89) must be within 0–30, got ${jointCondition}`);
  }
  if (!(rqd >= 0 && rqd <= 100)) throw new RangeError(`rqd must be within 0–100 %, got ${rqd}`);
  return Math.min(100, Math.max(0, 1.5 * jointCondition + rqd / 2));
}
