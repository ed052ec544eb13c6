/**
 * The key charts of the summary (pure SVG strings from src/report/charts). A chart that cannot
 * be drawn is replaced by a note naming the reason, so one chart never blocks the report.
 */
import { beamProfile, slabField } from '../../analysis/index';
import { beamProfileSvg, fsSpanSvg, slabContourSvg, strataColumnSvg, strengthChainSvg, strengthStripSvg, voussoirArchSvg } from '../charts/index';
import type { Block, Section } from '../document-types';
import type { SectionContext } from './context';

export function chart(title: string, draw: () => string | null, caption?: string): Block | null {
  try {
    const svg = draw();
    if (svg === null) return null;
    const block: Block = { kind: 'chart', title, svg };
    if (caption) block.caption = caption;
    return block;
  } catch (err) {
    return { kind: 'callout', tone: 'note', title, text: `This chart could not be drawn: ${err instanceof Error ? err.message : String(err)}` };
  }
}

/** The layer the charts focus on: the governing one, else the immediate roof. */
export function focusLayer(ctx: SectionContext): number {
  return ctx.analysis.report.governing?.layerIndex ?? 0;
}

export function chartsSection(ctx: SectionContext): Section {
  const { project, analysis, units, curve } = ctx;
  const focus = focusLayer(ctx);
  const layer = analysis.report.layers[focus];
  const blocks: Array<Block | null> = [];
  blocks.push(chart('Strata column', () => strataColumnSvg(project, analysis, { units })));
  if (curve) {
    blocks.push(chart(`Factor of safety versus ${ctx.verdict.spanWord}`, () => fsSpanSvg(curve, analysis.report.maxSpan_m, { units, spanWord: ctx.verdict.spanWord })));
  }
  // The chart of the governing check: the beam (or slab) for tension, the arch for a voussoir mode.
  const mode = analysis.report.governing?.mode ?? 'tension';
  const archGoverns = mode !== 'tension' && layer?.voussoir !== null && layer?.voussoir !== undefined;
  if (layer && !archGoverns) {
    if (project.opening.type === 'slab') {
      blocks.push(chart(`Slab stress contours, layer ${focus + 1}: ${layer.name}`, () => {
        const field = slabField(project, analysis, focus);
        return field ? slabContourSvg(field, { units }) : null;
      }));
    } else {
      blocks.push(chart(`Beam profile, layer ${focus + 1}: ${layer.name}`, () =>
        beamProfileSvg(beamProfile(project, analysis, focus), { units, designStrength_MPa: layer.strength.design_MPa, title: `Layer ${focus + 1}: ${layer.name}`, spanWord: ctx.verdict.spanWord === 'overhang' ? 'overhang' : 'span' }),
      `Intact-beam fibre tension and deflection along the ${ctx.verdict.spanWord}.`));
    }
  }
  const v = layer?.voussoir;
  if (layer && v && archGoverns) {
    const span = project.opening.span_m;
    blocks.push(chart(`Voussoir arch, layer ${focus + 1}: ${layer.name}`, () => voussoirArchSvg({
      span_m: span, thickness_m: layer.thickness_m, n: v.n, leverArm_m: v.leverArm_m, deflection_mm: v.deflection_mm,
      snapThrough: v.snapThrough, maxCompression_MPa: v.maxCompression_MPa,
    }, { units })));
  }
  return { id: 'charts', title: 'Key charts', blocks: blocks.filter((b): b is Block => b !== null) };
}

/** The strength chain and the specimen strengths of layer i (appendix A). */
export function strengthCharts(ctx: SectionContext, i: number): Block[] {
  const { analysis, units } = ctx;
  const detail = analysis.layers[i];
  if (!detail) return [];
  const name = analysis.report.layers[i]?.name ?? '';
  const blocks: Array<Block | null> = [chart(`Strength chain, layer ${i + 1}: ${name}`, () => strengthChainSvg(detail.steps, { units }))];
  if (detail.lab.source === 'specimens') blocks.push(chart(`Specimen strengths, layer ${i + 1}: ${name}`, () => strengthStripSvg(detail.lab, { units })));
  return blocks.filter((b): b is Block => b !== null);
}
