import { createHash } from 'node:crypto';
import { createReadStream } from 'node:fs';
import { open } from 'node:fs/promises';
import { pipeline } from 'node:stream/promises';
import { LIMITS } from '@driftmark/shared';
import sharp, { type Metadata, type Sharp, type SharpOptions } from 'sharp';

/** The upload formats we accept, named as LIMITS.photoTypes names them. */
export type PhotoFormat = 'jpeg' | 'png' | 'webp' | 'avif';

export type ImageRejection =
  /** Not one of JPEG, PNG, WebP, AVIF by its bytes (an SVG, a text file, a GIF, HEIC…). */
  | 'unsupported_type'
  /** Claims to be an accepted format but does not decode (truncated, corrupt). */
  | 'unreadable'
  /** More than LIMITS.photoMaxPixels pixels: refused before decoding. */
  | 'too_many_pixels';

export class ImageRejectedError extends Error {
  constructor(
    readonly reason: ImageRejection,
    message: string,
  ) {
    super(message);
    this.name = 'ImageRejectedError';
  }
}

export interface EncodedSize {
  data: Buffer;
  width: number;
  height: number;
  contentType: 'image/jpeg';
}

export interface ProcessedPhoto {
  /** The format the bytes really are. */
  format: PhotoFormat;
  /** SHA-256 (hex) of the input bytes. */
  contentHash: string;
  thumb: EncodedSize;
  display: EncodedSize;
}

/** Long edge of each stored size, px. */
export const PHOTO_SIZES = { thumb: 320, display: 1600 } as const;
export type PhotoSize = keyof typeof PHOTO_SIZES;

const JPEG_QUALITY: Record<PhotoSize, number> = { thumb: 76, display: 84 };

/** ISO base-media brands of HEIF-family files (AVIF among them); sharp then tells AVIF from HEIC. */
const HEIF_BRANDS = new Set(['avif', 'avis', 'mif1', 'msf1', 'heic', 'heix', 'heim', 'heis', 'hevc', 'hevx']);

/**
 * The format named by the file's first bytes, before any decoder sees it: an SVG or a text file
 * never reaches libvips' SVG or text loaders at all.
 */
export function sniffFormat(bytes: Buffer): PhotoFormat | 'heif' | null {
  if (bytes.length >= 3 && bytes[0] === 0xff && bytes[1] === 0xd8 && bytes[2] === 0xff) return 'jpeg';
  if (
    bytes.length >= 8 &&
    bytes.subarray(0, 8).equals(Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]))
  )
    return 'png';
  if (
    bytes.length >= 12 &&
    bytes.toString('latin1', 0, 4) === 'RIFF' &&
    bytes.toString('latin1', 8, 12) === 'WEBP'
  )
    return 'webp';
  if (bytes.length >= 12 && bytes.toString('latin1', 4, 8) === 'ftyp') {
    const brand = bytes.toString('latin1', 8, 12);
    if (HEIF_BRANDS.has(brand)) return brand === 'avif' || brand === 'avis' ? 'avif' : 'heif';
  }
  return null;
}

const TYPE_MESSAGE = 'is not a JPEG, PNG, WebP or AVIF image.';

function inputOptions(): SharpOptions {
  return {
    // Refuse decompression bombs from the header, before any pixel is decoded.
    limitInputPixels: LIMITS.photoMaxPixels,
    // Any decoder error (a truncated JPEG among them) fails instead of yielding a grey half-image.
    failOn: 'error',
    sequentialRead: true,
  };
}

function rejectFromSharp(error: unknown): ImageRejectedError {
  const message = error instanceof Error ? error.message : String(error);
  if (/pixel limit/i.test(message)) {
    return new ImageRejectedError(
      'too_many_pixels',
      `has more than ${(LIMITS.photoMaxPixels / 1_000_000).toFixed(0)} million pixels.`,
    );
  }
  if (/unsupported image format/i.test(message))
    return new ImageRejectedError('unsupported_type', TYPE_MESSAGE);
  return new ImageRejectedError(
    'unreadable',
    'could not be read as an image (the file may be damaged or incomplete).',
  );
}

// Uploads are decoded once and never again: libvips' operation cache would only hold on to their
// pixels (up to 50 MB by default) between requests. Threads per image stay at sharp's default, the
// number of cores.
sharp.cache(false);

