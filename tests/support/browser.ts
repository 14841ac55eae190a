import fs from 'node:fs';
import path from 'node:path';
import type { AddressInfo } from 'node:net';
import { afterAll, beforeAll } from 'vitest';
import { chromium, type Browser, type Page } from 'playwright-core';
import { attachRealtime } from '../../server/realtime/io';
import { testApp } from './app';

export const SCREENSHOT_DIR = path.resolve('test-results/screenshots');

// Flags that let Debian's Chromium run headless as root on a machine without outside network.
const CHROMIUM_ARGS = ['--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run', '--disable-background-networking', '--disable-component-update', '--disable-sync', '--disable-dev-shm-usage'];

/**
 * The real server (built client included) on a free loopback port, and Debian's Chromium
 * driven by playwright-core. Never downloads a browser.
 */
export function browserHarness() {
  const built = testApp();
  const harness = { app: built.app, baseUrl: '', browser: undefined as unknown as Browser };
  beforeAll(async () => {
    if (!fs.existsSync(path.join(built.config.clientDir, 'index.html'))) throw new Error('No client build: run the tests through `npm test`');
    const server = built.app.listen(0, '127.0.0.1');
    await new Promise((resolve) => server.once('listening', resolve));
    const io = attachRealtime(server, built);
    harness.baseUrl = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
    harness.browser = await chromium.launch({ executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium', headless: true, args: CHROMIUM_ARGS });
    fs.mkdirSync(SCREENSHOT_DIR, { recursive: true });
    afterAll(async () => {
      await harness.browser.close();
      await io.close();
      server.closeAllConnections();
      await new Promise((resolve) => server.close(resolve));
    });
  });
  return harness;
}

/** Fills in and sends the sign-in form, as a person at the tablet would. */
export async function fillSignIn(page: Page, baseUrl: string, email: string, password: string) {
  await page.goto(`${baseUrl}/sign-in`);
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password', { exact: true }).fill(password);
  await page.getByRole('button', { name: 'Sign in' }).click();
}
