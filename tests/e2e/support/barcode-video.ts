import { writeFile } from 'node:fs/promises';
import bwipjs from 'bwip-js';
import sharp from 'sharp';

const WIDTH = 640;
const HEIGHT = 480;

/**
 * A barcode picture made for the test: bwip-js draws the EAN-13 (its own check digit from the 12
 * digits given), sharp centres it on a white 640×480 frame.
 */
export async function barcodeImage(first12Digits: string): Promise<Buffer> {
  const png = await bwipjs.toBuffer({
    bcid: 'ean13',
    text: first12Digits,
    scale: 3,
    height: 22,
    includetext: true,
    backgroundcolor: 'FFFFFF',
  });
  return sharp({ create: { width: WIDTH, height: HEIGHT, channels: 3, background: '#ffffff' } })
    .composite([{ input: png, gravity: 'center' }])
    .png()
    .toBuffer();
}

/**
 * The same picture as a Y4M clip (YUV 4:2:0, two identical frames) for Chromium's fake camera
 * (`--use-file-for-fake-video-capture`): luma from the greyscale picture, chroma neutral (128).
 */
export async function writeBarcodeY4m(file: string, first12Digits: string): Promise<void> {
  const luma = await sharp(await barcodeImage(first12Digits))
    .greyscale()
    .raw()
    .toBuffer();
  const chroma = Buffer.alloc((WIDTH / 2) * (HEIGHT / 2), 128);
  const frame = Buffer.concat([Buffer.from('FRAME\n'), luma, chroma, chroma]);
  const header = Buffer.from(`YUV4MPEG2 W${WIDTH} H${HEIGHT} F10:1 Ip A1:1 C420jpeg\n`);
  await writeFile(file, Buffer.concat([header, frame, frame]));
}
