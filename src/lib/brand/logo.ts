import { randomBytes } from 'node:crypto';
import fs from 'node:fs';
import path from 'node:path';
import sharp from 'sharp';
import type { OutputInfo } from 'sharp';
import { getConfig } from '../config';

export const MAX_LOGO_BYTES = 2 * 1024 * 1024;
/** Largest stored logo, px; plenty for a report header at print resolution. */
const MAX_W = 1200;
const MAX_H = 600;

/** Why an upload was refused, with the HTTP status to answer. */
export class LogoError extends Error {
  constructor(
    readonly status: 400 | 413 | 415,
    message: string,
  ) {
    super(message);
  }
}

type Kind = 'png' | 'jpeg' | 'webp';

/** The image type from the file's first bytes (its name and stated type are not trusted). */
export function sniffImage(buf: Buffer): Kind | null {
  if (buf.length >= 8 && buf.subarray(0, 8).equals(Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]))) return 'png';
  if (buf.length >= 3 && buf[0] === 0xff && buf[1] === 0xd8 && buf[2] === 0xff) return 'jpeg';
  if (buf.length >= 12 && buf.toString('latin1', 0, 4) === 'RIFF' && buf.toString('latin1', 8, 12) === 'WEBP') return 'webp';
  return null;
}

function looksLikeSvg(buf: Buffer): boolean {
  const head = buf.subarray(0, 1024).toString('utf8').replace(/^\uFEFF/, '').trimStart().toLowerCase();
  return head.startsWith('<') && (head.includes('<svg') || head.startsWith('<?xml'));
}

export interface StoredLogo {
  file: string;
  contentType: 'image/png';
  width: number;
  height: number;
}

export function logoDir(): string {
  return path.join(getConfig().dataDir, 'logos');
}

/**
 * Check, decode, resize and re-encode an uploaded logo as PNG, then store it under a random name.
 * Re-encoding drops anything riding along in the file (scripts, appended archives, metadata).
 */
export async function storeLogo(buf: Buffer): Promise<StoredLogo> {
  if (buf.length === 0) throw new LogoError(400, 'The file is empty.');
  if (buf.length > MAX_LOGO_BYTES) throw new LogoError(413, 'The logo must be 2 MB or smaller.');
  if (looksLikeSvg(buf)) throw new LogoError(415, 'SVG logos are not accepted: upload PNG, JPEG or WebP.');
  const kind = sniffImage(buf);
  if (!kind) throw new LogoError(415, 'The file is not a PNG, JPEG or WebP image.');
  let out: { data: Buffer; info: OutputInfo };
  try {
    const img = sharp(buf, { failOn: 'error', limitInputPixels: 40_000_000 });
    const meta = await img.metadata();
    if (meta.format !== kind) throw new Error(`decoded as ${meta.format}`);
    out = await img
      .rotate()
      .resize({ width: MAX_W, height: MAX_H, fit: 'inside', withoutEnlargement: true })
      .png({ compressionLevel: 9 })
      .toBuffer({ resolveWithObject: true });
  } catch {
    throw new LogoError(400, `The file could not be read as a ${kind.toUpperCase()} image.`);
  }
  const file = `logo_${randomBytes(16).toString('hex')}.png`;
  fs.mkdirSync(logoDir(), { recursive: true });
  fs.writeFileSync(path.join(logoDir(), file), out.data);
  return { file, contentType: 'image/png', width: out.info.width, height: out.info.height };
}

/** A stored logo's bytes, or null (names are checked so no path can escape the folder). */
export function readLogo(file: string): Buffer | null {
  if (!/^logo_[0-9a-f]{32}\.png$/.test(file)) return null;
  try {
    return fs.readFileSync(path.join(logoDir(), file));
  } catch {
    return null;
  }
}

export function deleteLogoFile(file: string): void {
  if (/^logo_[0-9a-f]{32}\.png$/.test(file)) fs.rmSync(path.join(logoDir(), file), { force: true });
}
