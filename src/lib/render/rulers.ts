/**
 * Row letters down the left edge and column numbers along the top, as a builder reads them
 * on the side drawn: on the copper side the numbers run the other way (colNumber mirrors).
 */
import { colNumber, rowLabel } from '../board/labels.ts';
import { round, type Frame } from './frame.ts';
import type { SceneRuler } from './scene.ts';

/** Room kept outside the board for the labels, in pitches. */
export const RULER_MARGIN = 1.3;

export function rulers(frame: Frame): SceneRuler[] {
  const out: SceneRuler[] = [];
  const size = round(0.42 * frame.pitch);
  const gap = 0.65 * frame.pitch;
  for (let r = 0; r < frame.rows; r++) {
    const [, y] = frame.at(0, r);
    out.push({ id: `row:${r}`, axis: 'row', index: r, text: rowLabel(r), x: round(-gap), y, size });
  }
  for (let c = 0; c < frame.cols; c++) {
    const [x] = frame.at(c, 0);
    out.push({ id: `col:${c}`, axis: 'col', index: c, text: String(colNumber(c, frame.side, frame.cols)), x, y: round(-gap), size });
  }
  return out;
}
