import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { checkStatus } from '../../src/report/status';

describe('checkStatus', () => {
  it('checkStatus(0.404, 4) is "below ✗" — the intact shale beam of DESIGN.md (FS 0.40 vs target 4)', () => {
    const s = checkStatus(0.404, 4);
    expect(s.kind).toBe('below');
    expect(s.text).toBe('below ✗');
  });
  it('checkStatus(29.7, 2) is "meets ✓" — the voussoir crushing check of DESIGN.md', () => {
    expect(checkStatus(29.7, 2).text).toBe('meets ✓');
  });
  it('checkStatus(null, 4) is "n/a –"; excluded checks are "info ○"', () => {
    expect(checkStatus(null, 4).text).toBe('n/a –');
    expect(checkStatus(0.4, 4, { excluded: true }).text).toBe('info ○');
  });
  it('property: status is "meets" exactly when fs ≥ target, and always has a word and a symbol', () => {
    fc.assert(
      fc.property(fc.double({ min: 0, max: 100, noNaN: true }), fc.double({ min: 0.1, max: 10, noNaN: true }), (fs, target) => {
        const s = checkStatus(fs, target);
        return (s.kind === 'meets') === (fs >= target) && s.word.length > 0 && s.symbol.length > 0;
      }),
    );
  });
});
