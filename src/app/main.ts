/**
 * Start the app: open the workspace (autosaved draft, else the bundled demo), install the
 * test hook, mount the screen. Autosave is localStorage; when the browser refuses it (a
 * private window with storage off) the app still runs, it only cannot keep a draft.
 */
import { mount } from 'svelte';
import App from './App.svelte';
import { Workspace } from './state/workspace.svelte.ts';
import { installHook } from './test-hook.svelte.ts';
import type { KeyValueStore } from './state/project-file.ts';

function storage(): KeyValueStore | undefined {
  try {
    const s = window.localStorage;
    s.getItem('kerfline.probe');
    return s;
  } catch {
    return undefined;
  }
}

const ws = Workspace.open(storage());
const hook = installHook(ws);
mount(App, { target: document.getElementById('app')!, props: { ws } });
hook.ready = true;
