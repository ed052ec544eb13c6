/** The check table and the largest spans (summary); the notes and layer results behind them (appendix A). */
import type { CheckRow, Mode } from '../../model/types';
import { isOverhang, openingWords } from '../../model/span-wording';
import { MODE_LABEL, modeLabel, STATUS_LEGEND, STATUS_TEXT } from '../../analysis/check-labels';
import type { Verdict } from '../../analysis/verdict';
import type { Block, Cell, Section } from '../document-types';
import { fsText, quantityText, titleWithUnit } from '../format';
import { MISSING, numberText } from '../number-text';
import { nCell, qCell, textCell } from './cells';
import type { SectionContext } from './context';

function amount(row: CheckRow, value: number | null, ctx: SectionContext): Cell {
  if (value === null || row.unit === null) return { text: MISSING, value: null, numeric: true };
  if (row.unit === 'ratio') return { text: `δ/t = ${numberText(value, 3)}`, value, numeric: true };
  if (row.unit === 'probability') return { text: `P_f ${numberText(value, 3)}`, value, numeric: true };
  const quantity = row.unit === 'kN' ? 'boltForce' : row.unit === 'kPa' ? 'pressure' : 'stress';
  return { text: quantityText(value, quantity, ctx.units), value, numeric: true };
}

/** True for the row named in `report.governing` (by layer index and mode). */
export function isGoverning(row: CheckRow, ctx: SectionContext): boolean {
  const g = ctx.analysis.report.governing;
  return g !== null && g.layerIndex === row.layerIndex && g.mode === row.mode;
}

export function checkRowCells(row: CheckRow, ctx: SectionContext): Cell[] {
  const label = modeLabel(row.mode, ctx.project.opening.type);
  return [
    textCell(isGoverning(row, ctx) ? `${label} (governing)` : label),
    amount(row, row.demand, ctx),
    amount(row, row.capacity, ctx),
    { text: row.mode === 'snapThrough' && row.fs !== null ? (row.fs > 0 ? 'stands (1)' : 'snaps (0)') : fsText(row.fs), value: row.fs, numeric: true },
    { text: numberText(row.target, 3), value: row.target, numeric: true },
    { text: STATUS_TEXT[row.status], status: row.status },
    textCell(row.reason ? `not counted: ${row.reason} — ${row.note}` : row.note),
  ];
}

/** Why each largest span is what it is, in the opening's own word (span, overhang, entry width). */
function spanNote(word: Verdict['spanWord']): Record<Mode | 'governing', string> {
  return {
    tension: `layers in which tension counts; strengths held at current-${word} values; a jointed layer stops at its joint spacing`,
    crushing: 'arch thrust reaches UCS / target',
    sliding: `FS sliding rises with ${word}, so sliding never limits the ${word} from above`,
    snapThrough: `largest ${word} at which an arch still forms`,
    deflection: 'δ/t reaches the limit',
    governing: 'smallest of the counted modes',
  };
}

export function checksSection(ctx: SectionContext): Section {
  const { analysis, units, project } = ctx;
  const report = analysis.report;
  const blocks: Block[] = [];
  blocks.push({ kind: 'paragraph', text: `Status: ${STATUS_LEGEND.map((s) => `${s.text} ${s.meaning}`).join('; ')}.` });

  // The one check table, every layer and mode; the notes behind each row are in appendix A.
  blocks.push({
    kind: 'table',
    caption: 'Check table: every layer and mode (the notes on each row are in appendix A)',
    columns: [{ title: 'Layer' }, { title: 'Mode' }, { title: 'Demand' }, { title: 'Capacity' }, { title: 'FS', numeric: true }, { title: 'Target', numeric: true }, { title: 'Status' }, { title: 'Counts' }],
    rows: ctx.rows.map((r) => {
      const c = checkRowCells(r, ctx);
      return [textCell(r.layerIndex === null ? r.layer : `${r.layerIndex + 1} ${report.layers[r.layerIndex]?.name ?? ''}`), ...c.slice(0, 6), textCell(r.reason ? `no: ${r.reason}` : 'yes')];
    }),
  });
  const word = ctx.verdict.spanWord;
  const SPAN_NOTE = spanNote(word);
  blocks.push({ kind: 'heading', level: 3, text: `Largest ${word} per mode` });
  const spans = report.maxSpan_m;
  if (spans === null) {
    blocks.push({ kind: 'paragraph', text: `No ${openingWords(project.opening.type).span} search was run for this project.` });
  } else {
    const modes: Array<Mode | 'governing'> = ['tension', 'crushing', 'sliding', 'snapThrough', 'deflection', 'governing'];
    blocks.push({
      kind: 'table',
      caption: `Largest ${ctx.verdict.spanWord} meeting the target (searched up to 100 m; current ${ctx.verdict.spanWord} ${quantityText(project.opening.span_m, 'length', units)}${project.opening.type === 'intersection' ? `, w2/w1 held, design span the diagonal ${quantityText(report.opening.designSpan_m, 'length', units)}` : ''})`,
      columns: [{ title: 'Mode' }, { title: titleWithUnit(`Largest ${word}`, 'length', units), numeric: true }, { title: 'Note' }],
      rows: modes.map((m): Cell[] => {
        const value = spans[m];
        const label = m === 'governing' ? 'governing (all counted modes)' : modeLabel(m, project.opening.type);
        const note = value === null ? (m === 'sliding' ? SPAN_NOTE.sliding : `the mode counts in no layer at the current ${word}`) : value >= 100 ? 'target holds up to the 100 m search cap' : SPAN_NOTE[m];
        return [textCell(label), qCell(value, 'length', units), textCell(note)];
      }),
    });
  }
  return { id: 'checks', title: 'Checks', blocks };
}

