import { type ReaderSite } from '@skyledger/contracts';
import { type ReactElement, type ReactNode } from 'react';
import { renderToStaticMarkup } from 'react-dom/server';
import { readerStylesheet } from './reader-stylesheet.js';

/** The reader pages' addresses, relative to the site. */
export const readerPaths = {
  explainers: '/explainers',
  corrections: '/corrections',
  methodology: '/methodology',
  feed: '/feeds/explainers.atom',
} as const;

type Section = 'explainers' | 'corrections' | 'methodology';

const navItems: Array<{ section: Section; label: string }> = [
  { section: 'explainers', label: 'Explainers' },
  { section: 'corrections', label: 'Corrections' },
  { section: 'methodology', label: 'How we check' },
];

interface PageProps {
  site: ReaderSite;
  /** The document title, before the site's name. */
  title: string;
  description?: string;
  /** Extra elements for the head: canonical link, share cards, structured data. */
  head?: ReactNode;
  /** The nav entry this page belongs to. */
  section?: Section;
  /** Keep the page out of search engines (messages, errors). */
  noIndex?: boolean;
  children: ReactNode;
}

/** The frame of every reader page: head, skip link, site header and nav, main, footer. */
export function Page({ site, title, description, head, section, noIndex, children }: PageProps) {
  return (
    <html lang="en">
      <head>
        <meta charSet="utf-8" />
        <meta name="viewport" content="width=device-width, initial-scale=1" />
        <title>{`${title} · ${site.name}`}</title>
        {description ? <meta name="description" content={description} /> : null}
        {noIndex ? <meta name="robots" content="noindex" /> : null}
        <link rel="stylesheet" href={readerStylesheet.path} />
        <link
          rel="alternate"
          type="application/atom+xml"
          title={`${site.name}: explainers and their updates`}
          href={readerPaths.feed}
        />
        {head}
      </head>
      <body>
        <a className="skip" href="#main">
          Skip to the content
        </a>
        <header className="site-head">
          <div className="wrap">
            <a className="brand" href={readerPaths.explainers}>
              {site.name}
            </a>
            <nav aria-label="Reader pages">
              <ul>
                {navItems.map((item) => (
                  <li key={item.section}>
                    <a
                      href={readerPaths[item.section]}
                      aria-current={item.section === section ? 'page' : undefined}
                    >
                      {item.label}
                    </a>
                  </li>
                ))}
              </ul>
            </nav>
          </div>
        </header>
        <main id="main" className="wrap">
          {children}
        </main>
        <footer className="site-foot">
          <div className="wrap">
            <p>
              Climate claims checked by the science desk of {site.organisation}. Nothing we publish
              is deleted: every change is dated and listed on the corrections page.
            </p>
            <ul>
              <li>
                <a href={readerPaths.methodology}>How we check claims</a>
              </li>
              <li>
                <a href={readerPaths.corrections}>Corrections and updates</a>
              </li>
              <li>
                <a href={readerPaths.feed}>Atom feed</a>
              </li>
            </ul>
          </div>
        </footer>
      </body>
    </html>
  );
}

/** A complete HTML document from a page element: the doctype, then the markup. */
export function renderDocument(page: ReactElement): string {
  return `<!DOCTYPE html>${renderToStaticMarkup(page)}`;
}

/** `/explainers?topic=…&page=2`: a path with its query, empty values left out. */
export function pathWithQuery(
  path: string,
  query: Record<string, string | number | undefined>,
): string {
  const params = new URLSearchParams();
  for (const [name, value] of Object.entries(query)) {
    if (value !== undefined && value !== '') params.set(name, String(value));
  }
  const text = params.toString();
  return text ? `${path}?${text}` : path;
}
