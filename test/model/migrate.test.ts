import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { analyse } from '../../src/analysis';
import { readProjectText, writeProjectText } from '../../src/model/project-file';
import { migrateV1, V1_TENSION_TARGET } from '../../src/model/migrate';
import type { LayerReport, MaxSpanReport, Warning } from '../../src/model/types';
import { MIGRATED_CODE, validateProject } from '../../src/model/validate';

// The check values here are outside this release: `fixtures/v1/*.lamina.json` are the previous
// release's presets and variants as it wrote them (schema lamina/1), and `*.v1-report.json` is
// what the previous release (commit bed018d) reported for each of them. A migrated file must
// analyse to the same numbers, except where v1 was defective and v2 fixes it on purpose
// (each exception is named below and in the migration notice).
const dir = join(__dirname, 'fixtures', 'v1');
const files = readdirSync(dir).filter((f) => f.endsWith('.lamina.json')).sort();

interface V1Report {
  schema: string;
  layers: LayerReport[];
  governing: { layer: string; mode: string; fs: number } | null;
  maxSpan_m: MaxSpanReport | null;
  warnings: Warning[];
}

const close = (a: number | null, b: number | null, rel = 1e-9): void => {
  if (a === null || b === null) {
    expect(a).toBe(b);
    return;
  }
  expect(Math.abs(a - b)).toBeLessThanOrEqual(rel * Math.max(1, Math.abs(b)));
};

