/**
 * Schema of the support inputs (METHODS §12): `support.bolts`, `empirical.q`,
 * `design.fsTarget.bolt`. Defaults: anchorage 0.3 m and bolt target 1.5 (common practice);
 * shear capacity 0.6 × capacity (von Mises: steel shears at fy/√3 ≈ 0.577 fy, rounded);
 * Q-rating ranges from the published tables (Barton, Lien & Lunde 1974; from memory).
 */
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { defaultProject } from '../../src/model/defaults';
import { validateProject } from '../../src/model/validate';
import { readProjectText, writeProjectText } from '../../src/model/project-file';

type Json = any; // eslint-disable-line @typescript-eslint/no-explicit-any

/** A default project (one 0.5 m layer) with a second 1.5 m layer, so the strata are 2 m thick. */
function base(): Json {
  const p: Json = JSON.parse(JSON.stringify(defaultProject()));
  p.layers.push({ ...p.layers[0], name: 'Upper', thickness_m: 1.5 });
  return p;
}
const bolts = (extra: Json = {}): Json => ({ length_m: 1.8, capacity_kN: 100, spacingAcross_m: 1.2, spacingAlong_m: 1.2, ...extra });
function withBolts(extra: Json = {}): Json {
  const p = base();
  p.support.bolts = bolts(extra);
  return p;
}
const errorPaths = (raw: Json): string[] => {
  const r = validateProject(raw);
  return r.ok ? [] : r.errors.map((e) => e.path);
};

describe('support.bolts', () => {
  it('absent or null means no bolts', () => {
    const p = base();
    delete p.support.bolts;
    const r = validateProject(p);
    expect(r.ok && r.project.support.bolts).toBe(null);
  });

  it('fills the defaults: anchorage 0.3 m, action suspension, shear 0.6 × capacity, pretension 0 (METHODS §12)', () => {
    const r = validateProject(withBolts());
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.project.support.bolts).toStrictEqual({
      length_m: 1.8, capacity_kN: 100, spacingAcross_m: 1.2, spacingAlong_m: 1.2,
      anchorage_m: 0.3, action: 'suspension', shearCapacity_kN: 60, pretension_kN: 0,
    });
    expect(r.project.design.fsTarget.bolt).toBe(1.5);
  });

  it.each([
    ['negative spacing', { spacingAcross_m: -1 }, 'support.bolts.spacingAcross_m'],
    ['zero spacing along', { spacingAlong_m: 0 }, 'support.bolts.spacingAlong_m'],
    ['zero capacity', { capacity_kN: 0 }, 'support.bolts.capacity_kN'],
    ['a bolt longer than the strata (2 m)', { length_m: 2.5 }, 'support.bolts.length_m'],
    ['anchorage equal to the length', { length_m: 1, anchorage_m: 1 }, 'support.bolts.anchorage_m'],
    ['anchorage longer than the length', { length_m: 0.2 }, 'support.bolts.anchorage_m'],
    ['an unknown action', { action: 'glue' }, 'support.bolts.action'],
    ['pretension above the capacity', { pretension_kN: 150 }, 'support.bolts.pretension_kN'],
    ['a numeric string', { capacity_kN: '100' }, 'support.bolts.capacity_kN'],
    ['a spacing beyond the hard bound (10 m)', { spacingAcross_m: 50 }, 'support.bolts.spacingAcross_m'],
  ])('refuses %s with the field path', (_t, extra, path) => {
    expect(errorPaths(withBolts(extra))).toContain(path);
  });

  it('a missing required field is refused at its path', () => {
    const p = withBolts();
    delete p.support.bolts.capacity_kN;
    expect(errorPaths(p)).toEqual(['support.bolts.capacity_kN']);
  });

  it('the error text says what was expected and what was got', () => {
    const r = validateProject(withBolts({ length_m: 2.5 }));
    expect(!r.ok && r.errors[0].message).toMatch(/^support\.bolts\.length_m: must not exceed the total thickness of the strata 2 m .*got 2\.5$/);
  });

  it('a bolt exactly as long as the strata is accepted', () => {
    expect(errorPaths(withBolts({ length_m: 2 }))).toEqual([]);
  });

  it('writes and reads back a pattern and Q ratings unchanged', () => {
    const p = withBolts({ action: 'beamBuilding', pretension_kN: 20 });
    p.empirical = { q: { jn: 9, jr: 1.5, ja: 1, jw: 1, srf: 1, esr: 1.6 } };
    const r = validateProject(p);
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    const again = readProjectText(writeProjectText(r.project));
    expect(again.project).toStrictEqual(r.project);
  });

  it('property: any pattern inside the stated bounds is accepted, and any spacing ≤ 0 refused', () => {
    fc.assert(fc.property(
      fc.double({ min: 0.4, max: 2, noNaN: true }), fc.double({ min: 1e-3, max: 5000, noNaN: true }),
      fc.double({ min: 0.1, max: 10, noNaN: true }), fc.double({ min: -10, max: 0, noNaN: true }),
      (length, capacity, spacing, bad) => {
        expect(errorPaths(withBolts({ length_m: length, capacity_kN: capacity, spacingAcross_m: spacing, spacingAlong_m: spacing }))).toEqual([]);
        expect(errorPaths(withBolts({ spacingAcross_m: bad }))).toContain('support.bolts.spacingAcross_m');
      },
    ), { numRuns: 100 });
  });
});

describe('empirical.q', () => {
  it('absent means no cross-check', () => {
    const p = base();
    delete p.empirical;
    const r = validateProject(p);
    expect(r.ok && r.project.empirical).toStrictEqual({ q: null });
  });

  it.each([
    ['jn', 0.4], ['jr', 5], ['ja', 0.5], ['jw', 1.2], ['srf', 500], ['esr', 0.1],
  ])('refuses %s = %s outside the published range (Barton et al. 1974, memory)', (key, value) => {
    const p = base();
    p.empirical = { q: { jn: 9, jr: 1.5, ja: 1, jw: 1, srf: 1, esr: 1.6, [key]: value } };
    expect(errorPaths(p)).toEqual([`empirical.q.${key}`]);
  });

  it('a missing rating is refused at its path', () => {
    const p = base();
    p.empirical = { q: { jn: 9, jr: 1.5, ja: 1, jw: 1, srf: 1 } };
    expect(errorPaths(p)).toEqual(['empirical.q.esr']);
  });
});

describe('design.fsTarget.bolt', () => {
  it('refuses 0 and keeps a given value', () => {
    const p = base();
    p.design.fsTarget.bolt = 0;
    expect(errorPaths(p)).toEqual(['design.fsTarget.bolt']);
    p.design.fsTarget.bolt = 2;
    const r = validateProject(p);
    expect(r.ok && r.project.design.fsTarget.bolt).toBe(2);
  });
});
