/**
 * The events the worksheet elements dispatch (all `bubbles: true, composed: true`), handled by
 * the store in `<lamina-app>`. See ui-common contract: `project-edit`, `project-replace`,
 * `units-change`, `show-trace`, `chart-layer-change`.
 */
import type { UnitSystem } from '../../model/units';

export interface ProjectEditDetail {
  path: string;
  value: unknown;
}
export interface ProjectReplaceDetail {
  project: unknown;
  source: string;
}

export function fire<T>(target: EventTarget, type: string, detail: T): boolean {
  return target.dispatchEvent(new CustomEvent<T>(type, { detail, bubbles: true, composed: true }));
}

export const fireEdit = (target: EventTarget, path: string, value: unknown): boolean =>
  fire<ProjectEditDetail>(target, 'project-edit', { path, value });

export const fireReplace = (target: EventTarget, project: unknown, source: string): boolean =>
  fire<ProjectReplaceDetail>(target, 'project-replace', { project, source });

export const fireUnits = (target: EventTarget, units: UnitSystem): boolean =>
  fire(target, 'units-change', { units });
