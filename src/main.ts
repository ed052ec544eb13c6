/// <reference types="vite/client" />
/**
 * Browser entry: choose the first project (share link > autosave > demo), build the store,
 * register the elements of the top of the sheet and mount `<lamina-app>`. The elements of the
 * sections below load once the first results are painted (`ui/app/sheet-below.ts`).
 */
import { validateProject } from './model/validate';
import { ProjectStore, type AppState } from './ui/state/project-store';
import { defaultDeps } from './ui/state/default-deps';
import { createComputeClient, defaultWorkerFactory } from './ui/compute/client';
import { ANALYSIS_FUNCTIONS } from './ui/compute/compute-core';
import { initialProject } from './ui/state/initial-project';
import { writeAutosave, type KeyValueStorage } from './ui/state/autosave';
import { SHARE_PREFIX, decodeShareHash } from './ui/state/share-link';
import './ui/app/lamina-app';
import type { LaminaApp } from './ui/app/lamina-app';

function browserStorage(): KeyValueStorage | null {
  try {
    const s = window.localStorage;
    const probe = 'lamina:probe';
    s.setItem(probe, '1');
    s.removeItem(probe);
    return s;
  } catch {
    return null;
  }
}

export interface LaminaTestHook {
  state(): AppState;
  store: ProjectStore;
  app: LaminaApp;
  /** Where the last analysis ran: in the page ('local', a quick one) or in the edit worker. */
  analyseRoute(): 'local' | 'worker' | null;
  /** Edit, and resolve once its analysis (from the worker) has rendered. */
  editNow(path: string, value: unknown): Promise<{ accepted: boolean; rendered_ms: number; frame_ms: number }>;
}

declare global {
  interface Window {
    /** Test and benchmark hook (read-only use). */
    __lamina?: LaminaTestHook;
  }
}

function boot(): void {
  const storage = browserStorage();
  const first = initialProject(location.hash, storage, validateProject);
  // One compute client. The first analysis and each quick edit run in this thread (so the first
  // results never wait for a worker to boot); slower edits go to its edit worker, the span
  // curve and design chart to its aside worker, the uncertainty studies to its run worker.
  const deps = defaultDeps(storage, createComputeClient(defaultWorkerFactory, ANALYSIS_FUNCTIONS));
  const store = new ProjectStore(deps, first.project);
  if (first.source === 'link') {
    // The project now lives in the autosave; drop the hash so a reload keeps later edits.
    writeAutosave(storage, first.project);
    if (location.hash.startsWith(SHARE_PREFIX)) history.replaceState(null, '', location.pathname + location.search);
  }
  if (first.held) store.holdAutosave(first.held.text, first.held.message);
  const notices = [...first.notices];
  if (!storage) notices.push('This browser blocks local storage: changes are not autosaved — use Save.');
  if (notices.length) store.setNotice(notices.join(' '));

  const app = document.createElement('lamina-app');
  app.store = store;
  app.runner = deps.compute.runUncertainty;
  const mount = document.getElementById('app') ?? document.body;
  mount.replaceChildren(app);
  // A project link pasted into the address bar of an open worksheet replaces the project
  // (undoable), through the same validation.
  window.addEventListener('hashchange', () => {
    if (!location.hash.startsWith(SHARE_PREFIX)) return;
    try {
      const data = decodeShareHash(location.hash);
      if (data !== null && store.replace(data, 'Project link')) {
        history.replaceState(null, '', location.pathname + location.search);
      }
    } catch (err) {
      store.setNotice(`The project link could not be opened: ${err instanceof Error ? err.message : String(err)}.`);
    }
  });

  // An autosave still waiting for the next paint is written before the page goes away.
  window.addEventListener('pagehide', () => store.flushAutosave());
  document.addEventListener('visibilitychange', () => {
    if (document.visibilityState === 'hidden') store.flushAutosave();
  });

  window.__lamina = {
    state: () => store.getState(),
    store,
    app,
    analyseRoute: () => deps.compute.analyseRoute ?? null,
    editNow: (path, value) => app.editNow(path, value),
  };
}

boot();
