import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  DEFAULT_JOINT_CONDITION,
  DEFAULT_JOINT_FRICTION_DEG,
  DEFAULT_MI,
  defaultProject,
} from '../../src/model/defaults';
import type { Project } from '../../src/model/types';
import { ProjectError, parseProject, validateProject, type FieldIssue } from '../../src/model/validate';
import { rawProjectArb } from './arbitraries';

type Json = Record<string, any>;

/** A minimal valid raw project: only the required keys (DESIGN.md). */
function minimal(): Json {
  return {
    schema: 'lamina/2',
    opening: { type: 'beam', span_m: 6, ends: 'clamped' },
    layers: [{ thickness_m: 0.5, unitWeight_kNm3: 25, youngModulus_GPa: 8, ucs_MPa: 40, tensile: { value_MPa: 3 } }],
  };
}

/** A complete valid raw project: every key given, so no ASSUMED warnings. */
function complete(): Json {
  return JSON.parse(JSON.stringify(defaultProject()));
}

function errorsOf(input: unknown): FieldIssue[] {
  const r = validateProject(input);
  return r.ok ? [] : r.errors;
}

function warningsOf(input: unknown): FieldIssue[] {
  return validateProject(input).warnings;
}

function mutate(fn: (p: Json) => void, base: () => Json = complete): Json {
  const p = base();
  fn(p);
  return p;
}

describe('validateProject — accepts and normalises', () => {
  it('validateProject(defaultProject()) is ok with no warnings', () => {
    const r = validateProject(defaultProject());
    expect(r.ok).toBe(true);
    expect(r.warnings).toEqual([]);
    if (r.ok) expect(r.project).toStrictEqual(defaultProject());
  });

  it('validateProject(minimal) fills every optional field with the documented default', () => {
    const r = validateProject(minimal());
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    const p = r.project;
    expect(p.title).toBe('Untitled project');
    expect('description' in p).toBe(false);
    expect(p.opening).toStrictEqual({ type: 'beam', span_m: 6, length_m: null, ends: 'clamped', edges: null });
    expect(p.loads).toStrictEqual({ surcharge_kPa: 0, horizontalStress_MPa: 0 });
    expect(p.support).toStrictEqual({ standing_kPa: 0 });
    expect(p.design).toStrictEqual({
      fsTarget: { tension: 2, crushing: 2, sliding: 1.5 }, // METHODS §10 default targets on the rock-mass basis
      deflectionLimitRatio: 0.1, // Diederichs & Kaiser 1999 (METHODS §3)
      characteristic: 'mean',
      basis: 'intact',
      tensileBasis: 'rockMass',
      crushingStrength: 'rockMass',
      planeStrainModulus: false,
    });
    const l = p.layers[0];
    expect(l.name).toBe('Layer 1');
    expect(l.modulusBasis).toBe('mass');
    expect(l.poisson).toBe(0.25);
    expect(l.rockClass).toBe('sedimentary');
    expect(l.tensile).toStrictEqual({ value_MPa: 3, method: 'brazilian', specimens: [] });
    expect(l.jointing).toStrictEqual({
      crossJointSpacing_m: null,
      fractureFrequency_per_m: null,
      rqd: null,
      jointCondition: DEFAULT_JOINT_CONDITION,
      jointFriction_deg: DEFAULT_JOINT_FRICTION_DEG,
    });
    expect(l.hoekBrown).toStrictEqual({ mi: DEFAULT_MI.sedimentary, disturbance: 0 });
  });

  it('validateProject(minimal) warns ASSUMED for jointCondition, jointFriction_deg and mi (judgement defaults)', () => {
    const w = warningsOf(minimal());
    expect(w.map((x) => [x.path, x.code])).toEqual([
      ['layers[0].jointing.jointCondition', 'ASSUMED'],
      ['layers[0].jointing.jointFriction_deg', 'ASSUMED'],
      ['layers[0].hoekBrown.mi', 'ASSUMED'],
    ]);
    expect(w[0].message).toBe(
      'layers[0].jointing.jointCondition: not given; 20 assumed (JCond89 mid-range default; give the logged rating)',
    );
  });

  it('default mi follows the rock class: igneous 25, metamorphic 12 (Hoek 2007 tables, from memory)', () => {
    for (const [rockClass, mi] of [['igneous', 25], ['metamorphic', 12], ['sedimentary', 7]] as const) {
      const r = validateProject(mutate((p) => { p.layers[0].rockClass = rockClass; }, minimal));
      expect(r.ok && r.project.layers[0].hoekBrown.mi).toBe(mi);
    }
  });

  it('layer names default to their 1-based position; specimen ids and valid default to S1.. and true', () => {
    const raw = mutate((p) => {
      p.layers.push({ ...p.layers[0] });
      p.layers[1].tensile = { specimens: [{ diameter_mm: 54, thickness_mm: 27, peakLoad_kN: 10 }] };
    }, minimal);
    const r = validateProject(raw);
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.project.layers.map((l) => l.name)).toEqual(['Layer 1', 'Layer 2']);
    expect(r.project.layers[1].tensile).toStrictEqual({
      value_MPa: null,
      method: 'brazilian',
      specimens: [{ id: 'S1', diameter_mm: 54, thickness_mm: 27, peakLoad_kN: 10, valid: true }],
    });
  });

  it('a cantilever needs no ends (defaults to "clamped", ignored); a slab keeps length_m', () => {
    const c = validateProject(mutate((p) => { p.opening = { type: 'cantilever', span_m: 2 }; }, minimal));
    expect(c.ok && c.project.opening).toStrictEqual({ type: 'cantilever', span_m: 2, length_m: null, ends: 'clamped', edges: null });
    const s = validateProject(mutate((p) => { p.opening = { type: 'slab', span_m: 6, length_m: 9, ends: 'simple' }; }, minimal));
    expect(s.ok && s.project.opening).toStrictEqual({ type: 'slab', span_m: 6, length_m: 9, ends: 'simple', edges: null });
  });

  it('a slab with length_m equal to span_m (square) is accepted', () => {
    expect(errorsOf(mutate((p) => { p.opening = { type: 'slab', span_m: 6, length_m: 6, ends: 'clamped' }; }))).toEqual([]);
  });

  it('length_m on a beam is ignored with a warning and normalised to null', () => {
    const raw = mutate((p) => { p.opening.length_m = 9; });
    const r = validateProject(raw);
    expect(r.ok && r.project.opening.length_m).toBe(null);
    expect(r.warnings).toContainEqual({
      path: 'opening.length_m',
      message: 'opening.length_m: ignored for opening type "beam" (used for a slab or an intersection only)',
      code: 'IGNORED',
    });
  });

  it('description is kept, right after title', () => {
    const r = validateProject(mutate((p) => { p.description = 'note'; }));
    expect(r.ok && Object.keys(r.project).slice(0, 3)).toEqual(['schema', 'title', 'description']);
    expect(r.ok && r.project.description).toBe('note');
  });

  it('−0 is normalised to 0 (so a written file reads back equal)', () => {
    const r = validateProject(mutate((p) => { p.loads.horizontalStress_MPa = -0; }));
    expect(r.ok && Object.is(r.project.loads.horizontalStress_MPa, 0)).toBe(true);
  });

  it.each([
    ['thickness_m at its floor and its ceiling, 0.001 and 1000 m', (p: Json) => { p.layers[0].thickness_m = 0.001; p.layers.push({ ...p.layers[0], name: 'b', thickness_m: 1000 }); }],
    ['unit weight at 5 and 60 kN/m³ (inclusive bounds)', (p: Json) => { p.layers[0].unitWeight_kNm3 = 5; p.layers.push({ ...p.layers[0], name: 'b', unitWeight_kNm3: 60 }); }],
    ['poisson 0', (p: Json) => { p.layers[0].poisson = 0; }],
    ['poisson 0.499', (p: Json) => { p.layers[0].poisson = 0.499; }],
    ['rqd 0 and JCond89 30', (p: Json) => { p.layers[0].jointing.rqd = 0; p.layers[0].jointing.jointCondition = 30; }],
    ['rqd 100 and JCond89 0', (p: Json) => { p.layers[0].jointing.rqd = 100; p.layers[0].jointing.jointCondition = 0; }],
    ['disturbance 0 and 1', (p: Json) => { p.layers[0].hoekBrown.disturbance = 1; }],
    ['zero tensile strength (uncemented sand / fractured mass, METHODS §10 common practice)', (p: Json) => { p.layers[0].tensile.value_MPa = 0; }],
    ['friction 0°', (p: Json) => { p.layers[0].jointing.jointFriction_deg = 0; }],
    ['zero surcharge, support and horizontal stress', (p: Json) => { p.loads = { surcharge_kPa: 0, horizontalStress_MPa: 0 }; p.support = { standing_kPa: 0 }; }],
    ['fracture frequency 0 /m', (p: Json) => { p.layers[0].jointing.fractureFrequency_per_m = 0; }],
  ])('validateProject accepts the edge value: %s', (_title, fn) => {
    expect(errorsOf(mutate(fn))).toEqual([]);
  });

  it('property: every generated valid raw project is accepted', () => {
    fc.assert(
      fc.property(rawProjectArb, (raw) => {
        const r = validateProject(raw);
        if (!r.ok) throw new Error(r.errors.map((e) => e.message).join('\n'));
      }),
      { numRuns: 300 },
    );
  });
});

