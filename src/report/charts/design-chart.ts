/**
 * Design chart of one mode: contours of FS/target over span × thickness for one layer, with the
 * target contour (FS/target = 1) bold and labelled, the region below the target hatched, and the
 * current design point marked. Where the project has support, two lines give the largest span
 * meeting every counted check against the layer's thickness, with this support and without it.
 */
import { max, min } from 'd3-array';
import { contours } from 'd3-contour';
import { scaleLinear } from 'd3-scale';
import type { DesignChart } from '../../analysis/types';
import type { Mode } from '../../model/types';
import type { UnitSystem } from '../../model/units';
import { gridMapping, labelPoint } from './contour-grid';
import { MODE_STYLE, SUPPORT_STYLE } from './fs-span';
import { MODE_SHORT as MODE_NAME } from '../../analysis/check-labels';
import { ID, INK, axis, axisLabel, displayUnit, emptyNote, escapeXml, formatValue, legend, marker, num, svgDocument, text } from './svg';

export interface DesignChartOptions {
  units: UnitSystem;
  currentSpan_m?: number;
  currentThickness_m?: number;
  /** The opening's word for its length: "span" (default) or "overhang". */
  spanWord?: string;
  width?: number;
  height?: number;
  title?: string;
}

/** Contour levels of FS/target (1 = the target). */
const LEVELS = [0.25, 0.5, 1, 2, 4, 8];

