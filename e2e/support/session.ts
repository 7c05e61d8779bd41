/**
 * Shared set-up for the browser test files: one Chromium per file, a fresh context (empty
 * localStorage) per test, and after every test the assertion that the page logged no
 * console error and threw no uncaught error.
 */
import { afterAll, afterEach, beforeAll, expect, inject } from 'vitest';
import type { Browser, Page } from 'playwright-core';
import { launchBrowser, openApp, type AppPage } from './browser.ts';
import type { Layout } from '../../src/lib/model/index.ts';

export function useApp(): { open(): Promise<AppPage>; url(): string } {
  let browser: Browser | undefined;
  const pages: AppPage[] = [];
  beforeAll(async () => {
    browser = await launchBrowser();
  });
  afterEach(async () => {
    const errors = pages.flatMap((p) => p.errors);
    for (const p of pages.splice(0)) await p.context.close();
    expect(errors, 'console errors or uncaught page errors').toEqual([]);
  });
  afterAll(async () => {
    await browser?.close();
  });
  return {
    url: () => inject('appUrl'),
    async open() {
      const app = await openApp(browser!, inject('appUrl'));
      pages.push(app);
      return app;
    },
  };
}

export function layoutOf(page: Page): Promise<Layout> {
  return page.evaluate(() => window.__kerfline!.layout()!);
}

/** Drag with the real mouse from the centre of one hole to another, in small steps. */
export async function dragHole(page: Page, from: [number, number], to: [number, number]): Promise<void> {
  const a = await page.evaluate((h) => window.__kerfline!.holeToClient(h), from);
  const b = await page.evaluate((h) => window.__kerfline!.holeToClient(h), to);
  if (!a || !b) throw new Error(`hole ${from} or ${to} is not on screen`);
  await page.mouse.move(a.x, a.y);
  await page.mouse.down();
  await page.mouse.move((a.x + b.x) / 2, (a.y + b.y) / 2, { steps: 4 });
  await page.mouse.move(b.x, b.y, { steps: 4 });
  await page.mouse.up();
}

/** Wait for auto-place to finish and return how it ended. */
export async function autoPlace(page: Page): Promise<string> {
  await page.getByTestId('auto-place').click();
  const progress = page.getByTestId('plan-progress');
  await progress.waitFor();
  await page.waitForFunction(() => document.querySelector('[data-testid=plan-progress]')?.getAttribute('data-state') !== 'running', undefined, { timeout: 100_000 });
  return (await progress.getAttribute('data-state')) ?? '';
}
