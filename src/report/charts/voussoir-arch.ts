/**
 * The jointed (voussoir) beam: the beam to scale with an exaggerated, stated vertical scale, the
 * compression zones of depth n·t (at the bottom of each abutment and the top of midspan, where
 * the joints stay closed), the parabolic compression arch (thrust line) between them and the
 * lever arm z. After snap-through, a drawing that says no arch can form.
 */
import type { UnitSystem } from '../../model/units';
import { ID, INK, PALETTE, dimension, displayUnit, formatValue, line, num, svgDocument, text } from './svg';

export interface VoussoirArchInput {
  span_m: number;
  thickness_m: number;
  n: number | null;
  leverArm_m: number | null;
  deflection_mm: number | null;
  snapThrough: boolean;
  maxCompression_MPa: number | null;
}

export interface VoussoirArchOptions {
  units: UnitSystem;
  width?: number;
  height?: number;
  title?: string;
}

/** A round exaggeration factor ≤ raw (1, 2, 2.5, 5 × 10^k); below 1 the raw value is kept. */
function niceFactor(raw: number): number {
  if (!(raw >= 1)) return raw > 0 ? raw : 1;
  const p = 10 ** Math.floor(Math.log10(raw));
  for (const m of [5, 2.5, 2, 1]) if (m * p <= raw) return m * p;
  return p;
}

const ok = (v: number | null): v is number => v !== null && Number.isFinite(v);

