/**
 * The worksheet's uncertainty runner: `runUncertainty` in the compute worker (`ui/compute`),
 * whose client is created on the first run (so a page that never runs a study starts no
 * worker). Where the page has no Worker the client runs in-thread in chunks (its fallback).
 */
import { createComputeClient } from '../compute/client';
import type { ComputeClient, UncertaintyRunner } from '../compute/types';

export function workerRunner(): UncertaintyRunner {
  let client: ComputeClient | null = null;
  return (project, request, hooks) => {
    client ??= createComputeClient();
    return client.runUncertainty(project, request, hooks);
  };
}