describe('validateProject — messages name the path, the expectation and what was got', () => {
  it('layers[1].thickness_m: must be a number from 0.001 to 1000 m, got -0.2', () => {
    const raw = mutate((p) => { p.layers.push({ ...p.layers[0], name: 'b', thickness_m: -0.2 }); });
    expect(errorsOf(raw)).toEqual([
      { path: 'layers[1].thickness_m', message: 'layers[1].thickness_m: must be a number from 0.001 to 1000 m, got -0.2', code: 'RANGE' },
    ]);
  });

  it('opening.type: must be one of "beam", "slab", "cantilever", "intersection", got "arch"', () => {
    expect(errorsOf(mutate((p) => { p.opening.type = 'arch'; })).map((e) => e.message)).toEqual([
      'opening.type: must be one of "beam", "slab", "cantilever", "intersection", got "arch"',
    ]);
  });

  it('layers[0].unitWeight_kNm3: must be a number from 5 to 60 kN/m³, got "abc"', () => {
    expect(errorsOf(mutate((p) => { p.layers[0].unitWeight_kNm3 = 'abc'; })).map((e) => e.message)).toEqual([
      'layers[0].unitWeight_kNm3: must be a number from 5 to 60 kN/m³, got "abc"',
    ]);
  });

  it('collects every error, not just the first', () => {
    const raw = mutate((p) => {
      p.schema = 'lamina/3';
      p.opening.span_m = 0;
      p.layers[0].thickness_m = -1;
      p.layers[0].poisson = 0.5;
      p.design.fsTarget.tension = 0;
    });
    expect(errorsOf(raw).map((e) => e.message)).toEqual([
      'schema: must be "lamina/2" (or "lamina/1", migrated on load), got "lamina/3"',
      'opening.span_m: must be a number from 0.01 to 1000 m, got 0',
      'layers[0].thickness_m: must be a number from 0.001 to 1000 m, got -1',
      'layers[0].poisson: must be ≥ 0 and < 0.5, got 0.5',
      'design.fsTarget.tension: must be a number from 0.1 to 100, got 0',
    ]);
  });

  it('parseProject throws a ProjectError whose message lists every issue, one per line', () => {
    const raw = mutate((p) => { p.opening.span_m = -6; p.layers[0].ucs_MPa = 0; });
    let caught: unknown;
    try { parseProject(raw); } catch (e) { caught = e; }
    expect(caught).toBeInstanceOf(ProjectError);
    const err = caught as ProjectError;
    expect(err.name).toBe('ProjectError');
    expect(err.issues.map((i) => i.path)).toEqual(['opening.span_m', 'layers[0].ucs_MPa']);
    expect(err.message.split('\n')).toEqual([
      'opening.span_m: must be a number from 0.01 to 1000 m, got -6',
      'layers[0].ucs_MPa: must be a number from 0.01 to 1000 MPa, got 0',
    ]);
  });

  it('parseProject returns the project and warnings when valid', () => {
    const { project, warnings } = parseProject(mutate((p) => { p.extra = 1; }));
    expect(project).toStrictEqual(defaultProject());
    expect(warnings.map((w) => w.path)).toEqual(['extra']);
  });

  it('property: every error message starts with its path', () => {
    fc.assert(
      fc.property(fc.jsonValue(), (raw) => {
        const r = validateProject({ ...minimal(), layers: [raw] });
        for (const e of [...(r.ok ? [] : r.errors), ...r.warnings]) {
          expect(e.message.startsWith(e.path ? `${e.path}: ` : '')).toBe(true);
        }
      }),
    );
  });

  it('property: validateProject never throws and refuses any non-object input', () => {
    fc.assert(
      fc.property(fc.anything(), (raw) => {
        const r = validateProject(raw);
        const isObj = typeof raw === 'object' && raw !== null && !Array.isArray(raw);
        if (!isObj) expect(r.ok).toBe(false);
      }),
    );
  });
});

