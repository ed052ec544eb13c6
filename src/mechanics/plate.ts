/**
 * Rectangular roof slab: Kirchhoff thin plate a × b (a = short side) under uniform load q.
 * Returns the dimensionless coefficients of METHODS §4,
 *   σmax = β q a²/t²   (largest principal bending stress anywhere, on either face)
 *   w_max = α q a⁴/(E t³),
 * so β = 6 M_max/(q a²) and α = 12(1−ν²)·w_max D/(q a⁴) with D = E t³/(12(1−ν²)).
 * Sources: Timoshenko & Woinowsky-Krieger (1959), Theory of Plates and Shells, ch. 5–6;
 * Roark's Formulas for Stress and Strain, Table 11.4 (check values in the tests).
 *
 * Method (computed, not looked up): Ritz energy method with tensor products of Legendre
 * polynomial combinations that meet each edge's geometric conditions (see `plate-ritz.ts`,
 * `plate-basis.ts`). Edges may each be 'clamped' (w = 0, ∂w/∂n = 0), 'simple' (w = 0) or
 * 'free' (no geometric condition; zero moment and shear arise naturally from the energy).
 * When the two edges of a side are alike only the even functions are used (exact by symmetry).
 * The basis is enlarged level by level (short side: L even terms, long side ⌈L·√(b/a)⌉) until
 * β and α change by less than `accuracy` over the last three levels (at least three are
 * solved); `errorEstimate` is the larger of the last two relative changes of β. For this
 * spectrally convergent method it bounds the error of the finest level with a margin (the
 * tests check it against Navier and Lévy series). Growth stops at level 22 or 800 unknowns;
 * the estimate then exceeds `accuracy` and `method` says "NOT converged".
 * The maximum stress is found on a grid over the whole plate and polished by a bounded
 * compass search; edge midpoints, the centre and corners are exact grid nodes. It is the
 * maximum anywhere, so it may sit off the symmetry points: at the corners of a simply
 * supported plate with small ν (twisting moment, both faces in tension), or ≈ 1.3 a from the
 * short edges along the long edge of a long clamped plate (the edge moment overshoots the
 * strip value by ≈ 0.4%).
 * Free edges are accepted, but next to a clamped–free corner the stress converges slowly
 * (nearly singular corner field), so expect a larger error estimate there.
 *
 * Sign convention of the stress field: each value is the magnitude of the larger principal
 * bending stress coefficient |σ| t²/(q a²) at that point, which is the tension on one face;
 * `faces` says which: 'bottom' where the plate sags (e.g. the centre), 'top' where it hogs
 * (e.g. along a clamped edge). Coordinates are in units of a, origin at a corner, x along the
 * long side (0 … b/a), y along the short side (0 … 1); row-major, index j·nx + i.
 *
 *     plateCoefficients({ aspect: 1, edges: 'clamped', poisson: 0.3 }).beta // ≈ 0.3080
 *     plateCoefficients({ aspect: 2, edges: 'simple', poisson: 0.3 }).alpha // ≈ 0.1106
 */
import type { EndFixity } from './plate-basis';
import { type PlateFieldValues, type PlateSupports, type RitzPlate, plateAtPoint, plateFieldAt, solvePlateRitz } from './plate-ritz';

export type EdgeSupport = 'clamped' | 'simple' | 'free';

/** One support for both edges of a side, or [first, second]: long edges [y = 0, y = a], short edges [x = 0, x = b]. */
export type EdgePair = EdgeSupport | readonly [EdgeSupport, EdgeSupport];

export interface PlateEdges {
  shortEdges: EdgePair;
  longEdges: EdgePair;
}

export interface PlateInput {
  /** b/a ≥ 1. */
  aspect: number;
  edges: 'clamped' | 'simple' | PlateEdges;
  poisson: number;
  /** Relative accuracy on β and α, default 0.005. */
  accuracy?: number;
}

