/**
 * The support section (METHODS §12): the bolt pattern's results and the support needed as the
 * report holds them, the support rows of the check table (modes `bolt`, `skin`,
 * `interlayerShear`: nothing re-derived), and the empirical cross-check, never counted. Only
 * present when the project gives support or Q ratings. With a bolt pattern, the strata-and-bolts
 * drawing (`charts/support-bolts.ts`) follows the pattern's results.
 */
import { MODE_LABEL, STATUS_TEXT, SUPPORT_MODES } from '../../analysis/check-labels';
import { openingWords, qSpanWord } from '../../model/span-wording';
import { formatQuantity } from '../../model/units';
import { numberText } from '../number-text';
import { supportBoltsSvg } from '../charts/support-bolts';
import type { Block, Section } from '../document-types';
import { layerName, type SectionContext } from './context';

export function supportSection(ctx: SectionContext): Section | null {
  const r = ctx.analysis.report;
  const b = ctx.project.support.bolts;
  if (!r.support && !r.empirical) return null;
  const L = (v: number) => formatQuantity(v, 'length', ctx.units);
  const F = (v: number) => formatQuantity(v, 'boltForce', ctx.units);
  const fs = (v: number | null) => (v === null ? '—' : numberText(v, 3));
  const blocks: Block[] = [];
  if (b) {
    const items = [
      { key: 'Bolts', value: `${L(b.length_m)} long, ${F(b.capacity_kN)} each at ${L(b.spacingAcross_m)} × ${L(b.spacingAlong_m)}; anchorage ${L(b.anchorage_m)}; ${b.action === 'suspension' ? 'suspension' : 'beam building'}` },
    ];
    const s = r.support?.bolts;
    if (s) {
      items.push({ key: 'Anchor layer', value: s.anchorLayer === null ? 'none credited (the anchorage zone crosses an interface)' : layerName(ctx, s.anchorLayer) });
      if (s.suspended.length) {
        items.push({ key: 'Suspended', value: s.suspended.map((i) => layerName(ctx, i)).join(', ') });
        items.push({ key: 'Load per bolt', value: `${F(s.load_kN)}, FS ${fs(s.fsBolt)} against ${numberText(ctx.project.design.fsTarget.bolt, 3)}` });
      }
      if (s.composite) {
        items.push({ key: 'Composite beam', value: `${s.composite.credited ? 'credited: the bonded tension counts' : 'not credited: the unbonded tension counts'}; least interlayer shear FS ${fs(s.composite.fsShear)}` });
      }
    }
    blocks.push({ kind: 'keyValue', items });
    blocks.push({
      kind: 'chart',
      title: 'Bolts in the strata',
      svg: supportBoltsSvg(ctx.project, r, { units: ctx.units }),
      caption: 'The bolt pattern in the strata column: anchorage zone at each tip, suspended and bonded layers marked in words and hatch.',
    });
  } else if (ctx.project.support.standing_kPa > 0) {
    blocks.push({ kind: 'paragraph', text: `Standing support ${formatQuantity(ctx.project.support.standing_kPa, 'pressure', ctx.units)}, capped at the load it relieves.` });
  }
  const rows = ctx.rows.filter((row) => SUPPORT_MODES.includes(row.mode));
  if (rows.length) {
    blocks.push({
      kind: 'list',
      items: rows.map((row) => `${MODE_LABEL[row.mode]}, ${row.layerIndex === null ? row.layer : layerName(ctx, row.layerIndex)}: FS ${fs(row.fs)} against ${numberText(row.target, 3)} — ${STATUS_TEXT[row.status]}${row.reason ? ` (${row.reason})` : ''}. ${row.note}`),
    });
  }
  const n = r.support?.needed;
  if (r.support?.neededReason) blocks.push({ kind: 'paragraph', text: `Support needed: ${r.support.neededReason}.` });
  if (n) {
    const q = (v: number | null, kind: 'length' | 'pressure') => (v === null ? 'none found' : formatQuantity(v, kind, ctx.units));
    blocks.push({ kind: 'keyValue', items: [
      { key: 'Smallest standing support', value: q(n.standing_kPa, 'pressure') },
      { key: 'Largest square bolt spacing', value: q(n.boltSpacing_m, 'length') },
      { key: 'Shortest bolt length', value: q(n.boltLength_m, 'length') },
      { key: `Largest ${openingWords(ctx.project.opening.type).span} with this support`, value: q(n.maxSpan_m, 'length') },
    ] });
    for (const reason of n.reasons) blocks.push({ kind: 'paragraph', text: reason });
  }
  const e = r.empirical;
  if (e) {
    blocks.push({ kind: 'paragraph', text: `Empirical cross-check (Q system, not counted): Q ${numberText(e.q, 3)}; largest unsupported ${qSpanWord(ctx.project.opening.type)} ${L(e.unsupportedSpan_m)}; bolt length ${L(e.boltLength_m)}. ${e.note}` });
  }
  return { id: 'support', title: 'Support', blocks };
}
