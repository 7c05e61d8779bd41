/**
 * Driving Chromium for the browser tests: `launchBrowser()` starts Debian's Chromium
 * (PLAYWRIGHT_CHROMIUM, default /usr/bin/chromium) headless with the project's flags;
 * `openApp(browser, url, context?)` opens the app (in a fresh context unless one is given),
 * collects console errors and page errors into `errors`, and waits until the board is drawn;
 * `distinctColours(page, png)` counts the colours of a screenshot (blank-render check).
 */
import { chromium, type Browser, type BrowserContext, type Page } from 'playwright-core';

export const CHROMIUM_ARGS = ['--no-sandbox', '--disable-gpu', '--disable-background-networking', '--disable-component-update'];

export function launchBrowser(): Promise<Browser> {
  return chromium.launch({ executablePath: process.env.PLAYWRIGHT_CHROMIUM || '/usr/bin/chromium', headless: true, args: CHROMIUM_ARGS });
}

export interface AppPage {
  context: BrowserContext;
  page: Page;
  /** Console errors and uncaught page errors seen so far. */
  errors: string[];
}

export function watchErrors(page: Page, errors: string[]): void {
  page.on('console', (m) => {
    if (m.type() === 'error') errors.push(`console: ${m.text()}`);
  });
  page.on('pageerror', (e) => errors.push(`pageerror: ${e.message}`));
}

export async function openApp(browser: Browser, url: string, context?: BrowserContext): Promise<AppPage> {
  const ctx = context ?? (await browser.newContext({ viewport: { width: 1400, height: 900 }, acceptDownloads: true }));
  const page = await ctx.newPage();
  const errors: string[] = [];
  watchErrors(page, errors);
  await page.goto(url);
  await waitForBoard(page);
  return { context: ctx, page, errors };
}

export async function waitForBoard(page: Page): Promise<void> {
  await page.waitForFunction(() => {
    const h = window.__kerfline;
    return !!h?.ready && h.boardDrawnAt !== undefined;
  }, undefined, { timeout: 60_000 });
}

/** Number of distinct colours in a PNG screenshot, counted in the page (no image library needed). */
export async function distinctColours(page: Page, png: Buffer): Promise<number> {
  return page.evaluate(async (b64) => {
    const bytes = Uint8Array.from(atob(b64), (c) => c.charCodeAt(0));
    const bitmap = await createImageBitmap(new Blob([bytes], { type: 'image/png' }));
    const canvas = new OffscreenCanvas(bitmap.width, bitmap.height);
    const ctx = canvas.getContext('2d')!;
    ctx.drawImage(bitmap, 0, 0);
    const data = ctx.getImageData(0, 0, bitmap.width, bitmap.height).data;
    const seen = new Set<number>();
    for (let i = 0; i < data.length; i += 4) seen.add((data[i]! << 16) | (data[i + 1]! << 8) | data[i + 2]!);
    return seen.size;
  }, png.toString('base64'));
}
