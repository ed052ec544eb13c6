/**
 * Contours of the bending tension over the plan of a roof slab (d3-contour on the analysis grid),
 * drawn to equal scale, with each level labelled on its line and in a key, and the largest value
 * marked.
 */
import { max, min, ticks } from 'd3-array';
import { contours } from 'd3-contour';
import { interpolateRgb } from 'd3-interpolate';
import { scaleLinear } from 'd3-scale';
import type { SlabField } from '../../analysis/types';
import type { UnitSystem } from '../../model/units';
import { gridMapping, labelPoint } from './contour-grid';
import { ID, INK, axis, axisLabel, displayUnit, emptyNote, formatValue, marker, num, svgDocument, text } from './svg';

export interface SlabContourOptions {
  units: UnitSystem;
  width?: number;
  height?: number;
  title?: string;
}

/** SVG string of the slab stress field (m and MPa in; displayed in `units`). */
export function slabContourSvg(field: SlabField, options: SlabContourOptions): string {
  const width = options.width ?? 680;
  const height = options.height ?? 400;
  const len = displayUnit('length', options.units);
  const st = displayUnit('stress', options.units);
  const title = options.title ?? `Slab bending tension, layer ${field.layer + 1}`;
  const nx = field.x_m.length;
  const ny = field.y_m.length;
  const values = field.stress_MPa.map((v) => (Number.isFinite(v) ? st.convert(v) : NaN));
  if (nx < 2 || ny < 2 || values.length !== nx * ny || !values.some((v) => Number.isFinite(v))) {
    return svgDocument({ width, height, title, desc: 'No slab field.', body: emptyNote(width, height, 'No slab stress field to draw'), className: 'lamina-chart slab-contour' });
  }

  const X = field.x_m.map((v) => len.convert(v));
  const Y = field.y_m.map((v) => len.convert(v));
  const left = 70;
  const top = 50;
  const areaW = width - left - 170;
  const areaH = height - top - 64;
  const xr = X[nx - 1] - X[0] || 1;
  const yr = Y[ny - 1] - Y[0] || 1;
  const k = Math.min(areaW / xr, areaH / yr); // equal scale in plan
  const right = left + xr * k;
  const bottom = top + yr * k;
  const x = scaleLinear().domain([X[0], X[nx - 1]]).range([left, right]);
  const y = scaleLinear().domain([Y[0], Y[ny - 1]]).range([bottom, top]);
  const grid = gridMapping(X, Y, x, y);

  const finite = values.filter((v) => Number.isFinite(v));
  // Round-off residues (≈1e-17 of the peak at clamped corners) read as 0, not as "1.38e−17".
  const peak = Math.max(Math.abs(min(finite) ?? 0), Math.abs(max(finite) ?? 1));
  const snap = (v: number) => (Math.abs(v) < 1e-9 * peak ? 0 : v);
  const vMin = snap(min(finite) ?? 0);
  const vMax = snap(max(finite) ?? 1);
  let levels = ticks(vMin, vMax, 8).filter((l) => l > vMin && l < vMax);
  if (levels.length === 0) levels = [(vMin + vMax) / 2];
  const colour = interpolateRgb('#f7fbff', '#2b6a9e');
  const bands = contours().size([nx, ny]).thresholds(levels)(values);

  const parts: string[] = [];
  parts.push(text(12, 20, title, { size: 13, weight: 'bold' }));
  const reported = Number.isFinite(field.maxTension_MPa) ? `largest tension ${formatValue(st.convert(field.maxTension_MPa))} ${st.unit} at ${field.at}` : '';
  parts.push(text(12, 36, `Plan view, equal scale; contours of the largest principal bending tension${reported ? '; ' + reported : ''}`, { size: 10, fill: INK.muted }));
  parts.push(`<clipPath id="${ID}plan"><rect x="${num(left)}" y="${num(top)}" width="${num(right - left)}" height="${num(bottom - top)}"/></clipPath>`);
  parts.push(`<rect x="${num(left)}" y="${num(top)}" width="${num(right - left)}" height="${num(bottom - top)}" fill="${colour(0)}"/>`);
  parts.push(`<g clip-path="url(#${ID}plan)">`);
  bands.forEach((band, i) => {
    const d = grid.path(band);
    if (!d) return;
    const f = colour((i + 1) / (levels.length + 1));
    parts.push(`<path class="contour" data-level="${num(band.value)}" d="${d}" fill="${f}" stroke="${INK.axis}" stroke-width="0.7"/>`);
  });
  parts.push('</g>');

  // Level labels on the lines, at an interior point of each level's longest ring.
  bands.forEach((band) => {
    const half = formatValue(band.value).length * 2.8 + 2;
    const fits = (gx: number, gy: number) => {
      const [sx, sy] = grid.toScreen(gx, gy);
      return sx - half > left && sx + half < right && sy - 8 > top && sy + 4 < bottom;
    };
    const point = labelPoint(band, nx, ny, fits);
    if (!point) return;
    const [sx, sy] = grid.toScreen(point[0], point[1]);
    parts.push(
      `<text x="${num(sx)}" y="${num(sy + 3)}" font-size="9" text-anchor="middle" stroke="#ffffff" stroke-width="3" paint-order="stroke" class="level-label">${formatValue(band.value)}</text>`,
    );
  });
  parts.push(`<rect x="${num(left)}" y="${num(top)}" width="${num(right - left)}" height="${num(bottom - top)}" fill="none" stroke="${INK.axis}" stroke-width="2"/>`);

  // Largest value on the grid.
  let iMax = 0;
  values.forEach((v, i) => {
    if (Number.isFinite(v) && !(v <= values[iMax])) iMax = i;
  });
  const mx = x(X[iMax % nx]);
  const my = y(Y[Math.floor(iMax / nx)]);
  parts.push(`<g class="max-point">${marker('circle', mx, my, INK.axis, 5, false)}${marker('plus', mx, my, INK.axis, 7)}</g>`);
  const labelLeft = mx > (left + right) / 2;
  parts.push(
    `<text x="${num(labelLeft ? mx - 9 : mx + 9)}" y="${num(my < top + 14 ? my + 14 : my - 8)}" font-size="10" font-weight="bold"${labelLeft ? ' text-anchor="end"' : ''} stroke="#ffffff" stroke-width="3" paint-order="stroke">max ${formatValue(values[iMax])} ${st.unit}</text>`,
  );

  parts.push(axis({ scale: x, orient: 'bottom', at: bottom, label: axisLabel('Along the long side, x', len.unit), ticks: 6 }));
  parts.push(axis({ scale: y, orient: 'left', at: left, label: axisLabel('Across the span, y', len.unit), ticks: 5 }));

  // Key: one swatch per band with its range.
  const keyX = Math.max(right + 24, width - 150);
  parts.push(text(keyX, top + 4, axisLabel('Tension', st.unit), { size: 10, weight: 'bold' }));
  const edges = [vMin, ...levels, vMax];
  for (let i = edges.length - 2; i >= 0; i--) {
    const row = edges.length - 2 - i;
    const yy = top + 14 + row * 16;
    parts.push(`<rect x="${num(keyX)}" y="${num(yy)}" width="20" height="12" fill="${colour(i / (levels.length + 1))}" stroke="${INK.axis}" stroke-width="0.5"/>`);
    parts.push(text(keyX + 26, yy + 10, `${formatValue(edges[i])} to ${formatValue(edges[i + 1])}`, { size: 9 }));
  }

  const desc =
    `Slab plan ${formatValue(xr)} × ${formatValue(yr)} ${len.unit}; bending tension from ${formatValue(vMin)} to ${formatValue(vMax)} ${st.unit}, ` +
    `contours at ${levels.map(formatValue).join(', ')} ${st.unit}.` +
    (reported ? ` Reported ${reported}.` : '');
  return svgDocument({ width, height, title, desc, body: parts.join(''), className: 'lamina-chart slab-contour' });
}
