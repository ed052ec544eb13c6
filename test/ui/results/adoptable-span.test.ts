import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { adoptableSpan } from '../../../src/ui/results/adoptable-span';
import type { MaxSpanReport } from '../../../src/model/types';

const spans = (governing: number | null): MaxSpanReport => ({
  tension: governing, crushing: null, sliding: null, snapThrough: null, deflection: null, governing,
});

describe('adoptableSpan(maxSpan)', () => {
  it('rounds the governing largest span down to 1 mm: 1.82261 m → 1.822 m (hand rounding)', () => {
    expect(adoptableSpan(spans(1.82261))).toBe(1.822);
  });
  it('is null when no mode limits the span, or there is no span report', () => {
    expect(adoptableSpan(spans(null))).toBeNull();
    expect(adoptableSpan(null)).toBeNull();
  });
  it('property: never above the governing span and less than 1 mm below it', () => {
    fc.assert(
      fc.property(fc.double({ min: 0.01, max: 100, noNaN: true }), (g) => {
        const s = adoptableSpan(spans(g))!;
        expect(s).toBeLessThanOrEqual(g + 1e-12);
        expect(g - s).toBeLessThan(1e-3 + 1e-12);
      }),
    );
  });
});
