/**
 * The strata column: the roof layers drawn to scale vertically (layers[0] at the bottom, just
 * above the opening), hatched by rock class, with the opening (or the overhang of a cantilever)
 * below, the bending groups bracketed and any predicted bed separation marked.
 */
import { scaleLinear } from 'd3-scale';
import type { Analysis } from '../../analysis/types';
import type { UnitSystem } from '../../model/units';
import type { Project, RockClass } from '../../model/types';
import { ID, INK, PALETTE, axis, axisLabel, dimension, displayUnit, emptyNote, escapeXml, formatValue, legend, line, num, svgDocument, text } from './svg';

export interface StrataColumnOptions {
  units: UnitSystem;
  width?: number;
  height?: number;
}

const ROCK_CLASSES: RockClass[] = ['sedimentary', 'igneous', 'metamorphic'];

/** Inline hatch patterns, one per rock class (bedding lines, crosses, wavy foliation). */
function patternDefs(): string {
  return (
    `<pattern id="${ID}rock-sedimentary" patternUnits="userSpaceOnUse" width="16" height="8">` +
    `<rect width="16" height="8" fill="#fbf3dc"/><path d="M0,4H16M4,8V4M12,4V0" stroke="#8a7a50" stroke-width="0.7" fill="none"/></pattern>` +
    `<pattern id="${ID}rock-igneous" patternUnits="userSpaceOnUse" width="12" height="12">` +
    `<rect width="12" height="12" fill="#f5e8ef"/><path d="M3,1V5M1,3H5M9,7V11M7,9H11" stroke="#7d4f68" stroke-width="0.8" fill="none"/></pattern>` +
    `<pattern id="${ID}rock-metamorphic" patternUnits="userSpaceOnUse" width="16" height="8">` +
    `<rect width="16" height="8" fill="#e4f0f7"/><path d="M0,4Q4,1 8,4T16,4" stroke="#3f6a85" stroke-width="0.7" fill="none"/></pattern>` +
    `<pattern id="${ID}pillar" patternUnits="userSpaceOnUse" width="8" height="8" patternTransform="rotate(45)">` +
    `<rect width="8" height="8" fill="${INK.rock}"/><path d="M0,0V8" stroke="#9a9a9a" stroke-width="1"/></pattern>`
  );
}

/**
 * SVG string of the strata column of `project`. With `analysis`, brackets the bending groups
 * ("group 1", …) and marks each predicted bed separation (`analysis.separations`).
 * Layer rectangles carry `class="layer"`, `data-layer` and their heights are proportional to the
 * thicknesses (one vertical scale). The span is drawn to its own horizontal scale, as stated.
 */