async function jpeg(image: Sharp, size: PhotoSize): Promise<EncodedSize> {
  const { data, info } = await image
    // No withMetadata()/keepExif(): sharp writes no EXIF, XMP, IPTC or GPS unless asked to.
    .jpeg({ quality: JPEG_QUALITY[size], mozjpeg: true })
    .toBuffer({ resolveWithObject: true });
  return { data, width: info.width, height: info.height, contentType: 'image/jpeg' };
}

/**
 * Both stored sizes from one decode: the upload is decoded (shrunk on load where the format
 * allows), oriented and scaled to the display size once; the display JPEG is encoded from those
 * pixels and the thumbnail scaled down from them, never from the upload a second time.
 */
async function encodeSizes(input: Buffer | string): Promise<Pick<ProcessedPhoto, 'display' | 'thumb'>> {
  const edge = (size: PhotoSize) => ({
    width: PHOTO_SIZES[size],
    height: PHOTO_SIZES[size],
    fit: 'inside' as const,
    withoutEnlargement: true,
  });
  const { data, info } = await sharp(input, inputOptions())
    // Applies the EXIF orientation to the pixels; the tag itself goes with the rest of the metadata.
    .rotate()
    .resize(edge('display'))
    // JPEG has no alpha: a transparent PNG gets a white background rather than black.
    .flatten({ background: '#ffffff' })
    .toColourspace('srgb')
    .raw({ depth: 'uchar' })
    .toBuffer({ resolveWithObject: true });
  const pixels = () =>
    sharp(data, { raw: { width: info.width, height: info.height, channels: info.channels } });
  const [display, thumb] = await Promise.all([
    jpeg(pixels(), 'display'),
    jpeg(pixels().resize(edge('thumb')), 'thumb'),
  ]);
  return { display, thumb };
}

/**
 * Checks an uploaded file (real type from its bytes, pixel limit, full decode) and re-encodes it
 * as the stored sizes, orientation applied and every metadata block removed.
 * Throws ImageRejectedError for a file we refuse; anything else is our own failure.
 */
export async function processPhoto(input: Buffer): Promise<ProcessedPhoto> {
  return processSource(input, input, () => Promise.resolve(createHash('sha256').update(input).digest('hex')));
}

/** Bytes enough for sniffFormat. */
const HEAD_BYTES = 16;

/**
 * processPhoto for a file on disk (an upload's temp file): libvips reads the file itself and the
 * hash streams over it, so the upload is never held in memory whole.
 */
export async function processPhotoFile(path: string): Promise<ProcessedPhoto> {
  const head = Buffer.alloc(HEAD_BYTES);
  const file = await open(path);
  let length: number;
  try {
    ({ bytesRead: length } = await file.read(head, 0, HEAD_BYTES, 0));
  } finally {
    await file.close();
  }
  return processSource(path, head.subarray(0, length), async () => {
    const hash = createHash('sha256');
    await pipeline(createReadStream(path), hash);
    return hash.digest('hex');
  });
}

async function processSource(
  input: Buffer | string,
  head: Buffer,
  contentHash: () => Promise<string>,
): Promise<ProcessedPhoto> {
  const sniffed = sniffFormat(head);
  if (sniffed === null) throw new ImageRejectedError('unsupported_type', TYPE_MESSAGE);
  if (sniffed === 'heif') {
    throw new ImageRejectedError(
      'unsupported_type',
      'is a HEIC image, which we cannot read. Choose JPEG ("Most compatible") in the camera settings, or export it as JPEG.',
    );
  }

  let metadata: Metadata;
  try {
    metadata = await sharp(input, inputOptions()).metadata();
  } catch (error) {
    throw rejectFromSharp(error);
  }
  const real: PhotoFormat | null =
    metadata.format === 'heif'
      ? metadata.compression === 'av1'
        ? 'avif'
        : null
      : metadata.format === 'jpeg' || metadata.format === 'png' || metadata.format === 'webp'
        ? metadata.format
        : null;
  // The decoder must agree with the magic bytes: a polyglot never gets a second reading.
  if (real === null || real !== sniffed) throw new ImageRejectedError('unsupported_type', TYPE_MESSAGE);
  if (metadata.width * metadata.height > LIMITS.photoMaxPixels)
    throw rejectFromSharp(new Error('pixel limit'));

  try {
    const [{ display, thumb }, hash] = await Promise.all([encodeSizes(input), contentHash()]);
    return { format: real, contentHash: hash, thumb, display };
  } catch (error) {
    throw rejectFromSharp(error);
  }
}
