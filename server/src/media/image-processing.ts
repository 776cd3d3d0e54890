import { createHash } from 'node:crypto';
import { HttpStatus, Injectable, UnprocessableEntityException, UnsupportedMediaTypeException } from '@nestjs/common';
import sharp, { type Sharp } from 'sharp';
import { ConfigService } from '../config/config.service.js';

/** Widths of the WebP renditions a kiosk picks from (srcset); never wider than the original. */
export const RENDITION_WIDTHS = [640, 1280, 1920] as const;
const PLACEHOLDER_WIDTH = 16;

const ACCEPTED = 'JPEG, PNG, WebP, AVIF or TIFF';

export type ImageKind = 'jpeg' | 'png' | 'webp' | 'avif' | 'tiff';

export const MIME_TYPES: Record<ImageKind, string> = {
  jpeg: 'image/jpeg',
  png: 'image/png',
  webp: 'image/webp',
  avif: 'image/avif',
  tiff: 'image/tiff',
};

const ascii = (bytes: Buffer, start: number, end: number) => bytes.subarray(start, end).toString('latin1');

/**
 * The file's signature, before any decoder sees it: a renamed text file or an SVG (XML) is refused
 * without being parsed. sharp's metadata then confirms what the signature claims.
 */
export function sniffImageKind(bytes: Buffer): ImageKind | null {
  if (bytes.length < 16) return null;
  if (bytes[0] === 0xff && bytes[1] === 0xd8 && bytes[2] === 0xff) return 'jpeg';
  if (bytes.subarray(0, 8).equals(Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]))) return 'png';
  if (ascii(bytes, 0, 4) === 'RIFF' && ascii(bytes, 8, 12) === 'WEBP') return 'webp';
  if (['II*\0', 'MM\0*'].includes(ascii(bytes, 0, 4))) return 'tiff';
  if (ascii(bytes, 4, 8) === 'ftyp' && ['avif', 'avis'].includes(ascii(bytes, 8, 12))) return 'avif';
  return null;
}

/** What sharp names each kind; AVIF is HEIF with the AV1 codec (HEIC, with HEVC, is not accepted). */
const SHARP_FORMATS: Record<ImageKind, string> = { jpeg: 'jpeg', png: 'png', webp: 'webp', avif: 'heif', tiff: 'tiff' };

export interface InspectedImage {
  kind: ImageKind;
  sha256: string;
}

export interface Rendition {
  width: number;
  height: number;
  data: Buffer;
  sha256: string;
}

export interface ProcessedImage {
  /** As a visitor sees it: after the EXIF orientation is applied. */
  width: number;
  height: number;
  /** The original as it is kept: upright, in its own format, without EXIF, XMP or IPTC. */
  original: Buffer;
  placeholder: string;
}

const sha256Of = (data: Buffer) => createHash('sha256').update(data).digest('hex');

const unsupported = (filename: string) =>
  new UnsupportedMediaTypeException(`${filename} is not an image Mantlepiece accepts; upload ${ACCEPTED} (SVG is not accepted).`);

/** A 422 about the upload's `file` field, the file named in the message. */
const unprocessable = (message: string) =>
  new UnprocessableEntityException({ statusCode: HttpStatus.UNPROCESSABLE_ENTITY, message, errors: [{ path: ['file'], message }] });

/**
 * Re-encodes the original in its own format with nothing but its pixels and colour profile: sharp
 * writes no EXIF, XMP or IPTC unless asked, so a camera's GPS position, serial number and owner
 * never reach the disk, while renditions made again later lose no colour. JPEG, WebP and AVIF are
 * encoded at a quality well above the renditions', so the kept original stays the best copy.
 */
function encodeOriginal(image: Sharp, kind: ImageKind): Promise<Buffer> {
  const kept = image.keepIccProfile();
  if (kind === 'jpeg') return kept.jpeg({ quality: 95, chromaSubsampling: '4:4:4' }).toBuffer();
  if (kind === 'png') return kept.png().toBuffer();
  if (kind === 'webp') return kept.webp({ quality: 95 }).toBuffer();
  if (kind === 'avif') return kept.avif({ quality: 80 }).toBuffer();
  return kept.tiff({ compression: 'lzw' }).toBuffer();
}

