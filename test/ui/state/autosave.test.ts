import { describe, expect, it } from 'vitest';
import { AUTOSAVE_BACKUP_KEY, AUTOSAVE_KEY, readAutosave, setBackup, writeAutosave } from '../../../src/ui/state/autosave';

function memoryStorage() {
  const m = new Map<string, string>();
  return {
    map: m,
    getItem: (k: string) => m.get(k) ?? null,
    setItem: (k: string, v: string) => void m.set(k, v),
    removeItem: (k: string) => void m.delete(k),
  };
}

describe('autosave', () => {
  it('writeAutosave then readAutosave gives the same JSON back', () => {
    const s = memoryStorage();
    expect(writeAutosave(s, { title: 'x', layers: [1] })).toBe(true);
    expect(readAutosave(s)).toEqual({ kind: 'found', data: { title: 'x', layers: [1] }, text: '{"title":"x","layers":[1]}' });
  });

  it('nothing saved (or no storage) reads as none', () => {
    expect(readAutosave(memoryStorage())).toEqual({ kind: 'none' });
    expect(readAutosave(null)).toEqual({ kind: 'none' });
    expect(writeAutosave(null, {})).toBe(false);
  });

  it('damaged text is reported as corrupt with its exact text, not thrown; setBackup then moves it aside', () => {
    const s = memoryStorage();
    s.setItem(AUTOSAVE_KEY, '{"title": ');
    expect(readAutosave(s)).toEqual({ kind: 'corrupt', text: '{"title": ' });
    expect(setBackup(s, '{"title": ')).toEqual({ ok: true });
    expect(s.map.get(AUTOSAVE_BACKUP_KEY)).toBe('{"title": ');
    expect(s.map.has(AUTOSAVE_KEY)).toBe(false);
  });

  it('a storage that throws (quota, blocked) does not crash', () => {
    const s = { getItem: () => { throw new Error('blocked'); }, setItem: () => { throw new Error('quota'); }, removeItem: () => undefined };
    expect(readAutosave(s)).toEqual({ kind: 'none' });
    expect(writeAutosave(s, {})).toBe(false);
  });
});
