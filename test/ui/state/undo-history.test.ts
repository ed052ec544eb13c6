import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { UndoHistory } from '../../../src/ui/state/undo-history';

describe('UndoHistory', () => {
  it('undo after n records walks back through the states in reverse, redo walks forward (property)', () => {
    fc.assert(
      fc.property(fc.array(fc.integer(), { minLength: 1, maxLength: 30 }), (states) => {
        const h = new UndoHistory<number>(1000, 0);
        let current = states[0];
        for (let i = 1; i < states.length; i++) {
          h.record(current, null, i * 10);
          current = states[i];
        }
        const back: number[] = [];
        let s: number | null;
        while ((s = h.undo(current)) !== null) {
          back.push(s);
          current = s;
        }
        expect(back).toEqual(states.slice(0, -1).reverse());
        const forward: number[] = [];
        while ((s = h.redo(current)) !== null) {
          forward.push(s);
          current = s;
        }
        expect(forward).toEqual(states.slice(1));
      }),
    );
  });

  it('is bounded: keeps only the last `limit` steps', () => {
    const h = new UndoHistory<number>(3, 0);
    for (let i = 0; i < 10; i++) h.record(i, null, i);
    expect([h.undo(10), h.undo(9), h.undo(8), h.undo(7)]).toEqual([9, 8, 7, null]);
  });

  it('coalesces edits of the same field within the window into one step (typing "0.45")', () => {
    const h = new UndoHistory<string>(10, 1000);
    h.record('0.5', 'layers[0].thickness_m', 0);
    h.record('0', 'layers[0].thickness_m', 100);
    h.record('0.', 'layers[0].thickness_m', 200);
    h.record('0.4', 'layers[0].thickness_m', 300);
    expect(h.undo('0.45')).toBe('0.5');
    expect(h.canUndo).toBe(false);
  });

  it('a new record clears the redo list', () => {
    const h = new UndoHistory<number>(10, 0);
    h.record(1, null, 0);
    expect(h.undo(2)).toBe(1);
    expect(h.canRedo).toBe(true);
    h.record(1, null, 10);
    expect(h.canRedo).toBe(false);
  });
});
