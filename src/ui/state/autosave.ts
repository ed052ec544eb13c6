/**
 * Autosave of the current project to localStorage on every accepted change. A saved value that
 * cannot be read or fails validation is ignored with a notice (never a crash) and left in place
 * under a backup key so nothing is lost.
 */
export const AUTOSAVE_KEY = 'lamina:autosave';
export const AUTOSAVE_BACKUP_KEY = 'lamina:autosave:rejected';

export type KeyValueStorage = Pick<Storage, 'getItem' | 'setItem' | 'removeItem'>;

export type AutosaveRead =
  | { kind: 'none' }
  | { kind: 'found'; data: unknown }
  | { kind: 'corrupt'; notice: string };

/** Reads the saved JSON (unvalidated). */
export function readAutosave(storage: KeyValueStorage | null): AutosaveRead {
  if (!storage) return { kind: 'none' };
  let text: string | null;
  try {
    text = storage.getItem(AUTOSAVE_KEY);
  } catch {
    return { kind: 'none' };
  }
  if (text === null || text === '') return { kind: 'none' };
  try {
    return { kind: 'found', data: JSON.parse(text) as unknown };
  } catch {
    setBackup(storage, text);
    return { kind: 'corrupt', notice: 'The autosaved project could not be read (damaged text); it was set aside.' };
  }
}

/** Set a rejected saved value aside so the next autosave does not silently destroy it. */
export function setBackup(storage: KeyValueStorage, text: string): void {
  try {
    storage.setItem(AUTOSAVE_BACKUP_KEY, text);
    storage.removeItem(AUTOSAVE_KEY);
  } catch {
    /* storage full or blocked: nothing more to do */
  }
}

/** Saves the project; returns false when the storage refuses (quota, private mode). */
export function writeAutosave(storage: KeyValueStorage | null, project: unknown): boolean {
  if (!storage) return false;
  try {
    storage.setItem(AUTOSAVE_KEY, JSON.stringify(project));
    return true;
  } catch {
    return false;
  }
}
