/**
 * Migration of a `lamina/1` project to `lamina/2` (DESIGN.md "Contract changes in v2"), on the
 * raw parsed JSON before validation, so files, links and autosaves of the previous release open
 * with the same meaning:
 *   - `loads.support_kPa` → `support.standing_kPa`;
 *   - `design.tensileBasis` = "rockMass": v1's design strength was min(block, mass), which is
 *     v2's rock-mass basis;
 *   - `design.fsTarget.tension` = the file's value, or v1's default 4 where the file gave none
 *     (v2's default on the rock-mass basis is 2, so the default is NOT taken: the file keeps the
 *     target it was checked against);
 *   - `design.crushingStrength` = "lab": v1 checked crushing against the UCS as given.
 * What v2 changes on purpose because v1 was wrong is listed in the one-time notice
 * (`migrationNotice`) rather than preserved. Nothing is dropped: unknown keys stay and get the
 * usual unknown-key warning.
 *
 *     migrateV1({ schema: 'lamina/1', loads: { support_kPa: 20 } }).project
 *     // { schema: 'lamina/2', loads: {}, support: { standing_kPa: 20 },
 *     //   design: { tensileBasis: 'rockMass', crushingStrength: 'lab', fsTarget: { tension: 4 } } }
 */

type Raw = Record<string, unknown>;

const isObject = (v: unknown): v is Raw => typeof v === 'object' && v !== null && !Array.isArray(v);
const own = (obj: Raw, key: string): unknown => (Object.prototype.hasOwnProperty.call(obj, key) ? obj[key] : undefined);

/** The tension target of lamina/1 when a file gave none (Obert & Duvall's lab basis). */
export const V1_TENSION_TARGET = 4;

export interface Migration {
  /** The raw project in lamina/2 form (still to be validated). */
  project: Raw;
  /** One-time notice for the user: what was kept and what v2 now does differently for this file. */
  notice: string;
}

/** Copy of an object-valued key (a fresh {} when absent; the value itself when not an object, for validation to refuse). */
function copyOf(obj: Raw, key: string): unknown {
  const v = own(obj, key);
  if (v === undefined) return {};
  return isObject(v) ? { ...v } : v;
}

export function migrateV1(input: Raw): Migration {
  const out: Raw = { ...input, schema: 'lamina/2' };
  const loads = copyOf(input, 'loads');
  let support: unknown = 0;
  if (isObject(loads) && own(loads, 'support_kPa') !== undefined) {
    support = own(loads, 'support_kPa');
    delete loads.support_kPa;
    out.support = { standing_kPa: support };
  }
  if (own(input, 'loads') !== undefined) out.loads = loads;
  const design = copyOf(input, 'design');
  let tension: unknown = V1_TENSION_TARGET;
  if (isObject(design)) {
    design.tensileBasis = 'rockMass';
    design.crushingStrength = 'lab';
    const fs = copyOf(design, 'fsTarget');
    if (isObject(fs)) {
      if (own(fs, 'tension') === undefined) fs.tension = V1_TENSION_TARGET;
      tension = fs.tension;
    }
    design.fsTarget = fs;
  }
  out.design = design;
  const opening = own(input, 'opening');
  const type = isObject(opening) ? own(opening, 'type') : undefined;
  const sh = isObject(loads) ? own(loads, 'horizontalStress_MPa') : undefined;
  return { project: out, notice: migrationNotice({ support, tension, type, horizontalStress: sh }) };
}

/** The notice: kept meanings first, then each deliberate v2 change that touches this file. */
export function migrationNotice(file: { support: unknown; tension: unknown; type: unknown; horizontalStress: unknown }): string {
  const kept = [
    `standing support ${typeof file.support === 'number' ? `${file.support} kPa ` : ''}now in support.standing_kPa (was loads.support_kPa)`,
    `tension target ${String(file.tension)} on the "rockMass" tensile basis (v1’s min(block, rock mass) strength; v2’s default target on that basis is 2)`,
    'crushing checked against the UCS as given (crushingStrength "lab"; v2’s default is the rock-mass UCS σci·s^a)',
  ];
  const changed: string[] = [];
  if (typeof file.horizontalStress === 'number' && file.horizontalStress > 0) {
    changed.push(`the horizontal stress (${file.horizontalStress} MPa) now adds to the voussoir crushing demand, fc + σh (v1 ignored it)`);
  }
  if (typeof file.support === 'number' && file.support > 0) {
    changed.push('standing support is capped at the load it relieves: no layer carries a negative load (v1 could lift the roof)');
  }
  if (file.type !== 'cantilever') {
    changed.push('the voussoir checks of a layer that does not crack are shown as post-cracking reserve and no longer count (v1 counted them); a cracked layer’s tension is shown but not counted');
    changed.push('a block (span/thickness < 2) has its voussoir checks shown but not counted, and s/t ≤ 4 is flagged as a deep beam');
  }
  changed.push('the largest-span search goes down to 1 mm, and the tension span of a layer with cross-joints stops at its joint spacing');
  return `Opened a lamina/1 file and migrated it to lamina/2 (saving writes lamina/2). Kept as before: ${kept.join('; ')}. Changed in v2 because v1 was wrong: ${changed.join('; ')}.`;
}
