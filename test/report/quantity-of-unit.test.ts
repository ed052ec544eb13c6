/** Which display quantity a traced unit takes: a bolt's kN in kips, a disc's peak load in lbf (units.ts; METHODS §13). */
import { describe, expect, it } from 'vitest';
import { quantityOfUnit } from '../../src/report/format';
import { valueText } from '../../src/ui/results/trace-entries';

describe('quantityOfUnit', () => {
  it('kN under support.* is a bolt force (kip in US units); elsewhere a force (lbf)', () => {
    expect(quantityOfUnit('kN', 'support.bolts.load_kN')).toBe('boltForce');
    expect(quantityOfUnit('kN', 'layers[0].lab.specimens[0].brazilian_MPa')).toBe('force');
    expect(quantityOfUnit('kN')).toBe('force');
    expect(quantityOfUnit('m', 'support.bolts.length_m')).toBe('length');
  });
  it('the trace dialog shows 18 kN per bolt with 4.05 kip (18 / 4.4482216 kN per kip = 4.0466, 3 significant figures)', () => {
    expect(valueText(18, 'kN', 'US', 'support.bolts.load_kN')).toBe('18 kN (4.05 kip)');
  });
});
