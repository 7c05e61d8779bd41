/**
 * Files and safety of user text in a real browser: an unsaved edit survives a reload, the
 * exported layout and project files validate against the schemas, markup in a title or a
 * part value is shown as text and never runs, and screenshots of both sides are not blank.
 */
import { describe, expect, it } from 'vitest';
import { mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import type { Page } from 'playwright-core';
import { LayoutSchema, ProjectSchema, migrateProject } from '../src/lib/model/index.ts';
import { distinctColours, waitForBoard } from './support/browser.ts';
import { layoutOf, useApp } from './support/session.ts';

const app = useApp();

async function download(page: Page, testid: string): Promise<{ name: string; text: string }> {
  const [d] = await Promise.all([page.waitForEvent('download'), page.getByTestId(testid).click()]);
  const path = await d.path();
  return { name: d.suggestedFilename(), text: readFileSync(path, 'utf8') };
}

describe('files and user text', () => {
  it('restores an unsaved edit after a reload', async () => {
    const { page } = await app.open();
    const before = await layoutOf(page);
    const part = before.parts[0]!;
    const at = (await page.evaluate((h) => window.__kerfline!.holeToClient(h), part.pins[0]!.at))!;
    await page.mouse.click(at.x, at.y);
    // Nudge down, or up when the part already sits on the bottom row.
    const bottom = Math.max(...part.pins.map((p) => p.at[1])) === before.board.rows - 1;
    await page.keyboard.press(bottom ? 'ArrowUp' : 'ArrowDown');
    const edited = await layoutOf(page);
    expect(edited.parts[0]!.pins).not.toEqual(part.pins);
    await page.reload();
    await waitForBoard(page);
    expect(await layoutOf(page)).toEqual(edited);
    expect(await page.getByTestId('status').textContent()).toContain('Restored');
  });

  it('exports a layout document and a project file that validate against the schemas', async () => {
    const { page } = await app.open();
    const layout = await download(page, 'export-layout');
    expect(layout.name).toMatch(/\.layout\.json$/);
    const l = LayoutSchema.safeParse(JSON.parse(layout.text));
    expect(l.success).toBe(true);
    expect(l.data).toEqual(await layoutOf(page));

    const project = await download(page, 'save-project');
    const p = ProjectSchema.safeParse(migrateProject(JSON.parse(project.text)));
    expect(p.success).toBe(true);
    expect(p.data?.layout).toEqual(l.data);

    for (const side of ['component', 'copper']) {
      const svg = await download(page, `export-svg-${side}`);
      expect(svg.name).toMatch(new RegExp(`\\.${side}\\.svg$`));
      expect(svg.text).toContain('<svg');
      expect(svg.text).toContain(`data-side="${side}"`);
    }
  });

  it('shows markup in a title and a part value as text and never runs it', async () => {
    const { page } = await app.open();
    const title = '<img src=x onerror="window.__owned=1">';
    const value = '<script>window.__owned=2</script>';
    const text = await page.getByTestId('circuit-text').inputValue();
    const circuit = JSON.parse(text) as { title: string; parts: { value?: string }[] };
    circuit.title = title;
    circuit.parts[0]!.value = value;
    await page.getByTestId('circuit-text').fill(JSON.stringify(circuit, null, 2));
    await page.getByTestId('circuit-ok').waitFor();
    expect(await page.getByTestId('circuit-title').textContent()).toBe(title);
    const boardTexts = await page.locator('[data-testid=board-svg] text').allTextContents();
    expect(boardTexts).toContain(value);
    expect(await page.locator('img, script:not([type=module])').count()).toBe(0);
    expect(await page.locator('[data-testid=board-svg] script').count()).toBe(0);
    // Give a stray handler every chance to fire before checking it never did.
    await page.waitForTimeout(300);
    expect(await page.evaluate(() => (window as { __owned?: number }).__owned)).toBeUndefined();
  });

  it('lays out a SPICE netlist dropped on the page, and points the caret at a broken line', async () => {
    const { page } = await app.open();
    const deck = '* a divider with a filter cap\nR1 VCC MID 10k\nR2 MID 0 10k\nC1 MID 0 100n\n.end\n';
    await page.evaluate((text) => {
      const dt = new DataTransfer();
      dt.items.add(new File([text], 'divider.cir', { type: 'text/plain' }));
      window.dispatchEvent(new DragEvent('drop', { dataTransfer: dt, bubbles: true, cancelable: true }));
    }, deck);
    await page.waitForFunction(() => window.__kerfline!.layout()?.parts.length === 3, undefined, { timeout: 100_000 });
    expect((await layoutOf(page)).parts.map((p) => p.ref).sort()).toEqual(['C1', 'R1', 'R2']);
    expect(await page.getByTestId('plan-progress').getAttribute('data-state')).toBe('done');
    await page.getByTestId('checks-clean').waitFor();
    expect(await page.locator('input[name=src-kind][value=spice]').isChecked()).toBe(true);

    // A line the reader cannot take: listed with its number; a click puts the caret there.
    const broken = deck.replace('.end', 'Q7 only-one-node\n.end');
    await page.getByTestId('circuit-text').fill(broken);
    const problem = page.getByTestId('circuit-problem').first();
    expect(await problem.textContent()).toContain('line 5');
    await problem.click();
    const caret = await page.getByTestId('circuit-text').evaluate((el) => (el as HTMLTextAreaElement).selectionStart);
    expect(broken.slice(0, caret).split('\n').length).toBe(5);
    // The board keeps the last circuit that read cleanly.
    expect((await layoutOf(page)).parts.length).toBe(3);
  });

  it('writes screenshots of both sides that are not blank', async () => {
    const { page } = await app.open();
    mkdirSync('test-results', { recursive: true });
    const board = page.getByTestId('board-svg');
    const shots: Buffer[] = [];
    for (const side of ['component', 'copper'] as const) {
      await page.getByTestId(`side-${side}`).click();
      await expect.poll(() => board.getAttribute('data-side')).toBe(side);
      const png = await board.screenshot();
      writeFileSync(`test-results/board-${side}.png`, png);
      // A blank render is one or two flat colours; a drawn board has dozens.
      expect(await distinctColours(page, png)).toBeGreaterThan(20);
      shots.push(png);
    }
    expect(shots[0]!.equals(shots[1]!)).toBe(false);
  });
});
