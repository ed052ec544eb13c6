/**
 * The calculation trace: for every reported number, the formula as a mathjs expression over
 * named symbols, the substituted values with their units, the result with its unit, and the
 * published source. Evaluating `formula` with the values (as mathjs units) reproduces `result`
 * (a test checks this for every entry), so the trace cannot drift from the computation.
 */
import { inOpeningWords } from '../model/span-wording';
import type { TraceEntry } from '../model/types';

export type TraceValues = Record<string, [number, string]>;

export class TraceBuilder {
  readonly entries: TraceEntry[] = [];

  /** The opening type words the labels and notes (an overhang's entries never name a span). */
  constructor(private readonly openingType = 'beam') {}

  add(path: string, label: string, formula: string, values: TraceValues, result: number, unit: string, source: string, note?: string): TraceEntry {
    const entry: TraceEntry = {
      path,
      label: inOpeningWords(label, this.openingType),
      formula,
      values: Object.fromEntries(Object.entries(values).map(([k, [value, u]]) => [k, { value, unit: u }])),
      result,
      unit,
      source,
    };
    if (note) entry.note = inOpeningWords(note, this.openingType);
    this.entries.push(entry);
    return entry;
  }
}

export const SOURCES = {
  obertDuvall: 'Obert & Duvall (1967), Rock Mechanics and the Design of Structures in Rock',
  brazilian: 'ISRM Suggested Method (1978); ASTM D3967',
  perras: 'Perras & Diederichs (2014), Geotech Geol Eng 32:525–546',
  en1990: 'EN 1990 Annex D, Table D1 (V unknown)',
  en1990Log: 'EN 1990 Annex D, D7.3 (lognormal), Table D1 (V unknown)',
  en1997: 'EN 1997-1 §2.4.5.2 (cautious estimate); Student t',
  statistics: 'Sample statistics',
  sizeEffect: 'Hoek & Brown (1980), Underground Excavations in Rock',
  priestHudson: 'Priest & Hudson (1976)',
  gsi: 'Hoek, Carter & Diederichs (2013), 47th US Rock Mechanics Symposium',
  hoekBrown: 'Hoek, Carranza-Torres & Corkum (2002)',
  hoekDiederichs: 'Hoek & Diederichs (2006)',
  crossJoint: 'Common practice: a jointed mass has no tensile strength across its joints',
  voussoir: 'Diederichs & Kaiser (1999), IJRMMS 36:97–117; Brady & Brown, Rock Mechanics for Underground Mining, §8.4',
  voussoirCrushing: 'Diederichs & Kaiser (1999); σh superposed on the arch thrust (Lamina, METHODS §3a)',
  intersection: 'Diagonal span of an intersection: coal-mine roof control practice (METHODS §14)',
  plate: 'Kirchhoff thin-plate theory (Timoshenko & Woinowsky-Krieger 1959); Lamina Ritz solution',
  euler: 'Euler buckling of a strut, as used by Obert & Duvall (1967)',
  lamina: 'Lamina design rules (README, Methods and sources)',
} as const;
