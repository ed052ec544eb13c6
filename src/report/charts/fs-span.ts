/**
 * Factor of safety against span, one line per mode, each divided by its target so that every
 * target sits on the one line FS/target = 1 (log axis). Deflection enters as limit/(δ/t),
 * snap-through as a shaded "snaps" region. A vertical marker shows each mode's largest span and
 * another the current span. Where the project has support, two more lines give the least
 * FS/target over every counted check (support rows included) with this support and unsupported.
 */
import { max, min } from 'd3-array';
import { scaleLinear, scaleLog } from 'd3-scale';
import { line as d3line } from 'd3-shape';
import type { SpanCurve } from '../../analysis/types';
import type { MaxSpanReport, Mode } from '../../model/types';
import type { UnitSystem } from '../../model/units';
import { MODE_SHORT as MODE_NAME } from '../../analysis/check-labels';
import { ID, INK, PALETTE, axis, axisLabel, displayUnit, emptyNote, escapeXml, formatValue, legend, line, marker, num, svgDocument, text, type SeriesStyle } from './svg';

export interface FsSpanOptions {
  units: UnitSystem;
  /** What the x axis measures: "span" (default), "overhang" or "entry width". */
  spanWord?: string;
  width?: number;
  height?: number;
  title?: string;
}

/** One style per mode: colour, dash and marker (shared with the design chart). */
export const MODE_STYLE: Record<Mode, SeriesStyle> = {
  tension: { color: PALETTE.vermillion, dash: null, marker: 'circle' },
  crushing: { color: PALETTE.blue, dash: '8 4', marker: 'square' },
  sliding: { color: PALETTE.green, dash: '2 3', marker: 'triangle' },
  deflection: { color: PALETTE.purple, dash: '10 3 2 3', marker: 'diamond' },
  snapThrough: { color: PALETTE.orange, dash: '4 2', marker: 'cross' },
};


const LINE_MODES: Mode[] = ['tension', 'crushing', 'sliding', 'deflection'];

/** The governing FS/target of the whole check table with and without the project's support. */
export const SUPPORT_STYLE: Record<'withSupport' | 'unsupported', SeriesStyle> = {
  withSupport: { color: PALETTE.black, dash: null, marker: 'plus' },
  unsupported: { color: INK.muted, dash: '6 3', marker: 'circle' },
};
const MARKER_MODES: Mode[] = ['tension', 'crushing', 'sliding', 'snapThrough', 'deflection'];

/** A small label with a white halo, readable over lines. */
function halo(x: number, y: number, content: string, fill: string, bold: boolean, rotate = 0, anchor: 'start' | 'end' = 'start'): string {
  const r = rotate ? ` transform="rotate(${num(rotate)} ${num(x)} ${num(y)})"` : '';
  const a = anchor === 'end' ? ' text-anchor="end"' : '';
  return `<text x="${num(x)}" y="${num(y)}" font-size="9"${a}${bold ? ' font-weight="bold"' : ''} fill="${fill}" stroke="#ffffff" stroke-width="3" paint-order="stroke"${r}>${escapeXml(content)}</text>`;
}

