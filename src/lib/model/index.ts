/** Model: the documents that cross boundaries, their schemas, and problems-as-data. */
export {
  PART_KINDS,
  PartKindSchema,
  NetNameSchema,
  RefSchema,
  SpanSchema,
  CircuitPartSchema,
  NetRoleSchema,
  NetInfoSchema,
  CircuitSchema,
} from './circuit.ts';
export type { PartKind, CircuitPart, NetInfo, Circuit, CircuitInput } from './circuit.ts';
export {
  HoleSchema,
  BOARD_KINDS,
  BoardKindSchema,
  CutStyleSchema,
  BoardSchema,
  PlacedPinSchema,
  LayoutPartSchema,
  CutSchema,
  SegmentSchema,
  PackingSchema,
  LayoutSchema,
} from './layout.ts';
export type { BoardKind, CutStyle, Board, LayoutPart, Cut, Segment, Packing, Layout, LayoutInput } from './layout.ts';
export {
  EffortSchema,
  EdgeSchema,
  KeepOutSchema,
  BoardChoiceSchema,
  PlanOptionsSchema,
  RouteOptionsSchema,
} from './options.ts';
export type { Effort, Edge, KeepOut, BoardChoice, PlanOptions, PlanOptionsInput, RouteOptions, RouteOptionsInput } from './options.ts';
export { SourceSchema, ProjectSchema, PROJECT_MIGRATIONS, migrateProject } from './project.ts';
export type { Source, Project } from './project.ts';
export { ok, fail, formatPath, formatProblem, sortProblems } from './problem.ts';
export type { Hole, Severity, Problem, Result } from './problem.ts';
export { zodProblems, parseJsonText, validate, parseDocument } from './parse.ts';
export { locateJsonPath, offsetToLineColumn } from './json-locate.ts';
