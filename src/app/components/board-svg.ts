/**
 * The exported drawing of one side: the same Scene the board view and the command line
 * draw, written by the render module's escaping string writer at true scale (mm).
 */
import { drawScene, sceneSvgMarkup } from '../../lib/render/index.ts';
import { fileStem } from '../state/project-file.ts';
import type { Workspace } from '../state/workspace.svelte.ts';

export function boardSvgFile(ws: Workspace, side: 'component' | 'copper'): { name: string; text: string } | undefined {
  const layout = ws.layout;
  if (!layout) return undefined;
  const scene = drawScene(layout, ws.design, { side, faults: ws.faults });
  return { name: `${fileStem(ws.circuit.title)}.${side}.svg`, text: `<?xml version="1.0" encoding="UTF-8"?>\n${sceneSvgMarkup(scene)}\n` };
}