export interface PlateField {
  nx: number;
  ny: number;
  /** Node positions in units of a: x along the long side, y along the short side. */
  x: number[];
  y: number[];
  /** |σ| t²/(q a²) of the larger principal stress, row-major (j·nx + i). */
  values: number[];
  /** Face in tension at each node, same indexing. */
  faces: Array<'top' | 'bottom'>;
}

export interface PlateCoefficients {
  /** σmax = β q a²/t², largest principal bending stress anywhere on the plate. */
  beta: number;
  /** w_max = α q a⁴/(E t³). */
  alpha: number;
  /** Where σmax occurs: 'middle of long edge' | 'centre' | 'middle of short edge' | 'corner' | … */
  at: string;
  /** Position of σmax in units of a (x along the long side, y along the short side). */
  location: { x: number; y: number };
  /** Face in tension at σmax (for a pure twist, as at a simply supported corner, both are; 'bottom' is given). */
  face: 'top' | 'bottom';
  /** Short-direction stress at the centre, σ t²/(q a²), positive = bottom face in tension. */
  betaCentre: number;
  /** Relative error estimate on beta (larger of the changes over the last three basis levels). */
  errorEstimate: number;
  /** Same for alpha. */
  alphaErrorEstimate: number;
  field: PlateField;
  /** One-line description including basis size. */
  method: string;
}

const FIXITY: Record<EdgeSupport, EndFixity> = { free: 0, simple: 1, clamped: 2 };
/** Largest b/a solved; a longer plate has reached its plane-strain strip limit (see `stripAspect`). */
export const MAX_ASPECT = 100;
const MAX_LEVEL = 22;
const FIRST_LEVEL = 3;
const MAX_UNKNOWNS = 800;

function pair(p: EdgePair, name: string): readonly [EdgeSupport, EdgeSupport] {
  const both = typeof p === 'string' ? ([p, p] as const) : p;
  if (!Array.isArray(both) || both.length !== 2) throw new RangeError(`edges.${name} must be an edge support or a pair of them`);
  for (const e of both) if (!(e in FIXITY)) throw new RangeError(`edges.${name}: unknown edge support '${String(e)}'`);
  return both;
}

/** Edge supports as end fixities of the x span (short edges) and y span (long edges). */
export function plateSupports(edges: PlateInput['edges']): PlateSupports {
  const e: PlateEdges = typeof edges === 'string' ? { shortEdges: edges, longEdges: edges } : edges;
  if (typeof e !== 'object' || e === null) throw new RangeError(`edges must be 'clamped', 'simple' or { shortEdges, longEdges }`);
  const s = pair(e.shortEdges, 'shortEdges');
  const l = pair(e.longEdges, 'longEdges');
  const all = [...s, ...l];
  const clamped = all.filter((x) => x === 'clamped').length;
  const simple = all.filter((x) => x === 'simple').length;
  if (!(clamped >= 1 || simple >= 2)) {
    throw new RangeError(`edges: the plate can move as a rigid body (needs one clamped edge or two supported edges), got ${all.join(', ')}`);
  }
  return { x: [FIXITY[s[0]], FIXITY[s[1]]], y: [FIXITY[l[0]], FIXITY[l[1]]] };
}

function validate(input: PlateInput): { aspect: number; poisson: number; accuracy: number } {
  const { aspect, poisson } = input;
  const accuracy = input.accuracy ?? 0.005;
  if (!(aspect >= 1 && aspect <= MAX_ASPECT)) throw new RangeError(`aspect (b/a) must be between 1 and ${MAX_ASPECT}, got ${aspect}`);
  if (!(poisson > -1 && poisson < 0.5)) throw new RangeError(`poisson must be > −1 and < 0.5, got ${poisson}`);
  if (!(accuracy >= 1e-7 && accuracy <= 0.1)) throw new RangeError(`accuracy must be between 1e-7 and 0.1, got ${accuracy}`);
  return { aspect: Math.round(aspect * 1e6) / 1e6, poisson, accuracy };
}