const refusals: Array<[string, (p: Json) => void, string, string]> = [
  // [what, mutation, path, exact message]
  ['schema missing', (p) => { delete p.schema; }, 'schema', 'schema: required, must be "lamina/2" (or "lamina/1", migrated on load)'],
  ['schema wrong', (p) => { p.schema = 'lamina/3'; }, 'schema', 'schema: must be "lamina/2" (or "lamina/1", migrated on load), got "lamina/3"'],
  ['title not a string', (p) => { p.title = 5; }, 'title', 'title: must be a string, got 5'],
  ['description not a string', (p) => { p.description = ['a']; }, 'description', 'description: must be a string, got an array'],
  ['opening missing', (p) => { delete p.opening; }, 'opening', 'opening: required, must be an object with type, span_m and ends'],
  ['opening not an object', (p) => { p.opening = 'beam'; }, 'opening', 'opening: must be an object, got "beam"'],
  ['opening.type missing', (p) => { delete p.opening.type; }, 'opening.type', 'opening.type: required, must be one of "beam", "slab", "cantilever", "intersection"'],
  ['opening.type wrong case', (p) => { p.opening.type = 'Beam'; }, 'opening.type', 'opening.type: must be one of "beam", "slab", "cantilever", "intersection", got "Beam"'],
  ['span missing', (p) => { delete p.opening.span_m; }, 'opening.span_m', 'opening.span_m: required, must be a number from 0.01 to 1000 m'],
  ['span 0', (p) => { p.opening.span_m = 0; }, 'opening.span_m', 'opening.span_m: must be a number from 0.01 to 1000 m, got 0'],
  ['span negative', (p) => { p.opening.span_m = -3; }, 'opening.span_m', 'opening.span_m: must be a number from 0.01 to 1000 m, got -3'],
  ['span numeric string', (p) => { p.opening.span_m = '6'; }, 'opening.span_m', 'opening.span_m: must be a number from 0.01 to 1000 m, got "6"'],
  ['span NaN', (p) => { p.opening.span_m = NaN; }, 'opening.span_m', 'opening.span_m: must be a number from 0.01 to 1000 m, got NaN'],
  ['span Infinity', (p) => { p.opening.span_m = Infinity; }, 'opening.span_m', 'opening.span_m: must be a number from 0.01 to 1000 m, got Infinity'],
  ['span null', (p) => { p.opening.span_m = null; }, 'opening.span_m', 'opening.span_m: must be a number from 0.01 to 1000 m, got null'],
  ['ends missing for a beam', (p) => { delete p.opening.ends; }, 'opening.ends', 'opening.ends: required, must be one of "clamped", "simple"'],
  ['ends unknown', (p) => { p.opening.ends = 'fixed'; }, 'opening.ends', 'opening.ends: must be one of "clamped", "simple", got "fixed"'],
  ['slab without length_m', (p) => { p.opening = { type: 'slab', span_m: 6, ends: 'clamped' }; }, 'opening.length_m', 'opening.length_m: required, must be a number from 0.01 to 100000 m'],
  ['slab with length_m < span_m', (p) => { p.opening = { type: 'slab', span_m: 6, length_m: 4, ends: 'clamped' }; }, 'opening.length_m', 'opening.length_m: must be ≥ span_m (6 m) for a slab, got 4'],
  ['slab with length_m 0', (p) => { p.opening = { type: 'slab', span_m: 6, length_m: 0, ends: 'clamped' }; }, 'opening.length_m', 'opening.length_m: must be a number from 0.01 to 100000 m, got 0'],
  ['length_m not a number on a beam', (p) => { p.opening.length_m = 'long'; }, 'opening.length_m', 'opening.length_m: must be a number from 0.01 to 100000 m or null, got "long"'],
  ['loads not an object', (p) => { p.loads = 0; }, 'loads', 'loads: must be an object, got 0'],
  ['surcharge negative', (p) => { p.loads.surcharge_kPa = -10; }, 'loads.surcharge_kPa', 'loads.surcharge_kPa: must be a number from 0 to 100000 kPa, got -10'],
  ['support negative', (p) => { p.support.standing_kPa = -1; }, 'support.standing_kPa', 'support.standing_kPa: must be a number from 0 to 100000 kPa, got -1'],
  ['horizontal stress a string', (p) => { p.loads.horizontalStress_MPa = '3 MPa'; }, 'loads.horizontalStress_MPa', 'loads.horizontalStress_MPa: must be a number from -1000 to 1000 MPa, got "3 MPa"'],
  ['horizontal stress -Infinity', (p) => { p.loads.horizontalStress_MPa = -Infinity; }, 'loads.horizontalStress_MPa', 'loads.horizontalStress_MPa: must be a number from -1000 to 1000 MPa, got -Infinity'],
  ['layers missing', (p) => { delete p.layers; }, 'layers', 'layers: required, must be an array'],
  ['layers not an array', (p) => { p.layers = { 0: {} }; }, 'layers', 'layers: must be an array, got an object'],
  ['layers empty', (p) => { p.layers = []; }, 'layers', 'layers: must have at least one layer (layers[0] is the immediate roof), got an empty array'],
  ['layers over 100', (p) => { p.layers = Array.from({ length: 101 }, () => p.layers[0]); }, 'layers', 'layers: must have at most 100 entries, got 101'],
  ['a layer not an object', (p) => { p.layers.push(null); }, 'layers[1]', 'layers[1]: must be an object (a layer), got null'],
  ['layer name not a string', (p) => { p.layers[0].name = 1; }, 'layers[0].name', 'layers[0].name: must be a string, got 1'],
  ['thickness missing', (p) => { delete p.layers[0].thickness_m; }, 'layers[0].thickness_m', 'layers[0].thickness_m: required, must be a number from 0.001 to 1000 m'],
  ['thickness 0', (p) => { p.layers[0].thickness_m = 0; }, 'layers[0].thickness_m', 'layers[0].thickness_m: must be a number from 0.001 to 1000 m, got 0'],
  ['unit weight missing', (p) => { delete p.layers[0].unitWeight_kNm3; }, 'layers[0].unitWeight_kNm3', 'layers[0].unitWeight_kNm3: required, must be a number from 5 to 60 kN/m³'],
  ['unit weight below 5', (p) => { p.layers[0].unitWeight_kNm3 = 2.5; }, 'layers[0].unitWeight_kNm3', 'layers[0].unitWeight_kNm3: must be a number from 5 to 60 kN/m³, got 2.5'],
  ['unit weight above 60 (e.g. entered in N/m³ ÷ 100)', (p) => { p.layers[0].unitWeight_kNm3 = 250; }, 'layers[0].unitWeight_kNm3', 'layers[0].unitWeight_kNm3: must be a number from 5 to 60 kN/m³, got 250'],
  ['E missing', (p) => { delete p.layers[0].youngModulus_GPa; }, 'layers[0].youngModulus_GPa', 'layers[0].youngModulus_GPa: required, must be a number from 0.001 to 10000 GPa'],
  ['E 0', (p) => { p.layers[0].youngModulus_GPa = 0; }, 'layers[0].youngModulus_GPa', 'layers[0].youngModulus_GPa: must be a number from 0.001 to 10000 GPa, got 0'],
  ['E negative', (p) => { p.layers[0].youngModulus_GPa = -8; }, 'layers[0].youngModulus_GPa', 'layers[0].youngModulus_GPa: must be a number from 0.001 to 10000 GPa, got -8'],
  ['modulusBasis unknown', (p) => { p.layers[0].modulusBasis = 'rockmass'; }, 'layers[0].modulusBasis', 'layers[0].modulusBasis: must be one of "mass", "intact", got "rockmass"'],
  ['poisson negative', (p) => { p.layers[0].poisson = -0.1; }, 'layers[0].poisson', 'layers[0].poisson: must be ≥ 0 and < 0.5, got -0.1'],
  ['poisson 0.5', (p) => { p.layers[0].poisson = 0.5; }, 'layers[0].poisson', 'layers[0].poisson: must be ≥ 0 and < 0.5, got 0.5'],
  ['poisson null', (p) => { p.layers[0].poisson = null; }, 'layers[0].poisson', 'layers[0].poisson: must be a number ≥ 0 and < 0.5, got null'],
  ['ucs missing', (p) => { delete p.layers[0].ucs_MPa; }, 'layers[0].ucs_MPa', 'layers[0].ucs_MPa: required, must be a number from 0.01 to 1000 MPa'],
  ['ucs 0', (p) => { p.layers[0].ucs_MPa = 0; }, 'layers[0].ucs_MPa', 'layers[0].ucs_MPa: must be a number from 0.01 to 1000 MPa, got 0'],
  ['rockClass unknown', (p) => { p.layers[0].rockClass = 'coal'; }, 'layers[0].rockClass', 'layers[0].rockClass: must be one of "sedimentary", "igneous", "metamorphic", got "coal"'],
  ['tensile missing', (p) => { delete p.layers[0].tensile; }, 'layers[0].tensile', 'layers[0].tensile: required, give value_MPa or specimens'],
  ['tensile not an object', (p) => { p.layers[0].tensile = 3; }, 'layers[0].tensile', 'layers[0].tensile: must be an object, got 3'],
  ['tensile value negative', (p) => { p.layers[0].tensile.value_MPa = -1; }, 'layers[0].tensile.value_MPa', 'layers[0].tensile.value_MPa: must be a number from 0 to 100 MPa, got -1'],
  ['tensile value numeric string', (p) => { p.layers[0].tensile.value_MPa = '3'; }, 'layers[0].tensile.value_MPa', 'layers[0].tensile.value_MPa: must be a number from 0 to 100 MPa or null, got "3"'],
  ['tensile method unknown', (p) => { p.layers[0].tensile.method = 'flexural'; }, 'layers[0].tensile.method', 'layers[0].tensile.method: must be one of "brazilian", "direct", got "flexural"'],
  ['no tensile value and no specimens', (p) => { p.layers[0].tensile = { value_MPa: null, specimens: [] }; }, 'layers[0].tensile', 'layers[0].tensile: needs value_MPa or at least one specimen, got neither'],
  ['no tensile value, only invalid specimens', (p) => { p.layers[0].tensile = { value_MPa: null, specimens: [{ id: 'A', diameter_mm: 54, thickness_mm: 27, peakLoad_kN: 9, valid: false }] }; }, 'layers[0].tensile', 'layers[0].tensile: needs value_MPa or at least one specimen marked valid with thickness_mm ≤ diameter_mm, got none of 1'],
  ['no tensile value, only specimens thicker than their diameter', (p) => { p.layers[0].tensile = { specimens: [{ diameter_mm: 54, thickness_mm: 60, peakLoad_kN: 9 }, { diameter_mm: 54, thickness_mm: 54.1, peakLoad_kN: 9 }] }; }, 'layers[0].tensile', 'layers[0].tensile: needs value_MPa or at least one specimen marked valid with thickness_mm ≤ diameter_mm, got none of 2'],
  ['specimens not an array', (p) => { p.layers[0].tensile.specimens = {}; }, 'layers[0].tensile.specimens', 'layers[0].tensile.specimens: must be an array, got an object'],
  ['a specimen not an object', (p) => { p.layers[0].tensile.specimens = [7]; }, 'layers[0].tensile.specimens[0]', 'layers[0].tensile.specimens[0]: must be an object (a specimen), got 7'],
  ['specimen diameter negative', (p) => { p.layers[0].tensile.specimens = [{ diameter_mm: -54, thickness_mm: 27, peakLoad_kN: 9 }]; }, 'layers[0].tensile.specimens[0].diameter_mm', 'layers[0].tensile.specimens[0].diameter_mm: must be a number from 1 to 1000 mm, got -54'],
  ['specimen thickness 0', (p) => { p.layers[0].tensile.specimens = [{ diameter_mm: 54, thickness_mm: 0, peakLoad_kN: 9 }]; }, 'layers[0].tensile.specimens[0].thickness_mm', 'layers[0].tensile.specimens[0].thickness_mm: must be a number from 1 to 1000 mm, got 0'],
  ['specimen load negative', (p) => { p.layers[0].tensile.specimens = [{ diameter_mm: 54, thickness_mm: 27, peakLoad_kN: -9 }]; }, 'layers[0].tensile.specimens[0].peakLoad_kN', 'layers[0].tensile.specimens[0].peakLoad_kN: must be a number from 0.001 to 10000 kN, got -9'],
  ['specimen load missing', (p) => { p.layers[0].tensile.specimens = [{ diameter_mm: 54, thickness_mm: 27 }]; }, 'layers[0].tensile.specimens[0].peakLoad_kN', 'layers[0].tensile.specimens[0].peakLoad_kN: required, must be a number from 0.001 to 10000 kN'],
  ['specimen valid not a boolean', (p) => { p.layers[0].tensile.specimens = [{ diameter_mm: 54, thickness_mm: 27, peakLoad_kN: 9, valid: 'yes' }]; }, 'layers[0].tensile.specimens[0].valid', 'layers[0].tensile.specimens[0].valid: must be true or false, got "yes"'],
  ['specimen id a number', (p) => { p.layers[0].tensile.specimens = [{ id: 3, diameter_mm: 54, thickness_mm: 27, peakLoad_kN: 9 }]; }, 'layers[0].tensile.specimens[0].id', 'layers[0].tensile.specimens[0].id: must be a string, got 3'],
  ['jointing not an object', (p) => { p.layers[0].jointing = []; }, 'layers[0].jointing', 'layers[0].jointing: must be an object, got an array'],
  ['cross-joint spacing 0', (p) => { p.layers[0].jointing.crossJointSpacing_m = 0; }, 'layers[0].jointing.crossJointSpacing_m', 'layers[0].jointing.crossJointSpacing_m: must be a number from 0.001 to 10000 m, got 0'],
  ['fracture frequency negative', (p) => { p.layers[0].jointing.fractureFrequency_per_m = -2; }, 'layers[0].jointing.fractureFrequency_per_m', 'layers[0].jointing.fractureFrequency_per_m: must be a number from 0 to 1000 /m, got -2'],
  ['rqd above 100', (p) => { p.layers[0].jointing.rqd = 101; }, 'layers[0].jointing.rqd', 'layers[0].jointing.rqd: must be a number from 0 to 100, got 101'],
  ['rqd negative', (p) => { p.layers[0].jointing.rqd = -1; }, 'layers[0].jointing.rqd', 'layers[0].jointing.rqd: must be a number from 0 to 100, got -1'],
  ['JCond89 above 30', (p) => { p.layers[0].jointing.jointCondition = 31; }, 'layers[0].jointing.jointCondition', 'layers[0].jointing.jointCondition: must be a number from 0 to 30, got 31'],
  ['JCond89 negative', (p) => { p.layers[0].jointing.jointCondition = -1; }, 'layers[0].jointing.jointCondition', 'layers[0].jointing.jointCondition: must be a number from 0 to 30, got -1'],
  ['friction 90°', (p) => { p.layers[0].jointing.jointFriction_deg = 90; }, 'layers[0].jointing.jointFriction_deg', 'layers[0].jointing.jointFriction_deg: must be ≥ 0° and < 90°, got 90'],
  ['friction negative', (p) => { p.layers[0].jointing.jointFriction_deg = -5; }, 'layers[0].jointing.jointFriction_deg', 'layers[0].jointing.jointFriction_deg: must be ≥ 0° and < 90°, got -5'],
  ['hoekBrown not an object', (p) => { p.layers[0].hoekBrown = 'mi=7'; }, 'layers[0].hoekBrown', 'layers[0].hoekBrown: must be an object, got "mi=7"'],
  ['mi 0', (p) => { p.layers[0].hoekBrown.mi = 0; }, 'layers[0].hoekBrown.mi', 'layers[0].hoekBrown.mi: must be a number from 1 to 100, got 0'],
  ['disturbance above 1', (p) => { p.layers[0].hoekBrown.disturbance = 1.1; }, 'layers[0].hoekBrown.disturbance', 'layers[0].hoekBrown.disturbance: must be a number from 0 to 1, got 1.1'],
  ['disturbance negative', (p) => { p.layers[0].hoekBrown.disturbance = -0.1; }, 'layers[0].hoekBrown.disturbance', 'layers[0].hoekBrown.disturbance: must be a number from 0 to 1, got -0.1'],
  ['design not an object', (p) => { p.design = true; }, 'design', 'design: must be an object, got true'],
  ['fsTarget not an object', (p) => { p.design.fsTarget = 4; }, 'design.fsTarget', 'design.fsTarget: must be an object, got 4'],
  ['fsTarget.crushing negative', (p) => { p.design.fsTarget.crushing = -2; }, 'design.fsTarget.crushing', 'design.fsTarget.crushing: must be a number from 0.1 to 100, got -2'],
  ['fsTarget.sliding a string', (p) => { p.design.fsTarget.sliding = '1.5'; }, 'design.fsTarget.sliding', 'design.fsTarget.sliding: must be a number from 0.1 to 100, got "1.5"'],
  ['deflectionLimitRatio 0', (p) => { p.design.deflectionLimitRatio = 0; }, 'design.deflectionLimitRatio', 'design.deflectionLimitRatio: must be a number from 0.001 to 1, got 0'],
  ['characteristic unknown', (p) => { p.design.characteristic = 'lower10'; }, 'design.characteristic', 'design.characteristic: must be one of "mean", "lower5", "cautiousMean", "lower5Log", got "lower10"'],
  ['basis unknown', (p) => { p.design.basis = 'cracked'; }, 'design.basis', 'design.basis: must be one of "intact", "jointed", got "cracked"'],
  ['planeStrainModulus not a boolean', (p) => { p.design.planeStrainModulus = 1; }, 'design.planeStrainModulus', 'design.planeStrainModulus: must be true or false, got 1'],
];

