import { expect, it } from 'vitest';
import * as api from './index.ts';

it('exports exactly the parts API', () => {
  expect(Object.keys(api).sort()).toEqual(
    ['AXIAL_SPECS', 'DIP_SIZES', 'HEIGHT_CLASSES', 'KINDS', 'RADIAL_SPECS', 'checkPart', 'defaultFootprintName', 'fitPose', 'footprintFor', 'footprintNames', 'getFootprint', 'isPolarized', 'isTwoLead', 'leadOrder', 'packagePins', 'partPinNames', 'posePins', 'poseBody', 'rotate'].sort(),
  );
});
