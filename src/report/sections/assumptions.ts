/** Section 7: assumptions and limits of each method, and every warning with its path. */
import type { Block, Cell, Section } from '../document-types';
import { textCell } from './cells';
import type { SectionContext } from './context';

export const METHOD_LIMITS: ReadonlyArray<{ method: string; text: string }> = [
  { method: 'Elastic beam (Obert & Duvall 1967)', text: 'Plane strain, linear elastic, small deflection, uniform load per unit plan area; horizontal stress superposed as uniform compression with no P-δ amplification (the Euler stress is reported instead).' },
  { method: 'Layered roof (Obert & Duvall 1967)', text: 'Layers of a group share curvature with frictionless interfaces; grouping uses self-weights only; surcharge acts on the top group and support on group 1; a stiffer layer above separates (bed separation).' },
  { method: 'Voussoir beam (Diederichs & Kaiser 1999)', text: 'The cracked beam carries its load as a parabolic compression arch with a triangular thrust distribution; crushing is checked against the layer UCS as given; sliding uses the cross-joint friction angle; δ/t ≤ 0.1 marks the onset of non-linear response, about 0.25 is ultimate; for a slab the short span is used in plane strain (conservative).' },
  { method: 'Roof slab (Kirchhoff plate)', text: 'Thin plate, small deflection, uniform load, edges all clamped or all simply supported, solved numerically for the layer’s Poisson ratio and checked against Roark and Timoshenko tables.' },
  { method: 'Size effect (Hoek & Brown 1980)', text: 'σ(d) = σ50·(50/d)^0.18 fitted on specimens of about 10–200 mm; Lamina clamps the effective block size to [d_lab, 200 mm], so the block value never exceeds the characteristic value; the joint-scale reduction is left to Hoek–Brown.' },
  { method: 'Cross-joint rule (common practice)', text: 'A layer whose cross-joint spacing is less than the span has zero tensile strength across the joints: the tension check does not apply and the voussoir checks govern.' },
  { method: 'Modulus basis (Hoek & Diederichs 2006)', text: '“mass” uses E as given; “intact” reduces it with GSI and disturbance to a rock-mass modulus. The plane-strain modulus E/(1−ν²) is used only when the option is set.' },
  { method: 'Rock-mass tensile strength (Hoek–Brown)', text: 'The characteristic lab tensile strength is scaled by s·mi/mb, the ratio of rock-mass to intact Hoek–Brown tensile strength; GSI from JCond89 and RQD (Hoek, Carter & Diederichs 2013), RQD from fracture frequency (Priest & Hudson 1976).' },
  { method: 'Brazilian test (ISRM 1978; ASTM D3967)', text: 'Only valid specimens (central diametral fracture) with thickness ≤ diameter count; direct ≈ f × Brazilian with f = 0.7/0.8/0.9 for sedimentary/igneous/metamorphic rock (Perras & Diederichs 2014).' },
  { method: 'Span search', text: 'Largest span up to 100 m with FS ≥ target in every layer, found by bracketing and bisection to 1 mm; for a slab the aspect ratio is held fixed.' },
];

export function assumptionsSection(ctx: SectionContext): Section {
  const warnings = ctx.analysis.report.warnings;
  const blocks: Block[] = [
    { kind: 'list', items: METHOD_LIMITS.map((m) => `${m.method}: ${m.text}`) },
    { kind: 'heading', level: 3, text: `Warnings (${warnings.length})` },
  ];
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
  return { id: 'assumptions', title: 'Assumptions, limits and warnings', blocks };
}
