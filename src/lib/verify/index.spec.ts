import { describe, expect, it } from 'vitest';
import * as verify from './index.ts';

describe('verify front door', () => {
  it('exports exactly the public names', () => {
    expect(Object.keys(verify).sort()).toEqual(['createVerifier', 'diffNetlists', 'expectedNetlist', 'extractNetlist', 'probeChecklist', 'verifyLayout']);
  });
});
