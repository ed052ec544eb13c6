/**
 * Demo text left in a changed project. The demo projects are invented and say so in their
 * title and description; a user who starts from a demo and enters real values may keep that
 * text, and a printed report would then describe invented data. This finds that case:
 *
 *   demo text    the title or description is a demo's own text, or carries the demo mark
 *                "invented data" (every demo's title and description do);
 *   changed      the project's values (everything but the title and description) differ from
 *                every demo whose text it carries (numbers compared to 1 part in 10⁹, so a
 *                round trip through US units does not count as a change).
 *
 * A demo loaded as shipped is not flagged: its text is true. `clearDemoText` gives the project
 * with the demo text removed (title back to the default, description dropped).
 *
 *     demoLeftover(coalRoomWithSpan7)  // { preset: 'coal-room-shale', fields: ['title', 'description'], ... }
 */
import type { Project } from './types';
import { DEMO_PRESETS } from './demo-presets';
import { validateProject } from './validate';
import { DEFAULT_TITLE } from './defaults';

/** The words every demo's title and description carry. */
export const DEMO_MARK = /\binvented data\b/i;

export interface DemoLeftover {
  /** Id of the demo whose text the project carries, or null when only the mark matched. */
  preset: string | null;
  /** Title of that demo, for messages. */
  presetTitle: string | null;
  /** Which fields carry demo text. */
  fields: Array<'title' | 'description'>;
}

interface KnownDemo {
  id: string;
  /** The demo's title and description as shipped (the validated project keeps them as they are: test). */
  title: unknown;
  description: unknown;
  /** The demo validated (defaults filled in, as any loaded project), on first use. */
  project(): Project | null;
}

let known: KnownDemo[] | null = null;

/**
 * The demos. Each is validated only when a project's values are compared with it: a project
 * carrying one demo's text costs one validation, not one per demo (this runs on the app's
 * first render).
 */
function demos(): KnownDemo[] {
  if (known) return known;
  known = DEMO_PRESETS.map((d) => {
    const raw = d.data as Record<string, unknown>;
    let validated: Project | null | undefined;
    return {
      id: d.id,
      title: raw.title,
      description: raw.description,
      project: () => {
        if (validated === undefined) {
          const r = validateProject(structuredClone(d.data));
          validated = r.ok ? r.project : null;
        }
        return validated;
      },
    };
  });
  return known;
}

/** Deep equality of JSON values, numbers equal to 1 part in 10⁹. */
function same(a: unknown, b: unknown): boolean {
  if (typeof a === 'number' && typeof b === 'number') {
    return a === b || Math.abs(a - b) <= 1e-9 * Math.max(Math.abs(a), Math.abs(b));
  }
  if (a === null || b === null || typeof a !== 'object' || typeof b !== 'object') return a === b;
  if (Array.isArray(a) !== Array.isArray(b)) return false;
  const ka = Object.keys(a).filter((k) => (a as Record<string, unknown>)[k] !== undefined);
  const kb = Object.keys(b).filter((k) => (b as Record<string, unknown>)[k] !== undefined);
  if (ka.length !== kb.length) return false;
  return ka.every((k) => same((a as Record<string, unknown>)[k], (b as Record<string, unknown>)[k]));
}

const values = (p: Project): unknown => ({ ...p, title: undefined, description: undefined });

/** The demo text left in a changed project, or null when there is none (or it is the demo itself). */
export function demoLeftover(project: Project): DemoLeftover | null {
  const list = demos();
  const fields: Array<'title' | 'description'> = [];
  const carriers = new Set<KnownDemo>();
  for (const field of ['title', 'description'] as const) {
    const text = project[field];
    if (!text) continue;
    const owners = list.filter((d) => d[field] === text);
    if (owners.length > 0 || DEMO_MARK.test(text)) fields.push(field);
    for (const o of owners) carriers.add(o);
  }
  if (fields.length === 0) return null;
  const candidates = carriers.size > 0 ? [...carriers] : list;
  if (candidates.some((d) => {
    const demo = d.project();
    return demo !== null && same(values(demo), values(project));
  })) return null;
  const first = carriers.size > 0 ? [...carriers][0] : null;
  return { preset: first?.id ?? null, presetTitle: typeof first?.title === 'string' ? first.title : null, fields };
}

/** The project without its demo text: the default title, no description. */
export function clearDemoText(project: Project, leftover: DemoLeftover): Project {
  const next: Project = structuredClone(project);
  if (leftover.fields.includes('title')) next.title = DEFAULT_TITLE;
  if (leftover.fields.includes('description')) delete next.description;
  return next;
}

/** One sentence for the app and the report. */
export function demoLeftoverText(leftover: DemoLeftover): string {
  const what = leftover.fields.length === 2 ? 'title and description' : leftover.fields[0];
  const from = leftover.presetTitle ? `the demo “${leftover.presetTitle}”` : 'a demo';
  return (
    `This project’s ${what} come${leftover.fields.length === 2 ? '' : 's'} from ${from}, which is invented data, ` +
    `but its values have been changed since: the text does not describe this project. Replace or clear it.`
  );
}
