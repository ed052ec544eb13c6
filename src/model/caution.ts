/** The engineering caution carried by every screen, report and `--help` (DESIGN.md). */
export const CAUTION =
  'Roof and overhang falls injure and kill. Lamina is a screening aid based on simplified ' +
  'published methods; it does not replace site investigation, monitoring, numerical modelling ' +
  'or the judgement of a qualified, licensed engineer. Designs must follow the ground-control ' +
  'plan and the regulations in force where the work is done.';

/** A short heading for the caution block. */
export const CAUTION_TITLE = 'Caution';

/**
 * The caution in one line, for the bar pinned at the top of narrow screens (the full `CAUTION`
 * stays at the top and the foot of the sheet and in every report).
 */
export const CAUTION_SHORT = 'Screening aid only: roof falls kill. A qualified, licensed engineer must judge every design.';
