/** The inputs — opening, loads, strata, lab strength per layer, targets and options (summary); the lab specimens (appendix A). */
import type { Block, Cell, Section } from '../document-types';
import { inputQuantityText, quantityText, titleWithUnit } from '../format';
import { PRECISION, numberText } from '../number-text';
import { inCell, nCell, qCell, textCell } from './cells';
import type { SectionContext } from './context';

const OPENING_TEXT = {
  beam: 'long opening (plane-strain beam)',
  slab: 'rectangular roof slab (plate)',
  cantilever: 'overhang (cantilever)',
  intersection: 'intersection (beam on the diagonal of the entry widths)',
} as const;

const RULE_TEXT = {
  mean: 'mean of the specimens',
  lower5: 'lower 5 % fractile m(1 − kn·V) (EN 1990 Annex D)',
  cautiousMean: 'cautious mean m(1 − t·V/√n) (EN 1997-1 §2.4.5.2)',
  lower5Log: 'lognormal 5 % fractile exp(m_y − kn·s_y) (EN 1990 Annex D, D7.3)',
} as const;

export function inputsSection(ctx: SectionContext): Section {
  const { project, units, analysis } = ctx;
  const o = project.opening;
  const blocks: Block[] = [];

  blocks.push({ kind: 'heading', level: 3, text: 'Opening and loads' });
  blocks.push({
    kind: 'keyValue',
    items: [
      { key: 'Opening', value: OPENING_TEXT[o.type] },
      { key: o.type === 'cantilever' ? 'Overhang length' : o.type === 'slab' ? 'Span (short side)' : o.type === 'intersection' ? 'Entry width w1' : 'Span', value: inputQuantityText(o.span_m, 'length', units) },
      ...(o.type === 'slab' ? [{ key: 'Length (long side)', value: inputQuantityText(o.length_m, 'length', units) }] : []),
      ...(o.type === 'intersection'
        ? [
            { key: 'Entry width w2', value: inputQuantityText(o.length_m, 'length', units) },
            { key: 'Design span (diagonal √(w1² + w2²))', value: quantityText(analysis.report.opening.designSpan_m, 'length', units) },
          ]
        : []),
      { key: 'Ends', value: o.type === 'cantilever' ? 'fixed root, free tip' : o.ends === 'clamped' ? 'clamped (built-in)' : 'simply supported' },
      ...(o.type === 'slab' && o.edges ? [{ key: 'Slab edges', value: `short edges ${o.edges.short}, long edges ${o.edges.long}` }] : []),
      { key: 'Surcharge on top of the analysed strata', value: inputQuantityText(project.loads.surcharge_kPa, 'pressure', units) },
      { key: 'Standing support (upward, capped at the load it relieves)', value: inputQuantityText(project.support.standing_kPa, 'pressure', units) },
      { key: `Horizontal stress along the ${project.opening.type === 'cantilever' ? 'overhang' : 'span'} (compression +)`, value: inputQuantityText(project.loads.horizontalStress_MPa, 'stress', units) },
    ],
  });

  blocks.push({ kind: 'heading', level: 3, text: 'Strata (layer 1 is the immediate roof)' });
  blocks.push({
    kind: 'table',
    caption: 'Strata: geometry and stiffness',
    columns: [
      { title: 'Layer' }, { title: 'Name' },
      { title: titleWithUnit('Thickness', 'length', units), numeric: true },
      { title: titleWithUnit('Unit weight', 'unitWeight', units), numeric: true },
      { title: titleWithUnit('Young’s modulus E', 'modulus', units), numeric: true },
      { title: 'Modulus basis' },
      { title: 'Poisson ratio ν', numeric: true },
      { title: titleWithUnit('UCS', 'stress', units), numeric: true },
      { title: 'Rock class' },
    ],
    rows: project.layers.map((l, i): Cell[] => [
      nCell(i + 1), textCell(l.name), inCell(l.thickness_m, 'length', units), inCell(l.unitWeight_kNm3, 'unitWeight', units),
      inCell(l.youngModulus_GPa, 'modulus', units), textCell(l.modulusBasis === 'mass' ? 'rock mass (as given)' : 'intact (reduced with GSI)'),
      inCell(l.poisson, null, units), inCell(l.ucs_MPa, 'stress', units), textCell(l.rockClass),
    ]),
  });
  blocks.push({
    kind: 'table',
    caption: 'Strata: tensile input, jointing and Hoek–Brown',
    columns: [
      { title: 'Layer' },
      { title: titleWithUnit('Tensile value', 'stress', units), numeric: true },
      { title: 'Test method' },
      { title: 'Specimens', numeric: true },
      { title: titleWithUnit('Cross-joint spacing', 'length', units), numeric: true },
      { title: 'Fracture frequency (1/m)', numeric: true },
      { title: 'RQD given (%)', numeric: true },
      { title: 'JCond89', numeric: true },
      { title: 'Joint friction φ (°)', numeric: true },
      { title: 'Hoek–Brown mi', numeric: true },
      { title: 'Disturbance D', numeric: true },
    ],
    rows: project.layers.map((l, i): Cell[] => [
      nCell(i + 1), inCell(l.tensile.value_MPa, 'stress', units), textCell(l.tensile.method), nCell(l.tensile.specimens.length),
      l.jointing.crossJointSpacing_m === null ? textCell('none seen') : inCell(l.jointing.crossJointSpacing_m, 'length', units),
      inCell(l.jointing.fractureFrequency_per_m, null, units), inCell(l.jointing.rqd, null, units), inCell(l.jointing.jointCondition, null, units),
      inCell(l.jointing.jointFriction_deg, null, units), inCell(l.hoekBrown.mi, null, units), inCell(l.hoekBrown.disturbance, null, units),
    ]),
  });

  blocks.push({
    kind: 'table',
    caption: 'Laboratory tensile strength per layer (the specimens are listed in appendix A)',
    columns: [{ title: 'Layer' }, { title: 'Source' }, { title: 'Used', numeric: true }, { title: titleWithUnit('Mean (direct)', 'stress', units), numeric: true }, { title: 'V', numeric: true }, { title: titleWithUnit('Characteristic', 'stress', units), numeric: true }],
    rows: project.layers.map((layer, i): Cell[] => {
      const lab = analysis.layers[i]?.lab;
      if (!lab) return [textCell(`${i + 1} ${layer.name}`), textCell('—'), nCell(null), nCell(null), nCell(null), nCell(null)];
      return [textCell(`${i + 1} ${layer.name}`), textCell(lab.source === 'value' ? 'given value' : 'specimens'), nCell(lab.source === 'value' ? null : lab.n), qCell(lab.mean_MPa, 'stress', units), nCell(lab.cov), qCell(lab.characteristic_MPa, 'stress', units)];
    }),
  });

  const d = project.design;
  blocks.push({ kind: 'heading', level: 3, text: 'Targets and options' });
  blocks.push({
    kind: 'keyValue',
    items: [
      { key: 'FS target, tension', value: numberText(d.fsTarget.tension, PRECISION.storedInput) },
      { key: 'FS target, crushing', value: numberText(d.fsTarget.crushing, PRECISION.storedInput) },
      { key: 'FS target, sliding', value: numberText(d.fsTarget.sliding, PRECISION.storedInput) },
      { key: 'Deflection limit δ/t', value: numberText(d.deflectionLimitRatio, PRECISION.storedInput) },
      { key: 'Characteristic value', value: RULE_TEXT[d.characteristic] },
      { key: 'Tensile basis', value: d.tensileBasis === 'lab' ? 'lab: characteristic strength with the size effect' : 'rock mass: min(block, Hoek–Brown rock mass)' },
      { key: 'Crushing strength', value: d.crushingStrength === 'lab' ? 'UCS as given (lab)' : 'rock-mass UCS σci·s^a (Hoek–Brown)' },
      { key: 'Design basis', value: d.basis === 'intact' ? 'intact: a layer that does not crack must not crack' : 'jointed: the roof is taken as cracked' },
      { key: 'Plane-strain modulus E/(1−ν²)', value: d.planeStrainModulus ? 'used in deflection and Euler stress' : 'not used (E as given)' },
    ],
  });
  return { id: 'inputs', title: 'Inputs', blocks };
}

