/**
 * Board choice strings used on the command line and in the app:
 * `strip:24x18`, `pads:30x20`, `bus:breadboard` or `bus:breadboard-30`, and `auto`.
 */
import type { Board } from '../model/layout.ts';
import { fail, ok, type Result } from '../model/problem.ts';
import { breadboardBoard } from './breadboard.ts';
import { makeBoard } from './grid.ts';

export type BoardSpec = { kind: 'auto' } | { kind: 'fixed'; board: Board };

export function parseBoardSpec(text: string): Result<BoardSpec> {
  const t = text.trim().toLowerCase();
  if (t === 'auto') return ok({ kind: 'auto' });
  let m = /^(strip|pads):(\d+)x(\d+)$/.exec(t);
  if (m) {
    const cols = Number(m[2]);
    const rows = Number(m[3]);
    if (cols >= 2 && rows >= 2 && cols <= 400 && rows <= 400)
      return ok({ kind: 'fixed', board: makeBoard(m[1] as 'strip' | 'pads', cols, rows) });
  }
  m = /^bus:breadboard(?:-(\d+))?$/.exec(t);
  if (m) {
    const cols = m[1] ? Number(m[1]) : 30;
    if (cols >= 4 && cols <= 200) return ok({ kind: 'fixed', board: breadboardBoard(cols) });
  }
  return fail([
    {
      code: 'board.bad-spec',
      severity: 'error',
      path: ['board'],
      message: `"${text}" is not a board choice`,
      hint: 'write strip:COLSxROWS (e.g. strip:24x18), pads:COLSxROWS, bus:breadboard-30 or auto',
    },
  ]);
}
