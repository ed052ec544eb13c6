/** Section 1: header (title, date, version, file hash, units) and the caution. */
import { CAUTION, CAUTION_TITLE } from '../../model/caution';
import type { Block, Section } from '../document-types';
import { demoLeftover, demoLeftoverText } from '../../model/demo-leftover';
import { isNewProject, pendingDefaults } from '../../model/new-project';
import { inputQuantityText } from '../format';
import type { SectionContext } from './context';

export const UNIT_SYSTEM_TEXT = {
  SI: 'SI (m, mm, kPa, MPa, GPa, kN/m³, kN)',
  US: 'US customary (ft, in, psf, psi, ksi, lbf/ft³, lbf); the calculation trace keeps the SI units it was computed in',
} as const;

export function headerSection(ctx: SectionContext, meta: { date: string; version: string; hash: string; appendix: boolean }): Section {
  const { project } = ctx;
  const items = [
    { key: 'Project', value: project.title },
    { key: 'Date', value: meta.date },
    { key: 'Lamina version', value: meta.version },
    { key: 'Input file hash (FNV-1a 64)', value: meta.hash },
    { key: 'Units', value: UNIT_SYSTEM_TEXT[ctx.units] },
    { key: 'Design basis', value: project.design.basis === 'intact' ? 'intact — the beam must not crack' : 'jointed — the roof is taken as cracked' },
    {
      key: 'Contents',
      value: meta.appendix
        ? 'Summary, then the appendix: A strength chain, B calculation trace (every step with its formula, values and source), C methods, assumptions and limits'
        : 'Summary only: the appendix (strength chain, calculation trace, methods) was left out of this printout',
    },
  ];
  return {
    id: 'header',
    title: 'Project and report details',
    blocks: [
      { kind: 'callout', tone: 'caution', title: CAUTION_TITLE, text: CAUTION },
      ...provenanceWarnings(ctx),
      { kind: 'keyValue', items },
      ...(project.description ? [{ kind: 'paragraph' as const, text: `Description: ${project.description}` }] : []),
    ],
  };
}

/** Demo text left in a changed project, and placeholders of a new project still in use. */
function provenanceWarnings(ctx: SectionContext): Block[] {
  const blocks: Block[] = [];
  const leftover = demoLeftover(ctx.project);
  if (leftover) blocks.push({ kind: 'callout', tone: 'warning', title: 'Demo text in a changed project', text: demoLeftoverText(leftover) });
  if (isNewProject(ctx.project)) {
    const left = pendingDefaults(ctx.project).filter((v) => v.kind === 'placeholder');
    if (left.length > 0) {
      const list = left.map((v) => `${v.label} ${typeof v.value === 'number' && v.quantity ? inputQuantityText(v.value, v.quantity, ctx.units) : String(v.value)}`);
      blocks.push({ kind: 'callout', tone: 'warning', title: 'Placeholder values still in use', text: `This new project still holds Lamina’s placeholders, not site data: ${list.join('; ')}.` });
    }
  }
  return blocks;
}

export function closingSection(): Section {
  return {
    id: 'closing',
    title: 'End of report',
    blocks: [{ kind: 'callout', tone: 'caution', title: CAUTION_TITLE, text: CAUTION }],
  };
}
