/**
 * Shared by the print checks: the demo tank top (the worked input of the engine's command
 * line: bust 36 in, hip 40 in, armhole depth 8 1/2 in, 40 % stretch) and PDF helpers.
 */
import { execFileSync } from 'node:child_process';
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { jsPDF } from 'jspdf';
import { draft } from '../../shared/engine/index';
import { pdfBytes, pdfDocumentBuild, type PdfBuildResult } from '../../shared/engine/export/pdf-document';
import type { Draft, DraftInput } from '../../shared/engine/types';
import { EXAMPLE_INPUT } from '../../shared/engine/test-support/inputs.js';

/** The demo tank top's input. */
export const DEMO_TANK_INPUT: DraftInput = EXAMPLE_INPUT;

/** The demo tank top drafted. */
export function demoDraft(input: DraftInput = DEMO_TANK_INPUT): Draft {
  const result = draft(input);
  if (!result.ok) throw new Error(`demo draft failed: ${JSON.stringify(result.errors)}`);
  return result.draft;
}

/** Builds a document and fails loudly when it cannot be built. */
export function built(d: Draft, options: unknown): Extract<PdfBuildResult, { ok: true }> & { bytes: Uint8Array } {
  const result = pdfDocumentBuild(jsPDF, d, options);
  if (!result.ok) throw new Error(`PDF not built: ${JSON.stringify(result.errors)}`);
  return { ...result, bytes: pdfBytes(result.doc) };
}

/** A greyscale raster: width, height and one byte per pixel (0 black … 255 white). */
export interface GreyImage {
  width: number;
  height: number;
  pixels: Uint8Array;
}

/**
 * Reads a binary PGM (P5, 8 bit; Netpbm format): "P5", width, height, maxval separated by
 * whitespace, then one byte per pixel.
 */
export function pgmRead(bytes: Uint8Array): GreyImage {
  let offset = 0;
  const fields: string[] = [];
  while (fields.length < 4) {
    while (/\s/.test(String.fromCharCode(bytes[offset]!))) offset++;
    let field = '';
    while (!/\s/.test(String.fromCharCode(bytes[offset]!))) field += String.fromCharCode(bytes[offset++]!);
    fields.push(field);
  }
  offset++; // the single whitespace after maxval
  const [magic, width, height, maxval] = fields;
  if (magic !== 'P5' || maxval !== '255') throw new Error(`not an 8-bit binary PGM: ${fields.join(' ')}`);
  return { width: Number(width), height: Number(height), pixels: bytes.subarray(offset, offset + Number(width) * Number(height)) };
}

/** Renders one page with poppler's pdftoppm in grey at `dpi` and reads it back. */
export function pageRender(pdf: Uint8Array, page: number, dpi: number): GreyImage {
  const dir = mkdtempSync(join(tmpdir(), 'kw-print-'));
  try {
    const file = join(dir, 'doc.pdf');
    writeFileSync(file, pdf);
    execFileSync('pdftoppm', ['-r', String(dpi), '-gray', '-f', String(page), '-l', String(page), '-singlefile', file, join(dir, 'page')]);
    return pgmRead(new Uint8Array(readFileSync(join(dir, 'page.pgm'))));
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}

/** Runs of pixels darker than `threshold` along row `y` between x0 and x1: [start, end) pairs. */
export function darkRuns(image: GreyImage, y: number, x0: number, x1: number, threshold: number): [number, number][] {
  const runs: [number, number][] = [];
  let start = -1;
  for (let x = Math.max(0, x0); x < Math.min(image.width, x1); x++) {
    const dark = image.pixels[y * image.width + x]! < threshold;
    if (dark && start < 0) start = x;
    if (!dark && start >= 0) {
      runs.push([start, x]);
      start = -1;
    }
  }
  if (start >= 0) runs.push([start, Math.min(image.width, x1)]);
  return runs;
}

/** Runs of dark pixels down column `x` between y0 and y1. */
export function darkRunsDown(image: GreyImage, x: number, y0: number, y1: number, threshold: number): [number, number][] {
  const runs: [number, number][] = [];
  let start = -1;
  for (let y = Math.max(0, y0); y < Math.min(image.height, y1); y++) {
    const dark = image.pixels[y * image.width + x]! < threshold;
    if (dark && start < 0) start = y;
    if (!dark && start >= 0) {
      runs.push([start, y]);
      start = -1;
    }
  }
  if (start >= 0) runs.push([start, Math.min(image.height, y1)]);
  return runs;
}
