import { mkdir } from 'node:fs/promises';
import { join } from 'node:path';
import type { Page } from 'playwright-core';
import { expect } from 'vitest';

/**
 * When `SCREENSHOT_DIR` is set: the page as it stands in English, then in Arabic through the
 * language menu (right to left), then English again, so the suite goes on as it was. The choice is
 * saved to the signed-in account, which is why this runs only when screenshots are asked for.
 * `arrange` brings back, after each change of language, what the menu closed.
 */
export async function screenshotsInEnglishAndArabic(page: Page, name: string, arrange: () => Promise<void> = async () => {}): Promise<void> {
  const shots = process.env.SCREENSHOT_DIR;
  if (!shots) return;
  const direction = () => page.evaluate(() => document.documentElement.dir);
  await mkdir(shots, { recursive: true });
  await page.screenshot({ path: join(shots, `${name}-en.png`) });
  await page.getByRole('button', { name: 'Language: English' }).click();
  await page.getByRole('menuitemradio', { name: 'العربية' }).click();
  await expect.poll(direction).toBe('rtl');
  await arrange();
  await page.screenshot({ path: join(shots, `${name}-ar.png`) });
  await page.getByRole('button', { name: /^اللغة/ }).click();
  await page.getByRole('menuitemradio', { name: 'English' }).click();
  await expect.poll(direction).toBe('ltr');
  await arrange();
}