@Injectable()
export class ImageProcessing {
  constructor(private readonly config: ConfigService) {}

  /** Type from the bytes and pixel count from the header; nothing is decoded yet. */
  async inspect(bytes: Buffer, filename: string): Promise<InspectedImage> {
    const kind = sniffImageKind(bytes);
    if (!kind) throw unsupported(filename);
    // Header only, with no pixel limit, so an oversized image gets its own answer below.
    const metadata = await sharp(bytes, { limitInputPixels: false }).metadata().catch(() => null);
    if (!metadata || metadata.format !== SHARP_FORMATS[kind] || (kind === 'avif' && metadata.compression !== 'av1')) throw unsupported(filename);
    const pixels = metadata.width * metadata.height;
    if (pixels > this.config.mediaMaxPixels) {
      throw unprocessable(`${filename} is ${metadata.width} × ${metadata.height} pixels; the limit is ${(this.config.mediaMaxPixels / 1e6).toLocaleString('en')} megapixels.`);
    }
    return { kind, sha256: sha256Of(bytes) };
  }

  /**
   * Decodes the whole image: auto-orients it, makes the original to keep (see `encodeOriginal`)
   * and the placeholder, neither carrying EXIF, XMP or IPTC. A file whose header reads but whose
   * pixels do not (truncated, corrupt) is refused with 422. Renditions are made later, from the
   * kept original, by `renditionsOf`.
   */
  async process(bytes: Buffer, filename: string, kind: ImageKind): Promise<ProcessedImage> {
    try {
      return await this.decode(bytes, kind);
    } catch {
      // sharp's message names libvips internals; the person uploading needs the file's name.
      throw unprocessable(`Could not read this image: ${filename} is damaged or incomplete. Save or export it again, then upload it.`);
    }
  }

  /** Whether a stored original still carries what `encodeOriginal` leaves out: EXIF, XMP, IPTC or an orientation to apply. */
  async carriesMetadata(bytes: Buffer): Promise<boolean> {
    const { exif, xmp, iptc, orientation } = await sharp(bytes, { limitInputPixels: false }).metadata();
    return Boolean(exif || xmp || iptc || (orientation !== undefined && orientation !== 1));
  }

  /** An original stored as it was uploaded, kept again as `process` keeps one now. */
  stripMetadata(bytes: Buffer, kind: ImageKind): Promise<Buffer> {
    return encodeOriginal(sharp(bytes, { limitInputPixels: this.config.mediaMaxPixels, failOn: 'error' }).rotate(), kind);
  }

  /**
   * The WebP renditions of a kept original (upright already), one width after another, each
   * handed to `made` as it is done so the caller can store it and show progress.
   */
  async renditionsOf(original: Buffer, made: (rendition: Rendition, index: number, total: number) => Promise<void>): Promise<void> {
    // Each output decodes the original again: libvips streams it and shrinks on load, which
    // keeps memory far below holding a 100-megapixel bitmap.
    const oriented = sharp(original, { limitInputPixels: this.config.mediaMaxPixels, failOn: 'error' }).rotate();
    const { autoOrient } = await oriented.metadata();
    const widths = [...new Set(RENDITION_WIDTHS.map((width) => Math.min(width, autoOrient.width)))];
    for (const [index, width] of widths.entries()) {
      const { data, info } = await oriented.clone().resize({ width, withoutEnlargement: true }).webp({ quality: 82 }).toBuffer({ resolveWithObject: true });
      await made({ width: info.width, height: info.height, data, sha256: sha256Of(data) }, index, widths.length);
    }
  }

  private async decode(bytes: Buffer, kind: ImageKind): Promise<ProcessedImage> {
    const oriented = sharp(bytes, { limitInputPixels: this.config.mediaMaxPixels, failOn: 'error' }).rotate();
    const { autoOrient } = await oriented.metadata();
    const tiny = await oriented.clone().resize({ width: PLACEHOLDER_WIDTH }).blur(1).webp({ quality: 40 }).toBuffer();
    const original = await encodeOriginal(oriented.clone(), kind);
    return { width: autoOrient.width, height: autoOrient.height, original, placeholder: `data:image/webp;base64,${tiny.toString('base64')}` };
  }
}
