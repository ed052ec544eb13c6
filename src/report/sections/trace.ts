/** Section 6: the full calculation trace, every entry, grouped by layer. */
import type { Block, Section } from '../document-types';
import { traceBlock } from '../trace-block';
import type { SectionContext } from './context';

export function traceSection(ctx: SectionContext): Section {
  const blocks: Block[] = [
    {
      kind: 'paragraph',
      text: 'Every reported number with its formula, the values put into it (in the units the calculation used) and the result, so it can be redone by hand.',
    },
  ];
  let group: string | null = null;
  for (const entry of ctx.analysis.report.trace) {
    const m = /^layers\[(\d+)\]/.exec(entry.path);
    const heading = m ? `Layer ${Number(m[1]) + 1}: ${ctx.analysis.report.layers[Number(m[1])]?.name ?? ''}` : 'Whole roof';
    if (heading !== group) {
      blocks.push({ kind: 'heading', level: 3, text: heading });
      group = heading;
    }
    blocks.push(traceBlock(entry, ctx.units));
  }
  if (ctx.analysis.report.trace.length === 0) blocks.push({ kind: 'paragraph', text: 'The analysis returned no trace entries.' });
  return { id: 'trace', title: 'Calculation trace', blocks };
}
