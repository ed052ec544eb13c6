/** The real model and analysis behind the store (tests inject fixtures instead). */
import { validateProject } from '../../model/validate';
import { analyse, designChart, minimumThickness, spanCurve } from '../../analysis/index';
import { supportNeeded } from '../../analysis/support-needed';
import type { StoreDeps } from './project-store';

export function defaultDeps(storage: StoreDeps['storage'] = null): StoreDeps {
  return {
    validate: validateProject,
    analyse,
    spanCurve: (project) => spanCurve(project),
    designChart: (project, layer) => designChart(project, layer),
    minimumThickness,
    supportNeeded,
    storage,
    debounceMs: 150,
    mark: (name) => {
      try {
        performance.mark(name);
      } catch {
        /* no performance timeline (node without perf_hooks): marks are optional */
      }
    },
  };
}
