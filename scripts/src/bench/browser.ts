/**
 * The first screen in headless Chromium (playwright-core, Debian's Chromium as the browser tests
 * use it): the sign-in page alone and the athlete's Today after signing in, each in a fresh
 * browser context (empty cache, a first visit) with the CPU slowed 4 × through CDP
 * `Emulation.setCPUThrottlingRate` (a mid-range phone, as Lighthouse's mobile preset slows it).
 *
 * Figures per load: first paint and first contentful paint (the page's paint timings), idle (the
 * later of the last long task's end and the last response's end, read once nothing has been in
 * flight and no long task has run for a second), and the JavaScript received: bytes on the wire
 * (as served, compressed or not) and decoded, with the Content-Encoding the server used.
 */
import { chromium, type Browser, type Page } from 'playwright-core';
import { ensureChromium } from '../lib/chromium.js';
import { signIn } from './http.js';

export const CPU_THROTTLING = 4;

export interface PageLoad {
  firstPaintMs: number;
  firstContentfulPaintMs: number;
  idleMs: number;
  scriptFiles: number;
  scriptWireBytes: number;
  scriptDecodedBytes: number;
  scriptEncodings: string[];
  /** Scripts sent without Content-Encoding, and the largest of them (bytes). */
  uncompressedScripts: number;
  largestUncompressedScript: number;
}

/** Collects long tasks from the first moment of the page (before any script of ours runs). */
const OBSERVE_LONG_TASKS = `
  window.__benchLongTaskEnd = 0;
  try {
    new PerformanceObserver((list) => {
      for (const e of list.getEntries()) window.__benchLongTaskEnd = Math.max(window.__benchLongTaskEnd, e.startTime + e.duration);
    }).observe({ type: 'longtask', buffered: true });
  } catch {}
`;

const READ_TIMINGS = `(() => {
  const paint = (name) => performance.getEntriesByName(name)[0]?.startTime ?? NaN;
  const lastResponse = Math.max(0, ...performance.getEntriesByType('resource').map((e) => e.responseEnd));
  const nav = performance.getEntriesByType('navigation')[0];
  return {
    firstPaintMs: paint('first-paint'),
    firstContentfulPaintMs: paint('first-contentful-paint'),
    idleMs: Math.max(lastResponse, window.__benchLongTaskEnd, nav ? nav.loadEventEnd : 0),
  };
})()`;

/** Quiet this long (no request in flight, no long task) counts as idle. */
const QUIET_MS = 1000;
const SETTLE_TIMEOUT_MS = 45_000;

const SINCE_LONG_TASK = `performance.now() - window.__benchLongTaskEnd`;
const HAS_FCP = `performance.getEntriesByName('first-contentful-paint').length > 0`;

async function measure(page: Page, path: string): Promise<PageLoad> {
  const scripts: { url: string; wire: number; decoded: number; encoding: string }[] = [];
  const pending: Promise<void>[] = [];
  let inFlight = 0;
  let lastNetwork = Date.now();
  page.on('request', () => {
    inFlight += 1;
    lastNetwork = Date.now();
  });
  const finished = () => {
    inFlight -= 1;
    lastNetwork = Date.now();
  };
  page.on('requestfinished', finished);
  page.on('requestfailed', finished);
  page.on('response', (response) => {
    if (response.request().resourceType() !== 'script') return;
    pending.push(
      (async () => {
        const body = await response.body().catch(() => Buffer.alloc(0));
        const sizes = await response.request().sizes();
        const headers = await response.allHeaders();
        scripts.push({
          url: response.url(),
          wire: sizes.responseBodySize,
          decoded: body.length,
          encoding: headers['content-encoding'] ?? 'identity',
        });
      })(),
    );
  });
  const cdp = await page.context().newCDPSession(page);
  await cdp.send('Emulation.setCPUThrottlingRate', { rate: CPU_THROTTLING });
  await page.addInitScript(OBSERVE_LONG_TASKS);
  await page.goto(path, { waitUntil: 'load', timeout: 60_000 });
  // Idle: nothing in flight and no long task for QUIET_MS, once the first contentful paint happened
  // (a lazily loaded route starts its requests only after the entry's script has run).
  const deadline = Date.now() + SETTLE_TIMEOUT_MS;
  for (;;) {
    const sinceLongTask = (await page.evaluate(SINCE_LONG_TASK)) as number;
    const painted = (await page.evaluate(HAS_FCP)) as boolean;
    if (painted && inFlight === 0 && Date.now() - lastNetwork >= QUIET_MS && sinceLongTask >= QUIET_MS) break;
    if (Date.now() > deadline)
      throw new Error(`${path} did not settle within ${SETTLE_TIMEOUT_MS / 1000} s.`);
    await new Promise((resolve) => setTimeout(resolve, 100));
  }
  await Promise.all(pending);
  // A string, evaluated in the page: this workspace compiles without the DOM's types.
  const timings = (await page.evaluate(READ_TIMINGS)) as Pick<
    PageLoad,
    'firstPaintMs' | 'firstContentfulPaintMs' | 'idleMs'
  >;
  await cdp.detach();
  const uncompressed = scripts.filter((s) => s.encoding === 'identity');
  return {
    ...timings,
    scriptFiles: scripts.length,
    scriptWireBytes: scripts.reduce((sum, s) => sum + s.wire, 0),
    scriptDecodedBytes: scripts.reduce((sum, s) => sum + s.decoded, 0),
    scriptEncodings: [...new Set(scripts.map((s) => s.encoding))].sort(),
    uncompressedScripts: uncompressed.length,
    largestUncompressedScript: Math.max(0, ...uncompressed.map((s) => s.decoded)),
  };
}

export interface BrowserBench {
  signInPage(): Promise<PageLoad>;
  today(): Promise<PageLoad>;
  close(): Promise<void>;
}

export async function openBrowserBench(
  baseUrl: string,
  athlete: { email: string; password: string },
): Promise<BrowserBench> {
  const executablePath = await ensureChromium();
  const browser: Browser = await chromium.launch({
    executablePath,
    headless: true,
    args: [
      '--no-sandbox',
      '--disable-gpu',
      '--disable-quic',
      '--no-first-run',
      '--disable-background-networking',
    ],
  });
  const viewport = { width: 390, height: 844 };
  return {
    async signInPage() {
      const context = await browser.newContext({ baseURL: baseUrl, viewport });
      try {
        return await measure(await context.newPage(), '/sign-in');
      } finally {
        await context.close();
      }
    },
    async today() {
      const context = await browser.newContext({ baseURL: baseUrl, viewport });
      try {
        // Signed in through the API, so the load measured is Today's own, from a cold cache.
        const cookie = await signIn(baseUrl, athlete.email, athlete.password);
        const host = new URL(baseUrl).hostname;
        await context.addCookies(
          cookie.split('; ').map((pair) => {
            const at = pair.indexOf('=');
            return { name: pair.slice(0, at), value: pair.slice(at + 1), domain: host, path: '/' };
          }),
        );
        const page = await context.newPage();
        const load = await measure(page, '/athlete');
        if (!new URL(page.url()).pathname.startsWith('/athlete')) {
          throw new Error(`Today did not open for ${athlete.email} (ended on ${page.url()}).`);
        }
        return load;
      } finally {
        await context.close();
      }
    },
    async close() {
      await browser.close();
    },
  };
}
