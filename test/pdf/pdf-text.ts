// Read a PDF back as text with poppler's pdftotext (Debian poppler-utils), page by page.
import { spawnSync } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { PDFTOTEXT } from '../helpers/tools';

export const hasPoppler = PDFTOTEXT !== null;

export const POPPLER_MISSING =
  '[skip] PDF text checks skipped: pdftotext not found on PATH (apt-get install poppler-utils)';

export function writeTemp(bytes: Uint8Array, name: string): string {
  const dir = mkdtempSync(join(tmpdir(), 'rigwright-pdf-'));
  const file = join(dir, name);
  writeFileSync(file, bytes);
  return file;
}

/** Text of every page (pdftotext separates pages with a form feed). */
export function pagesText(file: string): string[] {
  const r = spawnSync(PDFTOTEXT ?? 'pdftotext', ['-enc', 'UTF-8', file, '-'], {
    encoding: 'utf8',
    maxBuffer: 64 * 1024 * 1024,
  });
  if (r.status !== 0) throw new Error(`pdftotext failed: ${r.stderr}`);
  const pages = r.stdout.split('\f');
  if (pages.at(-1)?.trim() === '') pages.pop();
  return pages;
}

/** Number of raster images in the file (poppler's pdfimages -list), or null when the tool is absent. */
export function imageCount(file: string): number | null {
  const r = spawnSync('pdfimages', ['-list', file], { encoding: 'utf8' });
  if (r.error) return null;
  // two header lines, then one line per image
  return r.stdout.trim().split('\n').length - 2;
}
