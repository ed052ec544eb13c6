/**
 * Helpers for contouring a sampled grid with d3-contour: map grid coordinates (sample i sits at
 * g = i + 0.5) onto possibly non-uniform axis values and screen scales, and pick a label point.
 */
import { range } from 'd3-array';
import { type ContourMultiPolygon } from 'd3-contour';
import { geoPath, geoTransform } from 'd3-geo';
import { scaleLinear } from 'd3-scale';

export interface GridMapping {
  /** Grid coordinate (d3-contour space) → screen point. */
  toScreen: (gx: number, gy: number) => [number, number];
  /** Path generator for contour MultiPolygons, in screen space, 2 decimals. */
  path: (band: ContourMultiPolygon) => string;
}

/**
 * Mapping for a grid whose columns sit at `xs` and rows at `ys` (display units, ascending),
 * drawn with screen scales `sx`, `sy`.
 */
export function gridMapping(xs: number[], ys: number[], sx: (v: number) => number, sy: (v: number) => number): GridMapping {
  const gx = scaleLinear().domain(range(xs.length)).range(xs).clamp(true);
  const gy = scaleLinear().domain(range(ys.length)).range(ys).clamp(true);
  const toScreen = (px: number, py: number): [number, number] => [sx(gx(px - 0.5)), sy(gy(py - 0.5))];
  const projection = geoTransform({
    point(px: number, py: number) {
      const [a, b] = toScreen(px, py);
      this.stream.point(a, b);
    },
  });
  const generator = geoPath(projection).digits(2);
  return { toScreen, path: (band) => generator(band) ?? '' };
}

/**
 * A point for a level label: of the band's ring vertices inside the grid (border points lie on
 * the clip edge; `interiorOnly` false admits them) and accepted by `fits` (e.g. "the label fits
 * inside the plot there"), the one nearest the grid centre; null when there is none.
 */
export function labelPoint(
  band: ContourMultiPolygon,
  nx: number,
  ny: number,
  fits: (gx: number, gy: number) => boolean = () => true,
  interiorOnly = true,
): [number, number] | null {
  let best: [number, number] | null = null;
  let bestD = Infinity;
  const cx = nx / 2;
  const cy = ny / 2;
  for (const poly of band.coordinates) {
    for (const ring of poly) {
      for (const [px, py] of ring) {
        if ((interiorOnly && !(px > 0.6 && px < nx - 0.6 && py > 0.6 && py < ny - 0.6)) || !fits(px, py)) continue;
        const d = ((px - cx) / nx) ** 2 + ((py - cy) / ny) ** 2;
        if (d < bestD) {
          bestD = d;
          best = [px, py];
        }
      }
    }
  }
  return best;
}