/** Basis sizes at a level: L terms across the short side, ⌈L√(b/a)⌉ along the long side, doubled for an unlike pair of edges. */
function counts(supports: PlateSupports, aspect: number, level: number): [number, number] {
  const cy = supports.y[0] === supports.y[1] ? level : 2 * level;
  const lx = Math.ceil(level * Math.sqrt(aspect));
  const cx = supports.x[0] === supports.x[1] ? lx : 2 * lx;
  return [cx, cy];
}

/** Larger principal moment magnitude |mean| + radius (allocation-free: the search's hot path). */
function principalValue(mx: number, my: number, mxy: number): number {
  return Math.abs((mx + my) / 2) + Math.hypot((mx - my) / 2, mxy);
}

/** Sign of the larger principal moment: +1 sagging (bottom tension), −1 hogging (top). */
function principalSign(mx: number, my: number): number {
  return mx + my >= 0 ? 1 : -1;
}

type Measure = (sol: RitzPlate, x: number, y: number) => number;

const scratch = new Float64Array(4);
const stressAt: Measure = (sol, x, y) => {
  plateAtPoint(sol, x, y, scratch);
  return principalValue(scratch[1], scratch[2], scratch[3]);
};
const deflectionAt: Measure = (sol, x, y) => {
  plateAtPoint(sol, x, y, scratch);
  return Math.abs(scratch[0]);
};

function grid(n: number, length: number): number[] {
  return Array.from({ length: n }, (_, i) => (i * length) / (n - 1));
}

/**
 * Largest value of a measure: grid scan (odd node counts, so edge middles, the centre and
 * corners are nodes), compass search from the three largest local maxima of the grid. A named
 * point (edge middle, centre, corner) within `tie` (relative) of the maximum is reported instead,
 * so a flat maximum is not placed at a discretisation ripple.
 */
function maximise(sol: RitzPlate, measure: Measure, kind: 'stress' | 'deflection', tie: number): { value: number; x: number; y: number } {
  const b = sol.aspect;
  // Where both ends of a side are alike the field is symmetric about the middle of that side:
  // scan one half (the middle line is a node, and the spacing is that of the full grid).
  const symX = sol.bx.ends[0] === sol.bx.ends[1];
  const symY = sol.by.ends[0] === sol.by.ends[1];
  const nxFull = 2 * Math.ceil(12 * Math.sqrt(b)) + 1;
  const nx = symX ? (nxFull + 1) / 2 : nxFull;
  const ny = symY ? 13 : 25;
  const xs = grid(nx, symX ? b / 2 : b);
  const ys = grid(ny, symY ? 0.5 : 1);
  const f = fieldOf(sol, xs, ys, `search ${nx}×${ny}`);
  const vals = new Float64Array(nx * ny);
  for (let k = 0; k < vals.length; k++) vals[k] = kind === 'stress' ? principalValue(f.mx[k], f.my[k], f.mxy[k]) : Math.abs(f.w[k]);
  const peaks: number[] = [];
  for (let r = 0; r < ny; r++) {
    for (let s = 0; s < nx; s++) {
      const v = vals[r * nx + s];
      let top = true;
      for (let dr = -1; dr <= 1 && top; dr++) {
        for (let ds = -1; ds <= 1; ds++) {
          const rr = r + dr;
          const ss = s + ds;
          if ((dr || ds) && rr >= 0 && rr < ny && ss >= 0 && ss < nx && vals[rr * nx + ss] > v) { top = false; break; }
        }
      }
      if (top) peaks.push(r * nx + s);
    }
  }
  peaks.sort((p, q) => vals[q] - vals[p]);
  let best = { value: -Infinity, x: 0, y: 0 };
  for (const k of peaks.slice(0, 3)) {
    if (vals[k] < 0.95 * vals[peaks[0]]) break;
    let x = xs[k % nx];
    let y = ys[Math.floor(k / nx)];
    let v = vals[k];
    let hx = b / (nxFull - 1);
    let hy = 1 / 24;
    while (hy > 2e-5) {
      let moved = false;
      for (const [dx, dy] of [[hx, 0], [-hx, 0], [0, hy], [0, -hy]]) {
        const xt = Math.min(b, Math.max(0, x + dx));
        const yt = Math.min(1, Math.max(0, y + dy));
        const vt = measure(sol, xt, yt);
        if (vt > v * (1 + 1e-12)) {
          x = xt; y = yt; v = vt; moved = true;
          break;
        }
      }
      if (!moved) { hx /= 2; hy /= 2; }
    }
    if (v > best.value) best = { value: v, x, y };
  }
  const named: Array<[number, number]> = [[b / 2, 0], [b / 2, 1], [b / 2, 0.5], [0, 0.5], [b, 0.5], [0, 0], [b, 0], [0, 1], [b, 1]];
  for (const [x, y] of named) {
    if (measure(sol, x, y) >= best.value * (1 - tie)) return { value: best.value, x, y };
  }
  return best;
}

