/**
 * Bounded undo/redo history of immutable snapshots. `record(previous)` is called with the state
 * that is being replaced; edits of the same field in quick succession (typing "0.45") can be
 * coalesced into one step with a `key` and a time window.
 *     const h = new UndoHistory<number>(); h.record(1); h.undo(2) // 1
 */
export class UndoHistory<T> {
  private past: T[] = [];
  private future: T[] = [];
  private lastKey: string | null = null;
  private lastTime = -Infinity;

  constructor(readonly limit = 100, readonly coalesceMs = 1000) {
    if (!(limit >= 1)) throw new RangeError(`history limit must be ≥ 1, got ${limit}`);
  }

  get canUndo(): boolean {
    return this.past.length > 0;
  }
  get canRedo(): boolean {
    return this.future.length > 0;
  }

  /**
   * Record `previous` as an undo step. With a `key` equal to the last one and within
   * `coalesceMs` of it, the step merges into the last one (the earlier snapshot is kept).
   */
  record(previous: T, key: string | null = null, now = Date.now()): void {
    const merge =
      key !== null && key === this.lastKey && now - this.lastTime <= this.coalesceMs && this.past.length > 0;
    if (!merge) {
      this.past.push(previous);
      if (this.past.length > this.limit) this.past.splice(0, this.past.length - this.limit);
    }
    this.future = [];
    this.lastKey = key;
    this.lastTime = now;
  }

  /** The state to restore, given the current one (which becomes redoable); null if none. */
  undo(current: T): T | null {
    const previous = this.past.pop();
    if (previous === undefined) return null;
    this.future.push(current);
    this.lastKey = null;
    return previous;
  }

  redo(current: T): T | null {
    const next = this.future.pop();
    if (next === undefined) return null;
    this.past.push(current);
    this.lastKey = null;
    return next;
  }

  clear(): void {
    this.past = [];
    this.future = [];
    this.lastKey = null;
  }
}
