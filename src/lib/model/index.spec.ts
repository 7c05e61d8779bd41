import { expect, it } from 'vitest';
import * as api from './index.ts';

// Growing the model's public surface is a deliberate change: update this list with it.
it('exports exactly the model API', () => {
  expect(Object.keys(api).sort()).toEqual(
    [
      'BOARD_KINDS', 'BoardChoiceSchema', 'BoardKindSchema', 'BoardSchema', 'CircuitPartSchema', 'CircuitSchema', 'CutSchema',
      'CutStyleSchema', 'EdgeSchema', 'EffortSchema', 'HoleSchema', 'KeepOutSchema', 'LayoutPartSchema', 'LayoutSchema',
      'NetInfoSchema', 'NetNameSchema', 'NetRoleSchema', 'PART_KINDS', 'PROJECT_MIGRATIONS', 'PackingSchema', 'PartKindSchema',
      'PlacedPinSchema', 'PlanOptionsSchema', 'ProjectSchema', 'RefSchema', 'RouteOptionsSchema', 'SegmentSchema', 'SourceSchema',
      'SpanSchema', 'fail', 'formatPath', 'formatProblem', 'locateJsonPath', 'migrateProject', 'offsetToLineColumn', 'ok',
      'parseDocument', 'parseJsonText', 'sortProblems', 'validate', 'zodProblems',
    ].sort(),
  );
});
