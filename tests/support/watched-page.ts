import { expect } from 'vitest';
import type { Browser, Page, Request } from 'playwright-core';

export const TABLET = { width: 800, height: 1280 };
export const PHONE = { width: 360, height: 780 };

interface WatchOptions {
  viewport?: { width: number; height: number };
  /**
   * Paths whose 4xx answers the test expects (asking for the session while signed out answers
   * 401): Chromium notes every refused request as a console error, and those are not problems.
   */
  refusals?: string[];
}

/**
 * A fresh touch browser (no cookies) whose page errors and console errors are collected.
 * `close()` waits for the API calls still on their way (closing under them would leave the server
 * answering into a database the test run is closing), closes, and expects no problems.
 */
export async function watchedPage(browser: Browser, { viewport = TABLET, refusals = ['/api/session'] }: WatchOptions = {}) {
  const context = await browser.newContext({ viewport, hasTouch: true });
  const page = await context.newPage();
  const problems: string[] = [];
  const inFlight = new Set<Request>();
  page.on('pageerror', (error) => problems.push(error.message));
  page.on('console', (message) => {
    if (message.type() !== 'error') return;
    const { pathname } = new URL(message.location().url || 'about:blank');
    if (message.text().startsWith('Failed to load resource') && refusals.includes(pathname)) return;
    problems.push(`${message.text()} (${message.location().url})`);
  });
  // The socket's long polls stay open by design; only the API calls have to finish.
  page.on('request', (request) => {
    if (new URL(request.url()).pathname.startsWith('/api/')) inFlight.add(request);
  });
  const done = (request: Request) => inFlight.delete(request);
  page.on('requestfinished', done);
  page.on('requestfailed', done);

  /** Until the page's API calls have all been answered (a page just opened is still loading). */
  const settled = () => expect.poll(() => inFlight.size, { message: 'API calls still on their way', timeout: 10_000 }).toBe(0);

  async function close() {
    await settled();
    await context.close();
    expect(problems, 'errors in the page or its console').toEqual([]);
  }
  return { context, page, problems, settled, close };
}

/** How far the page is wider than the screen: above 0, a phone would scroll sideways. */
export const sidewaysOverflow = (page: Page) => page.evaluate(() => document.documentElement.scrollWidth - document.documentElement.clientWidth);
