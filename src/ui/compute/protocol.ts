/** The messages between the compute client and `compute.worker.ts` (all structured-clone safe). */
import type { Project } from '../../model/types';
import type { UncertaintyRunRequest } from './types';

export type ComputeRequest =
  | { id: number; kind: 'analyse'; project: Project }
  | { id: number; kind: 'chart'; project: Project; layer: number }
  | { id: number; kind: 'support'; project: Project }
  | { id: number; kind: 'uncertainty'; project: Project; request: UncertaintyRunRequest }
  /** stop the uncertainty run `id` after its current chunk */
  | { id: number; kind: 'cancel' };

export type ComputeResponse =
  | { id: number; kind: 'result'; value: unknown }
  | { id: number; kind: 'error'; message: string }
  | { id: number; kind: 'progress'; done: number; total: number }
  | { id: number; kind: 'cancelled' };
