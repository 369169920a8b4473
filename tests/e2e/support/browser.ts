import { mkdtemp, mkdir, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { chromium, type BrowserContext, type Page } from 'playwright-core';

export const baseUrl = process.env.E2E_BASE_URL ?? 'http://127.0.0.1:3100';
const screenshotDir = process.env.E2E_SCREENSHOT_DIR ?? path.resolve('screenshots');
const chromiumPath = process.env.CHROMIUM_PATH ?? '/usr/bin/chromium';

export const DEMO_PASSWORD = 'driftmark-demo';

export interface Session {
  context: BrowserContext;
  page: Page;
  close(): Promise<void>;
}

/** A fresh browser profile (own cookies) at the given viewport width. */
export async function openSession(
  width = 1280,
  height = width < 600 ? 812 : 860,
  options: {
    /** A .y4m or .mjpeg file Chromium's fake camera plays instead of a real camera (camera allowed). */
    fakeCameraFile?: string;
  } = {},
): Promise<Session> {
  const dir = await mkdtemp(path.join(tmpdir(), 'driftmark-e2e-'));
  // When the whole run is on a faked system clock (libfaketime, to try the suite on another day),
  // the browser is started without it (it does not run under it) and gets the runner's clock
  // through Playwright's clock instead. Without FAKETIME nothing changes.
  const faked = Boolean(process.env.FAKETIME);
  const env = faked
    ? Object.fromEntries(
        Object.entries(process.env).filter(([k]) => k !== 'LD_PRELOAD' && !k.startsWith('FAKETIME')),
      )
    : undefined;
  const context = await chromium.launchPersistentContext(dir, {
    ...(env ? { env: env as Record<string, string> } : {}),
    executablePath: chromiumPath,
    headless: true,
    viewport: { width, height },
    baseURL: baseUrl,
    ...(options.fakeCameraFile ? { permissions: ['camera'] } : {}),
    args: [
      ...(options.fakeCameraFile
        ? [
            '--use-fake-device-for-media-stream',
            '--use-fake-ui-for-media-stream',
            `--use-file-for-fake-video-capture=${options.fakeCameraFile}`,
          ]
        : []),
      '--no-sandbox',
      '--disable-gpu',
      '--disable-quic',
      '--no-first-run',
      '--disable-background-networking',
      '--disable-component-update',
      '--disable-sync',
    ],
  });
  context.setDefaultTimeout(15_000);
  if (faked) await context.clock.install({ time: new Date() });
  const page = context.pages()[0] ?? (await context.newPage());
  return {
    context,
    page,
    async close() {
      await context.close();
      await rm(dir, { recursive: true, force: true });
    },
  };
}

export async function screenshot(page: Page, name: string): Promise<void> {
  await mkdir(screenshotDir, { recursive: true });
  await page.screenshot({ path: path.join(screenshotDir, `${name}.png`), fullPage: true });
}

export async function signIn(page: Page, email: string, password = DEMO_PASSWORD): Promise<void> {
  await page.goto('/sign-in');
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password', { exact: true }).fill(password);
  await page.getByRole('button', { name: 'Sign in' }).click();
}

/**
 * The date `days` from today (UTC), YYYY-MM-DD. The e2e server runs on this machine's clock, so a
 * date typed into a form is placed relative to it instead of written as a literal that expires.
 */
export function daysFromToday(days: number): string {
  return new Date(Date.now() + days * 86_400_000).toISOString().slice(0, 10);
}
