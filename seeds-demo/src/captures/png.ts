import { crc32, deflateSync } from 'node:zlib';
import { GLYPH_HEIGHT, GLYPH_WIDTH, glyphOf } from './pixel-font';

export type Rgb = readonly [number, number, number];

/** A picture in memory, 8-bit RGB, drawn with rectangles and pixel-font text. */
export class RgbImage {
  readonly pixels: Uint8Array;

  constructor(
    readonly width: number,
    readonly height: number,
    background: Rgb,
  ) {
    this.pixels = new Uint8Array(width * height * 3);
    this.fillRect(0, 0, width, height, background);
  }

  fillRect(x: number, y: number, width: number, height: number, colour: Rgb): void {
    const right = Math.min(this.width, x + width);
    const bottom = Math.min(this.height, y + height);
    for (let row = Math.max(0, y); row < bottom; row += 1) {
      for (let column = Math.max(0, x); column < right; column += 1) {
        this.pixels.set(colour, (row * this.width + column) * 3);
      }
    }
  }

  /** Draws `text` with its top-left corner at (x, y), each font pixel `scale` pixels wide. */
  drawText(text: string, x: number, y: number, colour: Rgb, scale = 1): void {
    [...text].forEach((character, index) => {
      const left = x + index * (GLYPH_WIDTH + 1) * scale;
      glyphOf(character).forEach((line, row) => {
        [...line].forEach((cell, column) => {
          if (cell === '#') {
            this.fillRect(left + column * scale, y + row * scale, scale, scale, colour);
          }
        });
      });
    });
  }

  /** The width `text` takes at `scale`, for centring and right-aligning. */
  static textWidth(text: string, scale = 1): number {
    return text.length * (GLYPH_WIDTH + 1) * scale - scale;
  }

  static readonly lineHeight = (scale = 1) => (GLYPH_HEIGHT + 2) * scale;
}

function chunk(type: string, data: Uint8Array): Buffer {
  const length = Buffer.alloc(4);
  length.writeUInt32BE(data.length);
  const body = Buffer.concat([Buffer.from(type, 'ascii'), data]);
  const crc = Buffer.alloc(4);
  crc.writeUInt32BE(crc32(body) >>> 0);
  return Buffer.concat([length, body, crc]);
}

/**
 * The image as a PNG file (ISO/IEC 15948): 8-bit truecolour, no interlace, every scanline
 * with filter type 0, deflated with node:zlib.
 */
export function encodePng(image: RgbImage): Buffer {
  const header = Buffer.alloc(13);
  header.writeUInt32BE(image.width, 0);
  header.writeUInt32BE(image.height, 4);
  header.set([8, 2, 0, 0, 0], 8); // bit depth 8, colour type 2 (RGB), deflate, filter 0, no interlace
  const stride = image.width * 3;
  const raw = Buffer.alloc((stride + 1) * image.height);
  for (let row = 0; row < image.height; row += 1) {
    raw[row * (stride + 1)] = 0;
    raw.set(image.pixels.subarray(row * stride, (row + 1) * stride), row * (stride + 1) + 1);
  }
  return Buffer.concat([
    Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]),
    chunk('IHDR', header),
    chunk('IDAT', deflateSync(raw)),
    chunk('IEND', new Uint8Array(0)),
  ]);
}
