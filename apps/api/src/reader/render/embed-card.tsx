import { type ReaderExplainerSummary, type ReaderSite } from '@skyledger/contracts';
import { createHash } from 'node:crypto';
import { ratingPosition } from './format.js';
import { renderDocument } from './page.js';

export interface EmbedCardInput {
  site: ReaderSite;
  item: ReaderExplainerSummary;
}

// Inline, so the card needs nothing but its own document inside another site's frame.
const cardStyle = `body{margin:0;font:15px/1.45 system-ui,-apple-system,'Segoe UI',Roboto,'Noto Sans',sans-serif;color:#1c2024;background:#fff}
main{border:1px solid #d6d2ca;border-left:6px solid #0a5a62;padding:12px 14px}
p,h1{margin:0 0 6px}h1{font-size:15px;font-weight:400}.site{color:#4a525c;font-size:13px}.rating{font-size:17px}.tag{color:#8c1422;font-weight:700}
a{color:#0a5a62;font-weight:600}a:focus-visible{outline:3px solid #1747c4;outline-offset:2px}`;

/** The card's one style element as a CSP source (CSP Level 3, section 8.4), so no other may apply. */
export const embedCardStyleSource = `'sha256-${createHash('sha256').update(cardStyle).digest('base64')}'`;

function EmbedCard({ site, item }: EmbedCardInput) {
  const position = item.rating ? ratingPosition(item.rating) : null;
  return (
    <html lang="en">
      <head>
        <meta charSet="utf-8" />
        <meta name="viewport" content="width=device-width, initial-scale=1" />
        <meta name="robots" content="noindex" />
        <title>{`${item.rating?.label ?? 'Not rated'}: ${item.summary} · ${site.name}`}</title>
        <style>{cardStyle}</style>
      </head>
      <body>
        <main>
          <p className="site">{site.name} · climate claim check</p>
          <p className="rating">
            <strong>{item.rating ? item.rating.label : 'Not rated'}</strong>
            {position ? ` (${position})` : ''}
            {item.retracted ? <span className="tag"> · Retracted</span> : null}
          </p>
          <h1>{item.summary}</h1>
          <p>
            <a href={item.url} target="_blank" rel="noopener">
              Read why on {site.name}
            </a>
          </p>
        </main>
      </body>
    </html>
  );
}

/** The small card other sites embed through oEmbed: the rating in words, the claim, a link. */
export function renderEmbedCard(input: EmbedCardInput): string {
  return renderDocument(<EmbedCard {...input} />);
}
