import { type NextFunction, type Request, type Response } from 'express';
import { embedCardStyleSource } from './render';

/**
 * Reader pages are server-rendered HTML that needs no script and no inline style, so their
 * policy allows neither: only the site's own stylesheet and images, forms posting back to
 * the site, no framing. The ClaimReview block (`application/ld+json`) is data, not script,
 * and is not affected.
 */
export const readerPagePolicy = [
  "default-src 'none'",
  "script-src 'none'",
  "style-src 'self'",
  "img-src 'self'",
  "form-action 'self'",
  "base-uri 'none'",
  "frame-ancestors 'none'",
].join('; ');

/** The embed card: its own style element (by hash) and nothing else; any site may frame it. */
export const embedCardPolicy = [
  "default-src 'none'",
  `style-src ${embedCardStyleSource}`,
  'frame-ancestors *',
  "base-uri 'none'",
  "form-action 'none'",
].join('; ');

/** Puts the reader policy in place of the desk's on every reader response; routes may narrow it. */
export function readerPolicy(_req: Request, res: Response, next: NextFunction): void {
  res.setHeader('Content-Security-Policy', readerPagePolicy);
  next();
}
