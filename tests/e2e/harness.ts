// Shared set-up for the browser tests: a free 127.0.0.1 port, `bulkhead view` spawned in its own
// process group (killed whole afterwards), headless Debian Chromium with a fresh profile, screenshots.
import { spawn, spawnSync, type ChildProcess } from 'node:child_process';
import { copyFileSync, mkdirSync, mkdtempSync, readFileSync } from 'node:fs';
import { createServer } from 'node:net';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { chromium, type BrowserContext, type Page } from 'playwright-core';
import { afterAll, beforeAll } from 'vitest';
import { analyze, loadModelText, type Analysis, type Model } from '@bulkhead/core';

export const ROOT = new URL('../../', import.meta.url).pathname;
export const DEMO = join(ROOT, 'fixtures/demo/marrow-fen.bulk');
export const ARTIFACTS = join(ROOT, 'test-artifacts/e2e');
const BIN = join(ROOT, 'packages/cli/bin/bulkhead.js');

export function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const probe = createServer();
    probe.once('error', reject);
    probe.listen(0, '127.0.0.1', () => {
      const address = probe.address();
      const port = typeof address === 'object' && address ? address.port : 0;
      probe.close(() => resolve(port));
    });
  });
}

export interface ViewProcess {
  url: string;
  port: number;
  child: ChildProcess;
  output: () => string;
  stop: () => void;
}

/** Spawns `bulkhead view FILE --port N [...extra]` and resolves once it prints its URL. */
export async function startView(file: string, extra: string[] = []): Promise<ViewProcess> {
  const port = await freePort();
  const child = spawn(process.execPath, [BIN, 'view', file, '--port', String(port), ...extra], {
    cwd: ROOT,
    detached: true,
    stdio: ['ignore', 'pipe', 'pipe'],
    env: { ...process.env, NO_COLOR: '1' },
  });
  let out = '';
  child.stdout!.on('data', (b: Buffer) => (out += b.toString()));
  child.stderr!.on('data', (b: Buffer) => (out += b.toString()));
  const stop = () => {
    try {
      process.kill(-child.pid!, 'SIGTERM');
    } catch {
      // already gone
    }
  };
  const url = `http://127.0.0.1:${port}/`;
  const deadline = Date.now() + 30_000;
  while (!out.includes(url)) {
    if (child.exitCode !== null) throw new Error(`bulkhead view exited ${child.exitCode}: ${out}`);
    if (Date.now() > deadline) {
      stop();
      throw new Error(`bulkhead view did not start: ${out}`);
    }
    await new Promise((r) => setTimeout(r, 50));
  }
  return { url, port, child, output: () => out, stop };
}

export async function launch(): Promise<BrowserContext> {
  return chromium.launchPersistentContext(mkdtempSync(join(tmpdir(), 'chromium-profile-')), {
    executablePath: '/usr/bin/chromium',
    headless: true,
    viewport: { width: 1440, height: 900 },
    acceptDownloads: true,
    args: [
      '--no-sandbox',
      '--disable-gpu',
      '--disable-quic',
      '--no-first-run',
      '--disable-background-networking',
      '--disable-component-update',
      '--disable-sync',
    ],
  });
}

/** Collects what would mean the page broke: uncaught errors, console errors, dialogs. */
export function watchPage(page: Page): { errors: string[]; dialogs: string[] } {
  const seen = { errors: [] as string[], dialogs: [] as string[] };
  page.on('pageerror', (e) => seen.errors.push(e.message));
  page.on('console', (m) => {
    if (m.type() === 'error') seen.errors.push(m.text());
  });
  page.on('dialog', (d) => {
    seen.dialogs.push(`${d.type()}: ${d.message()}`);
    void d.dismiss();
  });
  return seen;
}

export async function screenshot(page: Page, name: string): Promise<string> {
  mkdirSync(ARTIFACTS, { recursive: true });
  const path = join(ARTIFACTS, `${name}.png`);
  await page.screenshot({ path });
  return path;
}

export function copyTo(from: string, to: string): void {
  copyFileSync(from, to);
}

/**
 * A screenshot for the repository's docs: the pointer moved off the page and the layout time (which
 * differs on every run) hidden, so an unchanged view gives the same image and docs/ does not churn.
 */
export async function docScreenshot(page: Page, name: string, docPath: string): Promise<void> {
  await page.mouse.move(0, 0);
  const style = await page.addStyleTag({ content: '[data-testid=layout-status] { visibility: hidden; }' });
  copyTo(await screenshot(page, name), join(ROOT, docPath));
  await style.evaluate((el) => (el as Element).remove());
}

export function tempDir(prefix: string): string {
  return mkdtempSync(join(tmpdir(), prefix));
}

export interface DemoTruth {
  model: Model;
  analysis: Analysis;
  /** The CLI's own JSON report of the same file (`bulkhead report --format json`). */
  report: CliReport;
}

