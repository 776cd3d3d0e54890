/// <reference lib="dom" />
import { chromium, type Browser, type BrowserContext, type Page } from 'playwright-core';

/**
 * The running Mantlepiece that `npm test` started (or one started by hand with `npm start`, named in
 * MANTLEPIECE_URL). Without it every suite that reads this fails, rather than vanishing or testing
 * whatever happens to answer on a default port.
 */
const runningServer = process.env.MANTLEPIECE_URL;
if (!runningServer) throw new Error('MANTLEPIECE_URL is not set: run these suites through `node scripts/test.mjs test`, which starts the server they check, or set it to a running one');
export const baseUrl = runningServer.replace(/\/$/, '');
export const demoPassword = process.env.DEMO_PASSWORD ?? 'mantlepiece-demo';

/** Debian's chromium, headless, with everything that would reach the internet switched off. */
export const chromiumOptions = {
  executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
  headless: true,
  args: [
    '--no-sandbox',
    '--disable-gpu',
    '--disable-quic',
    '--no-first-run',
    '--disable-background-networking',
    '--disable-component-update',
    '--disable-sync',
  ],
};

export function launchBrowser(): Promise<Browser> {
  return chromium.launch(chromiumOptions);
}

/** A fresh, cookie-less browser profile that reads English, at a desk-sized window. */
export function newContext(browser: Browser): Promise<BrowserContext> {
  return browser.newContext({ baseURL: baseUrl, locale: 'en-GB', viewport: { width: 1440, height: 900 } });
}

/** Fills in and sends the real studio sign-in form, whatever the server then answers. */
export async function submitSignIn(page: Page, email: string, password: string): Promise<void> {
  await page.goto('/sign-in');
  await page.getByLabel('Email').fill(email);
  await page.getByLabel('Password').fill(password);
  await page.getByRole('button', { name: 'Sign in' }).click();
}

/** Signs in as a demo account and waits until the studio's navigation is there. */
export async function signIn(page: Page, email: string, password = demoPassword): Promise<void> {
  await submitSignIn(page, email, password);
  await page.getByRole('navigation', { name: 'Studio areas' }).waitFor();
}

/**
 * Calls the API with a demo account's own access token, as a test's setup and clean-up do; a FormData
 * body goes as multipart. `server` is the Mantlepiece to call (the one `npm test` started by default).
 */
export async function apiAs(email: string, password = demoPassword, server = baseUrl) {
  const login = await fetch(`${server}/api/auth/login`, { method: 'POST', headers: { 'Content-Type': 'application/json' }, body: JSON.stringify({ email, password }) });
  if (!login.ok) throw new Error(`Sign-in of ${email} answered ${login.status}`);
  const { accessToken } = (await login.json()) as { accessToken: string };
  return async <T>(method: string, path: string, body?: unknown): Promise<T> => {
    const response = await fetch(`${server}/api${path}`, {
      method,
      headers: { Authorization: `Bearer ${accessToken}`, ...(body === undefined || body instanceof FormData ? {} : { 'Content-Type': 'application/json' }) },
      body: body === undefined || body instanceof FormData ? body : JSON.stringify(body),
    });
    if (!response.ok) throw new Error(`${method} ${path} answered ${response.status}: ${await response.text()}`);
    return (response.status === 204 ? undefined : await response.json()) as T;
  };
}

/**
 * Waits until the page rests: every animation with an end has ended (endless ones, a spinner, have
 * none to wait for; a timer on an empty box draws nothing) and two frames have been drawn, so state
 * set by a resize observer has rendered.
 * Colours and boxes are judged on a resting page: a dialog fading in reads as grey on grey.
 */
export async function atRest(page: Page): Promise<void> {
  await page.evaluate(async () => {
    // An empty box draws nothing however long it animates: Fluent times a toast by a CSS animation on one.
    const drawsNothing = (target: Element | null | undefined) =>
      !!target && target.childElementCount === 0 && target.getBoundingClientRect().width === 0 && target.getBoundingClientRect().height === 0;
    await Promise.all(document.getAnimations()
      .filter((animation) => Number.isFinite(Number(animation.effect?.getComputedTiming().endTime)))
      .filter((animation) => !drawsNothing((animation.effect as KeyframeEffect | null)?.target))
      .map((animation) => animation.finished.catch(() => undefined)));
    await new Promise((resolve) => requestAnimationFrame(() => requestAnimationFrame(resolve)));
  });
}
