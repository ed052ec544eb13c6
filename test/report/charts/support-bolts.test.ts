/**
 * The support drawing (METHODS §12 geometry): bolts at their spacing across the span, tips at
 * the bolt length, anchorage zones of the anchorage length, to one scale; the layers the report
 * says hang from the bolts or bond marked in words. Check values are hand geometry.
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { analyse } from '../../../src/analysis/analyse';
import { boltPositions, supportBoltsSvg } from '../../../src/report/charts/support-bolts';
import { readProjectText } from '../../../src/model/project-file';
import type { BoltPattern, Project } from '../../../src/model/types';
import { expectEscaped, expectLabels, expectNoBadNumbers, expectWellFormed } from './contract';
import { EVIL } from './fixtures';

const coal = readProjectText(readFileSync(new URL('../../../presets/coal-room-shale.lamina.json', import.meta.url), 'utf8')).project;
const bolted = (b: Partial<BoltPattern> = {}, span = 6): Project => ({
  ...coal,
  opening: { ...coal.opening, span_m: span },
  support: { standing_kPa: 0, bolts: { length_m: 1.8, capacity_kN: 100, spacingAcross_m: 1.2, spacingAlong_m: 1.2, anchorage_m: 0.3, action: 'suspension', shearCapacity_kN: 60, pretension_kN: 0, ...b } },
});
const draw = (p: Project, units: 'SI' | 'US' = 'SI') => supportBoltsSvg(p, analyse(p).report, { units });
const attr = (el: string, name: string) => Number(new RegExp(`\\s${name}="([-\\d.]+)"`).exec(el)?.[1]);

describe('supportBoltsSvg', () => {
  it('boltPositions: a row centred on the span at the spacing (6 m at 1.2 m → 5 bolts at 0.6, 1.8, … 5.4 m; hand geometry)', () => {
    expect(boltPositions(6, 1.2).map((x) => +x.toFixed(9))).toEqual([0.6, 1.8, 3, 4.2, 5.4]);
    expect(boltPositions(6, 10)).toEqual([3]);
    expect(boltPositions(0, 1)).toEqual([]);
  });

  it('suspension: well-formed, the shale marked as suspended, the sandstone as anchor, legend in words', () => {
    const svg = draw(bolted());
    expectWellFormed(svg);
    expectNoBadNumbers(svg);
    expectLabels(svg, ['Height above the roof line (m)', 'suspended from the bolts', 'anchor layer', 'spacing across S = 1.2 m', 'Bolts 1.8 m long, anchorage 0.3 m',
      'anchorage zone (thick end)', 'suspended layer (diagonal hatch)', 'bonded layer (grid hatch)']);
    expect(svg).toContain('data-layer="0" data-role="suspended"');
    expect(svg).toContain('data-layer="1" data-role="anchor"');
    expect(svg.match(/<g class="bolt">/g)).toHaveLength(5);
  });

  it('bolt length and anchorage to the same scale as the strata and the spacing (one scale across and up)', () => {
    const svg = draw(bolted());
    expect(svg).toContain('Drawn to one scale across and up.');
    const layers = [...svg.matchAll(/<rect class="layer"[^>]*>/g)].map((m) => m[0]);
    const pxPerM = attr(layers[0], 'height') / 0.5; // the shale is 0.5 m
    const bolt = /<g class="bolt"><line x1="([\d.]+)" y1="([\d.]+)" x2="[\d.]+" y2="([\d.]+)"/.exec(svg)!;
    expect((Number(bolt[2]) - Number(bolt[3])) / pxPerM).toBeCloseTo(1.8, 1);
    const zone = /<rect class="anchorage"[^>]*>/.exec(svg)![0];
    expect(attr(zone, 'height') / pxPerM).toBeCloseTo(0.3, 1);
    const xs = [...svg.matchAll(/<g class="bolt"><line x1="([\d.]+)"/g)].map((m) => Number(m[1]));
    expect((xs[1] - xs[0]) / pxPerM).toBeCloseTo(1.2, 1);
  });

  it('beam building through the column marks every layer bonded, credited or not as the report says', () => {
    const p = bolted({ action: 'beamBuilding', length_m: 3.5, capacity_kN: 200, shearCapacity_kN: 120, pretension_kN: 50, spacingAcross_m: 0.85, spacingAlong_m: 0.85 }, 8);
    const svg = draw(p);
    expect(svg.match(/data-role="bonded"/g)).toHaveLength(3);
    expectLabels(svg, ['bonded beam, credited']);
    const loose = draw({ ...p, support: { ...p.support, bolts: { ...p.support.bolts!, spacingAcross_m: 2, spacingAlong_m: 2 } } });
    expectLabels(loose, ['bonded beam, not credited']);
  });

  it('an overhang is held at its root only: one rib, the strata end at the free end, the length dimensioned as the overhang (common practice: a cantilever has one fixed end)', () => {
    const quarry = readProjectText(readFileSync(new URL('../../../presets/quarry-bench-overhang.lamina.json', import.meta.url), 'utf8')).project;
    const p: Project = { ...quarry, support: { standing_kPa: 0, bolts: { length_m: 1.8, capacity_kN: 100, spacingAcross_m: 0.5, spacingAlong_m: 0.5, anchorage_m: 0.3, action: 'suspension', shearCapacity_kN: 60, pretension_kN: 0 } } };
    const svg = draw(p);
    expectWellFormed(svg);
    expectNoBadNumbers(svg);
    expect(svg.match(/<rect class="rib"/g)).toHaveLength(1);
    expectLabels(svg, [`overhang ${quarry.opening.span_m} m`]);
    expect(svg).not.toMatch(/>span /);
    // the layers end where the overhang does: at the right end of its dimension line
    const layer = /<rect class="layer"[^>]*>/.exec(svg)![0];
    const rib = /<rect class="rib"[^>]*>/.exec(svg)![0];
    const pxPerM = (attr(layer, 'width') - attr(rib, 'width')) / quarry.opening.span_m;
    const bolts = [...svg.matchAll(/<g class="bolt"><line x1="([\d.]+)"/g)].map((m) => Number(m[1]));
    expect((bolts[1] - bolts[0]) / pxPerM).toBeCloseTo(0.5, 1);
    // a beam keeps both ribs
    expect(draw(bolted()).match(/<rect class="rib"/g)).toHaveLength(2);
  });

  it('US units: heights and spacing in ft (1.2 m / 0.3048 = 3.94 ft, METHODS §13)', () => {
    expectLabels(draw(bolted(), 'US'), ['Height above the roof line (ft)', 'spacing across S = 3.94 ft']);
  });

  it('escapes a hostile layer name and title; no pattern draws a short note', () => {
    const p = bolted();
    p.title = EVIL;
    p.layers = p.layers.map((l, i) => (i === 0 ? { ...l, name: EVIL } : l));
    expectEscaped(draw(p));
    const none = supportBoltsSvg({ ...coal }, null, { units: 'SI' });
    expectWellFormed(none);
    expectLabels(none, ['No bolt pattern given']);
  });
});