/** SVG string of the voussoir beam described by `input` (m, mm, MPa; displayed in `units`). */
export function voussoirArchSvg(input: VoussoirArchInput, options: VoussoirArchOptions): string {
  const width = options.width ?? 640;
  const height = options.height ?? (input.snapThrough ? 340 : 270);
  const len = displayUnit('length', options.units);
  const def = displayUnit('deflection', options.units);
  const st = displayUnit('stress', options.units);
  const title = options.title ?? 'Jointed beam (voussoir): compression arch';
  const span = input.span_m > 0 && Number.isFinite(input.span_m) ? input.span_m : 1;
  const t = input.thickness_m > 0 && Number.isFinite(input.thickness_m) ? input.thickness_m : 0.1 * span;

  const left = 70;
  const right = width - 70;
  const kx = (right - left) / span;
  const exaggeration = niceFactor(110 / t / kx);
  const ky = kx * exaggeration;
  const beamTop = 78;
  const beamBot = beamTop + t * ky;
  const xm = (left + right) / 2;
  const sag = input.snapThrough ? Math.min(60, (beamBot - beamTop) * 0.8) : 0;

  const parts: string[] = [];
  parts.push(text(12, 20, title, { size: 13, weight: 'bold' }));
  const scaleNote =
    Math.abs(exaggeration - 1) < 1e-9 ? 'Drawn to true scale.' : `Vertical scale exaggerated ×${formatValue(exaggeration)} relative to the horizontal.`;
  parts.push(text(12, 36, scaleNote, { size: 10, fill: INK.muted, italic: true }));

  // Abutments.
  for (const [x0, w] of [
    [left - 44, 44],
    [right, 44],
  ] as const) {
    parts.push(`<rect x="${num(x0)}" y="${num(beamTop - 22)}" width="${num(w)}" height="${num(beamBot - beamTop + 56 + sag)}" fill="url(#${ID}abut)" stroke="${INK.axis}" stroke-width="0.8"/>`);
  }
  parts.push(text(left - 22, beamBot + sag + 48, 'abutment', { anchor: 'middle', size: 9, fill: INK.muted }));
  parts.push(text(right + 22, beamBot + sag + 48, 'abutment', { anchor: 'middle', size: 9, fill: INK.muted }));
  const dimY = beamBot + 22 + sag;
  parts.push(dimension(left, dimY, right, dimY, `span ${formatValue(len.convert(span))} ${len.unit}`, { x: xm, y: dimY + 16 }));
  parts.push(dimension(left - 52, beamTop, left - 52, beamBot, '', { x: left - 52, y: beamTop }));
  parts.push(text(left - 57, (beamTop + beamBot) / 2, `t = ${formatValue(len.convert(t))} ${len.unit}`, { anchor: 'middle', size: 10, rotate: -90 }));

  const defs =
    `<pattern id="${ID}abut" patternUnits="userSpaceOnUse" width="8" height="8" patternTransform="rotate(45)">` +
    `<rect width="8" height="8" fill="${INK.rock}"/><path d="M0,0V8" stroke="#9a9a9a" stroke-width="1"/></pattern>` +
    `<pattern id="${ID}zone" patternUnits="userSpaceOnUse" width="6" height="6">` +
    `<rect width="6" height="6" fill="#f8deb0"/><circle cx="3" cy="3" r="1" fill="#9a6a00"/></pattern>`;

  if (input.snapThrough) {
    // A sagged pair of blocks meeting below the beam: no thrust line fits inside the depth.
    parts.push(
      `<path class="snapped" d="M${num(left)},${num(beamTop)}L${num(xm)},${num(beamTop + sag)}L${num(right)},${num(beamTop)}L${num(right)},${num(beamBot)}L${num(xm)},${num(beamBot + sag)}L${num(left)},${num(beamBot)}Z" ` +
        `fill="#eeeeee" stroke="${INK.axis}" stroke-width="1" stroke-dasharray="5 3"/>`,
    );
    parts.push(line(xm, beamTop + sag, xm, beamBot + sag, INK.axis, 1));
    const archY = beamBot - 4;
    const ctrlY = beamTop - (beamBot - beamTop) * 0.3;
    const apexY = (archY + ctrlY) / 2;
    parts.push(`<path d="M${num(left)},${num(archY)}Q${num(xm)},${num(ctrlY)} ${num(right)},${num(archY)}" fill="none" stroke="${PALETTE.vermillion}" stroke-width="1.5" stroke-dasharray="4 4"/>`);
    parts.push(line(xm - 14, apexY - 14, xm + 14, apexY + 14, PALETTE.vermillion, 3));
    parts.push(line(xm - 14, apexY + 14, xm + 14, apexY - 14, PALETTE.vermillion, 3));
    parts.push(text(xm, dimY + 42, 'snap-through: no arch can form', { anchor: 'middle', size: 15, weight: 'bold', fill: PALETTE.vermillion }));
    parts.push(text(xm, dimY + 60, 'The shortened arch no longer fits the beam depth at any n; the beam has no voussoir capacity.', { anchor: 'middle', size: 10 }));
    return svgDocument({
      width,
      height,
      title,
      desc: `Voussoir beam of span ${formatValue(len.convert(span))} ${len.unit} and thickness ${formatValue(len.convert(t))} ${len.unit}: snap-through, no compression arch can form.`,
      defs,
      body: parts.join(''),
      className: 'lamina-chart voussoir-arch snap-through',
    });
  }

  parts.push(`<rect class="beam" x="${num(left)}" y="${num(beamTop)}" width="${num(right - left)}" height="${num(beamBot - beamTop)}" fill="#fbf3dc" stroke="${INK.axis}" stroke-width="1"/>`);

  if (!ok(input.n)) {
    parts.push(text(xm, (beamTop + beamBot) / 2 + 4, 'no voussoir result for this layer', { anchor: 'middle', size: 12, fill: INK.muted }));
    return svgDocument({ width, height, title, desc: 'No voussoir result.', defs, body: parts.join(''), className: 'lamina-chart voussoir-arch' });
  }

  const n = Math.min(Math.max(input.n, 0), 1);
  const zoneH = n * t * ky;
  const zoneW = Math.max(14, (right - left) * 0.06);
  const z0 = t * (1 - (2 * n) / 3);
  const z = ok(input.leverArm_m) ? input.leverArm_m : z0;
  // Joints: open at the top over each abutment and at the bottom at midspan.
  parts.push(`<path class="joint" d="M${num(left)},${num(beamTop)}L${num(left + 3)},${num(beamBot - zoneH)}M${num(right)},${num(beamTop)}L${num(right - 3)},${num(beamBot - zoneH)}" stroke="${INK.axis}" stroke-width="1.2" fill="none"/>`);
  parts.push(`<path class="joint" d="M${num(xm - 3)},${num(beamBot)}L${num(xm)},${num(beamTop + zoneH)}L${num(xm + 3)},${num(beamBot)}" stroke="${INK.axis}" stroke-width="1.2" fill="#ffffff"/>`);
  // Compression zones (depth n·t), hatched: bottom of each abutment, top of midspan.
  const zone = (x: number, y: number, w: number) =>
    `<rect class="compression-zone" x="${num(x)}" y="${num(y)}" width="${num(w)}" height="${num(zoneH)}" fill="url(#${ID}zone)" stroke="${PALETTE.orange}" stroke-width="1"/>`;
  parts.push(zone(left, beamBot - zoneH, zoneW));
  parts.push(zone(right - zoneW, beamBot - zoneH, zoneW));
  parts.push(zone(xm - zoneW / 2, beamTop, zoneW));
  // Thrust line: resultant at n·t/3 from the compressed face (triangular zone), rise z.
  const yA = beamBot - (n * t * ky) / 3;
  const yC = yA - z * ky;
  const ctrlY = 2 * yC - yA; // quadratic Bézier whose apex is yC at midspan: a parabola
  parts.push(`<path class="thrust-line" d="M${num(left)},${num(yA)}Q${num(xm)},${num(ctrlY)} ${num(right)},${num(yA)}" fill="none" stroke="${PALETTE.vermillion}" stroke-width="2.5"/>`);
  parts.push(line(xm + 40, yA, xm + 40, yC, INK.axis, 0.8, null, `marker-start="url(#${ID}arrow)" marker-end="url(#${ID}arrow)"`));
  parts.push(line(xm + 30, yA, right - zoneW - 6, yA, INK.muted, 0.6, '2 2'));
  parts.push(line(xm + zoneW / 2 + 2, yC, xm + 50, yC, INK.muted, 0.6, '2 2'));
  parts.push(text(xm + 46, (yA + yC) / 2 + 4, `lever arm z = ${formatValue(len.convert(z))} ${len.unit}`, { size: 10, weight: 'bold' }));

  // Labels.
  parts.push(text(left + zoneW + 6, beamBot - zoneH / 2 + 3, `compression zone, n·t = ${formatValue(len.convert(n * t))} ${len.unit}`, { size: 9 }));
  parts.push(text(left + 4, beamTop - 8, 'compression arch (thrust line), resultant at n·t/3 from the compressed face', { size: 10, fill: PALETTE.vermillion, weight: 'bold' }));
  const facts = [`n = ${formatValue(n)}`];
  if (ok(input.maxCompression_MPa)) facts.push(`max compression fc = ${formatValue(st.convert(input.maxCompression_MPa))} ${st.unit}`);
  if (ok(input.deflection_mm)) facts.push(`midspan deflection δ = ${formatValue(def.convert(input.deflection_mm))} ${def.unit}`);
  parts.push(text(12, height - 14, facts.join(' · '), { size: 10 }));

  const desc =
    `Voussoir beam of span ${formatValue(len.convert(span))} ${len.unit} and thickness ${formatValue(len.convert(t))} ${len.unit}: ` +
    `${facts.join(', ')}, lever arm ${formatValue(len.convert(z))} ${len.unit}. Vertical scale ×${formatValue(exaggeration)}.`;
  return svgDocument({ width, height, title, desc, defs, body: parts.join(''), className: 'lamina-chart voussoir-arch' });
}
