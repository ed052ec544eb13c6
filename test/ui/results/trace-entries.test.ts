import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { analyse } from '../../../src/analysis';
import { relatedEntries, tracePrefix, valueText, safeText } from '../../../src/ui/results/trace-entries';
import { loadPreset } from './presets';

describe('tracePrefix(path)', () => {
  it('groups report and detail paths of one layer under layers[i]', () => {
    expect(tracePrefix('layers[0].elastic.fsTension')).toBe('layers[0]');
    expect(tracePrefix('detail.layers[12].lab.cov')).toBe('layers[12]');
    expect(tracePrefix('maxSpan_m.governing')).toBe('maxSpan_m');
    expect(tracePrefix('governing.fs')).toBe('governing');
  });

  it('property: the layer prefix is the same for any field of layer i', () => {
    fc.assert(
      fc.property(fc.nat(99), fc.stringMatching(/^[a-zA-Z_.]{1,20}$/), fc.boolean(), (i, tail, detail) => {
        expect(tracePrefix(`${detail ? 'detail.' : ''}layers[${i}].${tail}`)).toBe(`layers[${i}]`);
      }),
    );
  });
});

describe('relatedEntries(trace, path)', () => {
  it('coal room: the entries of layer 0 include its report and detail paths and nothing of layer 1', () => {
    const { report } = analyse(loadPreset('coal-room-shale'));
    const related = relatedEntries(report.trace, 'layers[0].elastic.fsTension');
    const paths = related.map((t) => t.path);
    expect(paths).toContain('layers[0].elastic.fsTension');
    expect(paths).toContain('layers[0].strength.design_MPa');
    expect(paths.some((p) => p.startsWith('detail.layers[0].'))).toBe(true);
    expect(paths.some((p) => p.includes('layers[1]'))).toBe(false);
  });

  it('coal room: the beam tension lists what it uses (load, groups, modulus), not the 40 Brazilian discs', () => {
    const { report } = analyse(loadPreset('coal-room-shale'));
    const discs = report.trace.filter((t) => /\.lab\.specimens\[/.test(t.path));
    expect(discs.length).toBeGreaterThanOrEqual(5); // the demo's lab sheet
    // The layer as a whole has some 40 entries: listing them all was the complaint.
    expect(report.trace.filter((t) => tracePrefix(t.path) === 'layers[0]').length).toBeGreaterThanOrEqual(30);
    const paths = relatedEntries(report.trace, 'layers[0].elastic.maxTension_MPa').map((t) => t.path);
    expect(paths[0]).toBe('layers[0].load_kPa'); // report order: the load comes before the beam
    expect(paths).toContain('layers[0].elastic.maxTension_MPa');
    expect(paths.some((p) => p.includes('.lab.'))).toBe(false);
    expect(paths.some((p) => p.includes('.strength.'))).toBe(false); // σ = q s²/(2t²) − σh uses no strength
    expect(paths.length).toBeLessThan(12);
  });

  it('every related entry is reached through a value the one before substitutes (transitively), all in the same layer or whole roof', () => {
    const { report } = analyse(loadPreset('coal-room-shale'));
    for (const start of report.trace) {
      const related = relatedEntries(report.trace, start.path);
      expect(related).toContain(start);
      for (const r of related) {
        if (r === start) continue;
        // r's result appears among the values of some related entry, with its unit
        const user = related.find((u) => u !== r && Object.values(u.values).some((v) => v.unit === r.unit && v.value !== 0 && Math.abs(v.value - r.result) <= 1e-9 * Math.abs(v.value)));
        expect(user, `${start.path} → ${r.path}`).toBeDefined();
      }
    }
  });

  it('the FS tension reaches the strength chain through the design strength', () => {
    const { report } = analyse(loadPreset('coal-room-shale'));
    const paths = relatedEntries(report.trace, 'layers[0].elastic.fsTension').map((t) => t.path);
    expect(paths).toContain('layers[0].strength.design_MPa');
    expect(paths).toContain('layers[0].elastic.maxTension_MPa');
  });
});

describe('valueText(value, unit, units)', () => {
  it('SI: the traced value with its unit', () => {
    expect(valueText(11.25, 'kPa', 'SI')).toBe('11.25 kPa');
    expect(valueText(35, 'deg', 'SI')).toBe('35°');
  });
  it('US: adds the US equivalent — 6 m is 19.7 ft (6 / 0.3048 = 19.685 to 3 significant figures, METHODS §13)', () => {
    expect(valueText(6, 'm', 'US')).toBe('6 m (19.7 ft)');
  });
  it('US: 1 MPa is 145 psi (1 MPa = 145.04 psi, common practice; 4 significant digits → 145)', () => {
    expect(valueText(1, 'MPa', 'US')).toBe('1 MPa (145 psi)');
  });
  it('US: a dimensionless value has no equivalent', () => {
    expect(valueText(0.74, '1', 'US')).toBe('0.74');
  });
});

describe('safeText(render, fallback)', () => {
  it('returns the fallback when rendering throws', () => {
    expect(safeText(() => { throw new SyntaxError('bad'); }, 'x + ')).toBe('x + ');
    expect(safeText(() => 'ok', 'no')).toBe('ok');
  });
});
