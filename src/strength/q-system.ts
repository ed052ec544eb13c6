/**
 * Empirical cross-check by the Q system (Barton, Lien & Lunde 1974, Rock Mechanics 6:189–236;
 * all rules and ranges here from memory — confirm against the paper):
 *     Q = (RQD/Jn)·(Jr/Ja)·(Jw/SRF)
 *     largest unsupported span  = 2·ESR·Q^0.4                  (m)
 *     bolt length               L = 2 + 0.15·B/ESR             (m, B = span or height)
 * RQD in percent; where RQD < 10 (including 0) the nominal value 10 is used (Barton et al.).
 * Parameter ranges of the published tables: Jn 0.5–20, Jr 0.5–4, Ja 0.75–20, Jw 0.05–1,
 * SRF 0.5–400; ESR 0.5–5 (from 0.5–0.8 for the most sensitive caverns to 3–5 for temporary
 * mine openings). These rules summarise case histories; they are a cross-check, never a check.
 *
 *     qValue({ rqd: 90, jn: 9, jr: 1.5, ja: 1, jw: 1, srf: 1 })   // 15
 *     unsupportedSpan(10, 1.6)                                     // 8.04 m
 *     boltLengthRule(6, 1.6)                                       // 2.5625 m
 */

export interface QInput {
  /** Rock quality designation, percent (0–100). */
  rqd: number;
  jn: number;
  jr: number;
  ja: number;
  jw: number;
  srf: number;
}

/** Published ranges of the Q parameters and of ESR (Barton et al. 1974; memory). */
export const Q_RANGES = {
  jn: [0.5, 20],
  jr: [0.5, 4],
  ja: [0.75, 20],
  jw: [0.05, 1],
  srf: [0.5, 400],
  esr: [0.5, 5],
} as const satisfies Record<string, readonly [number, number]>;

/** RQD values below this are raised to it in Q (Barton et al. 1974). */
export const Q_MIN_RQD = 10;

function checkRange(name: keyof typeof Q_RANGES, value: number): void {
  const [lo, hi] = Q_RANGES[name];
  if (!(value >= lo && value <= hi)) throw new RangeError(`${name} must be in [${lo}, ${hi}], got ${value}`);
}

/** Q from the six parameters; RQD below 10 counts as 10. */
export function qValue(input: QInput): number {
  const { rqd, jn, jr, ja, jw, srf } = input;
  if (!(rqd >= 0 && rqd <= 100)) throw new RangeError(`rqd must be in [0, 100] percent, got ${rqd}`);
  checkRange('jn', jn);
  checkRange('jr', jr);
  checkRange('ja', ja);
  checkRange('jw', jw);
  checkRange('srf', srf);
  return (Math.max(rqd, Q_MIN_RQD) / jn) * (jr / ja) * (jw / srf);
}

/** Largest unsupported span 2·ESR·Q^0.4, m. */
export function unsupportedSpan(q: number, esr: number): number {
  if (!(q > 0 && q < Infinity)) throw new RangeError(`q must be > 0, got ${q}`);
  checkRange('esr', esr);
  return 2 * esr * q ** 0.4;
}

/** Bolt length rule 2 + 0.15·B/ESR, m (B: span of the roof, m). */
export function boltLengthRule(span: number, esr: number): number {
  if (!(span > 0 && span < Infinity)) throw new RangeError(`span must be > 0 m, got ${span}`);
  checkRange('esr', esr);
  return 2 + (0.15 * span) / esr;
}
