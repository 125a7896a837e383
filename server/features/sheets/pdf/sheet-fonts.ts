import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import path from 'node:path';
import { inflateSync } from 'node:zlib';
import { create as createFontkitFont, type FontkitFont } from 'fontkit';

/**
 * Noto Sans for process sheets, from the shipped @fontsource/noto-sans files. pdfkit reads WOFF
 * (not WOFF2) and embeds only the glyphs used (subset), so the PDF stays small.
 *
 * The package splits the font by Unicode range: `latin` covers ASCII, Latin-1 (µ, °, ², ·, ×),
 * `latin-ext` accented names (Ł, ő, č …), `greek` the symbols σ, Δ, κ, μ. Text is written in runs,
 * each with the subset that covers its characters (ranges from the package's unicode.json).
 */
export const fontSubsets = ['latin', 'latin-ext', 'greek'] as const;
export type FontSubset = (typeof fontSubsets)[number];
export type FontWeight = 'regular' | 'bold';

const require = createRequire(import.meta.url);
const packageDir = path.dirname(require.resolve('@fontsource/noto-sans/package.json'));

export interface SheetFonts {
  /** pdfkit font name → the font, parsed once from the WOFF unpacked to OpenType */
  files: ReadonlyMap<string, FontkitFont>;
  /** Code-point ranges of each subset, inclusive. */
  ranges: ReadonlyMap<FontSubset, readonly (readonly [number, number])[]>;
}

export function fontName(subset: FontSubset, weight: FontWeight): string {
  return `NotoSans-${subset}-${weight}`;
}

function parseRanges(text: string): [number, number][] {
  return text.split(',').map((part) => {
    const [from, to] = part.trim().replace(/^U\+/i, '').split('-');
    const start = Number.parseInt(from, 16);
    return [start, to === undefined ? start : Number.parseInt(to, 16)];
  });
}

/**
 * Unpacks a WOFF 1.0 file into the plain OpenType (sfnt) font it wraps, once per process. pdfkit
 * would otherwise inflate every table with a pure-JavaScript inflater on every document (most of
 * the rendering time); the glyphs are the same bytes either way.
 *
 * ## References
 * - W3C (2012) WOFF File Format 1.0, Recommendation, §3–§5 (header, table directory, zlib tables).
 * - Microsoft OpenType specification, "Organization of an OpenType font" (table directory).
 */
export function woffToSfnt(woff: Buffer): Buffer {
  if (woff.readUInt32BE(0) !== 0x774f4646) throw new Error('not a WOFF 1.0 font (signature is not wOFF)');
  const flavor = woff.readUInt32BE(4);
  const numTables = woff.readUInt16BE(12);
  const tables: { tag: number; checksum: number; data: Buffer }[] = [];
  for (let i = 0; i < numTables; i += 1) {
    const at = 44 + i * 20;
    const tag = woff.readUInt32BE(at);
    const offset = woff.readUInt32BE(at + 4);
    const compLength = woff.readUInt32BE(at + 8);
    const origLength = woff.readUInt32BE(at + 12);
    const checksum = woff.readUInt32BE(at + 16);
    const raw = woff.subarray(offset, offset + compLength);
    const data = compLength < origLength ? inflateSync(raw) : Buffer.from(raw);
    if (data.length !== origLength) throw new Error(`WOFF table ${i} inflates to ${data.length} bytes, expected ${origLength}`);
    tables.push({ tag, checksum, data });
  }
  const entrySelector = Math.floor(Math.log2(numTables));
  const searchRange = 2 ** entrySelector * 16;
  const headerLength = 12 + numTables * 16;
  const padded = (n: number) => (n + 3) & ~3;
  const total = headerLength + tables.reduce((sum, t) => sum + padded(t.data.length), 0);
  const out = Buffer.alloc(total);
  out.writeUInt32BE(flavor, 0);
  out.writeUInt16BE(numTables, 4);
  out.writeUInt16BE(searchRange, 6);
  out.writeUInt16BE(entrySelector, 8);
  out.writeUInt16BE(numTables * 16 - searchRange, 10);
  let offset = headerLength;
  tables.forEach((t, i) => {
    const at = 12 + i * 16;
    out.writeUInt32BE(t.tag, at);
    out.writeUInt32BE(t.checksum, at + 4);
    out.writeUInt32BE(offset, at + 8);
    out.writeUInt32BE(t.data.length, at + 12);
    t.data.copy(out, offset);
    offset += padded(t.data.length);
  });
  return out;
}

let cached: SheetFonts | undefined;

/** Reads the font files once per process. */
export function loadSheetFonts(): SheetFonts {
  if (cached) return cached;
  const unicode = JSON.parse(readFileSync(path.join(packageDir, 'unicode.json'), 'utf8')) as Record<string, string>;
  const files = new Map<string, FontkitFont>();
  const ranges = new Map<FontSubset, [number, number][]>();
  for (const subset of fontSubsets) {
    ranges.set(subset, parseRanges(unicode[subset]));
    for (const [weight, number] of [['regular', 400], ['bold', 700]] as const) {
      const woff = readFileSync(path.join(packageDir, 'files', `noto-sans-${subset}-${number}-normal.woff`));
      files.set(fontName(subset, weight), createFontkitFont(woffToSfnt(woff)));
    }
  }
  cached = { files, ranges };
  return cached;
}

/** The first subset whose ranges hold the code point, or undefined. */
export function subsetFor(fonts: SheetFonts, codePoint: number): FontSubset | undefined {
  for (const subset of fontSubsets) {
    const list = fonts.ranges.get(subset) ?? [];
    if (list.some(([a, b]) => codePoint >= a && codePoint <= b)) return subset;
  }
  return undefined;
}

/**
 * Characters no subset of Noto Sans carries, written with ones it does: the text stays readable
 * and selectable (a missing glyph would print as an empty box).
 */
const replacements: Record<string, string> = {
  '≥': '>=',
  '≤': '<=',
  '≈': '~',
  '→': '->',
  '←': '<-',
  '⁰': '^0',
  '¹': '^1',
  '⁴': '^4',
  '⁵': '^5',
  '⁶': '^6',
  '⁷': '^7',
  '⁸': '^8',
  '⁹': '^9',
  '⁻': '^-',
  '∞': 'infinity',
  '√': 'sqrt',
  '∙': '·',
  '✓': '',
};

export interface TextRun {
  subset: FontSubset;
  text: string;
}

/** Splits text into runs of one font subset each, replacing characters no subset carries. */
export function splitRuns(fonts: SheetFonts, text: string): TextRun[] {
  const runs: TextRun[] = [];
  for (const char of text) {
    let pieces = replacements[char] ?? char;
    // "10⁻³": superscript minus then ³ (which latin has) reads as "10^-³"; keep exponents together.
    if (char === '²' || char === '³') pieces = char;
    for (const piece of pieces) {
      const cp = piece.codePointAt(0) as number;
      const subset = subsetFor(fonts, cp);
      const out = subset ? piece : '?';
      const use = subset ?? 'latin';
      const last = runs.at(-1);
      if (last && last.subset === use) last.text += out;
      else runs.push({ subset: use, text: out });
    }
  }
  return runs;
}