function describe(x: number, y: number, aspect: number, supports: PlateSupports): string {
  const tol = 1e-6;
  const onLong = y < tol || y > 1 - tol;
  const onShort = x < tol * aspect || x > aspect * (1 - tol);
  const midX = Math.abs(x - aspect / 2) < tol * aspect;
  const midY = Math.abs(y - 0.5) < tol;
  const longSide = supports.y[0] === supports.y[1] ? '' : y < 0.5 ? ' (y = 0)' : ' (y = a)';
  const shortSide = supports.x[0] === supports.x[1] ? '' : x < aspect / 2 ? ' (x = 0)' : ' (x = b)';
  if (onLong && onShort) return 'corner';
  if (onLong && midX) return `middle of long edge${longSide}`;
  if (onShort && midY) return `middle of short edge${shortSide}`;
  if (midX && midY) return 'centre';
  if (onLong) return `long edge${longSide} at x = ${(x / aspect).toFixed(3)} b`;
  if (onShort) return `short edge${shortSide} at y = ${y.toFixed(3)} a`;
  return `interior at x = ${(x / aspect).toFixed(3)} b, y = ${y.toFixed(3)} a`;
}

interface LevelResult {
  sol: RitzPlate;
  beta: number;
  alpha: number;
  stressMax: { value: number; x: number; y: number };
  level: number;
}

/**
 * Solved Ritz systems that do not depend on ν, by aspect, edges and level. With every edge
 * clamped or simply supported the basis vanishes on the edges, so ∫X″X = −∫X′X′ exactly and
 * the ν terms of the stiffness, ν(B⊗Bᵀ + Bᵀ⊗B) − 2ν A1⊗A1, cancel: the deflection is the same
 * for every ν (the known result for plates with w = 0 on straight edges; Timoshenko &
 * Woinowsky-Krieger 1959, §10) and only the moments change with ν. Layers of one slab that
 * differ only in ν then share one solve per level. Bounded (oldest dropped first).
 */
const solutions = new Map<string, RitzPlate>();
const SOLUTION_CACHE_SIZE = 64;
/** A ν-specific view of a shared solution → the shared (ν = 0) solution. */
const baseOf = new WeakMap<RitzPlate, RitzPlate>();
/** Fields of a shared solution at ν = 0 on a named grid, and its deflection maximum per tie. */
const baseFields = new WeakMap<RitzPlate, Map<string, PlateFieldValues>>();
const baseDeflection = new WeakMap<RitzPlate, Map<number, { value: number; x: number; y: number }>>();

/**
 * The field on the grid xs × ys. For a view of a shared solution it is built from the shared
 * ν = 0 field, computed once per grid: with Mx⁰ = −w_xx, My⁰ = −w_yy, Mxy⁰ = −w_xy,
 * Mx = Mx⁰ + ν My⁰, My = My⁰ + ν Mx⁰, Mxy = (1 − ν) Mxy⁰ (same w for every ν, see `solutions`).
 */
