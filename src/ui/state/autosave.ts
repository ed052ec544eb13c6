/**
 * Autosave of the current project to localStorage on every accepted change.
 *
 * Nothing saved is ever overwritten unless it is safe elsewhere: a saved value that cannot be
 * read or fails validation is set aside under a backup key first, and only once that backup
 * write has succeeded is the original removed. If the backup cannot be written (the storage is
 * full, e.g. a 3 MB autosave and a 5 MB quota), the original stays exactly as it was, autosave
 * is paused so no edit overwrites it, and the user is offered the text as a file
 * (`initial-project.ts`, `project-store.ts`, `<lamina-app>`). A refused write is reported with
 * its reason, never swallowed.
 */
export const AUTOSAVE_KEY = 'lamina:autosave';
export const AUTOSAVE_BACKUP_KEY = 'lamina:autosave:rejected';

export type KeyValueStorage = Pick<Storage, 'getItem' | 'setItem' | 'removeItem'>;

export type AutosaveRead =
  | { kind: 'none' }
  | { kind: 'found'; data: unknown; text: string }
  | { kind: 'corrupt'; text: string };

/** The outcome of a storage write: ok, or why the browser refused it (for the user). */
export type StorageWrite = { ok: true } | { ok: false; reason: string };

/** Reads the saved JSON (unvalidated) with its exact text. */
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
    return { kind: 'found', data: JSON.parse(text) as unknown, text };
  } catch {
    return { kind: 'corrupt', text };
  }
}

/** Why a storage write failed, in words: the quota (any browser's name for it) or the error. */
export function storageFailure(err: unknown): string {
  const e = err as { name?: unknown; code?: unknown; message?: unknown } | null;
  // WHATWG Web Storage: setItem throws a "QuotaExceededError" DOMException (legacy code 22;
  // older Firefox: NS_ERROR_DOM_QUOTA_REACHED, code 1014).
  if (e && (e.name === 'QuotaExceededError' || e.name === 'NS_ERROR_DOM_QUOTA_REACHED' || e.code === 22 || e.code === 1014)) {
    return "the browser's storage for this page is full (QuotaExceededError)";
  }
  const text = e && typeof e.message === 'string' && e.message ? e.message : String(err);
  return `the browser refused to store it (${text})`;
}

/**
 * Set a rejected saved value aside so the next autosave does not destroy it. The original is
 * removed only after the backup was written; on failure both keys are left as they were.
 */
export function setBackup(storage: KeyValueStorage, text: string): StorageWrite {
  try {
    storage.setItem(AUTOSAVE_BACKUP_KEY, text);
  } catch (err) {
    return { ok: false, reason: storageFailure(err) };
  }
  try {
    storage.removeItem(AUTOSAVE_KEY);
  } catch {
    /* the backup exists; a leftover original is harmless (it is backed up) */
  }
  return { ok: true };
}

/** Saves the project; on a refusal (quota, private mode) says why. */
export function saveAutosave(storage: KeyValueStorage | null, project: unknown): StorageWrite {
  if (!storage) return { ok: false, reason: 'this browser blocks local storage' };
  try {
    storage.setItem(AUTOSAVE_KEY, JSON.stringify(project));
    return { ok: true };
  } catch (err) {
    return { ok: false, reason: storageFailure(err) };
  }
}

/** Saves the project; returns false when the storage refuses (see `saveAutosave` for why). */
export function writeAutosave(storage: KeyValueStorage | null, project: unknown): boolean {
  return saveAutosave(storage, project).ok;
}
