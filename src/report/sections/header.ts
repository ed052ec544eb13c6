/** Section 1: header (title, date, version, file hash, units) and the caution. */
import { CAUTION, CAUTION_TITLE } from '../../model/caution';
import type { Section } from '../document-types';
import type { SectionContext } from './context';

export const UNIT_SYSTEM_TEXT = {
  SI: 'SI (m, mm, kPa, MPa, GPa, kN/m³, kN)',
  US: 'US customary (ft, in, psf, psi, ksi, lbf/ft³, lbf); the calculation trace keeps the SI units it was computed in',
} as const;

export function headerSection(ctx: SectionContext, meta: { date: string; version: string; hash: string }): Section {
  const { project } = ctx;
  const items = [
    { key: 'Project', value: project.title },
    ...(project.description ? [{ key: 'Description', value: project.description }] : []),
    { key: 'Date', value: meta.date },
    { key: 'Lamina version', value: meta.version },
    { key: 'Input file hash (FNV-1a 64)', value: meta.hash },
    { key: 'Units', value: UNIT_SYSTEM_TEXT[ctx.units] },
    { key: 'Design basis', value: project.design.basis === 'intact' ? 'intact — the beam must not crack' : 'jointed — the roof is taken as cracked' },
  ];
  return {
    id: 'header',
    title: 'Project and report details',
    blocks: [
      { kind: 'callout', tone: 'caution', title: CAUTION_TITLE, text: CAUTION },
      { kind: 'keyValue', items },
    ],
  };
}

export function closingSection(): Section {
  return {
    id: 'closing',
    title: 'End of report',
    blocks: [{ kind: 'callout', tone: 'caution', title: CAUTION_TITLE, text: CAUTION }],
  };
}
