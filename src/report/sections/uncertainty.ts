/**
 * The uncertainty section (METHODS §16), present when the caller ran the file's uncertainty
 * block: the inputs as distributions, P_f with its interval, β, per mode, P(below target),
 * FORM, P_f against span, the histogram, sensitivity and P_f-against-span charts, the method
 * and seed, what P_f means and what it does not, and published acceptance levels as context
 * only. The acceptable P_f, when given, is judged in the check table (its whole-roof row).
 *
 * A project that asks for a study (variables in its `uncertainty` block) but comes without a
 * run for its inputs as they are — the app drops a run made before the latest edit — gets a
 * short section saying there is no current run, never the numbers of an earlier project.
 */
import { MODE_NAME } from '../../analysis/check-labels';
import type { Mode, UncertaintyReport } from '../../model/types';
import { fsHistogramSvg } from '../charts/fs-histogram';
import { sensitivitySvg } from '../charts/sensitivity';
import { pfSpanSvg } from '../charts/pf-span';
import type { Block, Section } from '../document-types';
import { numberText } from '../number-text';
import { textCell } from './cells';
import type { SectionContext } from './context';
import { openingWords } from '../../model/span-wording';

const prob = (p: number): string => (p === 0 ? '0' : numberText(p, 3));
const maybe = (v: number | null, digits = 3): string => (v === null ? '—' : numberText(v, digits));

/** What P_f means and does not (plain text shared by the report and the app). */
export const PF_MEANING =
  'P_f is the fraction of samples in which some counted check has a factor of safety below 1, with the inputs drawn from the distributions above and everything else held at the project values. ' +
  'It is conditional on those distributions and on the models of the analysis: it does not include the error of the models themselves, inputs not varied, correlation between inputs (sampled independently here), construction quality or time-dependent weathering. ' +
  'It is not an annual or lifetime frequency of roof falls. β = −Φ⁻¹(P_f) restates it on the standard normal scale. FORM linearises the governing check at its most probable failure point and is a second estimate, exact only for a linear limit state in normal variables.';

/** Published acceptance levels, shown as context only (Lamina sets none; METHODS §16). */
export const PF_CONTEXT =
  'Context only — Lamina sets no acceptable P_f. For slopes in open pits, Priest & Brown (1983) suggested probabilities of failure of roughly 0.1 for minor, 0.01 to 0.003 for moderate and 0.003 to 0.0003 for critical consequences (from memory; check the source before relying on it). ' +
  'Targets for underground roofs depend on the exposure of people and the owner’s criteria; the project’s acceptable P_f, when given, is the owner’s choice.';

/** The words of the section when the project asks for a study but no current run came with it. */
export const NO_CURRENT_RUN =
  'No current run: the project defines an uncertainty study, but no run made with its inputs as they are now is included. ' +
  'A run made before the latest change of the project is not printed. Run the study again to include P_f in this report.';

function noCurrentRun(ctx: SectionContext): Section {
  const u = ctx.project.uncertainty!;
  const blocks: Block[] = [
    { kind: 'paragraph', text: NO_CURRENT_RUN },
    { kind: 'list', items: u.variables.map((v) => `${v.path}: ${v.distribution}`) },
  ];
  if (u.acceptablePf !== null) {
    blocks.push({ kind: 'paragraph', text: `The acceptable P_f ${prob(u.acceptablePf)} (the file’s) adds its row to the check table only with a current run; without one it is not judged.` });
  }
  return { id: 'uncertainty', title: 'Uncertainty: probability of failure', blocks };
}

