/** The real model and compute client behind the store (tests inject fixtures instead). */
import { validateProject } from '../../model/validate';
import { createComputeClient } from '../compute/client';
import type { ComputeClient } from '../compute/types';
import type { StoreDeps } from './project-store';
import { whenSettledAfterPaint } from '../after-paint';

export function defaultDeps(storage: StoreDeps['storage'] = null, compute: ComputeClient = createComputeClient()): StoreDeps & { compute: ComputeClient } {
  return {
    validate: validateProject,
    compute,
    storage,
    later: typeof requestAnimationFrame === 'undefined' ? undefined : (task) => void whenSettledAfterPaint(1000).then(task),
    mark: (name) => {
      try {
        performance.mark(name);
      } catch {
        /* no performance timeline (node without perf_hooks): marks are optional */
      }
    },
  };
}
