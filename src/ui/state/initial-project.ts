/**
 * Which project the app opens with: a share link in the address (`#p=…`) wins; otherwise the
 * autosaved project; otherwise the coal-room demo. Each candidate goes through the model's
 * validation; a damaged link or autosave is skipped with a notice (never a crash). A lamina/1
 * link or autosave is migrated by the validation and its one-time notice shown; a migrated
 * autosave is written back at once as lamina/2, so the notice is not repeated.
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
  if (saved.kind === 'corrupt') notices.push(saved.notice);
  if (saved.kind === 'found') {
    const r = validate(saved.data);
    if (r.ok) {
      const migrated = migration(r);
      if (migrated.length > 0) writeAutosave(storage, r.project);
      return { project: r.project, source: 'autosave', notices: [...notices, ...migrated] };
    }
    if (storage) setBackup(storage, JSON.stringify(saved.data));
    notices.push('The autosaved project no longer passes validation; it was set aside and the demo opened instead.');
  }
  const demo = validate(presetData(DEMO_PRESET));
  if (!demo.ok) throw new Error(`the demo preset is refused: ${demo.errors.map((e) => e.message).join('; ')}`);
  return { project: demo.project, source: 'demo', notices };
}
