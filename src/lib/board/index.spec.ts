import { expect, it } from 'vitest';
import * as api from './index.ts';

it('exports exactly the board API', () => {
  expect(Object.keys(api).sort()).toEqual(
    ['BREADBOARD_HEIGHT', 'BREADBOARD_ROWS', 'boardSizeMm', 'breadboardBoard', 'colNumber', 'conductorsOf', 'holeAt', 'holeIndex', 'holeLabel', 'holeLabelBoth', 'makeBoard', 'mirrorCol', 'onBoard', 'parseBoardSpec', 'parseHoleLabel', 'rowLabel', 'sameHole'].sort(),
  );
});
