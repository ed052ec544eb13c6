/**
 * The voussoir's search for n as a chart: fc(n) over the published 0.01 grid (a line, broken
 * where n has no lever arm), each trial n of the search as an open circle, and the equilibrium
 * (least fc) as a filled diamond with its value. Axes in the trace's units (n, MPa).
 *     searchCurveSvg(entry.steps) // '<svg …>'
 */
import { scaleLinear } from 'd3-scale';
import type { TraceSteps } from '../../model/types';
import { numberText } from '../number-text';
import { INK, PALETTE, axis, emptyNote, line, marker, num, svgDocument, text } from './svg';

export interface SearchCurveOptions {
  width?: number;
  height?: number;
}

export function searchCurveSvg(steps: TraceSteps, options: SearchCurveOptions = {}): string {
  const width = options.width ?? 560;
  const height = options.height ?? 280;
  const title = 'Search for n: fc(n) with its minimum';
  const curve = (steps.curve ?? []).filter((p): p is [number, number] => p[1] !== null && Number.isFinite(p[1]));
  const trials = steps.rows.filter((r) => r[0] !== null && r[2] !== null && Number.isFinite(r[2])) as number[][];
  const best = steps.marked !== null ? steps.rows[steps.marked] : null;
  const className = 'lamina-chart search-curve';
  if (curve.length === 0 && trials.length === 0) {
    return svgDocument({ width, height, title, desc: 'No n has a lever arm: the beam snaps through.', body: emptyNote(width, height, 'No lever arm at any n'), className });
  }
  const left = 64, right = width - 16, top = 16, bottom = height - 62;
  const ys = [...curve.map((p) => p[1]), ...trials.map((r) => r[2])];
  const yMin = Math.min(...ys);
  // Above about 3× the minimum the curve only climbs to its ends: clip there so the minimum reads.
  const yMax = Math.min(Math.max(...ys), yMin * 3 || 1);
  const x = scaleLinear().domain([0, 1]).range([left, right]);
  const y = scaleLinear().domain([Math.max(0, yMin * 0.9), yMax]).range([bottom, top]).nice();
  const [y0, y1] = y.domain() as [number, number];
  const inside = (v: number): boolean => v >= y0 && v <= y1;
  const parts: string[] = [
    axis({ scale: x, orient: 'bottom', at: bottom, label: 'Compression-zone depth ratio n', tickValues: [0, 0.2, 0.4, 0.6, 0.8, 1], gridTo: top }),
    axis({ scale: y, orient: 'left', at: left, label: 'fc (MPa)', ticks: 5, gridTo: right }),
  ];
  // The curve, broken where fc leaves the plot or n has no lever arm.
  let path = '';
  let pen = false;
  for (const p of steps.curve ?? []) {
    const ok = p[1] !== null && inside(p[1]);
    if (!ok) {
      pen = false;
      continue;
    }
    path += `${pen ? 'L' : 'M'}${num(x(p[0]))},${num(y(p[1] as number))}`;
    pen = true;
  }
  if (path) parts.push(`<path d="${path}" fill="none" stroke="${PALETTE.blue}" stroke-width="1.6"/>`);
  for (const r of trials) if (inside(r[2])) parts.push(marker('circle', x(r[0]), y(r[2]), INK.muted, 2.6, false));
  let desc = `fc(n) for n = 0.01 … 0.99 and ${trials.length} trial values of the search.`;
  if (best && best[0] !== null && best[2] !== null) {
    const bx = x(best[0]), by = y(best[2]);
    parts.push(line(bx, by, bx, bottom, PALETTE.vermillion, 1, '3 3'));
    parts.push(marker('diamond', bx, by, PALETTE.vermillion, 5, true));
    const label = `minimum: n = ${numberText(best[0], 4)}, fc = ${numberText(best[2])} MPa`;
    // Named under the axis, clear of the curve, with the diamond as its key.
    parts.push(marker('diamond', left + 4, height - 10, PALETTE.vermillion, 4, true));
    parts.push(text(left + 14, height - 6, label, { size: 11, weight: 'bold' }));
    desc += ` The least fc, ${numberText(best[2])} MPa, is at n = ${numberText(best[0], 4)}.`;
  }
  return svgDocument({ width, height, title, desc, body: parts.join(''), className });
}