describe('validateProject — refusal paths', () => {
  it.each(refusals)('refuses %s', (_what, fn, path, message) => {
    const errors = errorsOf(mutate(fn));
    expect(errors.map((e) => e.message)).toContain(message);
    expect(errors.find((e) => e.message === message)?.path).toBe(path);
    expect(() => parseProject(mutate(fn))).toThrow(ProjectError);
  });

  it.each([
    ['null', null],
    ['an array', []],
    ['a number', 5],
    ['a string', 'lamina/1'],
  ])('refuses a top-level %s with path ""', (what, raw) => {
    expect(errorsOf(raw)).toEqual([
      { path: '', message: `a project must be a JSON object, got ${what === 'a number' ? '5' : what === 'a string' ? '"lamina/1"' : what}`, code: 'TYPE' },
    ]);
  });

  it('property: a non-finite or non-number value in any required number is refused at that path', () => {
    const fields = ['thickness_m', 'unitWeight_kNm3', 'youngModulus_GPa', 'ucs_MPa'] as const;
    fc.assert(
      fc.property(
        fc.constantFrom(...fields),
        fc.oneof(fc.constantFrom(NaN, Infinity, -Infinity, null, true), fc.string(), fc.array(fc.integer()), fc.object()),
        (field, bad) => {
          const raw = mutate((p) => { p.layers[0][field] = bad; });
          const errors = errorsOf(raw);
          expect(errors.map((e) => e.path)).toContain(`layers[0].${field}`);
        },
      ),
    );
  });
});

