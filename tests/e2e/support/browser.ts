import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';

import { chromium, type BrowserContext, type Page } from 'playwright-core';

import { checkNow, instrumentPage } from './axe';

export const PHONE = { width: 390, height: 844 };
export const WIDE = { width: 1280, height: 800 };

export function baseUrl(): string {
  const url = process.env.E2E_BASE_URL;
  if (!url) throw new Error('E2E_BASE_URL is not set: run the browser journeys with npm test');
  return url;
}

const ARGS = ['--headless', '--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run', '--disable-background-networking', '--disable-component-update', '--disable-sync'];

// Chromium reports a blocked load to the page as an event; the page says it on the console, where it is collected.
const REPORT_CSP = `document.addEventListener('securitypolicyviolation', (e) => console.error('CSP violation: ' + e.effectiveDirective + ' blocked ' + (e.blockedURI || 'inline') + ' on ' + e.documentURI + ' from ' + e.sourceFile + ':' + e.lineNumber + ':' + e.columnNumber));`;

/**
 * A fresh Chromium profile per test file; each journey opens its own page. Closing it fails the file
 * when any page broke the server's content security policy. Every page of it runs axe on each screen
 * it shows (support/axe.ts). Extra flags and permissions for journeys that need them (a fake microphone).
 */
export async function openBrowser(extra: { args?: string[]; permissions?: string[] } = {}): Promise<{ context: BrowserContext; close: () => Promise<void> }> {
  const dir = fs.mkdtempSync(path.join(process.env.TMPDIR ?? os.tmpdir(), 'fw-chromium-'));
  const context = await chromium.launchPersistentContext(dir, {
    executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
    args: [...ARGS, ...(extra.args ?? [])],
    headless: true,
    viewport: PHONE,
    permissions: extra.permissions,
  });
  const violations: string[] = [];
  for (const page of context.pages()) instrumentPage(page, baseUrl());
  context.on('page', (page) => instrumentPage(page, baseUrl()));
  await context.addInitScript(REPORT_CSP);
  context.on('console', (message) => {
    if (message.text().startsWith('CSP violation:')) violations.push(message.text());
  });
  return {
    context,
    close: async () => {
      await context.close();
      fs.rmSync(dir, { recursive: true, force: true });
      if (violations.length) throw new Error(`pages broke the content security policy:\n${[...new Set(violations)].join('\n')}`);
    },
  };
}

export async function newPage(context: BrowserContext, viewport: { width: number; height: number }): Promise<Page> {
  const page = await context.newPage();
  await page.setViewportSize(viewport);
  page.on('pageerror', (err) => console.error('page error:', err.message));
  // The profile is shared by the file's journeys: each starts signed out, with no draft left behind.
  // Cleared from a page of the same origin that runs no app code, which could write the session back.
  await page.goto(`${baseUrl()}/healthz`);
  await page.evaluate(() => localStorage.clear());
  return page;
}

export async function signIn(page: Page, email: string, password = 'feltwire-demo'): Promise<void> {
  await page.goto(`${baseUrl()}/sign-in`);
  await page.getByTestId('sign-in-email').fill(email);
  await page.getByTestId('sign-in-password').fill(password);
  await checkNow(page);
  await page.getByTestId('sign-in-submit').click();
}

export async function shot(page: Page, name: string): Promise<void> {
  const dir = path.join(process.cwd(), '.tmp', 'shots');
  fs.mkdirSync(dir, { recursive: true });
  // Every screen a journey looks at is checked by axe as it is shown.
  await checkNow(page);
  await page.screenshot({ path: path.join(dir, `${name}.png`), fullPage: false });
}

export function payUrl(): string {
  const url = process.env.E2E_PAY_URL;
  if (!url) throw new Error('E2E_PAY_URL is not set: the address of the payment stand-in');
  return url;
}

/** On the payment stand-in's page: pays with the test card that succeeds. */
export async function payWithTestCard(page: Page): Promise<void> {
  await page.waitForURL((u) => u.origin === new URL(payUrl()).origin);
  await page.getByTestId('checkout-card').fill('4242 4242 4242 4242');
  await page.getByTestId('checkout-exp').fill('12/30');
  await page.getByTestId('checkout-cvc').fill('123');
  await page.getByTestId('checkout-pay').click();
}
