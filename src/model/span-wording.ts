/**
 * The one place that words the opening for its type. A beam or a slab has a span between two
 * abutments with a midspan; an overhang (opening.type "cantilever") has no span: it has its
 * length, the overhang, from the fixed end (the root) to the free end. The report, the app and
 * the command line take these words from here; field paths and JSON keys (span_m, maxSpan_m,
 * abutmentTension_MPa) never change.
 *
 *     openingWords('cantilever').span          // "overhang"
 *     inOpeningWords('Largest span with this support', 'cantilever')
 *                                              // "Largest overhang with this support"
 */

export interface OpeningWords {
  /** "span" | "overhang" | "entry width" — the opening's length in a sentence. */
  span: string;
  /** Plural of `span`. */
  spans: string;
  /** `span` with a capital, for a label or a column title. */
  Span: string;
  /** Where the beam is held: "abutment" or "fixed end (root)". */
  support: string;
  /** Where a beam has its midspan: "midspan" or "free end". */
  middle: string;
}

const WORDS: Record<'span' | 'overhang' | 'entry width', OpeningWords> = {
  span: { span: 'span', spans: 'spans', Span: 'Span', support: 'abutment', middle: 'midspan' },
  overhang: { span: 'overhang', spans: 'overhangs', Span: 'Overhang', support: 'fixed end (root)', middle: 'free end' },
  'entry width': { span: 'entry width', spans: 'entry widths', Span: 'Entry width', support: 'abutment', middle: 'midspan' },
};

/** The words for an opening type ("beam", "slab", "cantilever", "intersection"). */
export function openingWords(openingType: string): OpeningWords {
  return WORDS[openingType === 'cantilever' ? 'overhang' : openingType === 'intersection' ? 'entry width' : 'span'];
}

/**
 * The Q system's unsupported dimension in a sentence: the opening's own word ("span", "entry
 * width"), but "roof width" for an overhang, whose reach it does not limit (the system's
 * spans are for the roofs of openings).
 */
export function qSpanWord(openingType: string): string {
  return isOverhang(openingType) ? 'roof width' : openingWords(openingType).span;
}

/** True for an overhang (a cantilever), the one opening type that has no span. */
export function isOverhang(openingType: string): boolean {
  return openingType === 'cantilever';
}

// Ordered: the longer phrases first. Whole words only, so field paths (span_m, maxSpan_m,
// midspanTension_MPa, `layers[0].elastic.abutmentTension_MPa`) are never touched.
const OVERHANG_REWRITES: ReadonlyArray<[RegExp, string]> = [
  [/\bat midspan\b/g, 'at the free end'],
  [/\bAt midspan\b/g, 'At the free end'],
  [/\bmidspan\b/g, 'free-end'],
  [/\bMidspan\b/g, 'Free-end'],
  [/\bthe abutments?\b/g, 'the fixed end'],
  [/\bThe abutments?\b/g, 'The fixed end'],
  [/\bAbutment\/root\b/g, 'Root'],
  [/\babutments?\b/g, 'fixed end'],
  [/\bAbutments?\b/g, 'Fixed end'],
  [/\ba span\b/g, 'an overhang'],
  [/\bA span\b/g, 'An overhang'],
  [/\bspans\b/g, 'overhangs'],
  [/\bSpans\b/g, 'Overhangs'],
  [/\bspan\b/g, 'overhang'],
  [/\bSpan\b/g, 'Overhang'],
];

/**
 * A sentence written for a span, in the words of the opening: for an overhang "span" becomes
 * "overhang", "abutment" the fixed end and "midspan" the free end; any other opening keeps the
 * text as written. Whole words only: field paths and keys stay as they are.
 *     inOpeningWords('FS sliding rises with span', 'cantilever') // "FS sliding rises with overhang"
 */
export function inOpeningWords(text: string, openingType: string): string {
  if (!isOverhang(openingType)) return text;
  let out = text;
  for (const [re, to] of OVERHANG_REWRITES) out = out.replace(re, to);
  return out;
}

/** Every word that names a span, its abutments or its midspan (what an overhang never shows). */
export const SPAN_WORD_PATTERN = /\b(?:mid-?spans?|spans?|abutments?)\b/gi;
