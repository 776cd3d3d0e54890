import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser, BrowserContext, Page, Response } from 'playwright-core';
import { launchBrowser, newContext, signIn } from '../support/browser';

// The studio's areas (studio/src/app/areas.ts); the admin may open every one.
const AREAS = ['stories', 'media', 'reviews', 'translations', 'releases', 'fleet', 'insights', 'people', 'settings'];

let browser: Browser;

/**
 * A context that records Content-Security-Policy violations two ways: the message Chromium itself
 * writes to the console, and the page's own `securitypolicyviolation` event (which also names what
 * was blocked). The listener comes in through the browser's debugging protocol, which the policy
 * does not govern.
 */
async function watchedContext(): Promise<{ context: BrowserContext; violations: string[] }> {
  const context = await newContext(browser);
  const violations: string[] = [];
  await context.addInitScript(() => {
    document.addEventListener('securitypolicyviolation', (event) => {
      console.error(`securitypolicyviolation: ${event.effectiveDirective} blocked ${event.blockedURI || 'inline'} in ${event.sourceFile}:${event.lineNumber}`);
    });
  });
  context.on('console', (message) => {
    const text = message.text();
    if (/securitypolicyviolation|Content Security Policy/i.test(text)) violations.push(`${message.page()?.url()}: ${text}`);
  });
  return { context, violations };
}

/** Goes to a page and waits until it has drawn its heading and stopped loading chunks. */
async function open(page: Page, path: string): Promise<Response | null> {
  const response = await page.goto(path);
  await page.getByRole('heading', { level: 1 }).first().waitFor();
  await page.waitForLoadState('networkidle');
  return response;
}

/** Every image on the page has loaded and has pixels: none was refused by the policy. */
async function expectImagesShown(page: Page): Promise<void> {
  await expect.poll(() => page.locator('img').evaluateAll((images) => images.filter((image) => !(image as HTMLImageElement).complete || (image as HTMLImageElement).naturalWidth === 0).map((image) => (image as HTMLImageElement).src)), { timeout: 30_000 }).toEqual([]);
}

function expectSecurityHeaders(response: Response | null): void {
  const headers = response!.headers();
  expect({
    scripts: headers['content-security-policy']?.match(/script-src [^;]*/)?.[0],
    framing: headers['content-security-policy']?.match(/frame-ancestors [^;]*/)?.[0],
    referrer: headers['referrer-policy'],
    camera: headers['permissions-policy']?.includes('camera=()'),
    sniffing: headers['x-content-type-options'],
  }).toEqual({ scripts: "script-src 'self'", framing: "frame-ancestors 'none'", referrer: 'no-referrer', camera: true, sniffing: 'nosniff' });
}

beforeAll(async () => {
  browser = await launchBrowser();
});

afterAll(async () => {
  await browser?.close();
});

describe('the Content-Security-Policy', () => {
  it('lets every studio area load without a violation, and sends its headers with each page', { timeout: 240_000 }, async () => {
    const { context, violations } = await watchedContext();
    const page = await context.newPage();
    await signIn(page, 'admin@demo.test');
    for (const area of AREAS) expectSecurityHeaders(await open(page, `/${area}`));
    await open(page, '/media');
    await page.locator('img').first().waitFor();
    await expectImagesShown(page);
    await context.close();
    expect(violations).toEqual([]);
  });

  it('lets the story editor and the widget workbench, with the convection solver in its Web Worker, run without a violation', { timeout: 120_000 }, async () => {
    const { context, violations } = await watchedContext();
    const page = await context.newPage();
    await signIn(page, 'curator@demo.test');
    await open(page, '/stories');
    await page.getByRole('table').getByRole('link').first().click();
    await page.locator('.ProseMirror').first().waitFor();
    await page.waitForLoadState('networkidle');
    await expectImagesShown(page);

    await open(page, '/widgets');
    const solver = page.waitForEvent('worker', { predicate: (worker) => worker.url().includes('convection') });
    await page.getByRole('tab', { name: 'Convection cell' }).click();
    await page.getByRole('img', { name: 'Convection cell' }).waitFor();
    // A worker the policy refused would never start.
    expect((await solver).url()).toMatch(/\/assets\/convection\.worker-[\w-]+\.js$/);
    await context.close();
    expect(violations).toEqual([]);
  });

  it('lets the kiosk load and register its service worker without a violation', async () => {
    const { context, violations } = await watchedContext();
    const page = await context.newPage();
    const response = await page.goto('/kiosk/');
    expectSecurityHeaders(response);
    const scope = await page.evaluate(() => navigator.serviceWorker.ready.then((registration) => registration.scope));
    expect(new URL(scope).pathname).toBe('/kiosk/');
    await page.getByRole('heading', { level: 1 }).first().waitFor();
    await page.waitForLoadState('networkidle');
    await context.close();
    expect(violations).toEqual([]);
  });

  it('lets the API reference at /api/docs render without a violation', async () => {
    const { context, violations } = await watchedContext();
    const page = await context.newPage();
    const response = await page.goto('/api/docs');
    expect(response!.headers()['content-security-policy']).toMatch(/frame-ancestors 'none'/);
    await page.getByRole('heading', { name: /Mantlepiece API/ }).waitFor();
    await page.waitForLoadState('networkidle');
    await context.close();
    expect(violations).toEqual([]);
  });
});
