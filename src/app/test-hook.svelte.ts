/**
 * `window.__kerfline`: a small, read-mostly handle for the browser tests and `npm run
 * bench:ui`. It exposes nothing a user could not do by hand, plus timings:
 * - `ready`, `boardDrawnAt` (performance.now() when the board was first drawn), `draws`
 * - `layout()`, `faults()`, `notes()`, `side()`, `selected()`, `pinNets()`
 * - `holeToClient([col, row])` → the hole's centre in page pixels on the side shown
 * - `timeEdit(ref, [dx, dy])` → timings of one part move: `pipelineMs` (re-route and
 *   re-verify, measured inside the edit), `editMs` (the whole edit with history and checks)
 * - `openText(name, text)` (as if the file were dropped), `saveNow()` (flush the autosave)
 */
import type { Layout, Problem } from '../lib/model/index.ts';
import type { Workspace } from './state/workspace.svelte.ts';

export interface BoardProbe {
  holeToClient(hole: [number, number]): { x: number; y: number } | undefined;
}

export interface KerflineHook {
  ready: boolean;
  /** 'draft', 'demo-layout' (committed layout, no planning) or 'demo-planned'. */
  openedFrom: string;
  boardDrawnAt?: number;
  draws: number;
  /** Time of the last drawScene (Scene from the layout) and of the last svg.js draw, ms. */
  sceneMs?: number;
  drawMs?: number;
  layout(): Layout | undefined;
  faults(): Problem[];
  notes(): Problem[];
  side(): string;
  selected(): string | undefined;
  /** Net of every connected pin of the design, keyed "ref.pin". */
  pinNets(): Record<string, string>;
  holeToClient(hole: [number, number]): { x: number; y: number } | undefined;
  timeEdit(ref: string, delta: [number, number]): { pipelineMs: number; routeMs: number; verifyMs: number; editMs: number; moved: boolean };
  openText(name: string, text: string): void;
  saveNow(): void;
  undo(): void;
}

declare global {
  interface Window {
    __kerfline?: KerflineHook;
  }
}

const probe: { board?: BoardProbe } = {};

export function setBoardProbe(p: BoardProbe): void {
  probe.board = p;
}

export function hook(): KerflineHook | undefined {
  return (globalThis as { __kerfline?: KerflineHook }).__kerfline;
}

export function installHook(ws: Workspace): KerflineHook {
  const h: KerflineHook = {
    ready: false,
    openedFrom: ws.openedFrom,
    draws: 0,
    layout: () => (ws.layout ? ($state.snapshot(ws.layout) as Layout) : undefined),
    faults: () => $state.snapshot(ws.faults) as Problem[],
    notes: () => $state.snapshot(ws.notes) as Problem[],
    side: () => ws.side,
    selected: () => ws.selected,
    pinNets: () => Object.fromEntries((ws.design?.parts ?? []).flatMap((p) => Object.entries(p.nets).map(([pin, net]) => [`${p.ref}.${pin}`, net]))),
    holeToClient: (hole) => probe.board?.holeToClient(hole),
    timeEdit(ref, delta) {
      const t0 = performance.now();
      const moved = ws.move(ref, delta);
      const editMs = performance.now() - t0;
      const t = ws.checked?.timing;
      return { pipelineMs: ws.lastEditMs ?? NaN, routeMs: t?.routeMs ?? NaN, verifyMs: t?.verifyMs ?? NaN, editMs, moved };
    },
    openText: (name, text) => ws.openFile(name, text),
    saveNow: () => ws.saveNow(),
    undo: () => ws.undo(),
  };
  (globalThis as { __kerfline?: KerflineHook }).__kerfline = h;
  return h;
}
