/**
 * Section 8: the static charts (pure SVG strings from src/report/charts). A chart that cannot
 * be drawn is replaced by a note naming the reason, so one chart never blocks the report.
 */
import { beamProfile, slabField } from '../../analysis/index';
import { beamProfileSvg, fsSpanSvg, slabContourSvg, strataColumnSvg, strengthChainSvg, strengthStripSvg, voussoirArchSvg } from '../charts/index';
import type { Block, Section } from '../document-types';
import type { SectionContext } from './context';

function chart(title: string, draw: () => string | null, caption?: string): Block | null {
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
  analysis.layers.forEach((detail, i) => {
    const name = analysis.report.layers[i]?.name ?? '';
    blocks.push(chart(`Strength chain, layer ${i + 1}: ${name}`, () => strengthChainSvg(detail.steps, { units })));
    if (detail.lab.source === 'specimens') {
      blocks.push(chart(`Specimen strengths, layer ${i + 1}: ${name}`, () => strengthStripSvg(detail.lab, { units })));
    }
  });
  if (curve) {
    blocks.push(chart('Factor of safety versus span', () => fsSpanSvg(curve, analysis.report.maxSpan_m, { units, spanWord: ctx.verdict.spanWord })));
  }
  if (layer) {
    blocks.push(chart(`Beam profile, layer ${focus + 1}: ${layer.name}`, () =>
      beamProfileSvg(beamProfile(project, analysis, focus), { units, designStrength_MPa: layer.strength.design_MPa, title: `Layer ${focus + 1}: ${layer.name}` }),
    'Intact-beam fibre tension and deflection along the span.'));
    const v = layer.voussoir;
    if (v) {
      const span = project.opening.span_m;
      blocks.push(chart(`Voussoir arch, layer ${focus + 1}: ${layer.name}`, () => voussoirArchSvg({
        span_m: span, thickness_m: layer.thickness_m, n: v.n, leverArm_m: v.leverArm_m, deflection_mm: v.deflection_mm,
        snapThrough: v.snapThrough, maxCompression_MPa: v.maxCompression_MPa,
      }, { units })));
    }
    if (project.opening.type === 'slab') {
      blocks.push(chart(`Slab stress contours, layer ${focus + 1}: ${layer.name}`, () => {
        const field = slabField(project, analysis, focus);
        return field ? slabContourSvg(field, { units }) : null;
      }));
    }
  }
  return { id: 'charts', title: 'Charts', blocks: blocks.filter((b): b is Block => b !== null) };
}
