import { createHash } from 'node:crypto';
import { HttpStatus, Injectable, UnprocessableEntityException, UnsupportedMediaTypeException } from '@nestjs/common';
import sharp from 'sharp';
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
  renditions: Rendition[];
  placeholder: string;
}

const sha256Of = (data: Buffer) => createHash('sha256').update(data).digest('hex');

const unsupported = (filename: string) =>
  new UnsupportedMediaTypeException(`${filename} is not an image Mantlepiece accepts; upload ${ACCEPTED} (SVG is not accepted).`);

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
      throw new UnprocessableEntityException({
        statusCode: HttpStatus.UNPROCESSABLE_ENTITY,
        message: `${filename} is ${metadata.width} × ${metadata.height} pixels; the limit is ${(this.config.mediaMaxPixels / 1e6).toLocaleString('en')} megapixels.`,
      });
    }
    return { kind, sha256: sha256Of(bytes) };
  }

  /**
   * Auto-orients and writes the renditions. sharp drops EXIF, XMP and IPTC unless asked to keep
   * them (we never ask), so no GPS position or camera detail reaches a rendition.
   */
  async process(bytes: Buffer): Promise<ProcessedImage> {
    // Each output decodes the original again: libvips streams it and shrinks on load, which
    // keeps memory far below holding a 100-megapixel bitmap.
    const oriented = sharp(bytes, { limitInputPixels: this.config.mediaMaxPixels, failOn: 'error' }).rotate();
    const { autoOrient } = await oriented.metadata();
    const widths = [...new Set(RENDITION_WIDTHS.map((width) => Math.min(width, autoOrient.width)))];
    const renditions = await Promise.all(
      widths.map(async (width) => {
        const { data, info } = await oriented
          .clone()
          .resize({ width, withoutEnlargement: true })
          .webp({ quality: 82 })
          .toBuffer({ resolveWithObject: true });
        return { width: info.width, height: info.height, data, sha256: sha256Of(data) };
      }),
    );
    const tiny = await oriented.clone().resize({ width: PLACEHOLDER_WIDTH }).blur(1).webp({ quality: 40 }).toBuffer();
    return { width: autoOrient.width, height: autoOrient.height, renditions, placeholder: `data:image/webp;base64,${tiny.toString('base64')}` };
  }
}
