/**
 * A readable name for the browser behind a User-Agent header, e.g. "Safari on iPhone", for the
 * signed-in devices list. Only a label for people: nothing is decided from it. Order matters,
 * because browsers carry each other's tokens (Edge and Opera say "Chrome", Chrome says "Safari").
 */
const BROWSERS: [RegExp, string][] = [
  [/\bEdg(e|A|iOS)?\//, 'Edge'],
  [/\bOPR\/|\bOpera\b/, 'Opera'],
  [/\bSamsungBrowser\//, 'Samsung Internet'],
  [/\bFirefox\/|\bFxiOS\//, 'Firefox'],
  [/\bHeadlessChrome\//, 'Headless Chrome'],
  [/\bChrome\/|\bCriOS\/|\bChromium\//, 'Chrome'],
  [/\bVersion\/[\d.]+.*\bSafari\//, 'Safari'],
  [/^curl\//, 'curl'],
];

const SYSTEMS: [RegExp, string][] = [
  [/\biPhone\b/, 'iPhone'],
  [/\biPad\b/, 'iPad'],
  [/\bAndroid\b/, 'Android'],
  [/\bWindows\b/, 'Windows'],
  [/\bCrOS\b/, 'ChromeOS'],
  [/\bMac OS X\b|\bMacintosh\b/, 'Mac'],
  [/\bLinux\b|\bX11\b/, 'Linux'],
];

export const UNKNOWN_DEVICE = 'Unknown device';

export function deviceSummary(userAgent: string | null | undefined): string {
  if (!userAgent) return UNKNOWN_DEVICE;
  const browser = BROWSERS.find(([pattern]) => pattern.test(userAgent))?.[1];
  const system = SYSTEMS.find(([pattern]) => pattern.test(userAgent))?.[1];
  if (browser && system) return `${browser} on ${system}`;
  return browser ?? system ?? UNKNOWN_DEVICE;
}