describe('lamina/1 files migrate to lamina/2 with their meaning kept', () => {
  it('finds the previous release files and reports', () => {
    expect(files.length).toBeGreaterThanOrEqual(7);
  });

  it.each(files)('%s opens with a one-time MIGRATED notice, and saving writes lamina/2 without it', (file) => {
    const text = readFileSync(join(dir, file), 'utf8');
    expect(JSON.parse(text).schema).toBe('lamina/1');
    const { project, warnings, migratedFrom } = readProjectText(text);
    expect(migratedFrom).toBe('lamina/1');
    const notices = warnings.filter((w) => w.code === MIGRATED_CODE);
    expect(notices).toHaveLength(1);
    expect(notices[0].message).toContain('lamina/1');
    expect(project.schema).toBe('lamina/2');
    const saved = writeProjectText(project);
    expect(JSON.parse(saved).schema).toBe('lamina/2');
    const again = readProjectText(saved);
    expect(again.warnings.filter((w) => w.code === MIGRATED_CODE)).toEqual([]);
    expect(again.project).toStrictEqual(project);
  });

  it.each(files)('%s keeps v1 meaning: support moved, rock-mass tensile basis, the v1 tension target, crushing on the UCS as given', (file) => {
    const raw = JSON.parse(readFileSync(join(dir, file), 'utf8'));
    const { project } = readProjectText(JSON.stringify(raw));
    expect(project.support.standing_kPa).toBe(raw.loads?.support_kPa ?? 0);
    expect(project.design.tensileBasis).toBe('rockMass');
    expect(project.design.crushingStrength).toBe('lab');
    expect(project.design.fsTarget.tension).toBe(raw.design?.fsTarget?.tension ?? V1_TENSION_TARGET);
  });

  it.each(files)('%s analyses to the v1 numbers field by field (except the v1 defects v2 fixes)', (file) => {
    const { project } = readProjectText(readFileSync(join(dir, file), 'utf8'));
    const v1: V1Report = JSON.parse(readFileSync(join(dir, file.replace('.lamina.json', '.v1-report.json')), 'utf8'));
    const v2 = analyse(project).report;
    const sh = project.loads.horizontalStress_MPa;
    expect(v2.layers).toHaveLength(v1.layers.length);
    v2.layers.forEach((l, i) => {
      const o = v1.layers[i];
      expect(l.name).toBe(o.name);
      expect(l.group).toBe(o.group);
      // Loads: equal while the standing support does not exceed the load (v1 let it go negative).
      if (o.load_kPa >= 0) close(l.load_kPa, o.load_kPa);
      else expect(l.load_kPa).toBe(0);
      for (const key of Object.keys(o.strength) as Array<keyof typeof o.strength>) {
        if (typeof o.strength[key] === 'number') close(l.strength[key] as number, o.strength[key] as number);
        else expect(l.strength[key]).toBe(o.strength[key]);
      }
      for (const key of Object.keys(o.elastic) as Array<keyof typeof o.elastic>) {
        const a = l.elastic[key];
        const b = o.elastic[key];
        if (typeof b === 'number') close(a as number, b);
        else expect(a).toBe(b);
      }
      expect(l.plate === null).toBe(o.plate === null);
      if (l.plate && o.plate) {
        close(l.plate.maxTension_MPa, o.plate.maxTension_MPa, 1e-6);
        close(l.plate.beta, o.plate.beta, 1e-6);
      }
      expect(l.voussoir === null).toBe(o.voussoir === null);
      if (l.voussoir && o.voussoir) {
        const v = l.voussoir;
        const w = o.voussoir;
        expect(v.snapThrough).toBe(w.snapThrough);
        close(v.n, w.n);
        close(v.leverArm_m, w.leverArm_m);
        close(v.maxCompression_MPa, w.maxCompression_MPa);
        close(v.deflectionRatio, w.deflectionRatio);
        close(v.fsSliding, w.fsSliding);
        // v1 defect fixed in v2 (METHODS §3a): σh was left out of the crushing demand.
        // v1: FS = UCS/fc; v2 (crushing on the UCS as given after migration): UCS/(fc + σh).
        if (w.fsCrushing !== null && w.maxCompression_MPa !== null) {
          const ucs = w.fsCrushing * w.maxCompression_MPa;
          close(v.fsCrushing, ucs / (w.maxCompression_MPa + Math.max(0, sh)));
        }
      }
    });
    // Largest tension span: v1 searched every layer not cross-jointed; v2 the layers in which
    // tension counts — the same layers on the intact basis — capped at a layer's joint spacing.
    if (project.design.basis === 'intact' && v1.maxSpan_m && v2.maxSpan_m) {
      const spacing = Math.min(...project.layers.map((l) => l.jointing.crossJointSpacing_m ?? Infinity).filter((c) => c > project.opening.span_m));
      const expected = v1.maxSpan_m.tension === null ? null : Math.min(v1.maxSpan_m.tension, spacing);
      if (expected === null) expect(v2.maxSpan_m.tension).toBe(null);
      else expect(Math.abs((v2.maxSpan_m.tension as number) - expected)).toBeLessThanOrEqual(1e-3);
    }
  });

  it('the notice names each v1 defect that changes this file, and only those', () => {
    const drift = migrateV1(JSON.parse(readFileSync(join(dir, 'drift-limestone.lamina.json'), 'utf8')));
    expect(drift.notice).toContain('horizontal stress (3 MPa) now adds to the voussoir crushing demand');
    expect(drift.notice).not.toContain('capped at the load it relieves');
    const propped = migrateV1(JSON.parse(readFileSync(join(dir, 'coal-room-jointed-support.lamina.json'), 'utf8')));
    expect(propped.notice).toContain('capped at the load it relieves');
    expect(propped.notice).not.toContain('horizontal stress (');
    const overhang = migrateV1(JSON.parse(readFileSync(join(dir, 'quarry-bench-overhang.lamina.json'), 'utf8')));
    expect(overhang.notice).not.toContain('voussoir checks of a layer that does not crack');
  });

  it('a link or autosave (raw JSON) of lamina/1 migrates through validateProject the same way', () => {
    const raw = JSON.parse(readFileSync(join(dir, 'minimal-defaults.lamina.json'), 'utf8'));
    const r = validateProject(raw);
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.migratedFrom).toBe('lamina/1');
    expect(r.project.design.fsTarget.tension).toBe(4); // the v1 default, kept (v2's rock-mass default would be 2)
    expect(raw.schema).toBe('lamina/1'); // the input is not mutated
  });

  it('a lamina/2 file that still carries loads.support_kPa gets a warning and the value is not used', () => {
    const raw = JSON.parse(readFileSync(join(__dirname, '..', '..', 'presets', 'coal-room-shale.lamina.json'), 'utf8'));
    raw.loads.support_kPa = 20;
    const r = validateProject(raw);
    expect(r.ok && r.project.support.standing_kPa).toBe(0);
    expect(r.warnings.map((w) => w.code)).toContain('MOVED');
  });
});
