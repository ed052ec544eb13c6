/**
 * Autosave data loss (issue 14 item 5): a large autosave that fails validation could not be
 * backed up (storage quota) and the first edit overwrote it. Browsers cap localStorage at
 * about 5 MB per origin (WHATWG Web Storage recommends it) and throw a "QuotaExceededError"
 * DOMException from setItem; the fake below does the same, counting UTF-16 code units.
 */
import { describe, expect, it } from 'vitest';
import { AUTOSAVE_BACKUP_KEY, AUTOSAVE_KEY, setBackup, storageFailure } from '../../../src/ui/state/autosave';
import { initialProject } from '../../../src/ui/state/initial-project';
import { ProjectStore } from '../../../src/ui/state/project-store';
import { defaultDeps } from '../../../src/ui/state/default-deps';
import { validateProject } from '../../../src/model/validate';

class QuotaStorage {
  readonly map = new Map<string, string>();
  writes = 0;
  constructor(public capacity: number) {}
  private used(except: string): number {
    let n = 0;
    for (const [k, v] of this.map) if (k !== except) n += k.length + v.length;
    return n;
  }
  getItem(k: string): string | null {
    return this.map.get(k) ?? null;
  }
  setItem(k: string, v: string): void {
    if (this.used(k) + k.length + v.length > this.capacity) throw new DOMException('The quota has been exceeded.', 'QuotaExceededError');
    this.writes++;
    this.map.set(k, v);
  }
  removeItem(k: string): void {
    this.map.delete(k);
  }
}

/** A 3,000,068-character autosave that parses but fails validation (the fuzzed case). */
const bigRefused = (): string => {
  const text = `{"schema":"lamina/1","title":"${'x'.repeat(3_000_000)}","layers":"not a list, refused!!!!!"}`;
  expect(text.length).toBe(3_000_068);
  return text;
};

describe('autosave under a storage quota', () => {
  it('setBackup that hits the quota leaves the original untouched and says why', () => {
    const s = new QuotaStorage(5_000_000);
    const text = bigRefused();
    s.setItem(AUTOSAVE_KEY, text);
    const r = setBackup(s, text);
    expect(r).toEqual({ ok: false, reason: "the browser's storage for this page is full (QuotaExceededError)" });
    expect(s.map.get(AUTOSAVE_KEY)).toBe(text);
    expect(s.map.has(AUTOSAVE_BACKUP_KEY)).toBe(false);
  });

  it('a refused 3 MB autosave that cannot be set aside is held: autosave pauses and no edit overwrites it', async () => {
    const s = new QuotaStorage(5_000_000);
    const text = bigRefused();
    s.setItem(AUTOSAVE_KEY, text);
    const first = initialProject('', s, validateProject);
    expect(first.source).toBe('demo');
    expect(first.held?.text).toBe(text);
    expect(first.held?.message).toMatch(/could not be set aside: the browser's storage for this page is full \(QuotaExceededError\)\. It is kept exactly as it was .*Download it/);

    const store = new ProjectStore(defaultDeps(s), first.project);
    store.holdAutosave(first.held!.text, first.held!.message);
    expect(store.getState().autosave).toMatchObject({ status: 'paused', held: text });
    expect(store.edit('opening.span_m', 7)).toBe(true);
    expect(store.edit('title', 'changed')).toBe(true);
    store.undo();
    expect(s.map.get(AUTOSAVE_KEY)).toBe(text); // 3,000,068 characters, not 2,525
    await store.settled();

    // the user downloaded it and resumes: only now is it replaced by the current project
    store.resumeAutosave();
    expect(store.getState().autosave.status).toBe('saved');
    expect(JSON.parse(s.map.get(AUTOSAVE_KEY)!).opening.span_m).toBe(7);
  }, 60_000); // the real analysis loads in this thread on first use

  it('when the backup fits, the refused autosave is moved aside and the demo opens, as before', () => {
    const s = new QuotaStorage(10_000_000);
    const text = bigRefused();
    s.setItem(AUTOSAVE_KEY, text);
    const first = initialProject('', s, validateProject);
    expect(first.held).toBeUndefined();
    expect(s.map.get(AUTOSAVE_BACKUP_KEY)).toBe(text);
    expect(first.notices.join(' ')).toMatch(/no longer passes validation; it was set aside/);
  });

  it('a quota error on an ordinary autosave is shown (status failed with the reason), and clears once a write succeeds', async () => {
    const s = new QuotaStorage(100_000);
    const store = new ProjectStore(defaultDeps(s), initialProject('', s, validateProject).project);
    expect(store.edit('title', 'first')).toBe(true);
    expect(store.getState().autosave.status).toBe('saved');
    s.capacity = 10; // another tab filled the storage
    expect(store.edit('title', 'second')).toBe(true);
    const a = store.getState().autosave;
    expect(a.status).toBe('failed');
    expect(a.message).toBe("Autosave failed: the browser's storage for this page is full (QuotaExceededError). Your latest changes are not kept in this browser — use Save to keep them as a file.");
    expect(JSON.parse(s.map.get(AUTOSAVE_KEY)!).title).toBe('first'); // the last good save is intact
    s.capacity = 100_000;
    expect(store.edit('title', 'third')).toBe(true);
    expect(store.getState().autosave).toEqual({ status: 'saved', message: null, held: null });
    await store.settled();
  }, 60_000);

  it('storageFailure names the quota by its standard and legacy names, and passes other errors on', () => {
    expect(storageFailure({ name: 'NS_ERROR_DOM_QUOTA_REACHED' })).toMatch(/full/);
    expect(storageFailure({ code: 22 })).toMatch(/full/);
    expect(storageFailure(new Error('SecurityError: blocked'))).toBe('the browser refused to store it (SecurityError: blocked)');
  });
});
