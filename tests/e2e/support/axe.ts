// Accessibility in every journey: axe-core checks each screen a journey visits, at each viewport it
// uses, and a violation fails the journey. Wired into every page of a browser from openBrowser().
import fs from 'node:fs';
import path from 'node:path';

import { AxeBuilder } from '@axe-core/playwright';
import axe from 'axe-core';
import type { Page } from 'playwright-core';

// axe's default rules, and its experimental ones (label-content-name-mismatch among them) and
// target-size (WCAG 2.2 AA), which it leaves off by default. Nothing is switched off.
const EXTRA_RULES = axe
  .getRules()
  .filter((r) => r.tags.includes('experimental') || r.ruleId === 'target-size')
  .map((r) => r.ruleId);
const RULE_OPTIONS = { rules: Object.fromEntries(EXTRA_RULES.map((id) => [id, { enabled: true }])) };

export interface AxeFinding {
  screen: string;
  viewport: string;
  rule: string;
  impact: string | null | undefined;
  help: string;
  nodes: { target: string; summary: string }[];
}

/** A screen's name: its path with ids and tokens folded, so one screen is one name whatever piano it shows. */
export function screenName(url: string): string {
  const u = new URL(url);
  const p = u.pathname
    .split('/')
    .map((part) => (/^\d+$/.test(part) ? ':id' : /^[A-Za-z0-9_-]{32}$/.test(part) ? ':token' : part))
    .join('/');
  return `${p || '/'}${u.searchParams.has('session') ? '?session' : ''}${u.searchParams.has('version') ? '?version' : ''}`;
}

// AXE_REPORT=1 collects every finding into .tmp/axe/ without failing, to count them all in one run.
const REPORT_ONLY = process.env.AXE_REPORT === '1';

function record(entry: { screen: string; viewport: string; findings: AxeFinding[] }): void {
  const dir = path.join(process.cwd(), '.tmp', 'axe');
  fs.mkdirSync(dir, { recursive: true });
  const file = path.join(dir, `${path.basename(expect.getState().testPath ?? 'journey')}.jsonl`);
  fs.appendFileSync(file, `${JSON.stringify({ test: expect.getState().currentTestName, ...entry })}\n`);
}

/** Runs axe on the page as it stands; throws with every violation in plain words (unless AXE_REPORT=1). */
export async function checkAccessibility(page: Page, where?: string): Promise<AxeFinding[]> {
  const viewport = page.viewportSize();
  const vp = viewport ? `${viewport.width}x${viewport.height}` : 'unknown';
  const screen = where ?? screenName(page.url());
  // Legacy mode runs axe in the page itself: the app has no frames, and no blank page is opened.
  const results = await new AxeBuilder({ page }).options(RULE_OPTIONS).setLegacyMode(true).analyze();
  const findings: AxeFinding[] = results.violations.map((v) => ({
    screen,
    viewport: vp,
    rule: v.id,
    impact: v.impact,
    help: v.help,
    nodes: v.nodes.map((n) => ({ target: n.target.join(' '), summary: n.failureSummary ?? '' })),
  }));
  record({ screen, viewport: vp, findings });
  if (findings.length && !REPORT_ONLY) {
    const lines = findings.flatMap((f) => [`${f.rule} (${f.impact}): ${f.help}`, ...f.nodes.slice(0, 4).map((n) => `    ${n.target}: ${n.summary.replace(/\s+/g, ' ').slice(0, 300)}`)]);
    throw new Error(`axe found ${findings.length} accessibility violation(s) on ${screen} at ${vp}:\n${lines.join('\n')}`);
  }
  return findings;
}

