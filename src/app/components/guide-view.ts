/**
 * The app's print view of the bench guide: the same `buildGuide` + `guideHtml` the command
 * line uses, opened as a self-contained page the builder prints from the browser.
 */
import type { Circuit, Layout, Problem } from '../../lib/model/index.ts';
import { buildGuide, guideHtml, type Paper } from '../../lib/guide/index.ts';

export type GuideFile = { ok: true; name: string; html: string } | { ok: false; problems: Problem[] };

/** Build the guide for the layout on screen; a layout with faults gets no guide. */
export function benchGuideFile(circuit: Circuit, layout: Layout, paper: Paper): GuideFile {
  const g = buildGuide(circuit, layout);
  if (!g.ok) return { ok: false, problems: g.problems };
  const base = circuit.title.replace(/[^\w.-]+/g, '-').replace(/^-+|-+$/g, '').slice(0, 60) || 'board';
  return { ok: true, name: `${base}.guide.html`, html: guideHtml(g.value, { paper }) };
}

/** Open the guide in a new tab for printing; falls back to a download when pop-ups are blocked. */
export function openGuide(file: { name: string; html: string }, download: (name: string, text: string, type: string) => void): boolean {
  const url = URL.createObjectURL(new Blob([file.html], { type: 'text/html' }));
  // No 'noopener' feature: with it window.open always returns null and we could not tell a
  // blocked pop-up from an opened one. The guide is our own static page; cut the link back.
  const win = window.open(url, '_blank');
  setTimeout(() => URL.revokeObjectURL(url), 60_000);
  if (win) {
    win.opener = null;
    return true;
  }
  download(file.name, file.html, 'text/html');
  return false;
}
