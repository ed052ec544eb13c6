/**
 * The one vocabulary of the check table: the order of the modes, their names in a table and in
 * a sentence, and the status words and symbols (a word AND a symbol, never colour alone).
 * The report, the app, the charts and the CLI take their words from here.
 *
 *     STATUS_TEXT.below // "below ✗"
 */
import type { CheckMode, CheckStatusKind, Mode } from '../model/types';

/** Table order of the modes. */
export const MODES: readonly Mode[] = ['tension', 'crushing', 'sliding', 'deflection', 'snapThrough'];

/** Modes of the voussoir (cracked beam). */
export const VOUSSOIR_MODES: readonly Mode[] = ['crushing', 'sliding', 'deflection', 'snapThrough'];

/** Row labels in a check table. */
export const MODE_LABEL: Record<CheckMode, string> = {
  tension: 'tension (intact beam)',
  crushing: 'crushing (voussoir arch)',
  sliding: 'abutment sliding (voussoir arch)',
  deflection: 'midspan deflection δ/t (voussoir arch)',
  snapThrough: 'snap-through (voussoir arch)',
  bolt: 'bolt load (suspension)',
  skin: 'skin between bolts',
  interlayerShear: 'interlayer shear (beam building)',
  probabilityOfFailure: 'probability of failure P_f (uncertainty run)',
};

/**
 * The row label for an opening type: an overhang (cantilever) has one root and no arch, so its
 * (not applicable) voussoir rows speak of joint sliding and deflection, not of abutments or midspan.
 *     modeLabel('sliding', 'cantilever') // "joint sliding (voussoir arch)"
 */
export function modeLabel(mode: CheckMode, openingType: string): string {
  if (openingType === 'cantilever' && mode === 'sliding') return 'joint sliding (voussoir arch)';
  if (openingType === 'cantilever' && mode === 'deflection') return 'deflection δ/t (voussoir arch)';
  return MODE_LABEL[mode];
}

/** Table order of the support modes (after the layer modes). */
export const SUPPORT_MODES: readonly CheckMode[] = ['bolt', 'skin', 'interlayerShear'];

/** What the P_f row (METHODS §16) shows in place of a layer: it belongs to the whole roof. */
export const WHOLE_ROOF = 'whole roof';

/** Names inside a sentence ("… governs: crushing of the arch in layer 1"). */
export const MODE_NAME: Record<CheckMode, string> = {
  tension: 'tension',
  crushing: 'crushing of the arch',
  sliding: 'sliding at the abutments',
  deflection: 'midspan deflection',
  snapThrough: 'snap-through',
  bolt: 'the bolt load',
  skin: 'the skin between bolts',
  interlayerShear: 'the interlayer shear of the bolted beam',
  probabilityOfFailure: 'the probability of failure against the acceptable P_f',
};

/** The name inside a sentence for an opening type (an overhang has no abutments). */
export function modeName(mode: CheckMode, openingType: string): string {
  if (openingType === 'cantilever' && mode === 'sliding') return 'joint sliding';
  if (openingType === 'cantilever' && mode === 'deflection') return 'deflection';
  return MODE_NAME[mode];
}

/** Short names for chart labels and legends. */
export const MODE_SHORT: Record<CheckMode, string> = {
  tension: 'tension',
  crushing: 'crushing',
  sliding: 'sliding',
  deflection: 'deflection',
  snapThrough: 'snap-through',
  bolt: 'bolt',
  skin: 'skin',
  interlayerShear: 'interlayer shear',
  probabilityOfFailure: 'P_f',
};

export const STATUS_WORD: Record<CheckStatusKind, string> = { meets: 'meets', below: 'below', info: 'info', na: 'n/a' };
export const STATUS_SYMBOL: Record<CheckStatusKind, string> = { meets: '✓', below: '✗', info: '○', na: '–' };
export const STATUS_TEXT: Record<CheckStatusKind, string> = {
  meets: 'meets ✓',
  below: 'below ✗',
  info: 'info ○',
  na: 'n/a –',
};

/** Legend lines for the statuses, for the report's key. */
export const STATUS_LEGEND: ReadonlyArray<{ text: string; meaning: string }> = [
  { text: STATUS_TEXT.meets, meaning: 'the factor of safety reaches the target, and the check counts' },
  { text: STATUS_TEXT.below, meaning: 'the factor of safety is short of the target, and the check counts' },
  { text: STATUS_TEXT.info, meaning: 'computed and shown, but it does not count (the row says why)' },
  { text: STATUS_TEXT.na, meaning: 'the check does not apply (the row says why)' },
];

/** What a status means, in one sentence (tooltips, screen readers). */
export function statusDescription(row: { status: CheckStatusKind; fs: number | null; target: number; reason: string | null }): string {
  const fs = row.fs === null ? '' : +row.fs.toPrecision(3);
  switch (row.status) {
    case 'meets':
      return `factor of safety ${fs} meets the target ${row.target}`;
    case 'below':
      return `factor of safety ${fs} is below the target ${row.target}`;
    case 'info':
      return `shown for information, not counted: ${row.reason ?? ''}`;
    default:
      return `not applicable: ${row.reason ?? ''}`;
  }
}
