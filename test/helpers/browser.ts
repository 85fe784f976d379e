// Headless Chromium from the Debian package through playwright-core (never a downloaded browser).
import { existsSync, mkdirSync, mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { chromium, type BrowserContext, type Page } from 'playwright-core';
import { REPO_ROOT, startServer, type RunningServer } from './server';
import { CHROMIUM } from './tools';

export const CHROMIUM_PATH = CHROMIUM ?? 'chromium (not found on PATH)';
export const hasChromium = CHROMIUM !== null;
export const ARTIFACTS = join(REPO_ROOT, 'test-artifacts');

// launchPersistentContext: chromium.launch() refuses --user-data-dir (STACK.md).
export async function launchBrowser(): Promise<{ context: BrowserContext; close: () => Promise<void> }> {
  const dir = mkdtempSync(join(tmpdir(), 'rigwright-chromium-'));
  const context = await chromium.launchPersistentContext(dir, {
    executablePath: CHROMIUM_PATH,
    args: [
      '--headless',
      '--no-sandbox',
      '--disable-gpu',
      '--disable-quic',
      '--no-first-run',
      '--disable-background-networking',
      '--disable-component-update',
      '--disable-sync',
    ],
    acceptDownloads: true,
    viewport: { width: 1280, height: 900 },
    timeout: 60_000,
  });
  context.setDefaultTimeout(20_000);
  return {
    context,
    close: async () => {
      await context.close().catch(() => undefined);
      rmSync(dir, { recursive: true, force: true });
    },
  };
}

export function artifactPath(name: string): string {
  mkdirSync(ARTIFACTS, { recursive: true });
  return join(ARTIFACTS, name);
}

export interface BrowserSession {
  server: RunningServer;
  page: Page;
  /** script errors, CSP violations and console errors other than deliberate 409/422 answers */
  problems: string[];
  /** a temp folder for downloads */
  downloads: string;
  /** set a marker on window; it survives an htmx swap but not a full page load */
  markPage: () => Promise<unknown>;
  marker: () => Promise<string | undefined>;
  close: () => Promise<void>;
}

/** A real server on its own database and one browser page watching for script problems. */
export async function openSession(): Promise<BrowserSession> {
  const server = await startServer();
  const browser = await launchBrowser();
  const page = await browser.context.newPage();
  const problems: string[] = [];
  page.on('pageerror', (e) => problems.push(`pageerror: ${e.message}`));
  // a refused form answers 409/422 on purpose; Chromium logs that as a failed resource load
  page.on(
    'console',
    (m) => m.type() === 'error' && !/status of 4(09|22)/.test(m.text()) && problems.push(`console: ${m.text()}`),
  );
  const downloads = mkdtempSync(join(tmpdir(), 'rigwright-dl-'));
  return {
    server,
    page,
    problems,
    downloads,
    markPage: () =>
      page.evaluate(() => ((window as unknown as { __rigwrightMarker: string }).__rigwrightMarker = 'still-here')),
    marker: () => page.evaluate(() => (window as unknown as { __rigwrightMarker?: string }).__rigwrightMarker),
    close: async () => {
      await browser.close();
      await server.stop();
      server.cleanup();
      rmSync(downloads, { recursive: true, force: true });
    },
  };
}
