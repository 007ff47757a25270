import { onePagePdf } from './pdf';
import { encodePng, RgbImage, type Rgb } from './png';

/** A file the seed uploads: its name and its bytes. */
export interface DemoFile {
  name: string;
  bytes: Buffer;
}

const ink: Rgb = [34, 34, 40];
const paper: Rgb = [248, 246, 240];
const bannerColour: Rgb = [255, 214, 102];
const white: Rgb = [255, 255, 255];

function wrap(text: string, width: number): string[] {
  const lines: string[] = [];
  let line = '';
  for (const word of text.split(/\s+/)) {
    if (line && line.length + 1 + word.length > width) {
      lines.push(line);
      line = word;
    } else {
      line = line ? `${line} ${word}` : word;
    }
  }
  if (line) lines.push(line);
  return lines;
}

/**
 * A made-up screenshot of a post or a page, as a PNG: the platform's bar, the words of
 * the post, and a banner across the foot saying it is a demo capture. Drawn by the seed,
 * never downloaded; nothing in it is real.
 */
export function demoScreenshot(options: {
  name: string;
  platform: string;
  /** e.g. the account or programme, shown under the bar. */
  byline: string;
  text: string;
  seen: string;
  accent: Rgb;
}): DemoFile {
  const width = 480;
  const scale = 2;
  const image = new RgbImage(width, 300, paper);
  image.fillRect(0, 0, width, 36, options.accent);
  image.drawText(options.platform, 12, 11, white, scale);
  image.drawText(options.seen, width - 12 - RgbImage.textWidth(options.seen), 15, white);
  image.drawText(options.byline, 12, 48, options.accent, scale);
  wrap(options.text, 37)
    .slice(0, 10)
    .forEach((line, index) => {
      image.drawText(line, 12, 76 + index * RgbImage.lineHeight(scale), ink, scale);
    });
  image.fillRect(0, 266, width, 34, bannerColour);
  const label = 'DEMO CAPTURE - INVENTED';
  image.drawText(label, (width - RgbImage.textWidth(label, scale)) / 2, 276, ink, scale);
  return { name: options.name, bytes: encodePng(image) };
}

/** A made-up document (a press release, a letter) as a one-page PDF marked as a demo capture. */
export function demoDocument(options: {
  name: string;
  heading: string;
  from: string;
  date: string;
  paragraphs: readonly string[];
}): DemoFile {
  const bytes = onePagePdf(options.heading, [
    { text: 'DEMO CAPTURE - invented for the Skyledger demo; not a real document', size: 9 },
    { text: options.from, size: 10, bold: true },
    { text: options.date, size: 10 },
    { text: options.heading, size: 16, bold: true },
    ...options.paragraphs.flatMap((paragraph) => [
      ...wrap(paragraph, 90).map((text) => ({ text })),
      { text: '' },
    ]),
  ]);
  return { name: options.name, bytes };
}