/** SVG string of `chart` for `mode` (spans and thicknesses in m; displayed in `units`). */
export function designChartSvg(chart: DesignChart, mode: Mode, options: DesignChartOptions): string {
  const width = options.width ?? 640;
  const height = options.height ?? 420;
  const len = displayUnit('length', options.units);
  const title = options.title ?? `Design chart: ${MODE_NAME[mode]}, layer ${chart.layer + 1}`;
  const nx = chart.spans_m.length;
  const ny = chart.thicknesses_m.length;
  const target = chart.targets[mode];
  const grid = chart.fs[mode] ?? [];
  const values: number[] = [];
  for (let j = 0; j < ny; j++) {
    for (let i = 0; i < nx; i++) {
      const v = grid[j]?.[i];
      values.push(v === null || v === undefined || !Number.isFinite(v) || !(target > 0) ? NaN : v / target);
    }
  }
  if (nx < 2 || ny < 2 || !values.some((v) => Number.isFinite(v))) {
    return svgDocument({
      width,
      height,
      title,
      desc: `The ${MODE_NAME[mode]} check does not apply on this grid.`,
      body: emptyNote(width, height, `${MODE_NAME[mode]}: does not apply`),
      className: 'lamina-chart design-chart',
    });
  }

  const X = chart.spans_m.map((s) => len.convert(s));
  const Y = chart.thicknesses_m.map((t) => len.convert(t));
  const left = 76;
  const right = width - 150;
  const top = 48;
  const bottom = height - 58;
  const x = scaleLinear().domain([X[0], X[nx - 1]]).range([left, right]);
  const y = scaleLinear().domain([Y[0], Y[ny - 1]]).range([bottom, top]);
  const map = gridMapping(X, Y, x, y);
  const finite = values.filter((v) => Number.isFinite(v));
  const vMin = min(finite) ?? 0;
  const vMax = max(finite) ?? 1;
  const levels = mode === 'snapThrough' ? [1] : LEVELS.filter((l) => l === 1 || (l > vMin && l < vMax));
  const bands = contours().size([nx, ny]).thresholds(levels)(values);

  const parts: string[] = [];
  parts.push(text(12, 20, title, { size: 13, weight: 'bold' }));
  const what = mode === 'snapThrough' ? 'snap-through: 1 stands, 0 snaps' : mode === 'deflection' ? 'deflection: limit / (δ/t)' : `FS / target, target FS ${formatValue(target)}`;
  parts.push(text(12, 36, `Contours of ${what}`, { size: 10, fill: INK.muted }));
  parts.push(`<clipPath id="${ID}plot"><rect x="${num(left)}" y="${num(top)}" width="${num(right - left)}" height="${num(bottom - top)}"/></clipPath>`);
  // Below the target: hatched; at or above: plain, shaded lighter as the margin grows.
  parts.push(`<rect class="below-target" x="${num(left)}" y="${num(top)}" width="${num(right - left)}" height="${num(bottom - top)}" fill="url(#${ID}below)"/>`);
  parts.push(`<g clip-path="url(#${ID}plot)">`);
  bands.forEach((band) => {
    const d = map.path(band);
    if (!d) return;
    const isTarget = band.value === 1;
    const fill = band.value >= 1 ? (band.value >= 4 ? '#d8ecf7' : band.value >= 2 ? '#e9f4fa' : '#ffffff') : 'none';
    parts.push(
      `<path class="contour${isTarget ? ' target' : ''}" data-level="${num(band.value)}" d="${d}" fill="${fill}" stroke="${isTarget ? INK.axis : '#666666'}" stroke-width="${isTarget ? 2.8 : 0.8}"${isTarget ? '' : ' stroke-dasharray="4 2"'}/>`,
    );
  });
  // Where the mode does not apply (null, e.g. after snap-through): grey, drawn over the bands.
  const missing = values.map((v) => (Number.isFinite(v) ? 0 : 1));
  if (missing.some((m) => m === 1)) {
    const [hole] = contours().size([nx, ny]).thresholds([0.5])(missing);
    const d = hole ? map.path(hole) : '';
    if (d) parts.push(`<path class="not-applicable" d="${d}" fill="url(#${ID}na)" stroke="#888888" stroke-width="0.8"/>`);
  }
  parts.push('</g>');
  const placed: Array<[number, number, number]> = []; // x, y, half-width of labels drawn
  const clear = (sx: number, sy: number, half: number) => placed.every(([px, py, ph]) => Math.abs(px - sx) > ph + half || Math.abs(py - sy) > 13);
  // Target label first, so it gets the best place.
  const order = [...bands].sort((a, b) => Number(b.value === 1) - Number(a.value === 1));
  order.forEach((band) => {
    const isTarget = band.value === 1;
    const label = isTarget
      ? mode === 'snapThrough'
        ? 'stands / snaps'
        : mode === 'deflection'
          ? 'δ/t = limit'
          : `FS = target (${formatValue(target)})`
      : `${formatValue(band.value)} × target`;
    const half = (label.length * (isTarget ? 6.5 : 5.2)) / 2 + 2;
    const fits = (gx: number, gy: number) => {
      const [sx, sy] = map.toScreen(gx, gy);
      return sx - half > left && sx + half < right && sy - 10 > top && sy + 4 < bottom && clear(sx, sy, half);
    };
    const p = labelPoint(band, nx, ny, fits) ?? labelPoint(band, nx, ny) ?? (isTarget ? labelPoint(band, nx, ny, () => true, false) : null);
    if (!p) return;
    const [gx, gy] = map.toScreen(p[0], p[1]);
    const sx = Math.min(Math.max(gx, left + half), right - half);
    const sy = Math.min(Math.max(gy, top + 12), bottom - 6);
    if (!clear(sx, sy, half) && !isTarget) return;
    placed.push([sx, sy, half]);
    parts.push(
      `<text x="${num(sx)}" y="${num(sy + 3)}" font-size="${isTarget ? 11 : 9}"${isTarget ? ' font-weight="bold"' : ''} text-anchor="middle" stroke="#ffffff" stroke-width="3" paint-order="stroke" class="level-label">${escapeXml(label)}</text>`,
    );
  });
  parts.push(`<rect x="${num(left)}" y="${num(top)}" width="${num(right - left)}" height="${num(bottom - top)}" fill="none" stroke="${INK.axis}" stroke-width="1"/>`);

  parts.push(axis({ scale: x, orient: 'bottom', at: bottom, label: axisLabel((options.spanWord ?? 'span').replace(/^./, (c) => c.toUpperCase()), len.unit), ticks: 7 }));
  parts.push(axis({ scale: y, orient: 'left', at: left, label: axisLabel('Thickness', len.unit), ticks: 6 }));

  // With support: the largest span meeting every counted check against thickness, with and without it.
  const sc = chart.support ?? null;
  if (sc && sc.thicknesses_m.length >= 2) {
    for (const [key, st, cls] of [['unsupported_m', SUPPORT_STYLE.unsupported, 'unsupported'], ['withSupport_m', SUPPORT_STYLE.withSupport, 'with-support']] as const) {
      const pts = sc.thicknesses_m.map((t, k) => {
        const s = sc[key][k];
        return s === null || !Number.isFinite(s) ? null : [x(len.convert(s)), y(len.convert(t))] as [number, number];
      });
      let d = '';
      let pen = false;
      for (const p of pts) {
        if (!p) { pen = false; continue; }
        d += `${pen ? 'L' : 'M'}${num(p[0])},${num(p[1])}`;
        pen = true;
      }
      if (d) parts.push(`<path class="support-curve ${cls}" d="${d}" fill="none" stroke="${st.color}" stroke-width="${key === 'withSupport_m' ? 2.6 : 1.6}"${st.dash ? ` stroke-dasharray="${st.dash}"` : ''}/>`);
      pts.forEach((p, k) => { if (p && k % 3 === (key === 'withSupport_m' ? 0 : 1)) parts.push(marker(st.marker, p[0], p[1], st.color, 3.4, key === 'withSupport_m')); });
    }
  }

  const cs = options.currentSpan_m;
  const ct = options.currentThickness_m;
  if (cs !== undefined && ct !== undefined && Number.isFinite(cs) && Number.isFinite(ct)) {
    const px = x(len.convert(cs));
    const py = y(len.convert(ct));
    if (px >= left - 1 && px <= right + 1 && py >= top - 1 && py <= bottom + 1) {
      parts.push(`<g class="current-point">${marker('diamond', px, py, MODE_STYLE[mode].color, 6, true)}</g>`);
      parts.push(
        `<text x="${num(px + 9)}" y="${num(py - 7)}" font-size="10" font-weight="bold" stroke="#ffffff" stroke-width="3" paint-order="stroke">current design (${formatValue(len.convert(cs))} ${len.unit}, ${formatValue(len.convert(ct))} ${len.unit})</text>`,
      );
    } else {
      parts.push(text(left, bottom + 48, 'The current design lies outside this chart.', { size: 9, fill: INK.muted }));
    }
  }

  // Key.
  const kx = right + 16;
  parts.push(`<rect x="${num(kx)}" y="${num(top)}" width="22" height="12" fill="url(#${ID}below)" stroke="${INK.axis}" stroke-width="0.5"/>`);
  parts.push(text(kx + 28, top + 10, 'below target', { size: 10 }));
  parts.push(`<rect x="${num(kx)}" y="${num(top + 18)}" width="22" height="12" fill="#ffffff" stroke="${INK.axis}" stroke-width="0.5"/>`);
  parts.push(text(kx + 28, top + 28, 'meets target', { size: 10 }));
  parts.push(`<path d="M${num(kx)},${num(top + 44)}H${num(kx + 22)}" stroke="${INK.axis}" stroke-width="2.8"/>`);
  parts.push(text(kx + 28, top + 47, 'target contour', { size: 10 }));
  parts.push(`<path d="M${num(kx)},${num(top + 60)}H${num(kx + 22)}" stroke="#666666" stroke-width="0.8" stroke-dasharray="4 2"/>`);
  parts.push(text(kx + 28, top + 63, 'other levels', { size: 10 }));
  parts.push(marker('diamond', kx + 11, top + 78, MODE_STYLE[mode].color, 5, true));
  parts.push(text(kx + 28, top + 81, 'current design', { size: 10 }));
  let ky = top + 90;
  if (missing.some((m) => m === 1)) {
    parts.push(`<rect x="${num(kx)}" y="${num(ky)}" width="22" height="12" fill="url(#${ID}na)" stroke="#888888" stroke-width="0.5"/>`);
    parts.push(text(kx + 28, ky + 10, 'does not apply', { size: 10 }));
    ky += 18;
  }
  if (sc) {
    parts.push(legend([
      { label: 'with support', style: SUPPORT_STYLE.withSupport },
      { label: 'without support', style: SUPPORT_STYLE.unsupported },
    ], kx, ky + 6, 120, 1));
    parts.push(text(kx, ky + 44, `largest ${options.spanWord ?? 'span'} meeting`, { size: 9, fill: INK.muted }));
    parts.push(text(kx, ky + 56, 'every counted check', { size: 9, fill: INK.muted }));
  }

  const defs =
    `<pattern id="${ID}below" patternUnits="userSpaceOnUse" width="8" height="8" patternTransform="rotate(45)">` +
    `<rect width="8" height="8" fill="#fbe3d6"/><path d="M0,0V8" stroke="#d55e00" stroke-width="1"/></pattern>` +
    `<pattern id="${ID}na" patternUnits="userSpaceOnUse" width="8" height="8">` +
    `<rect width="8" height="8" fill="#eeeeee"/><path d="M0,4H8M4,0V8" stroke="#bbbbbb" stroke-width="0.8"/></pattern>`;
  const desc =
    `${MODE_NAME[mode]} of layer ${chart.layer + 1} over ${options.spanWord ?? 'span'}s ${formatValue(X[0])} to ${formatValue(X[nx - 1])} ${len.unit} ` +
    `and thicknesses ${formatValue(Y[0])} to ${formatValue(Y[ny - 1])} ${len.unit}; FS/target from ${formatValue(vMin)} to ${formatValue(vMax)}.` +
    (sc ? ` Also the largest ${options.spanWord ?? 'span'} meeting every counted check against thickness, with this support and without it.` : '');
  return svgDocument({ width, height, title, desc, defs, body: parts.join(''), className: 'lamina-chart design-chart' });
}
