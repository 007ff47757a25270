import { type ReaderSite } from '@skyledger/contracts';
import { Page, readerPaths, renderDocument } from './page.js';

export interface MessagePageInput {
  site: ReaderSite;
  title: string;
  message: string;
  /** The HTTP status the page is sent with (200, 404, 410...). */
  status: number;
}

function MessagePage({ site, title, message, status }: MessagePageInput) {
  return (
    <Page site={site} title={title} noIndex>
      <h1>{title}</h1>
      <p>{message}</p>
      {status >= 400 ? (
        <p className="meta">
          {status === 410
            ? 'This address was in use once and is not coming back.'
            : 'Check the address, or find the explainer from the list.'}
        </p>
      ) : null}
      <p>
        <a href={readerPaths.explainers}>See all our explainers</a>
      </p>
    </Page>
  );
}

/** A short page with one message: subscription outcomes, pages not found or gone. */
export function renderMessagePage(input: MessagePageInput): string {
  return renderDocument(<MessagePage {...input} />);
}