/** Appendix A: the lab specimens of every layer with their reduction. */
export function labBlocks(ctx: SectionContext): Block[] {
  const { project, analysis, units } = ctx;
  const blocks: Block[] = [];
  blocks.push({ kind: 'heading', level: 3, text: 'Laboratory tensile tests' });
  project.layers.forEach((layer, i) => {
    const lab = analysis.layers[i]?.lab;
    if (!lab) return;
    blocks.push({ kind: 'heading', level: 4, text: `Layer ${i + 1}: ${layer.name}` });
    if (lab.source === 'value') {
      blocks.push({
        kind: 'paragraph',
        text: `No specimens: the given ${lab.method === 'brazilian' ? 'Brazilian' : 'direct'} tensile strength of ${inputQuantityText(layer.tensile.value_MPa, 'stress', units)} is used as the characteristic lab value.`,
      });
    } else {
      blocks.push({
        kind: 'table',
        caption: `Specimens of layer ${i + 1}`,
        columns: [
          { title: 'ID' },
          { title: titleWithUnit('Diameter D', 'smallLength', units), numeric: true },
          { title: titleWithUnit('Thickness L', 'smallLength', units), numeric: true },
          { title: 'L/D', numeric: true },
          { title: titleWithUnit('Peak load P', 'force', units), numeric: true },
          { title: titleWithUnit('Brazilian 2P/(πDL)', 'stress', units), numeric: true },
          { title: titleWithUnit('Direct', 'stress', units), numeric: true },
          { title: 'Used' },
          { title: 'Why not used / remarks' },
        ],
        rows: lab.specimens.map((s): Cell[] => [
          textCell(s.id), inCell(s.diameter_mm, 'smallLength', units), inCell(s.thickness_mm, 'smallLength', units),
          nCell(s.diameter_mm > 0 ? s.thickness_mm / s.diameter_mm : null), inCell(s.peakLoad_kN, 'force', units),
          qCell(s.brazilian_MPa, 'stress', units), qCell(s.direct_MPa, 'stress', units),
          textCell(s.accepted ? 'yes ✓' : 'no ✗'),
          textCell([s.reason ?? '', ...s.warnings].filter((x) => x).join('; ') || '—'),
        ]),
      });
    }
    const rule = lab.rule === 'mean' || lab.kn === null ? RULE_TEXT.mean : `${RULE_TEXT[lab.rule]}, ${lab.rule === 'cautiousMean' ? 't/√n' : 'kn'} = ${numberText(lab.kn, 3)}`;
    blocks.push({
      kind: 'keyValue',
      items: [
        { key: 'Specimens used', value: numberText(lab.n) },
        { key: 'Mean (direct)', value: quantityText(lab.mean_MPa, 'stress', units) },
        { key: 'Standard deviation', value: quantityText(lab.sd_MPa, 'stress', units) },
        { key: 'Coefficient of variation V', value: numberText(lab.cov) },
        { key: 'Direct/Brazilian factor', value: numberText(lab.directFactor) },
        { key: 'Characteristic value', value: `${quantityText(lab.characteristic_MPa, 'stress', units)} (${rule})` },
      ],
    });
  });

  return blocks;
}
