/**
 * The board screen in a real browser: the demo opens laid out and checked, auto-place runs
 * in the worker and ends clean, a drag that shorts two nets is named and drawn and undo
 * takes it back, hovering lights a net, keys turn and lock parts, cancel keeps the board.
 */
import { describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { autoPlace, dragHole, layoutOf, useApp } from './support/session.ts';
import { readFileSync } from 'node:fs';
import { LayoutSchema, type Circuit, type Layout } from '../src/lib/model/index.ts';

const app = useApp();

/**
 * A two-lead part and a move that puts one of its leads into another part's lead hole on a
 * different net, while its other lead lands in a hole no lead uses: exactly one new short.
 */
function shortingMove(layout: Layout, nets: Record<string, string>) {
  const { cols, rows } = layout.board;
  const leadAt = new Set(layout.parts.flatMap((p) => p.pins.map((q) => `${q.at[0]},${q.at[1]}`)));
  for (const part of layout.parts.filter((p) => p.pins.length === 2)) {
    const [lead, other] = part.pins as [Layout['parts'][number]['pins'][number], Layout['parts'][number]['pins'][number]];
    const net = nets[`${part.ref}.${lead.pin}`];
    if (net === undefined) continue;
    for (const target of layout.parts) {
      if (target.ref === part.ref) continue;
      for (const q of target.pins) {
        const otherNet = nets[`${target.ref}.${q.pin}`];
        if (otherNet === undefined || otherNet === net) continue;
        const dx = q.at[0] - lead.at[0];
        const dy = q.at[1] - lead.at[1];
        const to = [other.at[0] + dx, other.at[1] + dy];
        const fits = to[0]! >= 0 && to[0]! < cols && to[1]! >= 0 && to[1]! < rows && !leadAt.has(`${to[0]},${to[1]}`);
        if (fits && (dx !== 0 || dy !== 0)) return { ref: part.ref, from: lead.at, to: q.at, nets: [net, otherNet] };
      }
    }
  }
  throw new Error('no two-lead part can be moved onto another net in this layout');
}

async function faultCodes(page: Page): Promise<string[]> {
  return page.getByTestId('check-item').evaluateAll((els) => els.map((e) => e.getAttribute('data-code') ?? ''));
}

describe('board screen', () => {
  it('opens the demo laid out and checked, and auto-place ends with no findings', async () => {
    const { page } = await app.open();
    expect((await layoutOf(page)).parts.length).toBeGreaterThan(3);
    await page.getByTestId('checks-clean').waitFor();
    expect(await autoPlace(page)).toBe('done');
    // The progress plot had something to draw, and the board was redrawn from the new layout.
    await page.getByTestId('checks-clean').waitFor();
    expect(await page.getByTestId('check-item').count()).toBe(0);
    expect(await page.evaluate(() => window.__kerfline!.faults().length)).toBe(0);
  });

  it('names a short made by dragging a part, draws it on the board, and undo clears it', async () => {
    const { page } = await app.open();
    await page.getByTestId('checks-clean').waitFor();
    const before = await layoutOf(page);
    const move = shortingMove(before, await page.evaluate(() => window.__kerfline!.pinNets()));
    await dragHole(page, move.from, move.to);
    const moved = (await layoutOf(page)).parts.find((p) => p.ref === move.ref)!;
    expect(moved.pins.map((p) => p.at)).toContainEqual(move.to);
    await page.getByTestId('checks-dirty').waitFor();
    expect(await faultCodes(page)).toContain('verify.short');
    const shortText = await page.locator('[data-testid=check-item][data-code="verify.short"]').allTextContents();
    expect(shortText.some((t) => move.nets.every((n) => t.includes(n)))).toBe(true);
    expect(await page.locator('[data-testid=board-svg] [data-code="verify.short"]').count()).toBeGreaterThan(0);

    // Clicking the finding flashes it on the board.
    await page.locator('[data-testid=check-item][data-code="verify.short"]').first().click();
    expect(await page.getByTestId('locate-flash').count()).toBeGreaterThan(0);

    await page.getByTestId('undo').click();
    await page.getByTestId('checks-clean').waitFor();
    expect(await faultCodes(page)).toEqual([]);
    expect(await layoutOf(page)).toEqual(before);
    await page.keyboard.press('Control+Shift+Z');
    expect(await faultCodes(page)).toContain('verify.short');
    await page.keyboard.press('Control+z');
    await page.getByTestId('checks-clean').waitFor();
  });

  it('lights every hole of a net under the pointer', async () => {
    const { page } = await app.open();
    const layout = await layoutOf(page);
    const nets = await page.evaluate(() => window.__kerfline!.pinNets());
    const part = layout.parts.find((p) => p.pins.some((q) => nets[`${p.ref}.${q.pin}`]))!;
    const pin = part.pins.find((q) => nets[`${part.ref}.${q.pin}`])!;
    const at = (await page.evaluate((h) => window.__kerfline!.holeToClient(h), pin.at))!;
    await page.mouse.move(at.x, at.y);
    await expect.poll(() => page.getByTestId('hover-info').textContent()).toContain(`net ${nets[`${part.ref}.${pin.pin}`]}`);
    expect(await page.locator('[data-testid=board-svg] g.highlight > *').count()).toBeGreaterThan(1);

    // Turned over, the same lead sits mirrored on screen and still names its net.
    await page.keyboard.press('f');
    await expect.poll(() => page.getByTestId('board-svg').getAttribute('data-side')).toBe('copper');
    const mirrored = (await page.evaluate((h) => window.__kerfline!.holeToClient(h), pin.at))!;
    await page.mouse.move(mirrored.x, mirrored.y);
    await expect.poll(() => page.getByTestId('hover-info').textContent()).toContain(`net ${nets[`${part.ref}.${pin.pin}`]}`);
  });

  it('turns and locks the chosen part from the keyboard, and undoes the turn', async () => {
    const { page } = await app.open();
    const before = await layoutOf(page);
    const part = before.parts.find((p) => p.pins.length >= 2)!;
    const at = (await page.evaluate((h) => window.__kerfline!.holeToClient(h), part.pins[0]!.at))!;
    await page.mouse.click(at.x, at.y);
    expect(await page.getByTestId('selected-part').textContent()).toContain(part.ref);
    await page.keyboard.press('r');
    const turned = (await layoutOf(page)).parts.find((p) => p.ref === part.ref)!;
    expect(turned.pins).not.toEqual(part.pins);
    await page.keyboard.press('l');
    const lockedPins = (await layoutOf(page)).parts.find((p) => p.ref === part.ref)!;
    expect(lockedPins.locked).toBe(true);
    await page.keyboard.press('r'); // a locked part does not turn
    expect((await layoutOf(page)).parts.find((p) => p.ref === part.ref)!.pins).toEqual(lockedPins.pins);
    expect(await page.getByTestId('status').textContent()).toContain('locked');
    await page.keyboard.press('Control+z');
    await page.keyboard.press('Control+z');
    expect((await layoutOf(page)).parts.find((p) => p.ref === part.ref)!.pins).toEqual(part.pins);

    // Without the pointer: pick a part from the list, then the arrow keys move it.
    const other = before.parts.find((p) => p.ref !== part.ref && p.pins.every((q) => q.at[0] + 1 < before.board.cols))!;
    await page.getByTestId('part-picker').selectOption(other.ref);
    await page.keyboard.press('ArrowRight');
    const nudged = (await layoutOf(page)).parts.find((p) => p.ref === other.ref)!;
    expect(nudged.pins.map((p) => p.at)).toEqual(other.pins.map((p) => [p.at[0] + 1, p.at[1]]));
  });

  it('re-routes a layout whose op-amp sections were swapped between package slots, and stays clean', async () => {
    const { page } = await app.open();
    // The planner's committed four-mixer: its packing puts sections in other slots than the
    // circuit order would, so re-routing must read the nets through the layout's packing.
    const circuit = JSON.parse(readFileSync('layouts/four-mixer.circuit.json', 'utf8')) as Circuit;
    const layout = LayoutSchema.parse(JSON.parse(readFileSync('layouts/four-mixer.layout.json', 'utf8')));
    const project = { format: 'kerfline.project', version: 1, source: { kind: 'json', text: JSON.stringify(circuit, null, 2) }, circuit, layout, options: {} };
    await page.evaluate((text) => window.__kerfline!.openText('four-mixer.kerfline.json', text), JSON.stringify(project));
    await page.getByTestId('checks-clean').waitFor();
    const ref = layout.parts.find((p) => p.pins.length === 2 && p.pins.every((q) => q.at[0] + 1 < layout.board.cols))!.ref;
    const there = await page.evaluate((r) => window.__kerfline!.timeEdit(r, [1, 0]), ref);
    const back = await page.evaluate((r) => window.__kerfline!.timeEdit(r, [-1, 0]), ref);
    expect(there.moved && back.moved).toBe(true);
    expect(await faultCodes(page)).toEqual([]);
    expect((await layoutOf(page)).parts.find((p) => p.ref === ref)!.pins).toEqual(layout.parts.find((p) => p.ref === ref)!.pins);
  });

  it('sleeves a bent link on the board, notes it in the checks, and lets the builder turn insulated links off', async () => {
    const { page } = await app.open();
    const circuit = JSON.parse(readFileSync('layouts/bench-buffer.circuit.json', 'utf8')) as Circuit;
    const layout = LayoutSchema.parse(JSON.parse(readFileSync('layouts/bench-buffer.layout.json', 'utf8')));
    // A hand-made bent link between two free holes: insulated wire by its geometry.
    const used = new Set([...layout.parts.flatMap((p) => p.pins.map((q) => q.at.join())), ...layout.links.flatMap((l) => [l.from.join(), l.to.join()])]);
    const free: [number, number][] = [];
    for (let y = 0; y < layout.board.rows; y++) for (let x = 0; x < layout.board.cols; x++) if (!used.has(`${x},${y}`)) free.push([x, y]);
    const from = free[0]!;
    const to = free.find((h) => h[0] !== from[0] && h[1] !== from[1])!;
    const bent = { ...layout, links: [...layout.links, { from, to }] };
    const project = { format: 'kerfline.project', version: 1, source: { kind: 'json', text: JSON.stringify(circuit, null, 2) }, circuit, layout: bent, options: {} };
    await page.evaluate((text) => window.__kerfline!.openText('sleeved.kerfline.json', text), JSON.stringify(project));
    await expect.poll(() => page.evaluate(() => window.__kerfline!.notes().map((n) => n.code))).toContain('layout.insulated-link');
    expect(await page.locator('[data-insulated="true"]').count()).toBeGreaterThan(0);
    const box = page.getByTestId('opt-insulated');
    expect(await box.isChecked()).toBe(true);
    await box.uncheck();
    expect(await box.isChecked()).toBe(false);
  });

  it('cancels auto-place and keeps the board as it was', async () => {
    const { page } = await app.open();
    const before = await layoutOf(page);
    await page.getByTestId('opt-effort').selectOption('thorough');
    await page.getByTestId('auto-place').click();
    await page.getByTestId('plan-cancel').click();
    expect(await page.getByTestId('plan-progress').getAttribute('data-state')).toBe('cancelled');
    expect(await layoutOf(page)).toEqual(before);
    await expect.poll(() => page.getByTestId('status').textContent()).toContain('cancelled');
  });

  it('opens the printable bench guide for the board on screen, with its cut list and cautions', async () => {
    const { page, context } = await app.open();
    const layout = await layoutOf(page);
    const [guide] = await Promise.all([context.waitForEvent('page'), page.getByTestId('open-guide').click()]);
    await guide.waitForLoadState();
    const text = (await guide.locator('body').textContent()) ?? '';
    expect(text).toContain('Track cuts, copper side');
    expect(text).toContain('mains');
    // every cut of the layout is a tick-box line of the guide
    expect(await guide.locator('input[type=checkbox], .tick').count()).toBeGreaterThanOrEqual(layout.cuts.length);
    await expect.poll(() => page.getByTestId('status').textContent()).toContain('Bench guide opened');
    await guide.close();
  });

  it('keeps the help and the safety cautions one click away', async () => {
    const { page } = await app.open();
    await page.getByTestId('open-safety').click();
    const safety = await page.getByTestId('safety-panel').textContent();
    for (const words of ['Low voltage only', 'mains', 'fumes', 'Lead', 'wash your hands', 'eye protection when trimming leads', 'local codes', 'licensed practice']) expect(safety).toContain(words);
    await page.keyboard.press('Escape');
    await page.keyboard.press('?');
    expect(await page.getByTestId('help-panel').textContent()).toContain('Ctrl+Shift+Z');
  });
});
