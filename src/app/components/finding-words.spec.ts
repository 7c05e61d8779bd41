import { describe, expect, it } from 'vitest';
import { findingTitle } from './finding-words.ts';

describe('finding headings', () => {
  it('names known families and falls back to the code', () => {
    expect(findingTitle('verify.short')).toBe('Short');
    expect(findingTitle('route.unroutable')).toBe('Cannot route');
    expect(findingTitle('verify.lead-off-grid')).toBe('lead off grid');
  });
});
