/**
 * Probability of failure against span (METHODS §16): P_f of the uncertainty run at points of
 * the span curve (the same seed at every span), with its 95 % interval as a band, on a log
 * axis. A span where no sample failed has P_f = 0, which a log axis cannot place: it is drawn
 * at the axis floor as an open marker and its interval's upper end (3/N) still shows. The
 * project's acceptable P_f, when given, is a dashed line. Spans in m, displayed in `units`.
 */
import { max, min } from 'd3-array';
import { scaleLinear, scaleLog } from 'd3-scale';
import { area, line as d3line } from 'd3-shape';
import type { UncertaintyReport } from '../../model/types';
import type { UnitSystem } from '../../model/units';
import { INK, PALETTE, axis, axisLabel, displayUnit, emptyNote, formatValue, line, marker, num, svgDocument, text } from './svg';

export interface PfSpanOptions {
  units: UnitSystem;
  width?: number;
  height?: number;
  /** the span in m now (marked) */
  currentSpan_m?: number | null;
  /** what the x axis measures: "span" (default) or "entry width" */
  spanWord?: string;
}

export function pfSpanSvg(u: Pick<UncertaintyReport, 'pfVersusSpan' | 'samplesPerSpan' | 'acceptablePf'>, options: PfSpanOptions): string {
  const width = options.width ?? 640;
  const height = options.height ?? 320;
  const word = options.spanWord ?? 'span';
  const title = `Probability of failure against ${word}`;
  const pts = u.pfVersusSpan;
  if (pts.length < 2) {
    return svgDocument({ width, height, title, desc: 'No P_f against span.', body: emptyNote(width, height, 'No span points were run'), className: 'lamina-chart pf-span' });
  }
  const len = displayUnit('length', options.units);
  const left = 70, right = width - 20, top = 24, bottom = height - 52;
  const positive = pts.flatMap((p) => [p.pf, p.pfInterval[0], p.pfInterval[1]]).filter((v) => v > 0);
  const floor = Math.min(1e-4, (min(positive) ?? 1e-4) / 2, u.acceptablePf ?? 1);
  const lowest = 10 ** Math.floor(Math.log10(floor));
  const y = scaleLog().domain([lowest, 1]).range([bottom, top]).clamp(true);
  const x = scaleLinear().domain([min(pts, (p) => len.convert(p.span_m)) ?? 0, max(pts, (p) => len.convert(p.span_m)) ?? 1]).range([left, right]);
  const at = (v: number) => y(Math.max(lowest, v));
  const parts: string[] = [];
  const decades: number[] = [];
  for (let d = lowest; d <= 1.0000001; d *= 10) decades.push(d);
  parts.push(axis({ scale: y, orient: 'left', at: left, label: 'P_f', tickValues: decades, format: (v) => formatValue(v), gridTo: right }));
  parts.push(axis({ scale: x, orient: 'bottom', at: bottom, label: axisLabel(word, len.unit) }));
  const band = area<(typeof pts)[number]>().x((p) => x(len.convert(p.span_m))).y0((p) => at(p.pfInterval[0])).y1((p) => at(p.pfInterval[1])).digits(2)(pts);
  if (band) parts.push(`<path d="${band}" fill="${PALETTE.blue}" fill-opacity="0.18" stroke="none"/>`);
  const path = d3line<(typeof pts)[number]>().x((p) => x(len.convert(p.span_m))).y((p) => at(p.pf)).digits(2)(pts);
  if (path) parts.push(`<path d="${path}" fill="none" stroke="${PALETTE.blue}" stroke-width="1.8"/>`);
  for (const p of pts) parts.push(marker('circle', x(len.convert(p.span_m)), at(p.pf), PALETTE.blue, 3.5, p.pf > 0));
  if (u.acceptablePf !== null) {
    parts.push(line(left, y(u.acceptablePf), right, y(u.acceptablePf), PALETTE.vermillion, 1.5, '6 3'));
    parts.push(text(right - 4, y(u.acceptablePf) - 4, `acceptable P_f ${formatValue(u.acceptablePf)}`, { anchor: 'end', size: 10, fill: PALETTE.vermillion }));
  }
  const s = options.currentSpan_m;
  if (s !== null && s !== undefined && Number.isFinite(s)) {
    const cx = x(len.convert(s));
    if (cx >= left && cx <= right) {
      parts.push(line(cx, top, cx, bottom, INK.axis, 1, '2 3'));
      parts.push(text(cx + 4, top + 10, `current ${formatValue(len.convert(s))} ${len.unit}`, { size: 10 }));
    }
  }
  parts.push(text(left, height - 6, `${u.samplesPerSpan} samples at each ${word}, the same seed; band: 95 % interval; open marker: no failure (P_f 0, drawn at ${formatValue(lowest)})`, { size: 9, fill: INK.muted }));
  return svgDocument({
    width, height, title,
    desc: `P_f at ${pts.length} ${word}s from ${formatValue(len.convert(pts[0].span_m))} to ${formatValue(len.convert(pts[pts.length - 1].span_m))} ${len.unit}: ${pts.map((p) => formatValue(p.pf)).join(', ')}.`,
    body: parts.join(''), className: 'lamina-chart pf-span',
  });
}
