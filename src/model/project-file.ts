/**
 * Reading and writing the project file (`*.lamina.json`) and the file digest shown in the
 * report header. Pure: no I/O, runs in node and in the browser.
 *
 *     const { project, warnings } = readProjectText(text);
 *     writeProjectText(project) // stable key order (DESIGN.md), 2-space indent, trailing newline
 *     projectHash(text)         // "cbf29ce484222325" for ""
 */
import type { Layer, Project, Specimen } from './types';
import { ProjectError, parseProject, type FieldIssue } from './validate';

/**
 * Parse and validate the text of a project file. A JSON syntax error becomes a `ProjectError`
 * with path "" giving the line and column; a leading byte-order mark is ignored.
 */
export function readProjectText(text: string): { project: Project; warnings: FieldIssue[]; migratedFrom?: 'lamina/1' } {
  if (typeof text !== 'string') {
    throw new ProjectError([{ path: '', message: `a project file must be text, got a ${typeof text}`, code: 'JSON' }]);
  }
  const source = text.charCodeAt(0) === 0xfeff ? text.slice(1) : text;
  let raw: unknown;
  try {
    raw = JSON.parse(source);
  } catch (err) {
    throw new ProjectError([{ path: '', message: jsonErrorMessage(source, err), code: 'JSON' }]);
  }
  return parseProject(raw);
}

function jsonErrorMessage(source: string, err: unknown): string {
  if (source.trim() === '') return 'not valid JSON: the file is empty';
  const found = locateJsonError(source);
  if (!found) return `not valid JSON: ${err instanceof Error ? err.message : String(err)}`;
  const before = source.slice(0, found.position);
  const line = before.split('\n').length;
  const column = found.position - before.lastIndexOf('\n');
  return `not valid JSON at line ${line}, column ${column} (position ${found.position}): ${found.reason}`;
}

/**
 * Find the first syntax error in JSON text (the engine's own message does not always give a
 * position). Returns undefined if no error is found. Runs in time and stack linear in the text
 * whatever the nesting.
 */
export function locateJsonError(text: string): { position: number; reason: string } | undefined {
  let i = 0;
  const fail = (reason: string): never => {
    throw { position: i, reason };
  };
  const shown = (): string => (i < text.length ? JSON.stringify(text[i]) : 'end of the file');
  const space = (): void => {
    while (i < text.length && ' \t\n\r'.includes(text[i])) i++;
  };
  const literal = (word: string): void => {
    if (text.startsWith(word, i)) i += word.length;
    else fail(`unexpected ${shown()} (expected a value)`);
  };
  const string = (): void => {
    i++; // opening quote
    while (i < text.length) {
      const c = text[i];
      if (c === '"') { i++; return; }
      if (c === '\\') {
        const e = text[i + 1];
        if (e === 'u') {
          if (!/^[0-9a-fA-F]{4}$/.test(text.slice(i + 2, i + 6))) { i++; fail('bad \\u escape in a string'); }
          i += 6;
        } else if (e !== undefined && '"\\/bfnrt'.includes(e)) i += 2;
        else { i++; fail(`bad escape ${e === undefined ? 'at the end of the file' : JSON.stringify('\\' + e)} in a string`); }
        continue;
      }
      if (c.charCodeAt(0) < 0x20) fail('control character (e.g. a raw line break) inside a string');
      i++;
    }
    fail('unterminated string');
  };
  const number = (): void => {
    const m = /^-?(?:0|[1-9]\d*)(?:\.\d+)?(?:[eE][-+]?\d+)?/.exec(text.slice(i, i + 400));
    if (!m) fail(`unexpected ${shown()} (expected a value)`);
    i += m![0].length;
  };
  /** A scalar value at i (string, number, literal); containers are handled by the loop below. */
  const scalar = (): void => {
    const c = text[i];
    if (c === '"') return string();
    if (c === 't') return literal('true');
    if (c === 'f') return literal('false');
    if (c === 'n') return literal('null');
    if (c === '-' || (c !== undefined && c >= '0' && c <= '9')) return number();
    fail(`unexpected ${shown()} (expected a value)`);
  };
  /**
   * Iterative, with an explicit stack of open containers: 200,000 nested "[" are followed to
   * the end of the file like a flat list (a recursive reader would overflow the call stack).
   */
  const document = (): void => {
    const open: ('{' | '[')[] = [];
    let wantValue = true;
    for (;;) {
      space();
      if (wantValue) {
        const c = text[i];
        if (c === '{' || c === '[') {
          i++;
          space();
          const close = c === '{' ? '}' : ']';
          if (text[i] === close) {
            i++;
            wantValue = false;
          } else {
            open.push(c);
            if (c === '{') {
              if (text[i] !== '"') fail(`unexpected ${shown()} (expected a property name in double quotes)`);
              string(); space();
              if (text[i] !== ':') fail(`unexpected ${shown()} (expected ":")`);
              i++;
            }
            continue;
          }
        } else {
          scalar();
          wantValue = false;
        }
      }
      if (open.length === 0) return;
      space();
      const top = open[open.length - 1];
      const close = top === '{' ? '}' : ']';
      if (text[i] === ',') {
        i++;
        if (top === '{') {
          space();
          if (text[i] !== '"') fail(`unexpected ${shown()} (expected a property name in double quotes)`);
          string(); space();
          if (text[i] !== ':') fail(`unexpected ${shown()} (expected ":")`);
          i++;
        }
        wantValue = true;
      } else if (text[i] === close) {
        i++;
        open.pop();
      } else {
        fail(`unexpected ${shown()} (expected "," or "${close}")`);
      }
    }
  };
  try {
    document();
    space();
    if (i < text.length) fail(`unexpected ${shown()} after the end of the project`);
    return undefined;
  } catch (e) {
    if (e && typeof e === 'object' && 'position' in e) return e as { position: number; reason: string };
    return undefined;
  }
}

