/**
 * Paper and pagination. The printed guide is laid out in fixed-height lines (LINE_MM each;
 * a block may take several) so the page count is known before printing: each section
 * starts on a new page and fills pages of `linesPerPage(paper)` lines; a header line stays
 * with the line after it. The two drawings take one page each. So a guide has
 *   pages = Σ over list sections of their page count + 2 drawing pages,
 * and every list section that fits on a page counts one.
 */
export type Paper = 'a4' | 'letter';

/** Sheet sizes in mm: ISO 216 A4, and US Letter 8.5 × 11 in (1 in = 25.4 mm). */
export const PAPER: Record<Paper, { width: number; height: number; css: string }> = {
  a4: { width: 210, height: 297, css: 'A4' },
  letter: { width: 215.9, height: 279.4, css: 'letter' },
};

export const MARGIN_MM = 12;
export const LINE_MM = 6;
/** Page header (running title) plus the section heading. */
export const HEADER_MM = 16;
/** Kept free at the foot of each page so rounding never spills a page over. */
export const SLACK_MM = 3;

export function contentBox(paper: Paper, landscape = false): { width: number; height: number } {
  const p = PAPER[paper];
  const w = (landscape ? p.height : p.width) - 2 * MARGIN_MM;
  const h = (landscape ? p.width : p.height) - 2 * MARGIN_MM;
  return { width: Math.round(w * 10) / 10, height: Math.round(h * 10) / 10 };
}

export function linesPerPage(paper: Paper): number {
  return Math.floor((contentBox(paper).height - SLACK_MM - HEADER_MM) / LINE_MM);
}

export interface Line {
  /** Height in lines. */
  units: number;
  html: string;
  /** A heading: kept on the same page as the line after it. */
  sticky?: boolean;
}

/** Fill pages greedily; a sticky heading that would end a page moves to the next. */
export function paginate(lines: Line[], perPage: number): Line[][] {
  const pages: Line[][] = [];
  let cur: Line[] = [];
  let used = 0;
  for (const line of lines) {
    const units = Math.min(line.units, perPage);
    if (used + units > perPage && cur.length) {
      // Trailing headings move with this line, unless together they would not fit a page.
      let k = cur.length;
      while (k > 1 && cur[k - 1]!.sticky) k--;
      const carry = cur.slice(k);
      const carried = carry.reduce((s, l) => s + l.units, 0);
      const keep = carried + units <= perPage ? k : cur.length;
      pages.push(cur.slice(0, keep));
      cur = cur.slice(keep);
      used = cur.reduce((s, l) => s + l.units, 0);
    }
    cur.push(units === line.units ? line : { ...line, units });
    used += units;
  }
  if (cur.length || !pages.length) pages.push(cur);
  return pages;
}
