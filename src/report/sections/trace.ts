/** Appendix B: the full calculation trace, every entry once, grouped by layer, with the steps of each iteration. */
import type { TraceEntry } from '../../model/types';
import { openingWords } from '../../model/span-wording';
import type { Block, Section } from '../document-types';
import { traceBlock } from '../trace-block';
import { stepsChart, stepsTable } from '../trace-steps';
import type { SectionContext } from './context';

export function traceSection(ctx: SectionContext): Section {
  const blocks: Block[] = [
    {
      kind: 'paragraph',
      text: 'Every reported number with its formula, the values put into it (in the units the calculation used) and the result, so it can be redone by hand.',
    },
  ];
  let group: number | null = null;
  for (const entry of orderedTrace(ctx.analysis.report.trace)) {
    const g = traceGroup(entry);
    if (g !== group) {
      const name = ctx.analysis.report.layers[g]?.name;
      blocks.push({ kind: 'heading', level: 3, text: name !== undefined ? `Layer ${g + 1}: ${name}` : `Whole roof: groups, governing check and largest ${openingWords(ctx.project.opening.type).spans}` });
      group = g;
    }
    blocks.push(traceBlock(entry, ctx.units));
    if (entry.steps) {
      blocks.push(stepsTable(entry.steps));
      const chart = stepsChart(entry.steps);
      if (chart) blocks.push(chart);
    }
  }
  if (ctx.analysis.report.trace.length === 0) blocks.push({ kind: 'paragraph', text: 'The analysis returned no trace entries.' });
  return { id: 'trace', title: 'Appendix B — Calculation trace', appendix: true, blocks };
}

/** Layer index an entry belongs to (`layers[i].…` or `detail.layers[i].…`); whole-roof entries sort last. */
export function traceGroup(entry: TraceEntry): number {
  const m = /^(?:detail\.)?layers\[(\d+)\]/.exec(entry.path);
  return m ? Number(m[1]) : Number.MAX_SAFE_INTEGER;
}

/** The trace grouped by layer (whole-roof entries last), the analysis order kept within a group. */
export function orderedTrace(trace: readonly TraceEntry[]): TraceEntry[] {
  return trace.map((entry, i) => ({ entry, i })).sort((a, b) => traceGroup(a.entry) - traceGroup(b.entry) || a.i - b.i).map((x) => x.entry);
}