function fieldOf(sol: RitzPlate, xs: number[], ys: number[], grid: string): PlateFieldValues {
  const base = baseOf.get(sol);
  if (!base) return plateFieldAt(sol, xs, ys);
  let fields = baseFields.get(base);
  if (!fields) {
    fields = new Map();
    baseFields.set(base, fields);
  }
  let f0 = fields.get(grid);
  if (!f0) {
    f0 = plateFieldAt(base, xs, ys);
    fields.set(grid, f0);
  }
  const nu = sol.poisson;
  const n = f0.w.length;
  const mx = new Float64Array(n);
  const my = new Float64Array(n);
  const mxy = new Float64Array(n);
  for (let k = 0; k < n; k++) {
    mx[k] = f0.mx[k] + nu * f0.my[k];
    my[k] = f0.my[k] + nu * f0.mx[k];
    mxy[k] = (1 - nu) * f0.mxy[k];
  }
  return { w: f0.w, mx, my, mxy };
}

function solveLevel(aspect: number, poisson: number, supports: PlateSupports, level: number, tie: number): LevelResult {
  const [cx, cy] = counts(supports, aspect, level);
  const shareable = [...supports.x, ...supports.y].every((e) => e !== 0);
  let sol: RitzPlate;
  if (shareable) {
    const key = `${aspect}|${supports.x.join(',')}|${supports.y.join(',')}|${level}`;
    let base = solutions.get(key);
    if (!base) {
      base = solvePlateRitz(aspect, 0, supports, cx, cy);
      if (solutions.size >= SOLUTION_CACHE_SIZE) solutions.delete(solutions.keys().next().value as string);
      solutions.set(key, base);
    }
    sol = { ...base, poisson };
    baseOf.set(sol, base);
  } else {
    sol = solvePlateRitz(aspect, poisson, supports, cx, cy);
  }
  const stressMax = maximise(sol, stressAt, 'stress', tie);
  const wMax = deflectionMaximum(sol, tie);
  return { sol, beta: 6 * stressMax.value, alpha: 12 * (1 - poisson * poisson) * wMax.value, stressMax, level };
}

/** Largest deflection; the same for every view of a shared solution (w does not depend on ν). */
function deflectionMaximum(sol: RitzPlate, tie: number): { value: number; x: number; y: number } {
  const base = baseOf.get(sol);
  if (!base) return maximise(sol, deflectionAt, 'deflection', tie);
  let byTie = baseDeflection.get(base);
  if (!byTie) {
    byTie = new Map();
    baseDeflection.set(base, byTie);
  }
  let hit = byTie.get(tie);
  if (!hit) {
    hit = maximise(base, deflectionAt, 'deflection', tie);
    byTie.set(tie, hit);
  }
  return hit;
}

/**
 * β, α and centre stress at one fixed basis level (no adaptivity, no cache): for convergence
 * studies. Level L uses L terms across the short side and ⌈L√(b/a)⌉ along the long side.
 *     plateAtLevel({ aspect: 1, edges: 'simple', poisson: 0.3 }, 6).beta // ≈ 0.2873
 */
export function plateAtLevel(input: PlateInput, level: number): { beta: number; alpha: number; betaCentre: number; unknowns: number } {
  if (!(Number.isInteger(level) && level >= 1 && level <= 40)) throw new RangeError(`level must be an integer 1..40, got ${level}`);
  const { aspect, poisson } = validate(input);
  const supports = plateSupports(input.edges);
  const r = solveLevel(aspect, poisson, supports, level, 1e-9);
  const c = plateFieldAt(r.sol, [aspect / 2], [0.5]);
  return { beta: r.beta, alpha: r.alpha, betaCentre: 6 * c.my[0], unknowns: r.sol.unknowns };
}

function edgeKey(edges: PlateInput['edges']): string {
  if (typeof edges === 'string') return edges;
  const p = (e: EdgePair) => (typeof e === 'string' ? `${e},${e}` : e.join(','));
  return `s:${p(edges.shortEdges)};l:${p(edges.longEdges)}`;
}

const cache = new Map<string, PlateCoefficients>();
/** Results kept (oldest dropped first), so that a long run over many slabs stays bounded. */
const CACHE_SIZE = 512;

/** Empty the result caches (for benchmarks and tests). */
export function clearPlateCache(): void {
  cache.clear();
  solutions.clear();
}

