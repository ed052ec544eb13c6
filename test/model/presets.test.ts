import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { readProjectText, writeProjectText } from '../../src/model/project-file';
import type { Project } from '../../src/model/types';
import { validateProject } from '../../src/model/validate';

const dir = join(__dirname, '..', '..', 'presets');
const load = (name: string): Project => readProjectText(readFileSync(join(dir, name), 'utf8')).project;
const files = readdirSync(dir).filter((f) => f.endsWith('.lamina.json')).sort();

/** Brazilian σt = 2P/(πDL) in MPa from kN and mm (ISRM 1978, METHODS §5). */
const brazilian = (s: Project['layers'][number]['tensile']['specimens'][number]) =>
  (2000 * s.peakLoad_kN) / (Math.PI * s.diameter_mm * s.thickness_mm);

describe('presets/*.lamina.json', () => {
  it('the four demo presets are present', () => {
    expect(files).toEqual(['coal-room-shale.lamina.json', 'drift-limestone.lamina.json', 'intersection-limestone.lamina.json', 'quarry-bench-overhang.lamina.json']);
  });

  it.each(files)('%s passes validateProject with no errors and no warnings', (file) => {
    const r = validateProject(JSON.parse(readFileSync(join(dir, file), 'utf8')));
    expect(r.ok ? [] : r.errors).toEqual([]);
    expect(r.warnings).toEqual([]);
  });

  it.each(files)('%s says in its title and description that it is invented demo data', (file) => {
    const p = load(file);
    expect(p.title.startsWith('Demo (invented data): ')).toBe(true);
    expect(p.description?.startsWith('Demo (invented data')).toBe(true);
  });

  it.each(files)('%s survives a write/read round trip', (file) => {
    const p = load(file);
    expect(readProjectText(writeProjectText(p)).project).toStrictEqual(p);
  });

  it.each(files)('%s has physically plausible layers (γ 20–28 kN/m³, tensile ≤ UCS/5)', (file) => {
    for (const l of load(file).layers) {
      expect(l.unitWeight_kNm3).toBeGreaterThanOrEqual(20);
      expect(l.unitWeight_kNm3).toBeLessThanOrEqual(28);
      const tensile = l.tensile.value_MPa ?? Math.max(...l.tensile.specimens.map(brazilian));
      // UCS/tensile of 5–20 for sedimentary rocks (common practice)
      expect(tensile).toBeLessThanOrEqual(l.ucs_MPa / 5);
    }
  });

  it('coal room: 6 m clamped beam, shale under a stiffer sandstone that separates (Obert & Duvall, METHODS §2)', () => {
    const p = load('coal-room-shale.lamina.json');
    expect(p.opening.type).toBe('beam');
    expect(p.opening.ends).toBe('clamped');
    expect(p.opening.span_m).toBeGreaterThanOrEqual(5.5);
    expect(p.opening.span_m).toBeLessThanOrEqual(6.5);
    expect(p.layers).toHaveLength(3);
    const [shale, sandstone] = p.layers;
    expect(shale.thickness_m).toBeGreaterThanOrEqual(0.4);
    expect(shale.thickness_m).toBeLessThanOrEqual(0.6);
    expect(sandstone.thickness_m).toBeGreaterThanOrEqual(1.5);
    expect(sandstone.thickness_m).toBeLessThanOrEqual(2);
    // METHODS §2: (q2)1 = E1 t1³ (γ1 t1 + γ2 t2) / (E1 t1³ + E2 t2³) < q1 = γ1 t1 → the sandstone separates.
    // Hand calc for the file: E1t1³ = 8·0.125 = 1.0, E2t2³ = 20·1.8³ = 116.64; (12.5 + 43.2)·1/117.64 = 0.47 kPa < 12.5 kPa.
    const e1 = shale.youngModulus_GPa * shale.thickness_m ** 3;
    const e2 = sandstone.youngModulus_GPa * sandstone.thickness_m ** 3;
    const q21 = (e1 * (shale.unitWeight_kNm3 * shale.thickness_m + sandstone.unitWeight_kNm3 * sandstone.thickness_m)) / (e1 + e2);
    expect(q21).toBeLessThan(shale.unitWeight_kNm3 * shale.thickness_m);
    // shale: 6–8 Brazilian specimens, exactly one invalid, one thin disc (L/D < 0.2, ASTM D3967 range 0.2–0.75)
    const specimens = shale.tensile.specimens;
    expect(specimens.length).toBeGreaterThanOrEqual(6);
    expect(specimens.length).toBeLessThanOrEqual(8);
    expect(specimens.filter((s) => !s.valid)).toHaveLength(1);
    expect(specimens.filter((s) => s.thickness_mm / s.diameter_mm < 0.2)).toHaveLength(1);
    expect(shale.tensile.value_MPa).toBeNull();
    expect(p.layers.slice(1).every((l) => l.tensile.value_MPa !== null && l.tensile.specimens.length === 0)).toBe(true);
  });

  it('drift: 2–3 limestone layers, a horizontal stress of a few MPa, one cross-jointed layer', () => {
    const p = load('drift-limestone.lamina.json');
    expect(p.opening.type).toBe('beam');
    expect(p.layers.length).toBeGreaterThanOrEqual(2);
    expect(p.layers.length).toBeLessThanOrEqual(3);
    expect(p.loads.horizontalStress_MPa).toBeGreaterThanOrEqual(1);
    expect(p.loads.horizontalStress_MPa).toBeLessThanOrEqual(10);
    // crossJointed = crossJointSpacing_m < span_m (METHODS §10)
    const jointed = p.layers.filter((l) => l.jointing.crossJointSpacing_m !== null && l.jointing.crossJointSpacing_m < p.opening.span_m);
    expect(jointed).toHaveLength(1);
  });

  it('quarry bench: a sandstone cantilever of 1.5–2.5 m', () => {
    const p = load('quarry-bench-overhang.lamina.json');
    expect(p.opening.type).toBe('cantilever');
    expect(p.opening.span_m).toBeGreaterThanOrEqual(1.5);
    expect(p.opening.span_m).toBeLessThanOrEqual(2.5);
    expect(p.layers[0].name.toLowerCase()).toContain('sandstone');
    expect(p.layers[0].rockClass).toBe('sedimentary');
  });
});