/**
 * Serialise a normalised project with the key order of DESIGN.md, 2-space indent and a
 * trailing newline. `length_m` is written for a slab or an intersection only (validation sets it to `null` otherwise), so
 * `readProjectText(writeProjectText(p)).project` deep-equals a validated `p`.
 */
export function writeProjectText(project: Project): string {
  return `${JSON.stringify(orderedProject(project), null, 2)}\n`;
}

function orderedProject(p: Project): Record<string, unknown> {
  const out: Record<string, unknown> = { schema: p.schema, title: p.title };
  if (p.description !== undefined) out.description = p.description;
  const opening: Record<string, unknown> = { type: p.opening.type, span_m: p.opening.span_m };
  if ((p.opening.type === 'slab' || p.opening.type === 'intersection') && p.opening.length_m !== null) opening.length_m = p.opening.length_m;
  opening.ends = p.opening.ends;
  if (p.opening.type === 'slab' && p.opening.edges !== null) opening.edges = { short: p.opening.edges.short, long: p.opening.edges.long };
  out.opening = opening;
  out.loads = {
    surcharge_kPa: p.loads.surcharge_kPa,
    horizontalStress_MPa: p.loads.horizontalStress_MPa,
  };
  out.support = { standing_kPa: p.support.standing_kPa };
  out.layers = p.layers.map(orderedLayer);
  out.design = {
    fsTarget: {
      tension: p.design.fsTarget.tension,
      crushing: p.design.fsTarget.crushing,
      sliding: p.design.fsTarget.sliding,
    },
    deflectionLimitRatio: p.design.deflectionLimitRatio,
    characteristic: p.design.characteristic,
    basis: p.design.basis,
    tensileBasis: p.design.tensileBasis,
    crushingStrength: p.design.crushingStrength,
    planeStrainModulus: p.design.planeStrainModulus,
  };
  if (p.uncertainty !== undefined) {
    const u = p.uncertainty;
    out.uncertainty = u === null ? null : {
      samples: u.samples, seed: u.seed, method: u.method, acceptablePf: u.acceptablePf,
      variables: u.variables.map((v) => ({ ...v })),
    };
  }
  return out;
}

function orderedLayer(l: Layer): Record<string, unknown> {
  return {
    name: l.name,
    thickness_m: l.thickness_m,
    unitWeight_kNm3: l.unitWeight_kNm3,
    youngModulus_GPa: l.youngModulus_GPa,
    modulusBasis: l.modulusBasis,
    poisson: l.poisson,
    ucs_MPa: l.ucs_MPa,
    rockClass: l.rockClass,
    tensile: {
      value_MPa: l.tensile.value_MPa,
      method: l.tensile.method,
      specimens: l.tensile.specimens.map(orderedSpecimen),
    },
    jointing: {
      crossJointSpacing_m: l.jointing.crossJointSpacing_m,
      fractureFrequency_per_m: l.jointing.fractureFrequency_per_m,
      rqd: l.jointing.rqd,
      jointCondition: l.jointing.jointCondition,
      jointFriction_deg: l.jointing.jointFriction_deg,
    },
    hoekBrown: { mi: l.hoekBrown.mi, disturbance: l.hoekBrown.disturbance },
  };
}

const orderedSpecimen = (s: Specimen): Record<string, unknown> => ({
  id: s.id,
  diameter_mm: s.diameter_mm,
  thickness_mm: s.thickness_mm,
  peakLoad_kN: s.peakLoad_kN,
  valid: s.valid,
});

const FNV_OFFSET = 0xcbf29ce484222325n;
const FNV_PRIME = 0x100000001b3n;
const MASK_64 = 0xffffffffffffffffn;

/**
 * 64-bit FNV-1a digest of the UTF-8 bytes of `text`, as 16 lower-case hex digits. Not a
 * security hash: it identifies the file a report was made from. Source: Fowler, Noll & Vo,
 * FNV hash (IETF draft-eastlake-fnv).
 *     projectHash('a') // "af63dc4c8601ec8c"
 */
export function projectHash(text: string): string {
  const bytes = new TextEncoder().encode(text);
  let hash = FNV_OFFSET;
  for (const byte of bytes) {
    hash = ((hash ^ BigInt(byte)) * FNV_PRIME) & MASK_64;
  }
  return hash.toString(16).padStart(16, '0');
}
