/**
 * The strength chain as a step chart: lab → direct → characteristic → block → rock mass →
 * design, one bar per step on a linear axis (a zero design strength must show), with the value
 * on each bar, the ratio to the previous step, and a short reason under each.
 */
import { max } from 'd3-array';
import { scaleLinear } from 'd3-scale';
import type { StrengthStep } from '../../analysis/types';
import type { UnitSystem } from '../../model/units';
import { ID, INK, PALETTE, axis, axisLabel, displayUnit, emptyNote, escapeXml, formatValue, line, num, svgDocument, text, textBlock, wrapText } from './svg';

export interface StrengthChainOptions {
  units: UnitSystem;
  width?: number;
  height?: number;
  title?: string;
}

/** SVG string of the strength chain `steps` (values in MPa, displayed in `units`). */
export function strengthChainSvg(steps: StrengthStep[], options: StrengthChainOptions): string {
  const width = options.width ?? 640;
  const height = options.height ?? 340;
  const st = displayUnit('stress', options.units);
  const title = options.title ?? 'Tensile strength chain, laboratory to design';
  if (steps.length === 0) {
    return svgDocument({ width, height, title, desc: 'No strength steps.', body: emptyNote(width, height, 'No strength steps'), className: 'lamina-chart strength-chain' });
  }
  const left = 70;
  const right = width - 16;
  const top = 44;
  const axisY = height - 118;
  const safe = (v: number) => (Number.isFinite(v) ? v : 0);
  const top0 = max(steps, (s) => st.convert(safe(s.value_MPa))) ?? 1;
  const y = scaleLinear().domain([0, top0 > 0 ? top0 * 1.15 : 1]).range([axisY, top]).nice();
  const col = (right - left) / steps.length;
  const barW = Math.min(56, col * 0.5);

  const parts: string[] = [];
  parts.push(text(12, 20, title, { size: 13, weight: 'bold' }));
  parts.push(axis({ scale: y, orient: 'left', at: left, label: axisLabel('Tensile strength', st.unit), ticks: 5, gridTo: right }));
  parts.push(line(left, axisY, right, axisY, INK.axis, 1));

  const cx = (i: number) => left + col * (i + 0.5);
  steps.forEach((step, i) => {
    const v = st.convert(safe(step.value_MPa));
    const yTop = y(Math.max(0, v));
    const isDesign = step.key === 'design';
    const fill = isDesign ? `url(#${ID}design)` : '#cfe3f1';
    const x0 = cx(i) - barW / 2;
    parts.push(
      `<g class="step" data-key="${escapeXml(step.key)}"><title>${escapeXml(`${step.label}: ${formatValue(v)} ${st.unit}. ${step.reason} Source: ${step.source}`)}</title>` +
        `<rect x="${num(x0)}" y="${num(yTop)}" width="${num(barW)}" height="${num(Math.max(0, axisY - yTop))}" fill="${fill}" stroke="${isDesign ? PALETTE.vermillion : PALETTE.blue}" stroke-width="${isDesign ? 1.8 : 1}"/>` +
        `</g>`,
    );
    parts.push(text(cx(i), yTop - 5, `${formatValue(v)} ${st.unit}`, { anchor: 'middle', size: 10, weight: 'bold' }));
    if (i > 0) {
      const prev = st.convert(safe(steps[i - 1].value_MPa));
      const yPrev = y(Math.max(0, prev));
      // Step connector: level of the previous bar carried across, then down/up to this one.
      parts.push(`<path d="M${num(cx(i - 1) + barW / 2)},${num(yPrev)}H${num(cx(i) - barW / 2)}" fill="none" stroke="${INK.muted}" stroke-width="1" stroke-dasharray="3 2"/>`);
      if (prev > 0) parts.push(text(cx(i) - col / 2, yPrev - 4, `×${formatValue(v / prev)}`, { anchor: 'middle', size: 9, fill: INK.muted }));
    }
    parts.push(text(cx(i), axisY + 15, step.label, { anchor: 'middle', size: 10, weight: 'bold' }));
    const chars = Math.max(10, Math.floor(col / 5.2));
    parts.push(textBlock(cx(i), axisY + 29, wrapText(step.reason, chars, 6), { anchor: 'middle', size: 8.5, fill: INK.muted }));
  });

  const defs =
    `<pattern id="${ID}design" patternUnits="userSpaceOnUse" width="6" height="6" patternTransform="rotate(45)">` +
    `<rect width="6" height="6" fill="#f6d3bf"/><path d="M0,0V6" stroke="${PALETTE.vermillion}" stroke-width="1.2"/></pattern>`;
  const desc = steps.map((s) => `${s.label} ${formatValue(st.convert(safe(s.value_MPa)))} ${st.unit}`).join(' → ') + '.';
  return svgDocument({ width, height, title, desc, defs, body: parts.join(''), className: 'lamina-chart strength-chain' });
}
