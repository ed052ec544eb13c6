/**
 * The one place that turns a factor of safety and its target into a check status, with a word
 * AND a symbol so that no output relies on colour alone. Used by the report, the CSV and the app.
 *
 *     checkStatus(2.5, 2)   // { kind: 'meets', word: 'meets', symbol: '✓', text: 'meets ✓', ... }
 *     checkStatus(0.4, 4)   // { kind: 'below', word: 'below', symbol: '✗', text: 'below ✗', ... }
 *     checkStatus(null, 4)  // { kind: 'na',    word: 'n/a',   symbol: '–', text: 'n/a –', ... }
 */
import { numberText } from './number-text';

export type StatusKind = 'meets' | 'below' | 'na' | 'info';

export interface CheckStatus {
  kind: StatusKind;
  word: string;
  symbol: string;
  /** Word and symbol together, e.g. "meets ✓". */
  text: string;
  /** One plain sentence for tooltips and screen readers. */
  description: string;
}

export interface StatusOptions {
  /**
   * The check is computed and shown but does not count for the verdict (tension when
   * `design.basis` is "jointed"): status "info ○" whatever the value.
   */
  excluded?: boolean;
}

const STATUS: Record<StatusKind, { word: string; symbol: string }> = {
  meets: { word: 'meets', symbol: '✓' },
  below: { word: 'below', symbol: '✗' },
  na: { word: 'n/a', symbol: '–' },
  info: { word: 'info', symbol: '○' },
};

function make(kind: StatusKind, description: string): CheckStatus {
  const { word, symbol } = STATUS[kind];
  return { kind, word, symbol, text: `${word} ${symbol}`, description };
}

/** Status of a check from its factor of safety (or null: not applicable) and its target. */
export function checkStatus(fs: number | null | undefined, target: number, options: StatusOptions = {}): CheckStatus {
  if (fs === null || fs === undefined || !Number.isFinite(fs)) {
    return make('na', 'not applicable to this layer or opening');
  }
  if (options.excluded) {
    return make('info', 'reported for information; excluded from the verdict by the design basis');
  }
  if (!(target > 0)) return make('na', 'no target set');
  return fs >= target
    ? make('meets', `factor of safety ${numberText(fs, 3)} meets the target ${numberText(target, 3)}`)
    : make('below', `factor of safety ${numberText(fs, 3)} is below the target ${numberText(target, 3)}`);
}

/** Legend lines for the statuses, for the report's key. */
export const STATUS_LEGEND: ReadonlyArray<{ text: string; meaning: string }> = [
  { text: 'meets ✓', meaning: 'the factor of safety reaches the target' },
  { text: 'below ✗', meaning: 'the factor of safety is short of the target' },
  { text: 'info ○', meaning: 'computed and shown, but not counted by the chosen design basis' },
  { text: 'n/a –', meaning: 'the check does not apply (e.g. no net tension, cross-jointed layer, cantilever)' },
];