export function uncertaintySection(ctx: SectionContext): Section | null {
  const u: UncertaintyReport | null | undefined = ctx.analysis.report.uncertainty;
  if (!u) return (ctx.project.uncertainty?.variables.length ?? 0) > 0 ? noCurrentRun(ctx) : null;
  const method = u.method === 'latinHypercube' ? 'Latin hypercube sampling' : 'plain Monte Carlo sampling';
  const blocks: Block[] = [
    {
      kind: 'keyValue',
      items: [
        { key: 'Method', value: `${method}, ${u.evaluated} samples, seed ${u.seed} (the same file and seed give the same numbers)` },
        { key: 'P_f', value: `${prob(u.pf)} (95 % interval ${prob(u.pfInterval[0])} – ${prob(u.pfInterval[1])}, ${u.intervalMethod === 'wilson' ? 'Wilson' : 'rule of three 3/N'})` },
        { key: 'β', value: u.beta === null ? `— (${u.betaNote ?? 'not defined'})` : numberText(u.beta, 3) },
        { key: 'CoV of the P_f estimate', value: maybe(u.pfCov, 2) },
        { key: 'P(some check below its target)', value: prob(u.pBelowTarget) },
        { key: 'FORM on the governing check', value: u.form ? `β ${maybe(u.form.beta)}, P_f ${u.form.pf === null ? '—' : prob(u.form.pf)}${u.form.converged ? '' : ' (did not converge)'}${u.form.note ? `; ${u.form.note}` : ''}` : 'not run (no input varies)' },
        ...(u.governing ? [{ key: 'Governing check (deterministic)', value: `${MODE_NAME[u.governing.mode]} in layer ${u.governing.layerIndex + 1} “${u.governing.layer}”, FS ${numberText(u.governing.fs, 3)}` }] : []),
        ...(u.acceptablePf !== null ? [{ key: 'Acceptable P_f (the file’s)', value: `${prob(u.acceptablePf)}: ${u.meetsAcceptablePf ? 'met ✓ (the interval’s upper end is at or below it)' : 'not shown to be met ✗ (the interval’s upper end is above it)'}; a counted row of the check table (whole roof), never the governing one` }] : []),
        ...(u.plateInterpolation ? [{ key: 'Slab plate coefficients', value: `interpolated over aspect ratio and ν (${u.plateInterpolation.nodes.aspect} × ${u.plateInterpolation.nodes.poisson} nodes), largest relative error measured ${numberText(100 * u.plateInterpolation.maxRelativeError, 2)} %` }] : []),
      ],
    },
    {
      kind: 'table',
      caption: 'Sampled inputs (file units)',
      columns: [{ title: 'Field path' }, { title: 'Distribution' }, { title: 'Mean', numeric: true }, { title: 'SD', numeric: true }, { title: 'Lower end', numeric: true }, { title: 'Upper end', numeric: true }, { title: 'Rank correlation with FS', numeric: true }],
      rows: u.inputs.map((v, j) => [
        textCell(v.path), textCell(v.distribution),
        { text: numberText(v.mean, 4), value: v.mean, numeric: true }, { text: numberText(v.sd, 3), value: v.sd, numeric: true },
        { text: maybe(v.lower, 4), value: v.lower, numeric: true }, { text: maybe(v.upper, 4), value: v.upper, numeric: true },
        { text: maybe(u.sensitivity[j]?.rankCorrelation ?? null, 2), value: u.sensitivity[j]?.rankCorrelation ?? null, numeric: true },
      ]),
    },
    {
      kind: 'table',
      caption: 'P_f by mode (samples whose smallest counted FS of that mode is below 1)',
      columns: [{ title: 'Mode' }, { title: 'P_f', numeric: true }, { title: '95 % interval' }],
      rows: (Object.keys(u.byMode) as Mode[]).map((m) => [
        textCell(MODE_NAME[m]), { text: prob(u.byMode[m] as number), value: u.byMode[m] as number, numeric: true },
        textCell(u.byModeInterval[m] ? `${prob(u.byModeInterval[m]![0])} – ${prob(u.byModeInterval[m]![1])}` : '—'),
      ]),
    },
  ];
  if (u.pfVersusSpan.length) {
    const w = openingWords(ctx.project.opening.type);
    blocks.push({
      kind: 'table',
      caption: `P_f against ${w.span} (${u.samplesPerSpan} samples at each ${w.span}, same seed)`,
      columns: [{ title: `${w.Span} (m)`, numeric: true }, { title: 'P_f', numeric: true }, { title: '95 % interval' }, { title: 'β', numeric: true }],
      rows: u.pfVersusSpan.map((p) => [
        { text: numberText(p.span_m, 3), value: p.span_m, numeric: true }, { text: prob(p.pf), value: p.pf, numeric: true },
        textCell(`${prob(p.pfInterval[0])} – ${prob(p.pfInterval[1])}`), { text: maybe(p.beta), value: p.beta, numeric: true },
      ]),
    });
  }
  if (u.pfVersusSpan.length > 1) {
    const spanWord = openingWords(ctx.project.opening.type).span;
    blocks.push({ kind: 'chart', title: `P_f against ${spanWord}`, svg: pfSpanSvg(u, { units: ctx.units, currentSpan_m: ctx.project.opening.span_m, spanWord }), caption: 'Band: the 95 % interval at each point; dashed: the acceptable P_f, when given.' });
  }
  blocks.push(
    { kind: 'chart', title: 'Governing FS over the samples', svg: fsHistogramSvg(u, { target: u.governing?.target ?? null }), caption: 'Hatched bars: samples with FS below 1 (failure).' },
    { kind: 'chart', title: 'Sensitivity', svg: sensitivitySvg(u), caption: 'Spearman rank correlation of each input with the governing FS.' },
    { kind: 'heading', level: 3, text: 'What P_f means' },
    { kind: 'paragraph', text: PF_MEANING },
    { kind: 'callout', tone: 'note', title: 'Published acceptance levels (context only)', text: PF_CONTEXT },
  );
  return { id: 'uncertainty', title: 'Uncertainty: probability of failure', blocks };
}
