/**
 * The report's `support` and `empirical` blocks (DESIGN "Contract changes in v2"), their
 * warnings and their trace entries, from the evaluated state (`support.ts`) and the optional
 * Q ratings. Nothing here is counted: the bolt, skin and interlayer-shear checks are rows of
 * the check table; the empirical values summarise case histories (Barton, Lien & Lunde 1974).
 */
import type { EmpiricalReport, Project, SupportNeededReport, SupportReport, Warning } from '../model/types';
import { boltLengthRule, qValue, unsupportedSpan } from '../strength/q-system';
import { qSpanWord } from '../model/span-wording';
import type { State } from './evaluate';
import type { ProjectSI } from './inputs';
import { SOURCES, type TraceBuilder } from './trace';

const kN = 1e-3;
const kPa = 1e-3;

export const SUPPORT_SOURCES = {
  suspension: 'Suspension principle (Obert & Duvall 1967); statics',
  beamShear: 'Beam shear formula τ = VQ/(Ib) (Gere & Timoshenko, Mechanics of Materials); bolt resistance: common practice',
  q: 'Barton, Lien & Lunde (1974), Rock Mechanics 6:189–236 (from memory)',
} as const;

export const EMPIRICAL_NOTE =
  'Empirical spans summarise case histories, not this roof’s mechanics: shown beside the mechanistic answer, never counted.';

/** The note for an overhang: the Q system's width is for the roofs of openings. */
export const EMPIRICAL_OVERHANG_NOTE =
  'The Q system’s largest unsupported width is for the roof of an opening, not the reach of an overhang: it sets no limit on this overhang. ' +
  'Empirical values summarise case histories, not this overhang’s mechanics: shown beside the mechanistic answer, never counted.';

const round = (x: number): number => +x.toPrecision(3);

/** `support` of the report; `needed` is filled by the caller (support-needed.ts). */
export function supportReport(
  project: Project, p: ProjectSI, state: State, trace: TraceBuilder, warnings: Warning[],
  needed: { needed: SupportNeededReport | null; reason: string | null },
): SupportReport | null {
  const s = state.support;
  if (!s && !(p.support > 0) && needed.needed === null && needed.reason === null) return null;
  let bolts: SupportReport['bolts'] = null;
  if (s) {
    const a = s.anchorage;
    if (a.kind === 'atInterface') {
      const lower = project.layers[a.lowerLayer].name;
      const upper = project.layers[a.upperLayer].name;
      warnings.push({
        code: 'ANCHOR_AT_INTERFACE',
        path: 'support.bolts.length_m',
        message: `The anchorage zone ${round(a.zone[0])}–${round(a.zone[1])} m crosses the interface between layer ${a.lowerLayer + 1} “${lower}” and layer ${a.upperLayer + 1} “${upper}” at ${round(a.interfaceHeight)} m: no anchorage is credited. Lengthen or shorten the bolt so its anchorage lies in one layer.`,
      });
    }
    const susp = s.suspension;
    const load = susp ? susp.result.load : 0;
    const fsBolt = susp ? susp.result.fs : null;
    if (susp) {
      const values: Record<string, [number, string]> = { S_x: [s.bolts.spacingAcross, 'm'], S_y: [s.bolts.spacingAlong, 'm'], p_s: [Math.min(p.support, susp.result.weight) * kPa, 'kPa'] };
      const terms = susp.suspended.map((i) => {
        values[`gamma_${i + 1}`] = [p.layers[i].unitWeight * kN, 'kN/m^3'];
        values[`t_${i + 1}`] = [p.layers[i].thickness, 'm'];
        return `gamma_${i + 1} * t_${i + 1}`;
      });
      trace.add('support.bolts.load_kN', 'Load per bolt (suspension)', `(${terms.join(' + ')} - p_s) * S_x * S_y`, values, load * kN, 'kN', SUPPORT_SOURCES.suspension,
        `The layers below the anchorage zone (${susp.suspended.map((i) => i + 1).join(', ')}) hang from the bolts; standing support relieves them first (p_s, at most their weight).`);
      if (fsBolt !== null) {
        trace.add('support.bolts.fsBolt', 'FS per bolt', 'C / P', { C: [s.bolts.capacity * kN, 'kN'], P: [load * kN, 'kN'] }, fsBolt, '', SUPPORT_SOURCES.suspension,
          `Target fsTarget.bolt = ${p.design.fsTarget.bolt} (common practice).`);
      }
    }
    const c = s.composite;
    if (c && c.fsShear !== null) {
      const least = c.interfaces.reduce((m, f) => (f.check.fs !== null && (m === null || f.check.fs < (m.check.fs as number)) ? f : m), null as (typeof c.interfaces)[number] | null);
      if (least) {
        const phi = p.layers[least.lowerLayer].jointFriction;
        trace.add('support.bolts.composite.fsShear', `Least interlayer shear FS (interface above layer ${least.lowerLayer + 1})`, '(V_b + T_0 * tan(phi * pi / 180)) / (S_x * S_y) / tau',
          { V_b: [s.bolts.shearCapacity * kN, 'kN'], T_0: [s.bolts.pretension * kN, 'kN'], phi: [phi, ''], S_x: [s.bolts.spacingAcross, 'm'], S_y: [s.bolts.spacingAlong, 'm'], tau: [least.shearStress * kPa, 'kPa'] },
          c.fsShear, '', SUPPORT_SOURCES.beamShear,
          c.credited ? 'Meets the bolt target: the bonded (composite) tension counts.' : 'Below the bolt target: composite action is not credited; the unbonded tension counts.');
      }
    }
    bolts = {
      load_kN: load * kN,
      fsBolt,
      anchorLayer: a.kind === 'anchored' ? a.anchorLayer : null,
      suspended: susp ? [...susp.suspended] : [],
      composite: c ? { credited: c.credited, fsShear: c.fsShear } : null,
    };
  }
  return { bolts, needed: needed.needed, neededReason: needed.reason };
}