/** Plate coefficients for the input (see the module doc); cached, result frozen. */
export function plateCoefficients(input: PlateInput): PlateCoefficients {
  const { aspect, poisson, accuracy } = validate(input);
  const supports = plateSupports(input.edges);
  const key = `${aspect}|${edgeKey(input.edges)}|${poisson}|${accuracy}`;
  const hit = cache.get(key);
  if (hit) return hit;
  const tie = accuracy / 20;

  // Three levels at least; the estimate is the larger of the last two changes, so that one
  // accidental near-coincidence of two levels cannot pass for convergence.
  const levels = [FIRST_LEVEL, FIRST_LEVEL + 1, FIRST_LEVEL + 2].map((l) => solveLevel(aspect, poisson, supports, l, tie));
  const change = (key: 'beta' | 'alpha') => {
    const n = levels.length;
    const last = levels[n - 1][key];
    return Math.max(Math.abs(last - levels[n - 2][key]), Math.abs(levels[n - 2][key] - levels[n - 3][key])) / last;
  };
  let eb = change('beta');
  let ea = change('alpha');
  for (;;) {
    const next = levels[levels.length - 1].level + 1;
    const [nx, ny] = counts(supports, aspect, next);
    if ((eb <= accuracy && ea <= accuracy) || next > MAX_LEVEL || nx * ny > MAX_UNKNOWNS) break;
    levels.push(solveLevel(aspect, poisson, supports, next, tie));
    eb = change('beta');
    ea = change('alpha');
  }
  const cur = levels[levels.length - 1];
  const prev = levels[levels.length - 3];

  const { sol, stressMax } = cur;
  const at = plateFieldAt(sol, [stressMax.x], [stressMax.y]);
  const face = principalSign(at.mx[0], at.my[0]) > 0 ? 'bottom' : 'top';
  const centre = plateFieldAt(sol, [aspect / 2], [0.5]);

  // The stress field for contour plots, built on first use (the checks need only β and α).
  let field: PlateField | null = null;
  const buildField = (): PlateField => {
    const fny = 21;
    const fnx = Math.min(401, Math.round(20 * aspect) + 1);
    const fx = grid(fnx, aspect);
    const fy = grid(fny, 1);
    const f = fieldOf(sol, fx, fy, `output ${fnx}×${fny}`);
    const values: number[] = new Array(fnx * fny);
    const faces: Array<'top' | 'bottom'> = new Array(fnx * fny);
    for (let k = 0; k < values.length; k++) {
      values[k] = 6 * principalValue(f.mx[k], f.my[k], f.mxy[k]);
      faces[k] = principalSign(f.mx[k], f.my[k]) > 0 ? 'bottom' : 'top';
    }
    return Object.freeze({
      nx: fnx, ny: fny,
      x: Object.freeze(fx) as number[], y: Object.freeze(fy) as number[],
      values: Object.freeze(values) as number[], faces: Object.freeze(faces) as Array<'top' | 'bottom'>,
    });
  };
  const [cx, cy] = counts(supports, aspect, cur.level);
  const result: PlateCoefficients = {
    beta: cur.beta,
    alpha: cur.alpha,
    at: describe(stressMax.x, stressMax.y, aspect, supports),
    location: Object.freeze({ x: stressMax.x, y: stressMax.y }),
    face,
    betaCentre: 6 * centre.my[0],
    errorEstimate: eb,
    alphaErrorEstimate: ea,
    get field(): PlateField {
      field ??= buildField();
      return field;
    },
    method:
      `Ritz energy method, Legendre basis ${cx} × ${cy} terms (long × short side, degree ${sol.bx.degree} × ${sol.by.degree}, ` +
      `${sol.unknowns} unknowns), level ${cur.level}; largest change over levels ${prev.level}–${cur.level}: β ${(100 * eb).toPrecision(2)}%, α ${(100 * ea).toPrecision(2)}%` +
      (eb > accuracy || ea > accuracy ? ` — NOT converged to ${accuracy}` : ''),
  };
  Object.freeze(result);
  if (cache.size >= CACHE_SIZE) cache.delete(cache.keys().next().value as string);
  cache.set(key, result);
  return result;
}
