import type { Page } from 'playwright-core';

/**
 * An answer lost on the arena Wi-Fi: the first `method` request to `url` reaches the server and is
 * carried out, then its connection is reset before the page hears back; later requests pass.
 */
export async function loseFirstAnswer(page: Page, url: string, method: string) {
  let lost = false;
  await page.route(url, async (route) => {
    if (lost || route.request().method() !== method) return route.fallback();
    lost = true;
    await route.fetch();
    await route.abort('connectionreset');
  });
}
