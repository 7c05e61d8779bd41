import { expect, it } from 'vitest';
import * as api from './index.ts';

it('exports exactly the netlist API', () => {
  expect(Object.keys(api).sort()).toEqual(
    [
      'DUAL_SECTIONS',
      'DUAL_SUPPLY',
      'QUAD_SECTIONS',
      'QUAD_SUPPLY',
      'SpiceImportOptionsSchema',
      'SpiceOverrideSchema',
      'designFootprint',
      'importSpice',
      'packOpamps',
      'packageSizes',
      'parseCircuitText',
      'partPinNames',
      'prepareDesign',
    ].sort(),
  );
});
