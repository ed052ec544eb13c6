/**
 * Section 2: the verdict — the analysis' structured verdict (`analysis/verdict.ts`) rendered as
 * paragraphs: the governing check, the intact beam, the cracked voussoir, what counts, the
 * result and the largest span.
 */
import type { Section } from '../document-types';
import type { SectionContext } from './context';

export function verdictSection(ctx: SectionContext): Section {
  return {
    id: 'verdict',
    title: 'Verdict',
    blocks: ctx.verdict.sentences.map((s) => ({ kind: 'paragraph' as const, text: s.text, ...(s.strong ? { strong: true } : {}) })),
  };
}
