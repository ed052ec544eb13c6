/** The real model and compute client behind the store (tests inject fixtures instead). */
import { validateProject } from '../../model/validate';
import { createComputeClient } from '../compute/client';
import type { ComputeClient } from '../compute/types';
import type { StoreDeps } from './project-store';

export function defaultDeps(storage: StoreDeps['storage'] = null, compute: ComputeClient = createComputeClient()): StoreDeps & { compute: ComputeClient } {
  return {
    validate: validateProject,
    compute,
    storage,
    mark: (name) => {
      try {
        performance.mark(name);
      } catch {
        /* no performance timeline (node without perf_hooks): marks are optional */
      }
    },
  };
}
