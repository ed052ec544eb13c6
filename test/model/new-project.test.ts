import { describe, expect, it } from 'vitest';
import { NEW_PROJECT_DESCRIPTION, STARTING_VALUES, isNewProject, newProject, pendingDefaults } from '../../src/model/new-project';
import { DEFAULT_FS_TARGET, DEFAULT_DEFLECTION_LIMIT_RATIO } from '../../src/model/defaults';
import { validateProject } from '../../src/model/validate';
import { setAtPath } from '../../src/model/project-path';

describe('newProject', () => {
  it('is a valid one-layer project carrying the new-project description', () => {
    const p = newProject();
    expect(p.layers).toHaveLength(1);
    expect(p.description).toBe(NEW_PROJECT_DESCRIPTION);
    expect(isNewProject(p)).toBe(true);
    expect(validateProject(p).ok).toBe(true);
  });

  it('states every starting value, each equal to what the project holds (so the list cannot drift from defaults.ts)', () => {
    const p = newProject();
    expect(pendingDefaults(p)).toHaveLength(STARTING_VALUES.length);
    for (const v of STARTING_VALUES) expect(v.get(p), v.path).toBe(v.value);
    // METHODS §10 targets and the Diederichs & Kaiser (1999) deflection limit
    expect(STARTING_VALUES.find((v) => v.path === 'design.fsTarget.tension')?.value).toBe(DEFAULT_FS_TARGET.tension);
    expect(STARTING_VALUES.find((v) => v.path === 'design.deflectionLimitRatio')?.value).toBe(DEFAULT_DEFLECTION_LIMIT_RATIO);
    expect(STARTING_VALUES.filter((v) => v.kind === 'placeholder').map((v) => v.path)).toEqual(
      expect.arrayContaining(['opening.span_m', 'layers[0].thickness_m', 'layers[0].unitWeight_kNm3', 'layers[0].youngModulus_GPa', 'layers[0].ucs_MPa', 'layers[0].tensile.value_MPa']),
    );
  });

  it('a replaced value leaves the pending list; each path names a real field', () => {
    let p = newProject();
    for (const v of STARTING_VALUES) expect(() => setAtPath(p, v.path, v.value), v.path).not.toThrow();
    p = setAtPath(p, 'opening.span_m', 5.5);
    p = setAtPath(p, 'layers[0].thickness_m', 0.8);
    const left = pendingDefaults(p).map((v) => v.path);
    expect(left).not.toContain('opening.span_m');
    expect(left).not.toContain('layers[0].thickness_m');
    expect(left).toHaveLength(STARTING_VALUES.length - 2);
  });
});
