/**
 * The worksheet's uncertainty runner: `runUncertainty` of a compute client (`ui/compute`): the
 * app passes the one its store uses, so the runs go to that client's run worker (started on
 * the first run). Without one, a client of its own is created on the first run. Where the page
 * has no Worker the client runs in-thread in chunks (its fallback).
 */
import { createComputeClient } from '../compute/client';
import type { ComputeClient, UncertaintyRunner } from '../compute/types';

export function workerRunner(shared?: ComputeClient): UncertaintyRunner {
  let client: ComputeClient | null = shared ?? null;
  return (project, request, hooks) => {
    client ??= createComputeClient();
    return client.runUncertainty(project, request, hooks);
  };
}
