import { describe, expect, it } from 'vitest';
import { directFactor } from '../../src/strength/direct-factor';
import type { RockClassName } from '../../src/strength/direct-factor';

describe('directFactor', () => {
  it('directFactor is 0.7 sedimentary, 0.8 igneous, 0.9 metamorphic — Perras & Diederichs 2014', () => {
    expect(directFactor('sedimentary')).toBe(0.7);
    expect(directFactor('igneous')).toBe(0.8);
    expect(directFactor('metamorphic')).toBe(0.9);
  });

  it('directFactor throws a RangeError for an unknown class, including inherited keys', () => {
    expect(() => directFactor('granite' as RockClassName)).toThrow(RangeError);
    expect(() => directFactor('toString' as RockClassName)).toThrow(/rockClass/);
  });
});