/** SVG string of `curve` with the largest spans of `maxSpan` (spans in m, displayed in `units`). */
export function fsSpanSvg(curve: SpanCurve, maxSpan: MaxSpanReport | null, options: FsSpanOptions): string {
  const width = options.width ?? 680;
  const height = options.height ?? 420;
  const len = displayUnit('length', options.units);
  const word = options.spanWord ?? 'span';
  const title = options.title ?? `Factor of safety against ${word}`;
  // Whether each mode counts comes from the analysis' check table (curve.counts), never from the basis here.
  const notCounted = (m: Mode): boolean => curve.counts !== undefined && !curve.counts[m];
  const spans = curve.spans_m;
  if (spans.length < 2) {
    return svgDocument({ width, height, title, desc: 'No span curve.', body: emptyNote(width, height, 'No span curve to draw'), className: 'lamina-chart fs-span' });
  }
  const left = 70;
  const right = width - 170;
  const top = 40;
  const bottom = height - 58;

  const ratio = (mode: Mode, i: number): number | null => {
    const v = curve.fs[mode]?.[i];
    const target = curve.targets[mode];
    if (v === null || v === undefined || !Number.isFinite(v) || !(target > 0)) return null;
    const r = v / target;
    return r > 0 ? r : null;
  };
  const all: number[] = [];
  for (const m of LINE_MODES) for (let i = 0; i < spans.length; i++) {
    const r = ratio(m, i);
    if (r !== null) all.push(r);
  }
  const sc = curve.support ?? null;
  if (sc) for (const v of [...sc.withSupport, ...sc.unsupported]) if (v !== null && v > 0 && Number.isFinite(v)) all.push(v);
  const lo = Math.max(1e-3, Math.min(0.5, min(all) ?? 0.5));
  const hi = Math.min(1e4, Math.max(2, max(all) ?? 2));
  const yLo = 10 ** Math.floor(Math.log10(lo));
  const yHi = 10 ** Math.ceil(Math.log10(hi));
  const y = scaleLog().domain([yLo, yHi]).range([bottom, top]); // values beyond are clipped
  const X = spans.map((s) => len.convert(s));
  const xMax = max(X) ?? 1;
  const x = scaleLinear().domain([min(X) ?? 0, xMax]).range([left, right]);
  const decades: number[] = [];
  for (let p = Math.round(Math.log10(yLo)); p <= Math.round(Math.log10(yHi)); p++) decades.push(10 ** p);

  const parts: string[] = [];
  parts.push(text(12, 20, title, { size: 13, weight: 'bold' }));
  parts.push(`<clipPath id="${ID}plot"><rect x="${num(left)}" y="${num(top)}" width="${num(right - left)}" height="${num(bottom - top)}"/></clipPath>`);

  // Snap-through region(s): spans where no arch forms (fs 0).
  const snaps = curve.fs.snapThrough ?? [];
  for (let i = 0; i < spans.length; i++) {
    if (snaps[i] !== 0) continue;
    let j = i;
    while (j + 1 < spans.length && snaps[j + 1] === 0) j++;
    const xa = x(i === 0 ? X[0] : (X[i - 1] + X[i]) / 2);
    const xb = x(j === spans.length - 1 ? X[j] : (X[j] + X[j + 1]) / 2);
    parts.push(`<g class="snaps"><rect x="${num(xa)}" y="${num(top)}" width="${num(Math.max(0, xb - xa))}" height="${num(bottom - top)}" fill="url(#${ID}snaps)" stroke="none"/>`);
    parts.push(text((xa + xb) / 2, top + 14, 'snaps', { anchor: 'middle', size: 11, weight: 'bold', fill: '#8a5a00' }) + '</g>');
    i = j;
  }

  parts.push(axis({ scale: x, orient: 'bottom', at: bottom, label: axisLabel(word.charAt(0).toUpperCase() + word.slice(1), len.unit), ticks: 8, gridTo: top }));
  parts.push(axis({ scale: y, orient: 'left', at: left, label: 'FS / target (log scale)', tickValues: decades, gridTo: right }));

  // The targets: every mode's target is the line FS/target = 1.
  const t = curve.targets;
  parts.push(line(left, y(1), right, y(1), INK.axis, 2));
  const targetLabel = `FS = target (tension ${formatValue(t.tension)}, crushing ${formatValue(t.crushing)}, sliding ${formatValue(t.sliding)}; deflection: δ/t = limit)`;

  parts.push(`<g clip-path="url(#${ID}plot)">`);
  for (const m of LINE_MODES) {
    const pts = spans.map((_, i) => ratio(m, i));
    if (!pts.some((p) => p !== null)) continue;
    const excluded = notCounted(m);
    const st = MODE_STYLE[m];
    const d =
      d3line<number | null>()
        .defined((p) => p !== null)
        .x((_, i) => x(X[i]))
        .y((p) => y(p as number))
        .digits(2)(pts) ?? '';
    parts.push(
      `<path class="mode mode-${m}" d="${d}" fill="none" stroke="${st.color}" stroke-width="${excluded ? 1.2 : 2}"${st.dash ? ` stroke-dasharray="${st.dash}"` : ''}${excluded ? ' opacity="0.6"' : ''}/>`,
    );
    // A few markers along each line (staggered by mode) so lines differ by symbol too.
    const every = Math.max(1, Math.round(spans.length / 6));
    const offset = Math.round((LINE_MODES.indexOf(m) * every) / LINE_MODES.length);
    for (let i = offset; i < spans.length; i += every) {
      const p = pts[i];
      if (p === null || p < yLo || p > yHi) continue;
      parts.push(marker(st.marker, x(X[i]), y(p), st.color, 3.2, !excluded));
    }
  }
  // With support: the governing FS/target of the whole check table, with and without the support.
  if (sc && sc.spans_m.length >= 2) {
    const SX = sc.spans_m.map((s) => len.convert(s));
    for (const [key, st, cls] of [['unsupported', SUPPORT_STYLE.unsupported, 'unsupported'], ['withSupport', SUPPORT_STYLE.withSupport, 'with-support']] as const) {
      const pts = sc[key].map((v) => (v !== null && v > 0 && Number.isFinite(v) ? v : null));
      const d = d3line<number | null>().defined((p) => p !== null).x((_, i) => x(SX[i])).y((p) => y(p as number)).digits(2)(pts) ?? '';
      parts.push(`<path class="support-curve ${cls}" d="${d}" fill="none" stroke="${st.color}" stroke-width="${key === 'withSupport' ? 2.6 : 1.6}"${st.dash ? ` stroke-dasharray="${st.dash}"` : ''}/>`);
      const every = Math.max(1, Math.round(SX.length / 5));
      for (let i = key === 'withSupport' ? 0 : Math.floor(every / 2); i < SX.length; i += every) {
        const p = pts[i];
        if (p === null || p < yLo || p > yHi) continue;
        parts.push(marker(st.marker, x(SX[i]), y(p), st.color, 3.4, key === 'withSupport'));
      }
    }
  }
  parts.push('</g>');

  parts.push(halo(right - 4, y(1) - 5, targetLabel, INK.axis, true, 0, 'end'));

  // Largest span per mode and the current span.
  const usedX: number[] = [];
  if (maxSpan) {
    for (const m of MARKER_MODES) {
      const s = maxSpan[m];
      if (s === null || !Number.isFinite(s)) continue;
      const sv = len.convert(s);
      const beyond = sv > xMax;
      const xm = x(Math.min(sv, xMax));
      let shift = 0;
      while (usedX.some((u) => Math.abs(u - (xm + shift)) < 11)) shift += 11;
      usedX.push(xm + shift);
      const st = MODE_STYLE[m];
      const isGov = maxSpan.governing !== null && Math.abs(s - maxSpan.governing) < 1e-9;
      parts.push(line(xm, top, xm, bottom, st.color, isGov ? 2 : 1.2, '3 3', `class="max-span max-span-${m}"`));
      const label = `${MODE_NAME[m]} max ${beyond ? '> ' : ''}${formatValue(sv)} ${len.unit}${isGov ? ' (governs)' : ''}`;
      parts.push(halo(xm + shift - 3, bottom - 6, label, st.color, isGov, -90));
    }
  }
  if (Number.isFinite(curve.currentSpan_m)) {
    const xc = x(Math.min(len.convert(curve.currentSpan_m), xMax));
    parts.push(line(xc, top, xc, bottom, INK.axis, 1.5, null, 'class="current-span"'));
    parts.push(text(xc + 3, top + 28, `current ${word} ${formatValue(len.convert(curve.currentSpan_m))} ${len.unit}`, { size: 9, weight: 'bold' }));
  }

  const items = LINE_MODES.filter((m) => curve.fs[m]?.some((v) => v !== null)).map((m) => ({
    label: `${MODE_NAME[m]}${notCounted(m) ? ' (not counted)' : m === 'deflection' ? ' (limit / (δ/t))' : ` (target ${formatValue(t[m])})`}`,
    style: MODE_STYLE[m],
  }));
  if (sc) {
    items.push({ label: 'with this support', style: SUPPORT_STYLE.withSupport });
    items.push({ label: 'without support', style: SUPPORT_STYLE.unsupported });
  }
  parts.push(legend(items, right + 14, top + 8, 150, 1));
  parts.push(
    `<rect x="${num(right + 14)}" y="${num(top + 8 + items.length * 16 - 6)}" width="22" height="11" fill="url(#${ID}snaps)" stroke="${MODE_STYLE.snapThrough.color}"/>` +
      text(right + 42, top + 8 + items.length * 16 + 3.5, 'snap-through: snaps', { size: 10 }),
  );
  parts.push(text(right + 14, top + 8 + (items.length + 1) * 16 + 4, 'dashed verticals: largest', { size: 9, fill: INK.muted }));
  parts.push(text(right + 14, top + 8 + (items.length + 1) * 16 + 16, `${word} meeting the target`, { size: 9, fill: INK.muted }));
  if (sc) {
    parts.push(text(right + 14, top + 8 + (items.length + 1) * 16 + 32, 'with/without support: least', { size: 9, fill: INK.muted }));
    parts.push(text(right + 14, top + 8 + (items.length + 1) * 16 + 44, 'FS/target of all counted checks', { size: 9, fill: INK.muted }));
  }

  const defs =
    `<pattern id="${ID}snaps" patternUnits="userSpaceOnUse" width="8" height="8" patternTransform="rotate(45)">` +
    `<rect width="8" height="8" fill="#fdf0d5"/><path d="M0,0V8" stroke="${PALETTE.orange}" stroke-width="1.5"/></pattern>`;
  const spanList = maxSpan
    ? MARKER_MODES.filter((m) => maxSpan[m] !== null)
        .map((m) => `${MODE_NAME[m]} ${formatValue(len.convert(maxSpan[m] as number))} ${len.unit}`)
        .join(', ')
    : '';
  const desc =
    `FS divided by its target against ${word} from ${formatValue(X[0])} to ${formatValue(xMax)} ${len.unit}, log scale; ` +
    `current ${word} ${formatValue(len.convert(curve.currentSpan_m))} ${len.unit}.` +
    (LINE_MODES.some(notCounted) ? ` Not counted at the current ${word}: ${LINE_MODES.filter(notCounted).map((m) => MODE_NAME[m]).join(', ')}.` : '') +
    (spanList ? ` Largest ${word === 'span' ? 'spans' : `${word}s`}: ${spanList}.` : '') +
    (maxSpan && maxSpan.governing !== null ? ` Governing ${formatValue(len.convert(maxSpan.governing))} ${len.unit}.` : '') +
    (sc ? ' Also the least FS/target over every counted check, with this support and unsupported.' : '');
  return svgDocument({ width, height, title, desc, defs, body: parts.join(''), className: 'lamina-chart fs-span' });
}
