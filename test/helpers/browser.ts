// Headless Chromium from the Debian package through playwright-core (never a downloaded browser).
import { existsSync, mkdirSync, mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { chromium, type BrowserContext } from 'playwright-core';
import { REPO_ROOT } from './server';

export const CHROMIUM_PATH = '/usr/bin/chromium';
export const hasChromium = existsSync(CHROMIUM_PATH);
export const ARTIFACTS = join(REPO_ROOT, 'test-artifacts');

// launchPersistentContext: chromium.launch() refuses --user-data-dir (STACK.md).
export async function launchBrowser(): Promise<{ context: BrowserContext; close: () => Promise<void> }> {
  const dir = mkdtempSync(join(tmpdir(), 'rigwright-chromium-'));
  const context = await chromium.launchPersistentContext(dir, {
    executablePath: CHROMIUM_PATH,
    args: ['--headless', '--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run', '--disable-background-networking', '--disable-component-update', '--disable-sync'],
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