describe('validateProject — forbidden keys __proto__, constructor, prototype', () => {
  it('refuses an own "__proto__" key created by JSON.parse at the top level', () => {
    const raw = JSON.parse(`{"__proto__": {"polluted": true}, ${JSON.stringify(complete()).slice(1)}`);
    expect(Object.keys(raw)).toContain('__proto__');
    expect(errorsOf(raw)).toEqual([{ path: '__proto__', message: '__proto__: forbidden key "__proto__"', code: 'FORBIDDEN_KEY' }]);
    expect(({} as Json).polluted).toBeUndefined();
  });

  it('refuses forbidden keys anywhere: nested in a layer, in design, inside an unknown key', () => {
    const text = JSON.stringify(complete())
      .replace('"thickness_m"', '"__proto__":{"x":1},"thickness_m"')
      .replace('"basis"', '"constructor":{"prototype":1},"basis"')
      .replace('"title"', '"notes":{"deep":[{"prototype":2}]},"title"');
    const errors = errorsOf(JSON.parse(text));
    expect(errors.map((e) => e.path).sort()).toEqual([
      'design.constructor',
      'layers[0].__proto__',
      'notes.deep[0].prototype',
    ]);
    expect(errors.every((e) => e.code === 'FORBIDDEN_KEY')).toBe(true);
  });

  it('reads own properties only: fields inherited through a prototype are not seen', () => {
    const inherited = Object.create({ schema: 'lamina/2', opening: { type: 'beam', span_m: 6, ends: 'clamped' } });
    inherited.layers = complete().layers;
    expect(errorsOf(inherited).map((e) => e.path)).toEqual(['schema', 'opening']);
  });

  it('a cyclic object passed in does not hang the scan', () => {
    const raw = complete();
    raw.loop = raw;
    expect(validateProject(raw).ok).toBe(true);
  });
});

