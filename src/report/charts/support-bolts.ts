/**
 * The support drawing: a section across the opening with the strata to scale (layers[0] at the
 * bottom, on the roof line), the bolts of the pattern at their spacing across the opening, each
 * with its anchorage zone at the tip, and the layers the bolts act on marked in words and hatch:
 * the layers suspended from the bolts (suspension) and the bonded set (beam building, with
 * whether composite action is credited). What the bolts do is read from the report (anchor
 * layer, suspended layers, composite credited) and the check table's interlayer-shear rows
 * (one per bonded interface); only the geometry (tip height, zone, positions) is drawn from
 * the pattern. One scale for both directions when the span and the strata fit at a readable
 * size; otherwise the span has its own horizontal scale, and the drawing says so.
 */
import { scaleLinear } from 'd3-scale';
import type { Project, Report } from '../../model/types';
import type { UnitSystem } from '../../model/units';
import { ID, INK, PALETTE, axis, axisLabel, dimension, displayUnit, emptyNote, escapeXml, formatValue, legend, line, num, svgDocument, text } from './svg';
import { isOverhang, openingWords } from '../../model/span-wording';

export interface SupportBoltsOptions {
  units: UnitSystem;
  width?: number;
  height?: number;
}

/** Positions of the bolts across a span (m from the left rib): a row at spacing S centred on the span, inside it. */
export function boltPositions(span: number, spacing: number): number[] {
  if (!(span > 0) || !(spacing > 0)) return [];
  const n = Math.max(1, Math.min(60, Math.round(span / spacing)));
  const out: number[] = [];
  for (let j = 0; j < n; j++) {
    const x = span / 2 + (j - (n - 1) / 2) * spacing;
    if (x > 0 && x < span) out.push(x);
  }
  return out.length ? out : [span / 2];
}

function patternDefs(): string {
  return (
    `<pattern id="${ID}hang" patternUnits="userSpaceOnUse" width="10" height="10" patternTransform="rotate(45)">` +
    `<rect width="10" height="10" fill="#fff4e0"/><path d="M0,0V10" stroke="${PALETTE.orange}" stroke-width="2"/></pattern>` +
    `<pattern id="${ID}bond" patternUnits="userSpaceOnUse" width="12" height="12">` +
    `<rect width="12" height="12" fill="#e6f2fa"/><path d="M0,6H12M6,0V12" stroke="${PALETTE.blue}" stroke-width="0.8"/></pattern>` +
    `<pattern id="${ID}plain" patternUnits="userSpaceOnUse" width="16" height="8">` +
    `<rect width="16" height="8" fill="#fbf3dc"/><path d="M0,4H16" stroke="#b5a77f" stroke-width="0.6"/></pattern>` +
    `<pattern id="${ID}rib" patternUnits="userSpaceOnUse" width="8" height="8" patternTransform="rotate(45)">` +
    `<rect width="8" height="8" fill="${INK.rock}"/><path d="M0,0V8" stroke="#9a9a9a" stroke-width="1"/></pattern>`
  );
}

/**
 * SVG string of the bolt pattern in the strata of `project`, with what `report` says the bolts
 * do (null: geometry only). Bolts carry `class="bolt"`, their anchorage zones
 * `class="anchorage"`, layers `class="layer"` with `data-layer` and `data-role` (suspended,
 * bonded, anchor or none).
 */
