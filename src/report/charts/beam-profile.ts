/**
 * Elastic beam along the span: net tension (tension positive) on the top and bottom fibres,
 * with the zero line and the design strength, and below it a second panel with the downward
 * deflection (drawn downward).
 */
import { extent, max, min } from 'd3-array';
import { scaleLinear } from 'd3-scale';
import { line as d3line } from 'd3-shape';
import type { BeamProfile } from '../../analysis/types';
import type { UnitSystem } from '../../model/units';
import { ID, INK, PALETTE, axis, axisLabel, displayUnit, emptyNote, formatValue, legend, line, marker, num, svgDocument, text, type SeriesStyle } from './svg';

export interface BeamProfileOptions {
  units: UnitSystem;
  designStrength_MPa?: number;
  title?: string;
  /** The opening's word for its length: "span" (default) or "overhang". */
  spanWord?: string;
  width?: number;
  height?: number;
}

const TOP: SeriesStyle = { color: PALETTE.vermillion, dash: null, marker: 'circle' };
const BOTTOM: SeriesStyle = { color: PALETTE.blue, dash: '7 4', marker: 'square' };
const DEFLECTION: SeriesStyle = { color: PALETTE.green, dash: null, marker: 'triangle' };

/** SVG string of `profile` (m, MPa, mm in; displayed in `units`). */
export function beamProfileSvg(profile: BeamProfile, options: BeamProfileOptions): string {
  const width = options.width ?? 640;
  const height = options.height ?? 440;
  const len = displayUnit('length', options.units);
  const st = displayUnit('stress', options.units);
  const def = displayUnit('deflection', options.units);
  const title = options.title ?? `Beam profile, layer ${profile.layer + 1}`;
  const n = Math.min(profile.x_m.length, profile.topTension_MPa.length, profile.bottomTension_MPa.length, profile.deflection_mm.length);
  if (n < 2) {
    return svgDocument({ width, height, title, desc: 'No profile points.', body: emptyNote(width, height, 'No profile to draw'), className: 'lamina-chart beam-profile' });
  }
  const idx = [...Array(n).keys()].filter((i) => Number.isFinite(profile.x_m[i]));
  const X = idx.map((i) => len.convert(profile.x_m[i]));
  const T = idx.map((i) => st.convert(profile.topTension_MPa[i]));
  const B = idx.map((i) => st.convert(profile.bottomTension_MPa[i]));
  const D = idx.map((i) => def.convert(profile.deflection_mm[i]));
  const design = options.designStrength_MPa !== undefined && Number.isFinite(options.designStrength_MPa) ? st.convert(options.designStrength_MPa) : null;

  const left = 80;
  const right = width - 130;
  const p1 = { top: 48, bottom: 228 };
  const p2 = { top: 290, bottom: height - 56 };
  const [x0, x1] = extent(X) as [number, number];
  const x = scaleLinear().domain([x0, x1 > x0 ? x1 : x0 + 1]).range([left, right]);
  const sVals = [...T, ...B, 0, ...(design !== null ? [design] : [])];
  const sLo = min(sVals) ?? 0;
  const sHi = max(sVals) ?? 1;
  const y1 = scaleLinear().domain([sLo, sHi > sLo ? sHi : sLo + 1]).range([p1.bottom, p1.top]).nice();
  const dHi = max(D) ?? 0;
  const dLo = Math.min(0, min(D) ?? 0);
  // Deflection is downward: larger values plot lower.
  const y2 = scaleLinear().domain([dLo, dHi > dLo ? dHi : dLo + 1]).range([p2.top, p2.bottom]).nice();

  const path = (ys: number[], yScale: (v: number) => number) =>
    d3line<number>()
      .x((_, i) => x(X[i]))
      .y((v) => yScale(v))
      .digits(2)(ys) ?? '';

  const parts: string[] = [];
  parts.push(text(12, 20, title, { size: 13, weight: 'bold' }));
  parts.push(text(12, 36, 'Elastic beam, net of horizontal stress; tension positive', { size: 10, fill: INK.muted }));
  parts.push(`<clipPath id="${ID}p1"><rect x="${num(left)}" y="${num(p1.top)}" width="${num(right - left)}" height="${num(p1.bottom - p1.top)}"/></clipPath>`);
  parts.push(axis({ scale: x, orient: 'bottom', at: p1.bottom, label: axisLabel(`Distance along the ${options.spanWord ?? 'span'}`, len.unit), ticks: 8, gridTo: p1.top }));
  parts.push(axis({ scale: y1, orient: 'left', at: left, label: axisLabel('Net tension', st.unit), ticks: 6, gridTo: right }));
  parts.push(line(left, y1(0), right, y1(0), INK.axis, 1.2));
  // Right-hand labels of the stress panel, spread apart so that none overlap.
  const side: Array<{ y: number; label: string; fill: string; bold: boolean }> = [{ y: y1(0), label: 'zero', fill: INK.muted, bold: false }];
  parts.push(`<g clip-path="url(#${ID}p1)">`);
  parts.push(`<path class="top-fibre" d="${path(T, y1)}" fill="none" stroke="${TOP.color}" stroke-width="2"/>`);
  parts.push(`<path class="bottom-fibre" d="${path(B, y1)}" fill="none" stroke="${BOTTOM.color}" stroke-width="2" stroke-dasharray="${BOTTOM.dash}"/>`);
  parts.push('</g>');
  // Markers at the ends and the middle, so the two fibres differ by symbol as well.
  for (const i of [0, Math.floor((X.length - 1) / 2), X.length - 1]) {
    parts.push(marker(TOP.marker, x(X[i]), y1(T[i]), TOP.color, 3.5));
    parts.push(marker(BOTTOM.marker, x(X[i]), y1(B[i]), BOTTOM.color, 3.5));
  }
  if (design !== null) {
    parts.push(line(left, y1(design), right, y1(design), PALETTE.purple, 1.5, '2 3'));
    side.push({ y: y1(design), label: `design ${formatValue(design)} ${st.unit}`, fill: PALETTE.purple, bold: true });
  }
  const iTop = T.indexOf(max(T) ?? 0);
  const iBot = B.indexOf(max(B) ?? 0);
  side.push({ y: y1(T[iTop]), label: `top max ${formatValue(T[iTop])} ${st.unit}`, fill: TOP.color, bold: false });
  side.push({ y: y1(B[iBot]), label: `bottom max ${formatValue(B[iBot])} ${st.unit}`, fill: BOTTOM.color, bold: false });
  side.sort((a, b) => a.y - b.y);
  for (let i = 1; i < side.length; i++) if (side[i].y - side[i - 1].y < 11) side[i].y = side[i - 1].y + 11;
  for (const l of side) parts.push(text(right + 6, l.y + 3.5, l.label, { size: 9, fill: l.fill, weight: l.bold ? 'bold' : 'normal' }));
  parts.push(
    legend(
      [
        { label: 'top fibre', style: TOP },
        { label: 'bottom fibre', style: BOTTOM },
      ],
      width - 250,
      36,
      110,
      2,
    ),
  );

  parts.push(axis({ scale: x, orient: 'bottom', at: p2.bottom, label: axisLabel(`Distance along the ${options.spanWord ?? 'span'}`, len.unit), ticks: 8, gridTo: p2.top }));
  parts.push(axis({ scale: y2, orient: 'left', at: left, label: axisLabel('Deflection, down', def.unit), ticks: 4, gridTo: right }));
  parts.push(line(left, y2(0), right, y2(0), INK.axis, 1.2));
  parts.push(`<path class="deflection" d="${path(D, y2)}" fill="none" stroke="${DEFLECTION.color}" stroke-width="2"/>`);
  const iMax = D.indexOf(dHi);
  parts.push(marker(DEFLECTION.marker, x(X[iMax]), y2(D[iMax]), DEFLECTION.color, 4));
  parts.push(text(right + 8, y2(dHi) + 3.5, `max ${formatValue(dHi)} ${def.unit}`, { size: 9, fill: DEFLECTION.color, weight: 'bold' }));

  const desc =
    `Layer ${profile.layer + 1}: largest top-fibre net tension ${formatValue(T[iTop])} ${st.unit}, ` +
    `largest bottom-fibre net tension ${formatValue(B[iBot])} ${st.unit}` +
    (design !== null ? `, design strength ${formatValue(design)} ${st.unit}` : '') +
    `; largest deflection ${formatValue(dHi)} ${def.unit}.`;
  return svgDocument({ width, height, title, desc, body: parts.join(''), className: 'lamina-chart beam-profile' });
}