/** Waits until the app has drawn a screen: no request in flight for a moment, and no spinner showing. */
export async function settle(page: Page, inFlight: () => number = () => 0): Promise<void> {
  const until = Date.now() + 15_000;
  let quietSince = Date.now();
  while (Date.now() < until) {
    if (inFlight() > 0) quietSince = Date.now();
    else if (Date.now() - quietSince >= 300) break;
    await page.waitForTimeout(50);
  }
  await page
    // Drawn means a screen's title is up: a screen caught mid-redirect has none yet (axe still reports one that never comes).
    .waitForFunction(() => !document.querySelector('[role="progressbar"]') && !!document.querySelector('#root h1, #root [role="heading"][aria-level="1"]'), undefined, { timeout: 10_000 })
    .catch(() => undefined);
}

const ownOrigin = (url: string, base: string) => {
  try {
    return new URL(url).origin === new URL(base).origin;
  } catch {
    return false;
  }
};

// What is not a screen of the product: the health check, the API's files and JSON, the demo inbox.
const NOT_A_SCREEN = /^\/(healthz|api\/|graphql|dev\/)/;

/**
 * Puts the check into a page: before the page leaves a screen (goto, reload, a new viewport, close)
 * and before every screenshot, axe runs on what is shown; a screen reached by a click and left by
 * another click is opened again at its viewport when the page closes, so none goes unchecked.
 */
export function instrumentPage(page: Page, base: string): void {
  const visited = new Map<string, string>();
  const checked = new Set<string>();
  let lastState = '';
  // Requests of the app in flight (a screen's GraphQL, a route's chunk), to know when it has drawn.
  let inFlight = 0;
  page.on('request', () => (inFlight += 1));
  page.on('requestfinished', () => (inFlight = Math.max(0, inFlight - 1)));
  page.on('requestfailed', () => (inFlight = Math.max(0, inFlight - 1)));
  const keyOf = (url: string) => `${screenName(url)}@${page.viewportSize()?.width}x${page.viewportSize()?.height}`;
  const isScreen = (url: string) => ownOrigin(url, base) && !NOT_A_SCREEN.test(new URL(url).pathname);

  page.on('framenavigated', (frame) => {
    if (frame !== page.mainFrame() || !isScreen(frame.url())) return;
    const key = keyOf(frame.url());
    if (!visited.has(key)) visited.set(key, frame.url());
  });

  const checkHere = async () => {
    if (page.isClosed() || !isScreen(page.url())) return;
    await settle(page, () => inFlight);
    // The same screen in the same state at the same size is checked once.
    const state = `${keyOf(page.url())}#${await page.evaluate(() => document.body.innerHTML.length + ':' + document.title).catch(() => '')}`;
    if (state === lastState) return;
    await checkAccessibility(page);
    lastState = state;
    checked.add(keyOf(page.url()));
  };

  const goto = page.goto.bind(page);
  const reload = page.reload.bind(page);
  const setViewportSize = page.setViewportSize.bind(page);
  const close = page.close.bind(page);
  page.goto = async (...args: Parameters<Page['goto']>) => {
    await checkHere();
    return goto(...args);
  };
  page.reload = async (...args: Parameters<Page['reload']>) => {
    await checkHere();
    return reload(...args);
  };
  page.setViewportSize = async (size) => {
    await checkHere();
    return setViewportSize(size);
  };
  page.close = async (...args: Parameters<Page['close']>) => {
    try {
      await checkHere();
      for (const [key, url] of visited) {
        if (checked.has(key)) continue;
        const [w, h] = key.slice(key.lastIndexOf('@') + 1).split('x').map(Number);
        if (w && h) await setViewportSize({ width: w, height: h });
        await goto(url);
        await checkHere();
        checked.add(key);
      }
    } finally {
      await close(...args);
    }
  };
  (page as Page & { checkAccessibility?: () => Promise<void> }).checkAccessibility = checkHere;
}

/** Checks the page now, as the shared support does before a screenshot. */
export async function checkNow(page: Page): Promise<void> {
  const check = (page as Page & { checkAccessibility?: () => Promise<void> }).checkAccessibility;
  if (check) await check();
  else await checkAccessibility(page);
}
