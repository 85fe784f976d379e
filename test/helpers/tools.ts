// External tools the cross-checks need (ngspice, chromium, pdftotext), found on PATH like a shell would, never at a
// fixed path. A missing tool makes its tests skip, and the reason is printed once per test file.
import { accessSync, constants } from 'node:fs';
import { delimiter, join } from 'node:path';

/** Absolute path of the first executable `name` (or alternative name) on PATH, or null. */
export function findTool(...names: string[]): string | null {
  for (const dir of (process.env.PATH ?? '').split(delimiter).filter(Boolean)) {
    for (const name of names) {
      const file = join(dir, name);
      try {
        accessSync(file, constants.X_OK);
        return file;
      } catch {
        // not here
      }
    }
  }
  return null;
}

/** Print why tests are skipped when the tool is missing; returns whether it was found. */
export function requireTool(path: string | null, what: string, install: string): path is string {
  if (path === null) console.warn(`[skip] ${what} skipped: not found on PATH (${install}).`);
  return path !== null;
}

export const NGSPICE = findTool('ngspice');
export const PDFTOTEXT = findTool('pdftotext');
export const CHROMIUM = findTool('chromium', 'chromium-browser');
