// Reads a PDF the way a person would check it: its text through poppler's pdftotext, and its first page as a PNG through pdftoppm.
import { execFileSync } from 'node:child_process';
import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import sharp from 'sharp';

function written(pdf: Buffer): string {
  const dir = mkdtempSync(join(tmpdir(), 'vy-pdf-'));
  writeFileSync(join(dir, 'doc.pdf'), pdf);
  return dir;
}

export function pdfText(pdf: Buffer): string {
  const dir = written(pdf);
  execFileSync('pdftotext', ['-layout', join(dir, 'doc.pdf'), join(dir, 'doc.txt')]);
  return readFileSync(join(dir, 'doc.txt'), 'utf8');
}

export function firstPagePng(pdf: Buffer, resolution = 60): Buffer {
  const dir = written(pdf);
  execFileSync('pdftoppm', ['-png', '-r', String(resolution), '-f', '1', '-l', '1', join(dir, 'doc.pdf'), join(dir, 'page')]);
  return readFileSync(join(dir, 'page-1.png'));
}

/** The share of pixels darker than near-white: a blank page scores about 0. */
export async function inkShare(png: Buffer): Promise<number> {
  const { data, info } = await sharp(png).greyscale().raw().toBuffer({ resolveWithObject: true });
  let dark = 0;
  for (const value of data) if (value < 200) dark++;
  return dark / (info.width * info.height);
}
