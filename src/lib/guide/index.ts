/**
 * Guide: the printable bench guide.
 *
 * - `buildGuide(circuit, layout): Result<Guide>` — board preparation, cut list (copper side),
 *   links and wires, parts list, build order, off-board wiring, probe checklist, cautions and
 *   both drawings, as plain data; fails on a layout that does not verify.
 * - `guideHtml(guide, { paper: 'a4' | 'letter' }): string` — one self-contained, printable
 *   HTML file with the copper side at true scale.
 * - `guidePages(guide, { paper })` — the page plan guideHtml prints (one entry per sheet).
 */
export { buildGuide } from './build-guide.ts';
export { guideHtml, guidePages, SECTION_TITLES } from './html.ts';
export type { GuidePage, SectionId } from './html.ts';
export type { Paper } from './pages.ts';
export type { WireStock } from './awg.ts';
export type {
  Guide,
  HoleName,
  BoardPrep,
  CutItem,
  CutRow,
  SegmentItem,
  PartGroup,
  BuildStep,
  OffBoardPart,
  OffBoardPad,
  ProbeItem,
  Caution,
} from './types.ts';
