/**
 * Strip plot of the laboratory tensile strengths of one layer: every specimen on a strength
 * axis (accepted filled, rejected open and crossed, with the reason in a tooltip), the Brazilian
 * and the direct (f × Brazilian) values on two rows, and labelled mean and characteristic lines.
 */
import { extent } from 'd3-array';
import { scaleLinear } from 'd3-scale';
import type { LabDetail } from '../../analysis/types';
import type { UnitSystem } from '../../model/units';
import { INK, PALETTE, axis, axisLabel, displayUnit, escapeXml, formatValue, legend, line, marker, svgDocument, text } from './svg';

export interface StrengthStripOptions {
  units: UnitSystem;
  width?: number;
  height?: number;
}

/** SVG string of the specimen strengths of `lab` (MPa in, displayed in `units`). */
export function strengthStripSvg(lab: LabDetail, options: StrengthStripOptions): string {
  const width = options.width ?? 640;
  const height = options.height ?? 250;
  const st = displayUnit('stress', options.units);
  const left = 130;
  const right = width - 24;
  const rowB = 78; // Brazilian row
  const rowD = 128; // direct row
  const axisY = 160;
  const title = 'Laboratory tensile strength';

  const finite = (v: number | null | undefined): v is number => typeof v === 'number' && Number.isFinite(v);
  const values: number[] = [];
  for (const s of lab.specimens) {
    if (finite(s.brazilian_MPa)) values.push(s.brazilian_MPa);
    if (finite(s.direct_MPa)) values.push(s.direct_MPa);
  }
  if (finite(lab.mean_MPa)) values.push(lab.mean_MPa);
  if (finite(lab.characteristic_MPa)) values.push(lab.characteristic_MPa);
  const [lo0, hi0] = extent(values.length ? values : [0, 1]) as [number, number];
  const hi = hi0 > 0 ? hi0 * 1.08 : 1;
  const lo = Math.min(0, lo0);
  const x = scaleLinear().domain([st.convert(lo), st.convert(hi)]).range([left, right]).nice();
  const X = (mpa: number) => x(st.convert(mpa));

  const parts: string[] = [];
  parts.push(text(12, 20, title, { size: 13, weight: 'bold' }));
  const methodWord = lab.method === 'direct' ? 'direct tension' : 'Brazilian';
  const sourceText =
    lab.source === 'specimens'
      ? `${lab.n} accepted of ${lab.specimens.length} specimen${lab.specimens.length === 1 ? '' : 's'} (${methodWord}); direct factor f = ${formatValue(lab.directFactor)}`
      : `value given (${methodWord}), no specimens; direct factor f = ${formatValue(lab.directFactor)}`;
  parts.push(text(12, 38, sourceText, { size: 10, fill: INK.muted }));
  parts.push(axis({ scale: x, orient: 'bottom', at: axisY, label: axisLabel('Tensile strength', st.unit), ticks: 7, gridTo: 52 }));
  parts.push(text(left - 10, rowB + 4, 'Brazilian', { anchor: 'end', size: 10 }));
  parts.push(text(left - 10, rowD + 4, 'direct = f × Brazilian', { anchor: 'end', size: 10 }));
  parts.push(line(left, rowB, right, rowB, INK.grid, 0.6, '2 3'));
  parts.push(line(left, rowD, right, rowD, INK.grid, 0.6, '2 3'));

  const accepted = { color: PALETTE.blue, dash: null, marker: 'circle' as const };
  const rejected = { color: PALETTE.vermillion, dash: null, marker: 'cross' as const };
  const direct = { color: PALETTE.green, dash: null, marker: 'diamond' as const };
  // Small vertical jitter by index keeps coincident values visible (deterministic).
  lab.specimens.forEach((s, i) => {
    const jitter = ((i % 5) - 2) * 3;
    const tip = s.accepted
      ? `${s.id}: ${formatValue(st.convert(s.brazilian_MPa))} ${st.unit} (accepted)`
      : `${s.id}: ${formatValue(st.convert(s.brazilian_MPa))} ${st.unit}, not used: ${s.reason ?? 'rejected'}`;
    const warn = s.warnings.length ? ` Warnings: ${s.warnings.join('; ')}` : '';
    for (const [row, value, style] of [
      [rowB, s.brazilian_MPa, s.accepted ? accepted : rejected],
      [rowD, s.direct_MPa, s.accepted ? direct : rejected],
    ] as const) {
      if (!finite(value)) continue;
      const cx = X(value);
      const cy = row + jitter;
      const body = s.accepted
        ? marker(style.marker, cx, cy, style.color, 4, true)
        : marker('circle', cx, cy, style.color, 4.5, false) + marker('cross', cx, cy, style.color, 3);
      parts.push(`<g class="specimen ${s.accepted ? 'accepted' : 'rejected'}"><title>${escapeXml(tip + warn)}</title>${body}</g>`);
    }
  });

  if (lab.source === 'value' && lab.specimens.length === 0 && finite(lab.mean_MPa)) {
    const row = lab.method === 'direct' ? rowD : rowB;
    parts.push(`<g class="given"><title>${escapeXml(`value given: ${formatValue(st.convert(lab.mean_MPa))} ${st.unit}`)}</title>${marker('square', X(lab.mean_MPa), row, PALETTE.blue, 4, true)}</g>`);
  }

  const refLine = (mpa: number, label: string, dash: string, color: string, labelY: number, anchor: 'start' | 'end') => {
    const lx = X(mpa);
    parts.push(line(lx, 52, lx, axisY, color, 1.6, dash));
    parts.push(text(anchor === 'start' ? lx + 4 : lx - 4, labelY, label, { anchor, size: 10, fill: color, weight: 'bold' }));
  };
  const meanX = finite(lab.mean_MPa) ? X(lab.mean_MPa) : null;
  const charX = finite(lab.characteristic_MPa) ? X(lab.characteristic_MPa) : null;
  const charLeft = meanX !== null && charX !== null && charX <= meanX;
  if (finite(lab.mean_MPa)) {
    const nText = lab.n > 0 ? ` (direct, n = ${lab.n})` : ' (direct)';
    refLine(lab.mean_MPa, `mean ${formatValue(st.convert(lab.mean_MPa))} ${st.unit}${nText}`, '6 3', PALETTE.black, 60, charLeft ? 'start' : 'end');
  }
  if (finite(lab.characteristic_MPa)) {
    const rule = lab.rule === 'lower5' ? 'lower 5 % fractile' : 'mean rule';
    const kn = lab.rule === 'lower5' && finite(lab.kn) ? `, kn = ${formatValue(lab.kn)}` : '';
    refLine(lab.characteristic_MPa, `characteristic ${formatValue(st.convert(lab.characteristic_MPa))} ${st.unit} (${rule}${kn})`, '2 2', PALETTE.purple, 60, charLeft ? 'end' : 'start');
  }

  parts.push(
    legend(
      [
        { label: 'Brazilian, accepted', style: accepted, kind: 'marker' },
        { label: 'direct, accepted', style: direct, kind: 'marker' },
        { label: 'not used (reason in tooltip)', style: rejected, kind: 'marker', filled: false },
      ],
      left,
      height - 26,
      165,
      3,
    ),
  );
  if (finite(lab.cov)) parts.push(text(right, 38, `CoV ${formatValue(lab.cov)}`, { anchor: 'end', size: 10, fill: INK.muted }));

  const rejectedCount = lab.specimens.filter((s) => !s.accepted).length;
  const desc =
    `${sourceText}. ${rejectedCount} not used.` +
    (finite(lab.mean_MPa) ? ` Mean ${formatValue(st.convert(lab.mean_MPa))} ${st.unit}.` : '') +
    ` Characteristic ${formatValue(st.convert(lab.characteristic_MPa))} ${st.unit}.`;
  return svgDocument({ width, height, title, desc, body: parts.join(''), className: 'lamina-chart strength-strip' });
}
