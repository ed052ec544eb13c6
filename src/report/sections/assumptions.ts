/** The warnings of the analysis with their paths (summary), and the assumptions and limits of each method (appendix). */
import type { Block, Cell, Section } from '../document-types';
import { textCell } from './cells';
import type { SectionContext } from './context';
import { inOpeningWords, isOverhang } from '../../model/span-wording';

/**
 * Each method and its limits, worded for a span. `overhang`: the method's text for an overhang
 * (a cantilever) where the general one names a slab or an intersection, or null where the
 * method does not apply to an overhang at all; the rest is reworded by `inOpeningWords`.
 */
export const METHOD_LIMITS: ReadonlyArray<{ method: string; text: string; overhang?: string | null }> = [
  { method: 'Elastic beam (Obert & Duvall 1967)', text: 'Plane strain, linear elastic, small deflection, uniform load per unit plan area; horizontal stress superposed as uniform compression with no P-δ amplification (the Euler stress is reported instead).' },
  { method: 'Layered roof (Obert & Duvall 1967)', text: 'Layers of a group share curvature with frictionless interfaces; grouping uses self-weights only; surcharge acts on the top group and support on group 1; a stiffer layer above separates (bed separation).' },
  { method: 'Voussoir beam (Diederichs & Kaiser 1999)', text: 'The cracked beam carries its load as a parabolic compression arch with a triangular thrust distribution; crushing is checked against the rock-mass UCS σci·s^a (or the UCS as given, crushingStrength "lab") with the in-situ horizontal stress added to the arch thrust (fc + σh: the model has no σh, so Lamina superposes it, conservatively), while sliding and snap-through take no credit for σh; sliding uses the cross-joint friction angle; δ/t ≤ 0.1 marks the onset of non-linear response, about 0.25 is ultimate; for a slab the short span is used in plane strain (conservative). The arch assumes a slender layer: s/t ≤ 4 is flagged as a deep beam, and a block (s/t < 2) has its voussoir shown but not counted; past δ/t = 0.1 the small-deflection solution is out of range (Sofianos 1996).', overhang: 'Not applied: an overhang has one root and no second support to thrust against, so no compression arch can form and a cracked overhang has no capacity; its voussoir rows are shown as not applicable.' },
  { method: 'Which checks count (METHODS §10)', text: 'A layer that does not crack (not cross-jointed, basis “intact”) counts its tension check and shows its voussoir as post-cracking reserve; a cracked layer (cross-jointed, or basis “jointed”) counts its voussoir checks and shows tension for information; an overhang always counts tension. The governing check is the counted row with the least FS/target; ties go to the lower layer.' },
  { method: 'Tensile basis and targets (METHODS §10)', text: 'On the “rockMass” basis the design strength is min(block, rock mass) and the default tension target is 2; on the “lab” basis it is the block-scale strength and the default target is 4 (Obert & Duvall’s factors were set on lab strengths). FS 4 on a strength already scaled by Hoek–Brown would count the lab-to-field gap twice.' },
  { method: 'Standing support (METHODS §12)', text: 'Props and cribs push up on the lowest bending group and can only relieve load that is there: the support is capped at that load, and the excess is dropped with a warning; no layer carries a negative load.' },
  { method: 'Intersection (METHODS §14)', text: 'An intersection rests on pillar corners with open edges: it is checked as a beam (simple ends by default) spanning the diagonal √(w1² + w2²) of the entry widths; its largest spans are entry widths with w2/w1 held.', overhang: null },
  { method: 'Roof slab (Kirchhoff plate)', text: 'Thin plate, small deflection, uniform load, each edge pair clamped, simply supported or free (opening.edges; by default every edge as the ends), solved numerically for the layer’s Poisson ratio and checked against Roark and Timoshenko tables.', overhang: null },
  { method: 'Size effect (Hoek & Brown 1980)', text: 'σ(d) = σ50·(50/d)^0.18 fitted on specimens of about 10–200 mm; Lamina clamps the effective block size to [d_lab, 200 mm], so the block value never exceeds the characteristic value; the joint-scale reduction is left to Hoek–Brown.' },
  { method: 'Cross-joint rule (common practice)', text: 'A layer whose cross-joint spacing is less than the span has zero tensile strength across the joints: the tension check does not apply and the voussoir checks govern. In the span search its tension span stops at its joint spacing.' },
  { method: 'Modulus basis (Hoek & Diederichs 2006)', text: '“mass” uses E as given; “intact” reduces it with GSI and disturbance to a rock-mass modulus. The plane-strain modulus E/(1−ν²) is used only when the option is set.' },
  { method: 'Rock-mass tensile strength (Hoek–Brown)', text: 'The characteristic lab tensile strength is scaled by s·mi/mb, the ratio of rock-mass to intact Hoek–Brown tensile strength; GSI from JCond89 and RQD (Hoek, Carter & Diederichs 2013), RQD from fracture frequency (Priest & Hudson 1976).' },
  { method: 'Brazilian test (ISRM 1978; ASTM D3967)', text: 'Only valid specimens (central diametral fracture) with thickness ≤ diameter count; direct ≈ f × Brazilian with f = 0.7/0.8/0.9 for sedimentary/igneous/metamorphic rock (Perras & Diederichs 2014).' },
  { method: 'Span search', text: 'Largest span up to 100 m with FS ≥ target in every layer in which the mode counts at the current span, found by bracketing and bisection to 1 mm; for a slab the aspect ratio is held fixed, for an intersection the ratio of the entry widths.', overhang: 'Largest overhang up to 100 m with FS ≥ target in every layer in which the mode counts at the current overhang, found by bracketing and bisection to 1 mm.' },
];

/** The methods and their limits for this opening (an overhang's list leaves out the slab and intersection). */
export function methodLimits(openingType: string): string[] {
  const overhang = isOverhang(openingType);
  return METHOD_LIMITS.flatMap((m) => {
    const text = overhang && m.overhang !== undefined ? m.overhang : m.text;
    return text === null ? [] : [inOpeningWords(`${m.method}: ${text}`, openingType)];
  });
}

export function assumptionsSection(openingType = 'beam'): Section {
  return { id: 'assumptions', title: 'Appendix C — Methods: assumptions and limits', appendix: true, blocks: [{ kind: 'list', items: methodLimits(openingType) }] };
}

export function warningsSection(ctx: SectionContext): Section {
  const warnings = ctx.analysis.report.warnings;
  const blocks: Block[] = [];
  const errors = warnings.filter((w) => w.level === 'error');
  for (const w of errors) blocks.push({ kind: 'callout', tone: 'error', title: `Serious warning ${w.code}${w.path ? ` at ${w.path}` : ''}`, text: w.message });
  if (warnings.length === 0) {
    blocks.push({ kind: 'paragraph', text: 'The analysis raised no warnings.' });
  } else {
    blocks.push({
      kind: 'table',
      caption: 'All warnings',
      columns: [{ title: 'Level' }, { title: 'Code' }, { title: 'Field path' }, { title: 'Message' }],
      rows: warnings.map((w): Cell[] => [
        textCell(w.level === 'error' ? 'serious ✗' : 'warning !'), textCell(w.code), textCell(w.path || '(whole project)'), textCell(w.message),
      ]),
    });
  }
  return { id: 'warnings', title: 'Warnings', blocks };
}