export interface CliReport {
  scenarios: {
    id: string;
    tolerable: number;
    gap: number;
    lopa: { figure: 'claimed' | 'after-independence' | 'if-accepted'; mitigated: number; meets: boolean }[];
    layers: {
      function: string;
      claimedPfd: { value: number };
      allowedPfd: number;
      verdict: string;
      credited: boolean;
      creditedIfAccepted: boolean;
    }[];
    sif?: { function?: string; requiredPfd: number; requiredRrf: number; sil: number };
  }[];
  findings: { key: string; scenario?: string; element?: string; severity: string }[];
  /** The site-wide common-cause ranking, best first. */
  commonCauses: {
    order: string;
    elements: {
      rank: number;
      element: string;
      layers: number;
      scenarios: string[];
      frequencyCost: number;
      frequencyAtStake: number;
    }[];
  };
}

/** The CLI's JSON report for a file, plus the analysis in this process for what the report does not carry. */
export function truthFor(file: string): DemoTruth {
  const run = spawnSync(process.execPath, [BIN, 'report', file, '--format', 'json'], { cwd: ROOT, encoding: 'utf8' });
  // Exit 1 only says unaccepted findings exist (--fail-on defaults to voids-credit); the JSON is complete.
  if (run.status !== 0 && run.status !== 1) throw new Error(`bulkhead report failed (${run.status}): ${run.stderr}`);
  const report = JSON.parse(run.stdout) as CliReport;
  const loaded = loadModelText(file, readFileSync(file));
  if (!loaded.model) throw new Error(`${file} does not load`);
  return { model: loaded.model, analysis: analyze(loaded.model, { spans: loaded.spans }), report };
}

/**
 * A figure as shown ("2.5e-5", "0.4", "12,000") read back and compared with the exact value from the
 * JSON report: equal within half a unit of the last digit shown (trailing zeros of a whole number are
 * not counted as significant).
 */
export function sameFigure(shown: string, exact: number): boolean {
  const text = shown.trim().replace(/,/g, '');
  const value = Number(text);
  if (!/^-?\d+(\.\d+)?(e-?\d+)?$/.test(text) || !Number.isFinite(value)) return false;
  const [mantissa, exponent = '0'] = text.split('e');
  const decimals = mantissa!.includes('.') ? mantissa!.split('.')[1]!.length : -/0*$/.exec(mantissa!)![0].length;
  const halfUnit = 0.5 * 10 ** (Number(exponent) - decimals);
  return Math.abs(value - exact) <= halfUnit * (1 + 1e-9);
}

export interface Session {
  view: ViewProcess;
  context: BrowserContext;
  page: Page;
  seen: ReturnType<typeof watchPage>;
  close: () => Promise<void>;
}

/** `bulkhead view FILE [...extra]`, a browser, and a page opened on it (waiting for `waitFor` when given). */
export async function openViewer(file: string, waitFor?: string, extra: string[] = []): Promise<Session> {
  const view = await startView(file, extra);
  const context = await launch();
  const page = await context.newPage();
  const seen = watchPage(page);
  await page.goto(view.url);
  if (waitFor) await page.waitForSelector(waitFor, { timeout: 20_000 });
  return {
    view,
    context,
    page,
    seen,
    close: async () => {
      await context.close();
      view.stop();
    },
  };
}

export const GRAPH_BOX = 'svg[data-testid=graph] g.box';

/** A copy of the demo in a temporary directory, viewed live: the page is up and its live connection open. */
export async function openLiveDemo(prefix: string): Promise<Session & { file: string; original: string }> {
  const file = join(tempDir(prefix), 'marrow-fen.bulk');
  const original = readFileSync(DEMO, 'utf8');
  copyFileSync(DEMO, file);
  const session = await openViewer(file, GRAPH_BOX);
  await session.page.waitForSelector('[data-testid=live][data-live=connected]');
  return { ...session, file, original };
}

/** Clicks a scenario in the list and waits until its graph and its LOPA are shown. */
export async function focusScenario(page: Page, id: string): Promise<void> {
  await page.click(`[data-testid=scenarios] button[data-scenario="${id}"]`);
  await page.waitForSelector(`svg[data-testid=graph][data-scenario="${id}"] g.box`);
  await page.waitForSelector(`[data-testid=lopa][data-scenario="${id}"]`);
}

/**
 * For a describe block: `bulkhead view FILE` and a page on it, opened before its tests and closed after.
 * The returned object's `page` and `session` are set once the page is up.
 */
export function viewerForTests(file: string): { page: Page; session: Session } {
  const held = {} as { page: Page; session: Session };
  beforeAll(async () => {
    held.session = await openViewer(file, GRAPH_BOX);
    held.page = held.session.page;
  });
  afterAll(async () => {
    await held.session?.close();
  });
  return held;
}