describe('validateProject — warnings (accepted, flagged)', () => {
  it('unknown keys give UNKNOWN_KEY warnings with their path', () => {
    const raw = mutate((p) => {
      p.colour = 'red';
      p.layers[0].density = 2500;
      p.layers[0].tensile.specimens = [{ diameter_mm: 54, thickness_mm: 27, peakLoad_kN: 9, operator: 'x' }];
      p.design.fsTarget.bending = 3;
    });
    const r = validateProject(raw);
    expect(r.ok).toBe(true);
    expect(r.warnings.filter((w) => w.code === 'UNKNOWN_KEY').map((w) => w.message)).toEqual([
      'colour: unknown key, ignored',
      'layers[0].density: unknown key, ignored',
      'layers[0].tensile.specimens[0].operator: unknown key, ignored',
      'design.fsTarget.bending: unknown key, ignored',
    ]);
  });

  const implausible: Array<[string, (p: Json) => void, string]> = [
    ['E < 0.1 GPa', (p) => { p.layers[0].youngModulus_GPa = 0.05; }, 'layers[0].youngModulus_GPa'],
    ['E > 150 GPa', (p) => { p.layers[0].youngModulus_GPa = 200; }, 'layers[0].youngModulus_GPa'],
    ['span > 60 m', (p) => { p.opening.span_m = 70; }, 'opening.span_m'],
    ['thickness > 20 m', (p) => { p.layers[0].thickness_m = 25; }, 'layers[0].thickness_m'],
    ['thickness < 0.02 m', (p) => { p.layers[0].thickness_m = 0.005; }, 'layers[0].thickness_m'],
    ['ucs > 400 MPa', (p) => { p.layers[0].ucs_MPa = 500; p.layers[0].tensile.value_MPa = 10; }, 'layers[0].ucs_MPa'],
    ['ucs < 1 MPa', (p) => { p.layers[0].ucs_MPa = 0.5; p.layers[0].tensile.value_MPa = 0; }, 'layers[0].ucs_MPa'],
    ['tensile value > ucs/3', (p) => { p.layers[0].tensile.value_MPa = 14; }, 'layers[0].tensile.value_MPa'],
    ['tensile value > 50 MPa', (p) => { p.layers[0].ucs_MPa = 300; p.layers[0].tensile.value_MPa = 60; }, 'layers[0].tensile.value_MPa'],
    ['surcharge > 5000 kPa', (p) => { p.loads.surcharge_kPa = 6000; }, 'loads.surcharge_kPa'],
    ['support > 500 kPa', (p) => { p.support.standing_kPa = 600; }, 'support.standing_kPa'],
    ['horizontal stress > 100 MPa', (p) => { p.loads.horizontalStress_MPa = 120; }, 'loads.horizontalStress_MPa'],
    ['horizontal stress tensile (< 0)', (p) => { p.loads.horizontalStress_MPa = -1; }, 'loads.horizontalStress_MPa'],
    ['mi > 40', (p) => { p.layers[0].hoekBrown.mi = 55; }, 'layers[0].hoekBrown.mi'],
    ['joint friction > 60°', (p) => { p.layers[0].jointing.jointFriction_deg = 70; }, 'layers[0].jointing.jointFriction_deg'],
    ['fracture frequency > 50 /m', (p) => { p.layers[0].jointing.fractureFrequency_per_m = 80; }, 'layers[0].jointing.fractureFrequency_per_m'],
    ['FS target < 1', (p) => { p.design.fsTarget.tension = 0.8; }, 'design.fsTarget.tension'],
    ['deflection limit ratio > 0.25', (p) => { p.design.deflectionLimitRatio = 0.3; }, 'design.deflectionLimitRatio'],
    ['specimen diameter < 10 mm', (p) => { p.layers[0].tensile.specimens = [{ diameter_mm: 5, thickness_mm: 2.5, peakLoad_kN: 0.1 }]; }, 'layers[0].tensile.specimens[0].diameter_mm'],
    // hand calc, ISRM 1978 σt = 2P/(πDL): 2·150e3 N/(π·54 mm·27 mm) = 65.5 MPa > 50 MPa
    ['specimen Brazilian strength > 50 MPa (load in N typed as kN?)', (p) => { p.layers[0].tensile.specimens = [{ diameter_mm: 54, thickness_mm: 27, peakLoad_kN: 150 }]; }, 'layers[0].tensile.specimens[0].peakLoad_kN'],
  ];

  it.each(implausible)('warns IMPLAUSIBLE but accepts: %s', (_what, fn, path) => {
    const r = validateProject(mutate(fn));
    expect(r.ok).toBe(true);
    const w = r.warnings.filter((x) => x.code === 'IMPLAUSIBLE');
    expect(w.map((x) => x.path)).toEqual([path]);
    expect(w[0].message.startsWith(`${path}: `)).toBe(true);
  });

  it('the E warning says value, bound and unit: "0.05 GPa is implausibly low (below 0.1 GPa)"', () => {
    const w = warningsOf(mutate((p) => { p.layers[0].youngModulus_GPa = 0.05; }));
    expect(w[0].message).toBe('layers[0].youngModulus_GPa: 0.05 GPa is implausibly low (below 0.1 GPa); check the value and its unit');
  });

  it('the tensile/ucs warning names ucs/3: 14 MPa against ucs 40 MPa (40/3 = 13.33, shown as 13.3 by the precision rule)', () => {
    const w = warningsOf(mutate((p) => { p.layers[0].tensile.value_MPa = 14; }));
    expect(w[0].message).toBe(
      'layers[0].tensile.value_MPa: 14 MPa is implausibly high against ucs_MPa 40 (above ucs/3 = 13.3 MPa); check the value and its unit',
    );
  });

  it('values just inside the plausible ranges give no warning', () => {
    const raw = mutate((p) => {
      p.opening.span_m = 60;
      p.layers[0].youngModulus_GPa = 0.1;
      p.layers[0].thickness_m = 20;
      p.layers[0].ucs_MPa = 400;
      p.layers[0].tensile.value_MPa = 50;
      p.loads = { surcharge_kPa: 5000, horizontalStress_MPa: 100 };
      p.support = { standing_kPa: 500 };
    });
    expect(warningsOf(raw)).toEqual([]);
  });

  it('duplicate layer names and specimen ids are flagged', () => {
    const raw = mutate((p) => {
      p.layers.push(JSON.parse(JSON.stringify(p.layers[0])));
      p.layers[0].tensile.specimens = [
        { id: 'B1', diameter_mm: 54, thickness_mm: 27, peakLoad_kN: 9 },
        { id: 'B1', diameter_mm: 54, thickness_mm: 27, peakLoad_kN: 9 },
      ];
    });
    const w = warningsOf(raw);
    expect(w.map((x) => [x.code, x.path])).toEqual([
      ['DUPLICATE_ID', 'layers[0].tensile.specimens[1].id'],
      ['SPECIMENS_WIN', 'layers[0].tensile.value_MPa'],
      ['DUPLICATE_NAME', 'layers[1].name'],
    ]);
  });

  it('a value with usable specimens warns that the specimens give the strength (DESIGN.md: specimens win)', () => {
    const raw = mutate((p) => { p.layers[0].tensile.specimens = [{ diameter_mm: 54, thickness_mm: 27, peakLoad_kN: 9 }]; });
    expect(warningsOf(raw)).toEqual([
      {
        path: 'layers[0].tensile.value_MPa',
        message: 'layers[0].tensile.value_MPa: ignored: the 1 usable specimen give the tensile strength',
        code: 'SPECIMENS_WIN',
      },
    ]);
  });

  it('validateProject does not mutate its input', () => {
    const raw = minimal();
    const copy = JSON.parse(JSON.stringify(raw));
    validateProject(raw);
    expect(raw).toStrictEqual(copy);
  });

  it('the normalised project shares no objects with the input', () => {
    const raw = complete();
    const r = validateProject(raw);
    expect(r.ok).toBe(true);
    const p = (r as { project: Project }).project;
    expect(p.layers[0]).not.toBe(raw.layers[0]);
    expect(p.layers[0].tensile.specimens).not.toBe(raw.layers[0].tensile.specimens);
    expect(p.design.fsTarget).not.toBe(raw.design.fsTarget);
  });
});

describe('validateProject — hostile objects passed in (not from JSON)', () => {
  it('a huge sparse layers array is refused quickly by its length', () => {
    const raw = complete();
    raw.layers = new Array(1e9);
    const t0 = Date.now();
    expect(errorsOf(raw).map((e) => e.message)).toEqual(['layers: must have at most 100 entries, got 1000000000']);
    expect(Date.now() - t0).toBeLessThan(1000);
  });

  it('an own "constructor" key on an array inside the project is refused', () => {
    const raw = complete();
    Object.defineProperty(raw.layers, 'constructor', { value: 1, enumerable: false });
    expect(errorsOf(raw).map((e) => e.path)).toEqual(['layers.constructor']);
  });
});
