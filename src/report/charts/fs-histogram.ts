/**
 * Histogram of the governing FS over the samples of an uncertainty run (METHODS §16), with
 * FS = 1 (failure to its left, hatched bars) and the governing check's target marked. Samples
 * above the last bin (beyond the 99.5th percentile) are counted in a note.
 */
import { max } from 'd3-array';
import { scaleLinear } from 'd3-scale';
import type { UncertaintyReport } from '../../model/types';
import { ID, INK, PALETTE, axis, emptyNote, formatValue, line, num, svgDocument, text } from './svg';

export interface FsHistogramOptions {
  width?: number;
  height?: number;
  /** the target of the governing check, marked when given */
  target?: number | null;
}

export function fsHistogramSvg(u: Pick<UncertaintyReport, 'histogram' | 'pf' | 'evaluated'>, options: FsHistogramOptions = {}): string {
  const width = options.width ?? 640;
  const height = options.height ?? 300;
  const title = 'Governing factor of safety over the samples';
  const bins = u.histogram.bins;
  if (bins.length === 0) {
    return svgDocument({ width, height, title, desc: 'No finite FS to draw.', body: emptyNote(width, height, 'No counted check has a finite FS'), className: 'lamina-chart fs-histogram' });
  }
  const left = 60, right = width - 20, top = 30, bottom = height - 50;
  const lo = Math.min(bins[0].x0, 1);
  const hi = Math.max(bins[bins.length - 1].x1, 1, options.target ?? 0);
  const x = scaleLinear().domain([lo, hi]).range([left, right]);
  const y = scaleLinear().domain([0, max(bins, (b) => b.count) ?? 1]).nice().range([bottom, top]);
  const defs = `<pattern id="${ID}fail" width="6" height="6" patternUnits="userSpaceOnUse" patternTransform="rotate(45)"><rect width="6" height="6" fill="#ffffff"/><line x1="0" y1="0" x2="0" y2="6" stroke="${PALETTE.vermillion}" stroke-width="3"/></pattern>`;
  const parts: string[] = [];
  parts.push(axis({ scale: y, orient: 'left', at: left, label: 'samples', ticks: 5, gridTo: right }));
  parts.push(axis({ scale: x, orient: 'bottom', at: bottom, label: 'governing FS' }));
  for (const b of bins) {
    const failing = b.x1 <= 1;
    const x0 = x(b.x0), x1 = x(b.x1);
    parts.push(`<rect x="${num(x0)}" y="${num(y(b.count))}" width="${num(Math.max(0.5, x1 - x0 - 0.5))}" height="${num(bottom - y(b.count))}" fill="${failing ? `url(#${ID}fail)` : PALETTE.blue}" stroke="${failing ? PALETTE.vermillion : PALETTE.blue}" stroke-width="0.5"/>`);
  }
  parts.push(line(x(1), top - 8, x(1), bottom, INK.axis, 1.5, '5 3'));
  parts.push(text(x(1) + 4, top - 10, `FS = 1 (P_f ${formatValue(u.pf)})`, { size: 10 }));
  if (options.target !== undefined && options.target !== null && options.target !== 1) {
    parts.push(line(x(options.target), top, x(options.target), bottom, PALETTE.green, 1.5, '2 2'));
    const tx = x(options.target);
    const nearRight = tx > right - 70; // label to the left of the line, inside the plot
    parts.push(text(nearRight ? tx - 4 : tx + 4, top + 4, `target ${formatValue(options.target)}`, { size: 10, fill: PALETTE.green, ...(nearRight ? { anchor: 'end' as const } : {}) }));
  }
  if (u.histogram.above > 0) parts.push(text(right, bottom + 44, `${u.histogram.above} samples above ${num(bins[bins.length - 1].x1)} not drawn`, { anchor: 'end', size: 9, fill: INK.muted }));
  return svgDocument({
    width, height, title,
    desc: `Histogram of the governing FS of ${u.evaluated} samples; hatched bars lie below FS = 1 (failure).`,
    defs, body: parts.join(''), className: 'lamina-chart fs-histogram',
  });
}
