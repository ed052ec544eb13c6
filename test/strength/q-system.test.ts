import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { qValue, unsupportedSpan, boltLengthRule, Q_RANGES } from '../../src/strength/q-system';
import { expectClose } from '../helpers/expect-close';

// Barton, Lien & Lunde (1974) — formulas and ranges from memory (METHODS §12); the check values
// below are METHODS §12's arithmetic on those formulas.
describe('Q system — Barton, Lien & Lunde 1974 (memory)', () => {
  it('Q = (RQD/Jn)(Jr/Ja)(Jw/SRF): RQD 90, Jn 9, Jr 1.5, Ja 1, Jw 1, SRF 1 → 15 (arithmetic)', () => {
    expectClose(qValue({ rqd: 90, jn: 9, jr: 1.5, ja: 1, jw: 1, srf: 1 }), 15);
    expectClose(qValue({ rqd: 60, jn: 12, jr: 1, ja: 2, jw: 0.66, srf: 2.5 }), (60 / 12) * (1 / 2) * (0.66 / 2.5));
  });

  it('RQD below 10 (including 0) counts as 10 (Barton et al. 1974, memory)', () => {
    const q = (rqd: number) => qValue({ rqd, jn: 9, jr: 1, ja: 1, jw: 1, srf: 1 });
    expectClose(q(0), 10 / 9);
    expectClose(q(5), 10 / 9);
    expectClose(q(20), 20 / 9);
  });

  it('largest unsupported span 2·ESR·Q^0.4: Q 10, ESR 1.6 → 8.04 m; Q 4, ESR 3 → 10.45 m (METHODS §12)', () => {
    expectClose(unsupportedSpan(10, 1.6), 8.04, 1e-3);
    expectClose(unsupportedSpan(4, 3), 10.45, 1e-3);
  });

  it('bolt length 2 + 0.15 B/ESR: B 6 m, ESR 1.6 → 2.56 m (METHODS §12)', () => {
    expectClose(boltLengthRule(6, 1.6), 2.5625);
  });

  it('a better rock mass never gets a shorter unsupported span (Q^0.4 rises with Q)', () => {
    fc.assert(
      fc.property(fc.double({ min: 1e-3, max: 1e3, noNaN: true }), fc.double({ min: 1, max: 10, noNaN: true }), fc.double({ min: 0.5, max: 5, noNaN: true }), (q, k, esr) => {
        expect(unsupportedSpan(q * k, esr)).toBeGreaterThanOrEqual(unsupportedSpan(q, esr));
      }),
    );
  });

  it('refuses parameters outside the published table ranges (Jn 0.5–20, Jr 0.5–4, Ja 0.75–20, Jw 0.05–1, SRF 0.5–400, ESR 0.5–5), naming the parameter', () => {
    const ok = { rqd: 90, jn: 9, jr: 1.5, ja: 1, jw: 1, srf: 1 };
    expect(Q_RANGES).toEqual({ jn: [0.5, 20], jr: [0.5, 4], ja: [0.75, 20], jw: [0.05, 1], srf: [0.5, 400], esr: [0.5, 5] });
    for (const [name, [lo, hi]] of Object.entries(Q_RANGES)) {
      if (name === 'esr') continue;
      expect(() => qValue({ ...ok, [name]: lo })).not.toThrow();
      expect(() => qValue({ ...ok, [name]: hi })).not.toThrow();
      for (const bad of [lo * 0.99, hi * 1.01, NaN]) expect(() => qValue({ ...ok, [name]: bad })).toThrow(new RegExp(`^${name} must be`));
    }
    expect(() => qValue({ ...ok, rqd: 101 })).toThrow(/rqd/);
    expect(() => qValue({ ...ok, rqd: NaN })).toThrow(/rqd/);
    expect(() => unsupportedSpan(10, 0.4)).toThrow(/esr/);
    expect(() => unsupportedSpan(10, 6)).toThrow(/esr/);
    expect(() => unsupportedSpan(0, 1.6)).toThrow(/q must be/);
    expect(() => boltLengthRule(NaN, 1.6)).toThrow(/span/);
    expect(() => boltLengthRule(6, NaN)).toThrow(/esr/);
  });
});
