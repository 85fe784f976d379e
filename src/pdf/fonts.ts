// Font loading for the pack: DejaVu Sans (regular and bold) embedded through fontkit, so Ω µ ° ± ≤ ≥ ×
// render (the standard PDF fonts are WinAnsi-only). The bytes are read once and cached per process.
import { readFile } from 'node:fs/promises';
import { createRequire } from 'node:module';
import { dirname, join } from 'node:path';
import type { PDFDocument, PDFFont } from 'pdf-lib';
import fontkit from '@pdf-lib/fontkit';

const require = createRequire(import.meta.url);
let cache: Promise<{ regular: Uint8Array; bold: Uint8Array }> | null = null;

function fontBytes(): Promise<{ regular: Uint8Array; bold: Uint8Array }> {
  if (!cache) {
    const dir = join(dirname(require.resolve('dejavu-fonts-ttf/package.json')), 'ttf');
    cache = Promise.all([readFile(join(dir, 'DejaVuSans.ttf')), readFile(join(dir, 'DejaVuSans-Bold.ttf'))]).then(
      ([regular, bold]) => ({ regular, bold }),
    );
    cache.catch(() => (cache = null));
  }
  return cache;
}

export interface Fonts {
  regular: PDFFont;
  bold: PDFFont;
  /** Code points both fonts can draw; anything else is stripped before drawing. */
  charset: Set<number>;
}

type Fontkit = Parameters<PDFDocument['registerFontkit']>[0];
type FontkitFont = ReturnType<Fontkit['create']>;
type Glyph = ReturnType<FontkitFont['glyphForCodePoint']>;

/**
 * fontkit with a per-character layout: one glyph per code point from glyphForCodePoint, cached. pdf-lib
 * calls layout() for every string it measures or draws, and full OpenType shaping of each line made a
 * long parts list take seconds. Latin/Greek text of the pack needs no ligatures or contextual forms;
 * pdf-lib draws glyphs at their advances (no kerning) either way.
 */
// Parsed once per process per font file: the bytes are read once (fontBytes), so the same array comes back, and
// each document's embedder makes its own subset from the shared, read-only parsed font.
const parsed = new WeakMap<object, FontkitFont>();

const perCharacterFontkit: Fontkit = {
  create(data, postscriptName) {
    const held = postscriptName === undefined ? parsed.get(data) : undefined;
    if (held) return held;
    const font = fontkit.create(data, postscriptName);
    if (postscriptName === undefined) parsed.set(data, font);
    const cache = new Map<number, Glyph>();
    const glyphFor = (cp: number): Glyph => {
      let g = cache.get(cp);
      if (!g) {
        g = font.glyphForCodePoint(cp);
        cache.set(cp, g);
      }
      return g;
    };
    font.layout = ((text: string) => ({
      glyphs: Array.from(text, (ch) => glyphFor(ch.codePointAt(0)!)),
      positions: [],
    })) as unknown as FontkitFont['layout'];
    return font;
  },
};

export async function embedFonts(doc: PDFDocument): Promise<Fonts> {
  doc.registerFontkit(perCharacterFontkit);
  const bytes = await fontBytes();
  // subset: only the glyphs used are written (TTF subsetting works; woff2 subsetting renders blank)
  const regular = await doc.embedFont(bytes.regular, { subset: true });
  const bold = await doc.embedFont(bytes.bold, { subset: true });
  const boldSet = new Set(bold.getCharacterSet());
  const charset = new Set(regular.getCharacterSet().filter((c) => boldSet.has(c)));
  return { regular, bold, charset };
}

/** Replace line breaks and tabs by spaces and drop characters the fonts cannot encode. */
export function clean(text: string, charset: Set<number>): string {
  let out = '';
  for (const ch of text.replace(/[\r\n\t]+/g, ' ')) {
    const cp = ch.codePointAt(0)!;
    if (cp === 0x20 || charset.has(cp)) out += ch;
  }
  return out;
}
