import { readFile } from 'node:fs/promises';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser, Page } from 'playwright-core';
import { apiAs, launchBrowser, newContext, signIn } from '../support/browser';

// An admin invites someone, then finds the invitation in the audit trail's CSV and reads its mail
// on the captured-mail page, both through the studio's signed-in API client.
const invitee = `audit-mail-${Math.random().toString(36).slice(2, 8)}@example.test`;

let browser: Browser;
let page: Page;

beforeAll(async () => {
  const asAdmin = await apiAs('admin@demo.test');
  await asAdmin('POST', '/users/invitations', { email: invitee, name: 'Audit Mail Reader', roles: ['curator'], locales: ['en'] });
  browser = await launchBrowser();
  page = await (await newContext(browser)).newPage();
  await signIn(page, 'admin@demo.test');
});

afterAll(async () => {
  await browser?.close();
});

describe('an admin checks what happened and what was sent', () => {
  it('downloads the audit trail, filtered by action, as CSV', async () => {
    await page.goto('/audit?action=user.invited');
    await page.getByRole('cell', { name: 'user.invited' }).first().waitFor();
    const [download] = await Promise.all([page.waitForEvent('download'), page.getByRole('button', { name: 'Download CSV' }).click()]);
    expect(download.suggestedFilename()).toMatch(/^audit-trail-\d{4}-\d{2}-\d{2}\.csv$/);
    // RFC 4180: records end in CRLF, and a field with quotes is quoted with its quotes doubled.
    const records = (await readFile((await download.path())!, 'utf8')).split('\r\n');
    expect(records[0]).toBe('"id","at","actor_id","actor_name","action","target_type","target_id","venue_id","details","venue_time_zone","at_venue_time"');
    const invitation = records.find((record) => record.includes(`""email"":""${invitee}""`));
    expect(invitation, `a user.invited record naming ${invitee}`).toContain('"user.invited","invitation"');
    expect(records.slice(1).filter(Boolean).every((record) => record.includes('"user.invited"'))).toBe(true);
  });

  it('reads the captured invitation, dated, with its link', async () => {
    await page.goto('/dev/mail');
    const row = page.getByRole('row').filter({ hasText: invitee });
    // The outbox sends in the background: refresh until the stand-in has caught the message.
    await expect.poll(async () => {
      if (await row.count()) return true;
      await page.getByRole('button', { name: 'Refresh' }).click();
      return false;
    }, { timeout: 30_000, interval: 500 }).toBe(true);
    await expect.poll(() => row.getByRole('cell').nth(2).textContent()).toMatch(/\d{4}/);
    await row.getByRole('button', { name: 'You are invited to Mantlepiece' }).click();
    const message = page.getByRole('article', { name: 'You are invited to Mantlepiece' });
    await message.getByRole('link', { name: /\/invitation\// }).waitFor();
    expect(await message.getByRole('definition').allTextContents()).toEqual([expect.any(String), invitee, expect.stringMatching(/\d{4}/)]);
  });
});