export function supportBoltsSvg(project: Project, report: Report | null, options: SupportBoltsOptions): string {
  const width = options.width ?? 640;
  const len = displayUnit('length', options.units);
  const title = `Bolts in the strata${project.title ? ': ' + project.title : ''}`;
  const bolts = project.support.bolts;
  const layers = project.layers;
  if (!bolts || layers.length === 0) {
    return svgDocument({ width, height: 120, title, desc: 'No bolt pattern to draw.', body: emptyNote(width, 60, 'No bolt pattern given'), className: 'lamina-chart support-bolts' });
  }
  const thick = layers.map((l) => (Number.isFinite(l.thickness_m) && l.thickness_m > 0 ? l.thickness_m : 0));
  const total = thick.reduce((a, b) => a + b, 0) || 1;
  const base: number[] = [];
  thick.reduce((acc, t, i) => ((base[i] = acc), acc + t), 0);
  const span = project.opening.type === 'intersection' && report ? report.opening.designSpan_m ?? project.opening.span_m : project.opening.span_m;

  // Frame: ribs of fixed width either side of the span (an overhang: at its root only); the
  // strata above the roof line.
  const overhang = isOverhang(project.opening.type);
  const left = 70;
  const ribW = 34;
  const plotW = width - left - 200 - 2 * ribW;
  const top = 40;
  const below = 150;
  const availH = (options.height ?? 440) - top - below;
  const kV0 = availH / total;
  const kH0 = plotW / span;
  const k = Math.min(kV0, kH0);
  // One scale when the column keeps at least 110 px of height; otherwise the span has its own.
  const sameScale = k * total >= 110;
  const kV = sameScale ? k : kV0;
  const kH = sameScale ? k : kH0;
  // The drawing is as tall as the column needs (no empty band above a wide, thin roof).
  const height = Math.round(top + total * kV + below);
  const roofY = height - below;
  const x0 = left + ribW;
  const x1 = x0 + span * kH;
  const colTop = roofY - total * kV;
  const y = scaleLinear().domain([0, len.convert(total)]).range([roofY, colTop]);

  const s = report?.support?.bolts ?? null;
  const suspended = new Set(s?.suspended ?? []);
  const shearRows = report ? report.checks.filter((c) => c.mode === 'interlayerShear') : [];
  const bonded = new Set<number>();
  for (const r of shearRows) {
    if (r.layerIndex === null) continue;
    bonded.add(r.layerIndex);
    bonded.add(r.layerIndex + 1);
  }
  const credited = s?.composite?.credited ?? false;
  const anchor = s?.anchorLayer ?? null;
  const role = (i: number): string => (suspended.has(i) ? 'suspended' : bonded.has(i) ? 'bonded' : anchor === i ? 'anchor' : 'none');

  const parts: string[] = [];
  parts.push(text(12, 20, title, { size: 13, weight: 'bold' }));
  parts.push(axis({ scale: y, orient: 'left', at: left - 6, label: axisLabel('Height above the roof line', len.unit), ticks: 5 }));

  layers.forEach((layer, i) => {
    const yTop = roofY - (base[i] + thick[i]) * kV;
    const h = thick[i] * kV;
    const r = role(i);
    const fill = r === 'suspended' ? 'hang' : r === 'bonded' ? 'bond' : 'plain';
    parts.push(
      `<rect class="layer" data-layer="${i}" data-role="${r}" x="${num(left)}" y="${num(yTop)}" width="${num((overhang ? x1 : x1 + ribW) - left)}" height="${num(h)}" ` +
        `fill="url(#${ID}${fill})" stroke="${INK.axis}" stroke-width="0.8"><title>${escapeXml(`${layer.name}: ${formatValue(len.convert(layer.thickness_m))} ${len.unit}`)}</title></rect>`,
    );
  });
  // Ribs (an overhang: its root only) and the opening below the roof line.
  const voidDepth = 40;
  parts.push(`<rect class="rib" x="${num(left)}" y="${num(roofY)}" width="${num(ribW)}" height="${num(voidDepth)}" fill="url(#${ID}rib)" stroke="${INK.axis}" stroke-width="0.8"/>`);
  if (!overhang) parts.push(`<rect class="rib" x="${num(x1)}" y="${num(roofY)}" width="${num(ribW)}" height="${num(voidDepth)}" fill="url(#${ID}rib)" stroke="${INK.axis}" stroke-width="0.8"/>`);
  parts.push(text(x1 - 6, roofY + voidDepth - 6, 'opening', { anchor: 'end', size: 10, fill: INK.muted }));

  // Bolts: shank from the roof line to the tip, the anchorage zone drawn wide at the tip, a plate at the collar.
  const L = Math.min(bolts.length_m, total);
  const a = Math.min(bolts.anchorage_m, L);
  const xs = boltPositions(span, bolts.spacingAcross_m);
  const yTip = roofY - L * kV;
  const yZone = roofY - (L - a) * kV;
  for (const bx of xs) {
    const px = x0 + bx * kH;
    parts.push(`<g class="bolt">${line(px, roofY, px, yTip, INK.axis, 2)}` +
      `<rect class="anchorage" x="${num(px - 3.5)}" y="${num(yTip)}" width="7" height="${num(Math.max(1, yZone - yTip))}" fill="${INK.axis}"/>` +
      `<rect x="${num(px - 7)}" y="${num(roofY)}" width="14" height="3" fill="${INK.axis}"/></g>`);
  }
  // Spacing across, dimensioned between the first two bolts (its value in the line below the span).
  if (xs.length >= 2) {
    const pa = x0 + xs[0] * kH;
    const pb = x0 + xs[1] * kH;
    parts.push(dimension(pa, roofY + 12, pb, roofY + 12, 'S', { x: (pa + pb) / 2, y: roofY + 25 }));
  }
  parts.push(dimension(x0, roofY + voidDepth + 12, x1, roofY + voidDepth + 12, `${openingWords(project.opening.type).span} ${formatValue(len.convert(span))} ${len.unit}`, { x: (x0 + x1) / 2, y: roofY + voidDepth + 26 }));
  const action = bolts.action === 'suspension' ? 'suspension' : 'beam building';
  parts.push(text(left, roofY + voidDepth + 44,
    `Bolts ${formatValue(len.convert(bolts.length_m))} ${len.unit} long, anchorage ${formatValue(len.convert(bolts.anchorage_m))} ${len.unit}, ` +
    `spacing across S = ${formatValue(len.convert(bolts.spacingAcross_m))} ${len.unit} (along ${formatValue(len.convert(bolts.spacingAlong_m))} ${len.unit}), ${action}.`, { size: 10 }));

  // Labels at the right: each layer's name and what the bolts do to it.
  const labelX = x1 + ribW + 10;
  const words: Record<string, string> = {
    suspended: 'suspended from the bolts',
    bonded: credited ? 'bonded beam, credited' : 'bonded beam, not credited',
    anchor: 'anchor layer',
    none: '',
  };
  const wanted = layers.map((_, i) => roofY - (base[i] + thick[i] / 2) * kV);
  const placed: number[] = [];
  for (let i = 0; i < layers.length; i++) {
    let yl = wanted[i];
    if (i > 0 && placed[i - 1] - yl < 26) yl = placed[i - 1] - 26;
    placed.push(yl);
  }
  const overflow = top + 6 - placed[placed.length - 1];
  if (overflow > 0) for (let i = 0; i < placed.length; i++) placed[i] += overflow;
  layers.forEach((layer, i) => {
    const full = layer.name || `layer ${i + 1}`;
    const name = full.length > 24 ? full.slice(0, 23) + '…' : full;
    parts.push(text(labelX, placed[i] - 1, `${i + 1} ${name}`, { size: 11, weight: 'bold' }));
    const r = role(i);
    if (words[r]) parts.push(text(labelX, placed[i] + 11, words[r], { size: 10, fill: INK.muted }));
    if (r === 'bonded' && anchor === i) parts.push(text(labelX, placed[i] + 23, 'anchor layer', { size: 10, fill: INK.muted }));
  });

  const note = sameScale ? 'Drawn to one scale across and up.' : `Heights to scale; the ${openingWords(project.opening.type).span} has its own horizontal scale.`;
  parts.push(text(left, roofY + voidDepth + 58, note, { size: 9, fill: INK.muted, italic: true }));
  if (s && s.anchorLayer === null) {
    parts.push(text(left, roofY + voidDepth + 72, 'No anchorage credited: the anchorage zone crosses an interface.', { size: 10, weight: 'bold', fill: PALETTE.vermillion }));
  }

  const legendItems = [
    { label: 'bolt (plate at the roof line)', kind: 'line' as const, style: { color: INK.axis, dash: null, marker: 'plus' as const } },
    { label: 'anchorage zone (thick end)', kind: 'swatch' as const, fill: INK.axis, style: { color: INK.axis, dash: null, marker: 'square' as const } },
    { label: 'suspended layer (diagonal hatch)', kind: 'swatch' as const, fill: `url(#${ID}hang)`, style: { color: INK.axis, dash: null, marker: 'square' as const } },
    { label: 'bonded layer (grid hatch)', kind: 'swatch' as const, fill: `url(#${ID}bond)`, style: { color: INK.axis, dash: null, marker: 'square' as const } },
  ];
  parts.push(legend(legendItems, left, height - 28, 230, 2));

  const desc =
    `${xs.length} bolt${xs.length === 1 ? '' : 's'} across a ${formatValue(len.convert(span))} ${len.unit} span at ${formatValue(len.convert(bolts.spacingAcross_m))} ${len.unit}, ` +
    `${formatValue(len.convert(bolts.length_m))} ${len.unit} long with ${formatValue(len.convert(bolts.anchorage_m))} ${len.unit} anchorage (${action}). ` +
    (anchor !== null ? `Anchored in layer ${anchor + 1} ${layers[anchor].name}. ` : s ? 'No anchorage credited. ' : '') +
    (suspended.size ? `Suspended: ${[...suspended].map((i) => `${i + 1} ${layers[i].name}`).join(', ')}. ` : '') +
    (bonded.size ? `Bonded (${credited ? 'credited' : 'not credited'}): ${[...bonded].sort((p, q) => p - q).map((i) => `${i + 1} ${layers[i].name}`).join(', ')}.` : '');
  return svgDocument({ width, height, title, desc, defs: patternDefs(), body: parts.join(''), className: 'lamina-chart support-bolts' });
}
