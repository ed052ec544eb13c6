/**
 * Which project the app opens with: a share link in the address (`#p=…`) wins; otherwise the
 * autosaved project; otherwise the coal-room demo. Each candidate goes through the model's
 * validation; a damaged link or autosave is skipped with a notice (never a crash). A lamina/1
 * link or autosave is migrated by the validation and its one-time notice shown; a migrated
 * autosave is written back at once as lamina/2, so the notice is not repeated.
 *
 * A refused autosave is set aside under the backup key. If even that write fails (storage
 * full), the original is left untouched and returned as `held`: the app then pauses autosave
 * and offers the text as a file, so no later edit can overwrite it.
 */
import type { Project } from '../../model/types';
import { MIGRATED_CODE } from '../../model/validate';
import { decodeShareHash } from './share-link';
import { readAutosave, setBackup, writeAutosave, type KeyValueStorage } from './autosave';
import type { ValidationOutcome } from './project-store';
import { DEMO_PRESET, presetData } from './presets';

export interface InitialProject {
  project: Project;
  source: 'link' | 'autosave' | 'demo';
  notices: string[];
  /** A refused autosave that could not be set aside: its exact text and what to tell the user. */
  held?: { text: string; message: string };
}

export function initialProject(
  hash: string,
  storage: KeyValueStorage | null,
  validate: (input: unknown) => ValidationOutcome,
): InitialProject {
  const notices: string[] = [];
  let linked: unknown = null;
  try {
    linked = decodeShareHash(hash);
  } catch (err) {
    notices.push(`The project link could not be opened: ${err instanceof Error ? err.message : String(err)}.`);
  }
  const migration = (r: ValidationOutcome): string[] =>
    r.ok ? r.warnings.filter((w) => w.code === MIGRATED_CODE).map((w) => w.message) : [];
  if (linked !== null) {
    const r = validate(linked);
    if (r.ok) return { project: r.project, source: 'link', notices: [...notices, 'Opened the project from the link.', ...migration(r)] };
    notices.push(`The project in the link was refused: ${r.errors.map((e) => e.message).join('; ')}.`);
  }
  const saved = readAutosave(storage);
  let held: InitialProject['held'];
  if (saved.kind === 'found' || saved.kind === 'corrupt') {
    let why = 'could not be read (damaged text)';
    if (saved.kind === 'found') {
      const r = validate(saved.data);
      if (r.ok) {
        const migrated = migration(r);
        if (migrated.length > 0) writeAutosave(storage, r.project);
        return { project: r.project, source: 'autosave', notices: [...notices, ...migrated] };
      }
      why = 'no longer passes validation';
    }
    const backup = storage ? setBackup(storage, saved.text) : { ok: false as const, reason: 'no storage' };
    if (backup.ok) {
      notices.push(`The autosaved project ${why}; it was set aside and the demo opened instead.`);
    } else {
      held = {
        text: saved.text,
        message:
          `The autosaved project ${why}, and it could not be set aside: ${backup.reason}. ` +
          'It is kept exactly as it was and autosave is paused so that no edit overwrites it. ' +
          'Download it to keep it as a file, then resume autosave.',
      };
      notices.push('The autosaved project was kept but not opened; see the message below.');
    }
  }
  const demo = validate(presetData(DEMO_PRESET));
  if (!demo.ok) throw new Error(`the demo preset is refused: ${demo.errors.map((e) => e.message).join('; ')}`);
  return held ? { project: demo.project, source: 'demo', notices, held } : { project: demo.project, source: 'demo', notices };
}
