/**
 * Shared pieces for the pure SVG chart builders: escaping, number rounding, the colour-blind
 * safe palette, dash patterns and markers, axes with ticks and a quantity-and-unit label, legends
 * and the accessible `<svg>` wrapper. Everything returns strings; nothing touches a document, so
 * the same markup goes into the lit app (via `unsafeSVG`) and into the static HTML report.
 */
import type { ScaleContinuousNumeric } from 'd3-scale';
import { toDisplay, unitLabel, type Quantity, type UnitSystem } from '../../model/units';
import { numberText } from '../../model/number-format';

/** Escapes text for XML text nodes and attribute values: & < > " '. */
export function escapeXml(text: unknown): string {
  return String(text)
    .replace(/&/g, '&amp;')
    .replace(/</g, '&lt;')
    .replace(/>/g, '&gt;')
    .replace(/"/g, '&quot;')
    .replace(/'/g, '&apos;');
}

/**
 * A coordinate rounded to ≤ 2 decimals for the markup (never NaN, never "-0"); clamped to
 * ±1e6 so that no exponent notation can appear.
 */
export function num(value: number): string {
  if (!Number.isFinite(value)) return '0';
  const rounded = Math.round(Math.max(-1e6, Math.min(1e6, value)) * 100) / 100;
  return Object.is(rounded, -0) || rounded === 0 ? '0' : String(rounded);
}

/**
 * A value for a text label, by the one precision rule (model/number-format.ts): 3 significant
 * figures, whole-number digits kept, trailing zeros dropped, the true minus sign.
 */
export function formatValue(value: number): string {
  if (!Number.isFinite(value)) return '–';
  return numberText(value);
}

/** Okabe–Ito colour-blind safe palette (Okabe & Ito 2008), used by every chart. */
export const PALETTE = {
  black: '#000000',
  orange: '#E69F00',
  skyBlue: '#56B4E9',
  green: '#009E73',
  yellow: '#F0E442',
  blue: '#0072B2',
  vermillion: '#D55E00',
  purple: '#CC79A7',
} as const;

/** Neutral tones for axes, grid and fills. */
export const INK = { axis: '#000000', grid: '#d9d9d9', muted: '#555555', fill: '#f2f2f2', rock: '#e6e6e6' } as const;

export const FONT = "system-ui, -apple-system, 'Segoe UI', Roboto, Helvetica, Arial, sans-serif";

export type MarkerShape = 'circle' | 'square' | 'triangle' | 'diamond' | 'cross' | 'plus';

/** One visual style per series: colour, dash pattern and marker, so colour is never alone. */
export interface SeriesStyle {
  color: string;
  dash: string | null;
  marker: MarkerShape;
}

/** A marker symbol centred on (x, y); `filled` false draws it open. */
export function marker(shape: MarkerShape, x: number, y: number, color: string, size = 4, filled = true, extra = ''): string {
  const fill = filled ? color : '#ffffff';
  const common = `fill="${fill}" stroke="${color}" stroke-width="1.2"${extra ? ' ' + extra : ''}`;
  const r = size;
  switch (shape) {
    case 'circle':
      return `<circle cx="${num(x)}" cy="${num(y)}" r="${num(r)}" ${common}/>`;
    case 'square':
      return `<rect x="${num(x - r)}" y="${num(y - r)}" width="${num(2 * r)}" height="${num(2 * r)}" ${common}/>`;
    case 'triangle':
      return `<path d="M${num(x)},${num(y - r * 1.15)}L${num(x + r)},${num(y + r * 0.75)}L${num(x - r)},${num(y + r * 0.75)}Z" ${common}/>`;
    case 'diamond':
      return `<path d="M${num(x)},${num(y - r * 1.2)}L${num(x + r)},${num(y)}L${num(x)},${num(y + r * 1.2)}L${num(x - r)},${num(y)}Z" ${common}/>`;
    case 'cross':
      return `<path d="M${num(x - r)},${num(y - r)}L${num(x + r)},${num(y + r)}M${num(x - r)},${num(y + r)}L${num(x + r)},${num(y - r)}" fill="none" stroke="${color}" stroke-width="1.5"${extra ? ' ' + extra : ''}/>`;
    case 'plus':
      return `<path d="M${num(x - r)},${num(y)}L${num(x + r)},${num(y)}M${num(x)},${num(y - r)}L${num(x)},${num(y + r)}" fill="none" stroke="${color}" stroke-width="1.5"${extra ? ' ' + extra : ''}/>`;
  }
}

/** Attributes for a text element; `anchor` start | middle | end. */
export function text(
  x: number,
  y: number,
  content: string,
  opts: { anchor?: 'start' | 'middle' | 'end'; size?: number; weight?: 'bold' | 'normal'; fill?: string; rotate?: number; italic?: boolean; baseline?: 'middle' | 'hanging' | 'auto'; cls?: string } = {},
): string {
  const attrs = [`x="${num(x)}"`, `y="${num(y)}"`];
  if (opts.anchor && opts.anchor !== 'start') attrs.push(`text-anchor="${opts.anchor}"`);
  if (opts.size) attrs.push(`font-size="${num(opts.size)}"`);
  if (opts.weight === 'bold') attrs.push('font-weight="bold"');
  if (opts.italic) attrs.push('font-style="italic"');
  if (opts.fill) attrs.push(`fill="${opts.fill}"`);
  if (opts.baseline && opts.baseline !== 'auto') attrs.push(`dominant-baseline="${opts.baseline}"`);
  if (opts.rotate) attrs.push(`transform="rotate(${num(opts.rotate)} ${num(x)} ${num(y)})"`);
  if (opts.cls) attrs.push(`class="${opts.cls}"`);
  return `<text ${attrs.join(' ')}>${escapeXml(content)}</text>`;
}

/** A straight line. */
export function line(x1: number, y1: number, x2: number, y2: number, stroke: string, width = 1, dash: string | null = null, extra = ''): string {
  const d = dash ? ` stroke-dasharray="${dash}"` : '';
  return `<line x1="${num(x1)}" y1="${num(y1)}" x2="${num(x2)}" y2="${num(y2)}" stroke="${stroke}" stroke-width="${num(width)}"${d}${extra ? ' ' + extra : ''}/>`;
}

/** Label text for an axis: "Quantity (unit)"; a dimensionless axis passes unit ''. */
export function axisLabel(quantity: string, unit: string): string {
  return unit ? `${quantity} (${unit})` : quantity;
}

/** Any d3 continuous scale (linear or log). */
export type NumericScale = ScaleContinuousNumeric<number, number>;

export interface AxisOptions {
  scale: NumericScale;
  orient: 'bottom' | 'left';
  /** y of a bottom axis, x of a left axis. */
  at: number;
  label: string;
  ticks?: number;
  tickValues?: number[];
  format?: (value: number) => string;
  /** Draw grid lines across to this coordinate (y for a bottom axis, x for a left axis). */
  gridTo?: number;
}

/** A thin black axis with ticks, tick labels, optional grey grid and the quantity-and-unit label. */
export function axis(o: AxisOptions): string {
  const [r0, r1] = o.scale.range() as [number, number];
  const values = o.tickValues ?? o.scale.ticks(o.ticks ?? 6);
  const fmt = o.format ?? ((v: number) => formatValue(v));
  const parts: string[] = [];
  if (o.orient === 'bottom') {
    if (o.gridTo !== undefined) for (const v of values) parts.push(line(o.scale(v), o.at, o.scale(v), o.gridTo, INK.grid, 0.6));
    parts.push(line(Math.min(r0, r1), o.at, Math.max(r0, r1), o.at, INK.axis, 1));
    for (const v of values) {
      const x = o.scale(v);
      parts.push(line(x, o.at, x, o.at + 4, INK.axis, 1));
      parts.push(text(x, o.at + 15, fmt(v), { anchor: 'middle', size: 10 }));
    }
    parts.push(text((r0 + r1) / 2, o.at + 32, o.label, { anchor: 'middle', size: 11, cls: 'axis-label' }));
  } else {
    if (o.gridTo !== undefined) for (const v of values) parts.push(line(o.at, o.scale(v), o.gridTo, o.scale(v), INK.grid, 0.6));
    parts.push(line(o.at, Math.min(r0, r1), o.at, Math.max(r0, r1), INK.axis, 1));
    for (const v of values) {
      const y = o.scale(v);
      parts.push(line(o.at - 4, y, o.at, y, INK.axis, 1));
      parts.push(text(o.at - 6, y + 3.5, fmt(v), { anchor: 'end', size: 10 }));
    }
    const mid = (r0 + r1) / 2;
    parts.push(text(o.at - 44, mid, o.label, { anchor: 'middle', size: 11, rotate: -90, cls: 'axis-label' }));
  }
  return `<g class="axis axis-${o.orient}">${parts.join('')}</g>`;
}

export interface LegendItem {
  label: string;
  style: SeriesStyle;
  /** 'line' (default) draws a line sample with the marker; 'marker' only the marker; 'swatch' a filled box. */
  kind?: 'line' | 'marker' | 'swatch';
  filled?: boolean;
  /** For a swatch: a fill (colour or `url(#...)`). */
  fill?: string;
}

/** A legend laid out in rows from (x, y); each sample shows dash and marker as well as colour. */
export function legend(items: LegendItem[], x: number, y: number, columnWidth = 150, columns = 1): string {
  const parts: string[] = [];
  items.forEach((item, i) => {
    const cx = x + (i % columns) * columnWidth;
    const cy = y + Math.floor(i / columns) * 16;
    const kind = item.kind ?? 'line';
    if (kind === 'swatch') {
      parts.push(`<rect x="${num(cx)}" y="${num(cy - 6)}" width="22" height="11" fill="${item.fill ?? item.style.color}" stroke="${item.style.color}" stroke-width="1"/>`);
    } else {
      if (kind === 'line') parts.push(line(cx, cy, cx + 22, cy, item.style.color, 2, item.style.dash));
      parts.push(marker(item.style.marker, cx + 11, cy, item.style.color, 3.5, item.filled ?? true));
    }
    parts.push(text(cx + 28, cy + 3.5, item.label, { size: 10 }));
  });
  return `<g class="legend">${parts.join('')}</g>`;
}

/**
 * Splits a sentence into lines of at most `width` characters at spaces (long words are kept
 * whole), for short reasons under bars.
 */
export function wrapText(content: string, width: number, maxLines = 4): string[] {
  const words = content.split(/\s+/).filter((w) => w.length > 0);
  const lines: string[] = [];
  let current = '';
  for (const word of words) {
    if (current && (current + ' ' + word).length > width) {
      lines.push(current);
      current = word;
    } else current = current ? current + ' ' + word : word;
  }
  if (current) lines.push(current);
  if (lines.length > maxLines) {
    const kept = lines.slice(0, maxLines);
    kept[maxLines - 1] = kept[maxLines - 1] + ' …';
    return kept;
  }
  return lines;
}

/** A multi-line text block (one `<tspan>` per line). */
export function textBlock(x: number, y: number, lines: string[], opts: { anchor?: 'start' | 'middle' | 'end'; size?: number; fill?: string; lineHeight?: number } = {}): string {
  const size = opts.size ?? 9;
  const lh = opts.lineHeight ?? size * 1.25;
  const anchor = opts.anchor && opts.anchor !== 'start' ? ` text-anchor="${opts.anchor}"` : '';
  const fill = opts.fill ? ` fill="${opts.fill}"` : '';
  const spans = lines.map((l, i) => `<tspan x="${num(x)}" dy="${i === 0 ? 0 : num(lh)}">${escapeXml(l)}</tspan>`).join('');
  return `<text x="${num(x)}" y="${num(y)}" font-size="${num(size)}"${anchor}${fill}>${spans}</text>`;
}

/** Placeholder for the per-chart id prefix; it cannot occur in escaped user text ("&" is escaped). */
export const ID = '&lmid;';

/** FNV-1a 32-bit hash, hex: stable, dependency-free ids for patterns and clip paths. */
function fnv1a(s: string): string {
  let h = 0x811c9dc5;
  for (let i = 0; i < s.length; i++) {
    h ^= s.charCodeAt(i);
    h = Math.imul(h, 0x01000193) >>> 0;
  }
  return h.toString(16).padStart(8, '0');
}

export interface SvgDocument {
  width: number;
  height: number;
  /** Short accessible name (also the `<title>`). */
  title: string;
  /** Longer description for screen readers. */
  desc: string;
  /** Inline `<defs>` content (patterns, clip paths, arrow heads), using `ID` in ids. */
  defs?: string;
  body: string;
  /** A class on the root for the app's CSS, e.g. "lamina-chart fs-span". */
  className: string;
}

/**
 * Wraps a chart in an accessible, self-contained `<svg>` with a fixed viewBox and width 100%.
 * Ids written with the `ID` placeholder become `lm<hash>-…`, where the hash is of the chart's own
 * markup: the output is deterministic, and two different charts on one page get different ids.
 */
export function svgDocument(doc: SvgDocument): string {
  const markup =
    `<svg xmlns="http://www.w3.org/2000/svg" viewBox="0 0 ${num(doc.width)} ${num(doc.height)}" width="100%" ` +
    `role="img" aria-label="${escapeXml(doc.title)}" aria-describedby="${ID}desc" class="${escapeXml(doc.className)}" ` +
    `font-family="${FONT}" font-size="11">` +
    `<title>${escapeXml(doc.title)}</title><desc id="${ID}desc">${escapeXml(doc.desc)}</desc>` +
    `<defs>${arrowDefs()}${doc.defs ?? ''}</defs>` +
    `<rect x="0" y="0" width="${num(doc.width)}" height="${num(doc.height)}" fill="#ffffff"/>` +
    doc.body +
    `</svg>`;
  const prefix = `lm${fnv1a(markup)}-`;
  return markup.split(ID).join(prefix);
}

/** Arrow heads (for dimension lines) referenced as url(#IDarrow). */
function arrowDefs(): string {
  return (
    `<marker id="${ID}arrow" viewBox="0 0 10 10" refX="9" refY="5" markerWidth="6" markerHeight="6" orient="auto-start-reverse">` +
    `<path d="M0,0L10,5L0,10Z" fill="${INK.axis}"/></marker>`
  );
}

/** A dimension line with arrow heads at both ends. */
export function dimension(x1: number, y1: number, x2: number, y2: number, label: string, labelAt: { x: number; y: number; anchor?: 'start' | 'middle' | 'end' }): string {
  return (
    `<g class="dimension">${line(x1, y1, x2, y2, INK.axis, 0.8, null, `marker-start="url(#${ID}arrow)" marker-end="url(#${ID}arrow)"`)}` +
    (label ? text(labelAt.x, labelAt.y, label, { anchor: labelAt.anchor ?? 'middle', size: 10 }) : '') +
    `</g>`
  );
}

/** A short centred note used when a chart has nothing to draw. */
export function emptyNote(width: number, height: number, message: string): string {
  return text(width / 2, height / 2, message, { anchor: 'middle', size: 13, fill: INK.muted });
}

/** Converts values of one quantity from file units to the display system, with its label. */
export interface DisplayUnit {
  convert: (valueInFileUnit: number) => number;
  unit: string;
}

/** `toDisplay`/`unitLabel` of the model, bundled for a chart (non-finite values map to 0). */
export function displayUnit(quantity: Quantity, units: UnitSystem): DisplayUnit {
  return {
    convert: (v: number) => (Number.isFinite(v) ? toDisplay(v, quantity, units) : 0),
    unit: unitLabel(quantity, units),
  };
}
