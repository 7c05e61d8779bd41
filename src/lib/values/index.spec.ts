import { describe, expect, it } from 'vitest';
import * as values from './index.ts';

describe('values module surface', () => {
  it('exports exactly these names', () => {
    expect(Object.keys(values).sort()).toEqual(
      [
        'BAND_COLOURS',
        'E_SERIES',
        'QUANTITIES',
        'SERIES_NAMES',
        'TOLERANCE_LETTERS',
        'UNIT_SYMBOL',
        'capacitorCode',
        'colourBands',
        'decodeBands',
        'formatSi',
        'formatValue',
        'isPreferred',
        'isQuantity',
        'nearestPreferred',
        'offSeriesWarning',
        'parseCapacitorCode',
        'parseSpiceNumber',
        'parseValue',
      ].sort(),
    );
  });
});
