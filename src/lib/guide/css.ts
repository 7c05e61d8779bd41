/**
 * Print CSS of the guide. Each `section.page` is exactly one sheet: its height is the
 * paper's text height less SLACK_MM, it breaks after itself and clips anything taller, so
 * the printed page count is the planned one. A landscape sheet (a wide true-scale drawing)
 * uses the named page `wide`. On screen the pages show as sheets one under another.
 */
import { HEADER_MM, LINE_MM, MARGIN_MM, PAPER, SLACK_MM, contentBox, type Paper } from './pages.ts';

export function guideCss(paper: Paper): string {
  const p = PAPER[paper];
  const tall = contentBox(paper, false);
  const wide = contentBox(paper, true);
  return `
@page { size: ${p.css} portrait; margin: ${MARGIN_MM}mm; }
@page wide { size: ${p.css} landscape; margin: ${MARGIN_MM}mm; }
* { box-sizing: border-box; }
html, body { margin: 0; padding: 0; }
body { font: 9pt/${LINE_MM}mm Helvetica, Arial, sans-serif; color: #161616; -webkit-print-color-adjust: exact; print-color-adjust: exact; }
.page { width: ${tall.width}mm; height: ${tall.height - SLACK_MM}mm; overflow: hidden; break-after: page; page-break-after: always; }
.page.wide { page: wide; width: ${wide.width}mm; height: ${wide.height - SLACK_MM}mm; }
.page:last-child { break-after: auto; page-break-after: auto; }
header { height: 6mm; display: flex; justify-content: space-between; font-size: 7.5pt; color: #5b5b5b; border-bottom: 0.2mm solid #9a9a9a; }
h2 { height: ${HEADER_MM - 6}mm; margin: 0; font-size: 13pt; line-height: ${HEADER_MM - 6}mm; }
.ln { overflow: hidden; white-space: nowrap; text-overflow: ellipsis; }
.ln.wrap { white-space: normal; line-height: ${LINE_MM - 0.8}mm; padding-top: 0.4mm; }
.ln.hd { font-weight: bold; border-bottom: 0.15mm solid #c9c9c9; }
.ln.title { font-size: 16pt; font-weight: bold; line-height: ${LINE_MM * 2}mm; white-space: nowrap; }
.ln.sub { padding-left: 6mm; color: #333; }
.ln.toc { display: flex; justify-content: space-between; max-width: 120mm; }
.ln.cells { display: flex; }
.cell { display: inline-block; width: 33%; overflow: hidden; }
.alt { color: #666; }
.val { font-size: 10pt; }
.tick { display: inline-block; width: 3.2mm; height: 3.2mm; border: 0.3mm solid #222; margin: 0 1.6mm 0 0; vertical-align: -0.5mm; }
.band { display: inline-block; width: 2.6mm; height: 3.4mm; border: 0.2mm solid #444; margin: 0 0.8mm 0 1.4mm; vertical-align: -0.7mm; }
.barbox { display: flex; align-items: center; }
.drawing svg, .barbox svg { display: block; }
@media screen {
  body { background: #8a8a8a; }
  .page { background: #fff; margin: 8mm auto; padding: 0; box-shadow: 0 0 3mm rgba(0,0,0,0.35); outline: ${MARGIN_MM}mm solid #fff; }
}
`;
}
