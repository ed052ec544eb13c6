/**
 * Sensitivity (tornado) chart of an uncertainty run: the Spearman rank correlation of each
 * sampled input with the governing FS (METHODS §16), largest magnitude first. A bar to the
 * right: the FS rises with the input; to the left: it falls. Constant inputs are listed as such.
 */
import { scaleLinear } from 'd3-scale';
import type { UncertaintyReport } from '../../model/types';
import { INK, PALETTE, axis, emptyNote, formatValue, line, num, svgDocument, text } from './svg';

export function sensitivitySvg(u: Pick<UncertaintyReport, 'sensitivity'>, options: { width?: number } = {}): string {
  const width = options.width ?? 640;
  const rows = [...u.sensitivity].sort((a, b) => Math.abs(b.rankCorrelation ?? 0) - Math.abs(a.rankCorrelation ?? 0));
  const rowHeight = 22;
  const height = Math.max(120, 70 + rows.length * rowHeight);
  const title = 'Sensitivity: rank correlation with the governing FS';
  if (rows.length === 0) return svgDocument({ width, height, title, desc: 'No sampled inputs.', body: emptyNote(width, height, 'No sampled inputs'), className: 'lamina-chart sensitivity' });
  const labelWidth = 230;
  const left = labelWidth + 10, right = width - 30, top = 20, bottom = top + rows.length * rowHeight;
  const x = scaleLinear().domain([-1, 1]).range([left, right]);
  const parts: string[] = [axis({ scale: x, orient: 'bottom', at: bottom + 6, label: 'Spearman rank correlation ρ', tickValues: [-1, -0.5, 0, 0.5, 1], gridTo: top })];
  rows.forEach((r, k) => {
    const cy = top + k * rowHeight + rowHeight / 2;
    parts.push(text(labelWidth, cy + 4, r.path, { anchor: 'end', size: 10 }));
    if (r.rankCorrelation === null) {
      parts.push(text(x(0) + 6, cy + 4, 'constant (no spread)', { size: 9, fill: INK.muted }));
      return;
    }
    const v = r.rankCorrelation;
    const x0 = Math.min(x(0), x(v)), w = Math.abs(x(v) - x(0));
    parts.push(`<rect x="${num(x0)}" y="${num(cy - 7)}" width="${num(Math.max(0.5, w))}" height="14" fill="${v >= 0 ? PALETTE.blue : PALETTE.vermillion}"/>`);
    parts.push(text(v >= 0 ? x(v) + 4 : x(v) - 4, cy + 4, formatValue(v), { anchor: v >= 0 ? 'start' : 'end', size: 9 }));
  });
  parts.push(line(x(0), top, x(0), bottom, INK.axis, 1));
  return svgDocument({
    width, height, title,
    desc: `Rank correlation of ${rows.length} sampled inputs with the governing FS: ${rows.map((r) => `${r.path} ${r.rankCorrelation === null ? 'constant' : r.rankCorrelation.toFixed(2)}`).join('; ')}.`,
    body: parts.join(''), className: 'lamina-chart sensitivity',
  });
}
