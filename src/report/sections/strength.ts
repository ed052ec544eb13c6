/**
 * Appendix A: the notes on the checks and the layer results, the lab specimens, and the
 * strength chain of each layer step by step with the reason and source and its chart; the
 * formulas are in the calculation trace (appendix B), once.
 */
import type { Block, Cell, Section } from '../document-types';
import { openingWords } from '../../model/span-wording';
import { quantityText, titleWithUnit } from '../format';
import { numberText } from '../number-text';
import { strengthCharts } from './charts';
import { resultBlocks } from './checks';
import { labBlocks } from './inputs';
import { qCell, textCell } from './cells';
import type { SectionContext } from './context';

export function strengthSection(ctx: SectionContext): Section {
  const { analysis, units } = ctx;
  const blocks: Block[] = [...resultBlocks(ctx), ...labBlocks(ctx)];
  blocks.push({ kind: 'heading', level: 3, text: 'Strength chain' });
  analysis.report.layers.forEach((layer, i) => {
    const detail = analysis.layers[i];
    blocks.push({ kind: 'heading', level: 4, text: `Strength chain of layer ${i + 1}: ${layer.name}` });
    if (detail) {
      blocks.push({
        kind: 'table',
        caption: `Strength chain of layer ${i + 1}`,
        columns: [{ title: 'Step' }, { title: titleWithUnit('Tensile strength', 'stress', units), numeric: true }, { title: 'Why' }, { title: 'Source' }],
        rows: detail.steps.map((s): Cell[] => [textCell(s.label), qCell(s.value_MPa, 'stress', units), textCell(s.reason), textCell(s.source)]),
      });
      const b = detail.blockSize;
      const hb = detail.hoekBrown;
      blocks.push({
        kind: 'keyValue',
        items: [
          { key: 'RQD', value: `${numberText(layer.strength.rqd)} %` },
          { key: 'GSI', value: numberText(layer.strength.gsi) },
          { key: 'Hoek–Brown mb, s, a', value: `${numberText(hb.mb)}, ${numberText(hb.s)}, ${numberText(hb.a)}` },
          { key: 'Rock-mass UCS σci·s^a', value: quantityText(hb.massUcs_MPa, 'stress', units) },
          {
            key: 'Size effect',
            value: `d_lab ${quantityText(b.dLab_mm, 'smallLength', units)}, d_eff ${quantityText(b.dEff_mm, 'smallLength', units)}` +
              `${b.clamped ? ` (clamped from ${quantityText(b.dEffRaw_mm, 'smallLength', units)} to the 10–200 mm range of the fit and ≥ d_lab)` : ''}, factor ${numberText(b.factor)}`,
          },
          { key: 'Modulus used in the mechanics', value: quantityText(detail.modulusUsed_GPa, 'modulus', units) },
          { key: `Cross-jointed at this ${openingWords(ctx.project.opening.type).span}`, value: layer.strength.crossJointed ? 'yes — no tensile strength across the joints (design = 0)' : 'no' },
          { key: 'Design tensile strength', value: quantityText(layer.strength.design_MPa, 'stress', units) },
        ],
      });
    }
    blocks.push(...strengthCharts(ctx, i));
  });
  return { id: 'strength', title: 'Appendix A — Layer results, lab tests and strength chain', appendix: true, blocks };
}
