/// <reference lib="dom" />
import { createRequire } from 'node:module';
import { readFileSync } from 'node:fs';
import type { Page } from 'playwright-core';
import { atRest } from './browser';

const axeSource = readFileSync(createRequire(import.meta.url).resolve('axe-core/axe.min.js'), 'utf8');

/** WCAG 2.2 level A and AA, as axe-core tags them (axe-core's rule descriptions list each rule's tags). */
export const WCAG_22_AA_TAGS = ['wcag2a', 'wcag2aa', 'wcag21a', 'wcag21aa', 'wcag22aa'];

export interface AxeFinding {
  rule: string;
  impact: string | null;
  nodes: string[];
}

interface AxeOptions {
  /** Rules a screen breaks on purpose, each with its reason where the caller names it. */
  allowedRules?: readonly string[];
}

/**
 * Runs axe-core on the page as it stands (dialogs and menus open included) and returns what breaks
 * WCAG 2.2 AA. Fluent UI's focus sentinels are not counted: Tabster's `<i data-tabster-dummy>` is
 * aria-hidden yet focusable on purpose, handing focus straight on to the next real control when it
 * gets it (microsoft/tabster#288, its maintainer; Accessibility Insights drops the same nodes from
 * its aria-hidden-focus results, microsoft/accessibility-insights-web#7605). `tabLandsOnSentinel`
 * checks that promise on every screen.
 */
export async function axeFindings(page: Page, options: AxeOptions = {}): Promise<AxeFinding[]> {
  // Evaluated through the DevTools protocol, which the page's Content-Security-Policy does not govern.
  if (!(await page.evaluate(() => 'axe' in window))) await page.evaluate(axeSource);
  await atRest(page);
  const violations = await page.evaluate(async (tags) => {
    const axe = (window as unknown as { axe: { run: (context: Document, options: unknown) => Promise<{ violations: { id: string; impact: string | null; nodes: { html: string; target: unknown[]; failureSummary?: string }[] }[] }> } }).axe;
    const result = await axe.run(document, { runOnly: { type: 'tag', values: tags }, resultTypes: ['violations'] });
    return result.violations.map((violation) => ({
      rule: violation.id,
      impact: violation.impact,
      nodes: violation.nodes.map((node) => ({ html: node.html, where: node.target.join(' '), why: node.failureSummary ?? '' })),
    }));
  }, WCAG_22_AA_TAGS);
  return violations
    .filter((violation) => !options.allowedRules?.includes(violation.rule))
    .map((violation) => ({
      rule: violation.rule,
      impact: violation.impact,
      nodes: violation.nodes
        .filter((node) => !(violation.rule === 'aria-hidden-focus' && node.html.includes('data-tabster-dummy')))
        .map((node) => `${node.where}: ${node.html.slice(0, 160)} — ${node.why.replace(/\s+/g, ' ').slice(0, 240)}`),
    }))
    .filter((violation) => violation.nodes.length > 0);
}

/** Presses Tab through the page and reports whether focus ever rested on a Tabster sentinel. */
export async function tabLandsOnSentinel(page: Page, presses = 40): Promise<boolean> {
  for (let press = 0; press < presses; press++) {
    await page.keyboard.press('Tab');
    if (await page.evaluate(() => document.activeElement?.hasAttribute('data-tabster-dummy') ?? false)) return true;
  }
  return false;
}
