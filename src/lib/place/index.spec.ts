import { expect, it } from 'vitest';
import * as api from './index.ts';

it('exports exactly the place API', () => {
  expect(Object.keys(api).sort()).toEqual(
    ['DEFAULT_WEIGHTS', 'EFFORT_STEPS', 'PROGRAM', 'buildProblem', 'circuitOfDesign', 'exactPlacement', 'naiveBaseline', 'placeOnBoard', 'planLayout', 'plantedInstance', 'scoreSpots'].sort(),
  );
});