/** `empirical` of the report: Q from the immediate roof's RQD, 2·ESR·Q^0.4 and 2 + 0.15 B/ESR; null without ratings. */
export function empiricalReport(project: Project, p: ProjectSI, state: State, trace: TraceBuilder): EmpiricalReport | null {
  const r = project.empirical.q;
  if (!r) return null;
  const rqd = state.layers[0].chain.rqd;
  const q = qValue({ rqd, jn: r.jn, jr: r.jr, ja: r.ja, jw: r.jw, srf: r.srf });
  const span = unsupportedSpan(q, r.esr);
  const bolt = boltLengthRule(p.entrySpan, r.esr);
  const note = project.opening.type === 'cantilever' ? EMPIRICAL_OVERHANG_NOTE : EMPIRICAL_NOTE;
  trace.add('empirical.q', 'Q (rock mass quality)', '(max(RQD, 10) / J_n) * (J_r / J_a) * (J_w / SRF)',
    { RQD: [rqd, ''], J_n: [r.jn, ''], J_r: [r.jr, ''], J_a: [r.ja, ''], J_w: [r.jw, ''], SRF: [r.srf, ''] }, q, '', SUPPORT_SOURCES.q,
    `RQD of the immediate roof (layer 1). ${note}`);
  trace.add('empirical.unsupportedSpan_m', `Largest unsupported ${qSpanWord(project.opening.type)} (Q system)`, '2 * ESR * Q^0.4 * 1 m', { ESR: [r.esr, ''], Q: [q, ''] }, span, 'm', SUPPORT_SOURCES.q, note);
  trace.add('empirical.boltLength_m', 'Bolt length rule (Q system)', '2 m + 0.15 * B / ESR', { B: [p.entrySpan, 'm'], ESR: [r.esr, ''] }, bolt, 'm', SUPPORT_SOURCES.q, note);
  return { q, unsupportedSpan_m: span, boltLength_m: bolt, note };
}

export { SOURCES };