export function strataColumnSvg(project: Project, analysis: Analysis | null, options: StrataColumnOptions): string {
  const width = options.width ?? 640;
  const height = options.height ?? 460;
  const len = displayUnit('length', options.units);
  const press = displayUnit('pressure', options.units);
  const stress = displayUnit('stress', options.units);
  const layers = project.layers;
  const opening = project.opening;
  const title = `Strata column${project.title ? ': ' + project.title : ''}`;
  if (layers.length === 0) {
    return svgDocument({ width, height, title, desc: 'No layers to draw.', body: emptyNote(width, height, 'No layers'), className: 'lamina-chart strata-column' });
  }

  const thick = layers.map((l) => (Number.isFinite(l.thickness_m) && l.thickness_m > 0 ? l.thickness_m : 0));
  const total = thick.reduce((a, b) => a + b, 0) || 1;
  const left = 78;
  const right = Math.min(width - 270, 400);
  const top = 52;
  const roofY = height - 130;
  const voidDepth = 56;
  const y = scaleLinear().domain([0, len.convert(total)]).range([roofY, top]);
  const k = (roofY - top) / total; // px per metre, vertical
  const base: number[] = [];
  thick.reduce((acc, t, i) => ((base[i] = acc), acc + t), 0);

  const parts: string[] = [];
  parts.push(text(12, 20, title, { size: 13, weight: 'bold' }));
  parts.push(axis({ scale: y, orient: 'left', at: left - 6, label: axisLabel('Height above the roof line', len.unit), ticks: 6 }));

  // Opening / overhang geometry (horizontal scale of its own).
  const cantilever = opening.type === 'cantilever';
  const faceX = cantilever ? left + (right - left) * 0.35 : 0;
  const spanX0 = cantilever ? faceX : left + (right - left) * 0.18;
  const spanX1 = cantilever ? right : right - (right - left) * 0.18;
  if (cantilever) {
    parts.push(`<rect x="${num(left)}" y="${num(roofY)}" width="${num(faceX - left)}" height="${num(voidDepth)}" fill="url(#${ID}pillar)" stroke="${INK.axis}" stroke-width="0.8"/>`);
    parts.push(text((left + faceX) / 2, roofY + voidDepth / 2 + 4, 'rock face', { anchor: 'middle', size: 10 }));
    parts.push(`<rect x="${num(faceX)}" y="${num(roofY)}" width="${num(right - faceX)}" height="${num(voidDepth)}" fill="#ffffff" stroke="${INK.muted}" stroke-width="0.8" stroke-dasharray="4 3"/>`);
    parts.push(text((faceX + right) / 2, roofY + voidDepth / 2 + 4, 'open below the overhang', { anchor: 'middle', size: 10, fill: INK.muted }));
  } else {
    parts.push(`<rect x="${num(left)}" y="${num(roofY)}" width="${num(spanX0 - left)}" height="${num(voidDepth)}" fill="url(#${ID}pillar)" stroke="${INK.axis}" stroke-width="0.8"/>`);
    parts.push(`<rect x="${num(spanX1)}" y="${num(roofY)}" width="${num(right - spanX1)}" height="${num(voidDepth)}" fill="url(#${ID}pillar)" stroke="${INK.axis}" stroke-width="0.8"/>`);
    parts.push(`<rect x="${num(spanX0)}" y="${num(roofY)}" width="${num(spanX1 - spanX0)}" height="${num(voidDepth)}" fill="#ffffff" stroke="${INK.muted}" stroke-width="0.8" stroke-dasharray="4 3"/>`);
    const what = opening.type === 'slab' ? 'opening (slab roof)' : 'opening';
    parts.push(text((spanX0 + spanX1) / 2, roofY + voidDepth / 2 + 4, what, { anchor: 'middle', size: 10, fill: INK.muted }));
  }
  const spanWord = cantilever ? 'overhang' : opening.type === 'slab' ? 'span (short side)' : 'span';
  let spanText = `${spanWord} ${formatValue(len.convert(opening.span_m))} ${len.unit}`;
  if (opening.type === 'slab' && opening.length_m !== null && Number.isFinite(opening.length_m)) {
    spanText += ` × length ${formatValue(len.convert(opening.length_m))} ${len.unit}`;
  }
  if (!cantilever) spanText += `, ${opening.ends} ends`;
  parts.push(dimension(spanX0, roofY + voidDepth + 12, spanX1, roofY + voidDepth + 12, spanText, { x: (spanX0 + spanX1) / 2, y: roofY + voidDepth + 26 }));
  parts.push(text(left, roofY + voidDepth + 44, `Thicknesses to scale; the ${cantilever ? 'overhang' : 'span'} is drawn to its own horizontal scale.`, { size: 9, fill: INK.muted, italic: true }));

  // Layers, to scale.
  const layerX0 = cantilever ? left : left;
  layers.forEach((layer, i) => {
    const yTop = roofY - (base[i] + thick[i]) * k;
    const h = thick[i] * k;
    const cls = ROCK_CLASSES.includes(layer.rockClass) ? layer.rockClass : 'sedimentary';
    parts.push(
      `<rect class="layer" data-layer="${i}" x="${num(layerX0)}" y="${num(yTop)}" width="${num(right - layerX0)}" height="${num(h)}" ` +
        `fill="url(#${ID}rock-${cls})" stroke="${INK.axis}" stroke-width="0.8"><title>${escapeXml(`${layer.name}: ${formatValue(len.convert(layer.thickness_m))} ${len.unit}, ${cls}`)}</title></rect>`,
    );
  });

  if (thick[0] * k >= 12) {
    parts.push(
      `<text x="${num(right - 6)}" y="${num(roofY - 4)}" font-size="9" text-anchor="end" stroke="#ffffff" stroke-width="3" paint-order="stroke">immediate roof</text>`,
    );
  }

  // Loads: surcharge arrows on top, horizontal stress note.
  if (project.loads.surcharge_kPa > 0) {
    const yT = top - 2;
    for (const fx of [0.2, 0.5, 0.8]) {
      const x = left + (right - left) * fx;
      parts.push(line(x, yT - 16, x, yT, INK.axis, 1, null, `marker-end="url(#${ID}arrow)"`));
    }
    parts.push(text(left + (right - left) * 0.5 + 6, yT - 20, `surcharge ${formatValue(press.convert(project.loads.surcharge_kPa))} ${press.unit}`, { size: 10 }));
  }
  const notes: string[] = [];
  if (project.loads.horizontalStress_MPa > 0) notes.push(`horizontal stress ${formatValue(stress.convert(project.loads.horizontalStress_MPa))} ${stress.unit}`);
  if (project.support.standing_kPa > 0) notes.push(`standing support ${formatValue(press.convert(project.support.standing_kPa))} ${press.unit}`);
  if (notes.length) parts.push(text(12, 36, `Loads: ${notes.join('; ')}`, { size: 10 }));

  // Bending groups.
  const bracketX = right + 10;
  const labelX = right + (analysis ? 84 : 24);
  if (analysis) {
    // Group ranges: the analysis' group list, or the report's per-layer group numbers.
    const ranges: Array<[number, number]> = [];
    if (analysis.groups && analysis.groups.length > 0) {
      for (const g of analysis.groups) ranges.push([g.first, g.last]);
    } else {
      analysis.report.layers.forEach((l, i) => {
        const g = Number.isFinite(l.group) ? l.group : 0;
        const r = ranges[g];
        ranges[g] = r ? [Math.min(r[0], i), Math.max(r[1], i)] : [i, i];
      });
    }
    ranges.forEach((range, g) => {
      if (!range) return;
      const lo = Math.max(0, Math.min(range[0], layers.length - 1));
      const hi = Math.max(lo, Math.min(range[1], layers.length - 1));
      const yB = roofY - base[lo] * k - 1.5;
      const yT = roofY - (base[hi] + thick[hi]) * k + 1.5;
      parts.push(`<path class="group" d="M${num(bracketX)},${num(yT)}H${num(bracketX + 6)}V${num(yB)}H${num(bracketX)}" fill="none" stroke="${INK.axis}" stroke-width="1.2"/>`);
      parts.push(text(bracketX + 10, (yT + yB) / 2 + 3.5, `group ${g + 1}`, { size: 10 }));
    });
    for (const [below, above] of analysis.separations) {
      if (!(below >= 0 && below < layers.length && above >= 0 && above < layers.length)) continue;
      const yI = roofY - (base[below] + thick[below]) * k;
      parts.push(`<g class="separation">${line(layerX0, yI, right, yI, PALETTE.vermillion, 2.5, '7 3')}`);
      for (const fx of [0.3, 0.7]) {
        const x = left + (right - left) * fx;
        parts.push(`<path d="M${num(x - 5)},${num(yI - 4)}L${num(x)},${num(yI + 1)}L${num(x + 5)},${num(yI - 4)}" fill="none" stroke="${PALETTE.vermillion}" stroke-width="1.2"/>`);
      }
      parts.push(
        `<text x="${num(left + 6)}" y="${num(yI - 5)}" font-size="10" font-weight="bold" fill="${PALETTE.vermillion}" stroke="#ffffff" stroke-width="3" paint-order="stroke">` +
          `${escapeXml(`bed separation (${layers[below].name} / ${layers[above].name})`)}</text></g>`,
      );
    }
  }

  // Layer labels with simple collision avoidance (two lines each, bottom-up).
  const lineGap = 26;
  const wanted = layers.map((_, i) => roofY - (base[i] + thick[i] / 2) * k);
  const placed: number[] = [];
  for (let i = 0; i < layers.length; i++) {
    let yl = wanted[i];
    if (i > 0 && placed[i - 1] - yl < lineGap) yl = placed[i - 1] - lineGap;
    placed.push(yl);
  }
  const overflow = top + 6 - placed[placed.length - 1];
  if (overflow > 0) for (let i = 0; i < placed.length; i++) placed[i] += overflow;
  layers.forEach((layer, i) => {
    const yl = placed[i];
    parts.push(`<path d="M${num(right)},${num(wanted[i])}L${num(labelX - 4)},${num(yl)}" fill="none" stroke="${INK.muted}" stroke-width="0.6"/>`);
    const full = layer.name || `layer ${i + 1}`;
    // Long names are shortened on the drawing; the full name is in the layer's tooltip and the description.
    const name = full.length > 28 ? full.slice(0, 27) + '…' : full;
    parts.push(text(labelX, yl - 1, name, { size: 11, weight: 'bold' }));
    parts.push(text(labelX, yl + 11, `t = ${formatValue(len.convert(layer.thickness_m))} ${len.unit} · ${layer.rockClass}`, { size: 10, fill: INK.muted }));
  });

  // Rock-class legend (pattern + word).
  const used = ROCK_CLASSES.filter((c) => layers.some((l) => l.rockClass === c));
  parts.push(
    legend(
      used.map((c) => ({ label: c, kind: 'swatch' as const, fill: `url(#${ID}rock-${c})`, style: { color: INK.axis, dash: null, marker: 'square' as const } })),
      left,
      height - 16,
      110,
      3,
    ),
  );

  const groupCount = analysis ? (analysis.groups?.length || new Set(analysis.report.layers.map((l) => l.group)).size) : 0;
  const desc =
    `${layers.length} layer${layers.length === 1 ? '' : 's'}, total ${formatValue(len.convert(total))} ${len.unit}, ` +
    `over a ${opening.type} opening, ${spanText}. From the roof upward: ` +
    layers.map((l) => `${l.name} ${formatValue(len.convert(l.thickness_m))} ${len.unit}`).join(', ') +
    '.' +
    (analysis ? ` ${groupCount} bending group${groupCount === 1 ? '' : 's'}; ${analysis.separations.length} predicted bed separation${analysis.separations.length === 1 ? '' : 's'}.` : '');
  return svgDocument({ width, height, title, desc, defs: patternDefs(), body: parts.join(''), className: 'lamina-chart strata-column' });
}