/** Appendix A: the note on every check row, and the layer results behind the checks. */
export function resultBlocks(ctx: SectionContext): Block[] {
  const { analysis, units, project } = ctx;
  const report = analysis.report;
  const blocks: Block[] = [];
  blocks.push({ kind: 'heading', level: 3, text: 'Notes on the checks' });
  blocks.push({
    kind: 'table',
    caption: 'Why each check counts or not, and what it compares',
    columns: [{ title: 'Layer' }, { title: 'Mode' }, { title: 'Note' }],
    rows: ctx.rows.map((r) => [textCell(r.layerIndex === null ? r.layer : `${r.layerIndex + 1}`), textCell(modeLabel(r.mode, ctx.project.opening.type)), textCell(r.reason ? `not counted: ${r.reason} — ${r.note}` : r.note)]),
  });
  blocks.push({ kind: 'heading', level: 3, text: 'Intact beam results' });
  // An overhang has a root and a free end, no midspan: its bending tension is at the root.
  const overhang = isOverhang(project.opening.type);
  blocks.push({
    kind: 'table',
    caption: 'Elastic beam per layer (net of horizontal stress, tension positive)',
    columns: [
      { title: 'Layer' }, { title: 'Group', numeric: true },
      { title: titleWithUnit('Load carried', 'pressure', units), numeric: true },
      { title: titleWithUnit(overhang ? 'Root tension' : 'Abutment/root tension', 'stress', units), numeric: true },
      ...(overhang ? [] : [{ title: titleWithUnit('Midspan tension', 'stress', units), numeric: true }]),
      { title: titleWithUnit('Max tension', 'stress', units), numeric: true },
      { title: 'At' },
      { title: titleWithUnit('Deflection', 'deflection', units), numeric: true },
      { title: titleWithUnit('Euler stress', 'stress', units), numeric: true },
    ],
    rows: report.layers.map((l, i): Cell[] => [
      textCell(`${i + 1} ${l.name}`), nCell(l.group + 1, 3), qCell(l.load_kPa, 'pressure', units),
      qCell(l.elastic.abutmentTension_MPa, 'stress', units), ...(overhang ? [] : [qCell(l.elastic.midspanTension_MPa, 'stress', units)]),
      qCell(l.elastic.maxTension_MPa, 'stress', units), textCell(l.elastic.at),
      qCell(l.elastic.deflection_mm, 'deflection', units), qCell(l.elastic.bucklingStress_MPa, 'stress', units),
    ]),
  });

  if (report.layers.some((l) => l.voussoir !== null)) {
    blocks.push({ kind: 'heading', level: 3, text: 'Voussoir (cracked beam) results' });
    if (project.opening.type === 'slab') {
      blocks.push({ kind: 'paragraph', text: 'For a slab the voussoir uses the short span in plane strain (conservative).' });
    }
    blocks.push({
      kind: 'table',
      caption: 'Voussoir arch per layer (Diederichs & Kaiser 1999)',
      columns: [
        { title: 'Layer' }, { title: 'n (zone depth / t)', numeric: true },
        { title: titleWithUnit('Lever arm z', 'length', units), numeric: true },
        { title: titleWithUnit('Max compression fc', 'stress', units), numeric: true },
        { title: titleWithUnit('Midspan deflection δ', 'deflection', units), numeric: true },
        { title: 'δ/t', numeric: true }, { title: 'Snap-through' },
      ],
      rows: report.layers.map((l, i): Cell[] => {
        const v = l.voussoir;
        if (v === null) return [textCell(`${i + 1} ${l.name}`), nCell(null), nCell(null), nCell(null), nCell(null), nCell(null), textCell('n/a (cantilever)')];
        return [
          textCell(`${i + 1} ${l.name}`), nCell(v.n, 3), qCell(v.leverArm_m, 'length', units), qCell(v.maxCompression_MPa, 'stress', units),
          qCell(v.deflection_mm, 'deflection', units), nCell(v.deflectionRatio, 3), textCell(v.snapThrough ? 'yes ✗' : 'no ✓'),
        ];
      }),
    });
  }

  if (report.layers.some((l) => l.plate !== null)) {
    blocks.push({ kind: 'heading', level: 3, text: 'Roof slab (plate) results' });
    blocks.push({
      kind: 'table',
      caption: 'Rectangular plate per layer, σ = β·q·a²/t², w = α·q·a⁴/(E·t³)',
      columns: [
        { title: 'Layer' }, { title: titleWithUnit('Max tension', 'stress', units), numeric: true }, { title: 'At' },
        { title: titleWithUnit('Deflection', 'deflection', units), numeric: true }, { title: 'β', numeric: true }, { title: 'α', numeric: true },
      ],
      rows: report.layers.map((l, i): Cell[] => {
        const p = l.plate;
        if (p === null) return [textCell(`${i + 1} ${l.name}`), nCell(null), textCell('—'), nCell(null), nCell(null), nCell(null)];
        return [textCell(`${i + 1} ${l.name}`), qCell(p.maxTension_MPa, 'stress', units), textCell(p.at), qCell(p.deflection_mm, 'deflection', units), nCell(p.beta, 4), nCell(p.alpha, 4)];
      }),
    });
  }

  return blocks;
}
