import {
  type ReaderAppearance,
  type ReaderExplainer,
  type ReaderSite,
  type ReaderSource,
  type ReaderUpdateNote,
  updateNoteKindLabels,
} from '@skyledger/contracts';
import { bodyWithWorkings, workingElementId } from './explainer-body.js';
import { doiUrl, isLinkable, siteTimeZone } from './format.js';
import { JsonLdScript } from './json-ld.js';
import { Page, pathWithQuery, readerPaths, renderDocument } from './page.js';
import { Moment, Verdict } from './rating.js';
import { WorkingView } from './working-view.js';

/** What a share of the page shows (Open Graph and Twitter card): the verdict, not the claim alone. */
export interface ShareCard {
  title: string;
  description: string;
  url: string;
  imageUrl?: string;
}

/** The outcome of a subscription form sent back to the page. */
export interface SubscriptionResult {
  status: 'sent' | 'invalid';
  message: string;
}

export interface ExplainerPageInput {
  site: ReaderSite;
  explainer: ReaderExplainer;
  /** The ClaimReview object; written into the page's one ld+json script. */
  jsonLd: object;
  share: ShareCard;
  subscription?: SubscriptionResult;
}

const newestFirst = (notes: readonly ReaderUpdateNote[]) =>
  [...notes].sort((a, b) => Date.parse(b.at) - Date.parse(a.at));

function ShareMeta({ site, explainer, share }: ExplainerPageInput) {
  return (
    <>
      <link rel="canonical" href={explainer.url} />
      <link
        rel="alternate"
        type="application/json+oembed"
        title={share.title}
        href={`${site.origin}/oembed?url=${encodeURIComponent(explainer.url)}&format=json`}
      />
      <meta property="og:type" content="article" />
      <meta property="og:site_name" content={site.name} />
      <meta property="og:title" content={share.title} />
      <meta property="og:description" content={share.description} />
      <meta property="og:url" content={share.url} />
      {share.imageUrl ? <meta property="og:image" content={share.imageUrl} /> : null}
      <meta property="article:published_time" content={explainer.firstPublishedAt} />
      {explainer.modifiedAt ? (
        <meta property="article:modified_time" content={explainer.modifiedAt} />
      ) : null}
      <meta name="twitter:card" content="summary" />
      <meta name="twitter:title" content={share.title} />
      <meta name="twitter:description" content={share.description} />
      {share.imageUrl ? <meta name="twitter:image" content={share.imageUrl} /> : null}
    </>
  );
}

function UpdateNotes({ notes, timeZone }: { notes: ReaderUpdateNote[]; timeZone: string }) {
  return (
    <section className="notes" aria-labelledby="updates-title">
      <h2 id="updates-title">
        {notes.length === 1
          ? 'This explainer has been updated'
          : `Updates to this explainer (${notes.length})`}
      </h2>
      <ol reversed>
        {notes.map((note, index) => (
          <li key={index}>
            <strong>{note.kindLabel}</strong>, <Moment at={note.at} timeZone={timeZone} />:{' '}
            {note.text} <a href={note.url}>Version {note.sequence} as published</a>
          </li>
        ))}
      </ol>
    </section>
  );
}

function Appearance({ appearance }: { appearance: ReaderAppearance }) {
  const seen = (
    <>
      <strong>{appearance.outlet}</strong>,{' '}
      <Moment at={appearance.seenAt} timeZone={appearance.seenTimeZone} zoneId />
      {appearance.isFirstKnown ? ' (the first known appearance)' : ''}.{' '}
    </>
  );
  if (appearance.url === null) {
    return (
      <li>{seen}We do not give its address or a copy: they could identify a private individual.</li>
    );
  }
  return (
    <li>
      {seen}Address: <span className="url">{appearance.url}</span>.{' '}
      {isLinkable(appearance.captureUrl) ? (
        <a href={appearance.captureUrl} rel="nofollow">
          Archived copy<span className="sr"> of the appearance in {appearance.outlet}</span>
        </a>
      ) : (
        'No archived copy.'
      )}
    </li>
  );
}

function ClaimSection({ explainer }: { explainer: ReaderExplainer }) {
  const { claim, claimant } = explainer;
  // A private individual's affiliation could name them: it is shown only with a name.
  const affiliation = claimant.name !== null ? claimant.affiliation : null;
  return (
    <section className="claim" aria-labelledby="claim-title">
      <h2 id="claim-title">What was claimed</h2>
      <figure>
        <blockquote>
          <p>{claim.text}</p>
        </blockquote>
        <figcaption>
          Said by {claimant.displayName}
          {affiliation ? `, ${affiliation}` : ''}
        </figcaption>
      </figure>
      {explainer.appearances.length > 0 ? (
        <>
          <p>Where and when we saw it:</p>
          <ul>
            {explainer.appearances.map((appearance, index) => (
              <Appearance key={index} appearance={appearance} />
            ))}
          </ul>
        </>
      ) : null}
      {claim.topics.length > 0 ? (
        <p className="meta">
          Topics:{' '}
          {claim.topics.map((topic, index) => (
            <span key={topic}>
              {index > 0 ? ', ' : ''}
              <a href={pathWithQuery(readerPaths.explainers, { topic })}>{topic}</a>
            </span>
          ))}
        </p>
      ) : null}
    </section>
  );
}

function Source({ source }: { source: ReaderSource }) {
  const byline = [source.authors, source.year === null ? null : `(${source.year})`]
    .filter(Boolean)
    .join(' ');
  return (
    <li id={`source-${source.id}`} value={source.number}>
      {byline ? `${byline}. ` : ''}
      <cite>{source.title}</cite>.{source.publisher ? ` ${source.publisher}.` : ''}
      {source.doi ? (
        <>
          {' '}
          <a className="url" href={doiUrl(source.doi)}>
            doi:{source.doi}
          </a>
          .
        </>
      ) : null}
      {source.url ? (
        <>
          {' '}
          {isLinkable(source.url) ? (
            <a className="url" href={source.url}>
              {source.url}
            </a>
          ) : (
            <span className="url">{source.url}</span>
          )}
        </>
      ) : null}
      <br />
      <span className="meta">
        {source.kindLabel}. Reliability: {source.gradeLabel} — {source.gradeReason}
      </span>
    </li>
  );
}

function PublicationHistory({
  explainer,
  timeZone,
}: {
  explainer: ReaderExplainer;
  timeZone: string;
}) {
  const publications = [...explainer.publications].sort((a, b) => a.sequence - b.sequence);
  return (
    <section aria-labelledby="versions-title">
      <h2 id="versions-title">Versions of this explainer</h2>
      <p>
        Every version we publish stays readable at its own address. Changes are listed on our{' '}
        <a href={readerPaths.corrections}>corrections page</a>.
      </p>
      <ol>
        {publications.map((publication) => {
          const current = publication.sequence === explainer.sequence;
          return (
            <li key={publication.sequence} value={publication.sequence}>
              <a href={publication.url} aria-current={current ? 'page' : undefined}>
                Version {publication.sequence}
              </a>
              , published <Moment at={publication.publishedAt} timeZone={timeZone} />
              {publication.noteKind
                ? `, with a note: ${updateNoteKindLabels[publication.noteKind].toLowerCase()}`
                : ', the first publication'}
              {current ? ' (this page)' : ''}
            </li>
          );
        })}
      </ol>
    </section>
  );
}

function Subscribe({
  explainer,
  subscription,
}: {
  explainer: ReaderExplainer;
  subscription?: SubscriptionResult;
}) {
  const invalid = subscription?.status === 'invalid';
  return (
    <section className="subscribe-box" id="subscribe" aria-labelledby="subscribe-title">
      <h2 id="subscribe-title">Hear when this explainer changes</h2>
      <p>
        We send an e-mail when we correct or update this explainer, and for nothing else. You
        confirm your address first; every e-mail has a link to stop them, and stopping deletes your
        address.
      </p>
      {subscription ? (
        <p id="subscribe-result" className={`result result-${subscription.status}`} role="status">
          {subscription.message}
        </p>
      ) : null}
      <form className="subscribe" method="post" action={`${explainer.url}/subscribe`}>
        <label htmlFor="subscribe-email">Your e-mail address</label>
        <input
          id="subscribe-email"
          name="email"
          type="email"
          autoComplete="email"
          required
          maxLength={254}
          aria-invalid={invalid ? true : undefined}
          aria-describedby={subscription ? 'subscribe-result' : undefined}
        />
        <button type="submit">Send me updates</button>
      </form>
    </section>
  );
}

function ExplainerPage(input: ExplainerPageInput) {
  const { site, explainer, jsonLd, share, subscription } = input;
  const timeZone = siteTimeZone(site);
  const notes = newestFirst(explainer.updateNotes);
  const retraction = notes.find((note) => note.kind === 'retraction');
  const { html, unplaced } = bodyWithWorkings(explainer.bodyHtml, explainer.workings);
  return (
    <Page
      site={site}
      title={share.title}
      description={share.description}
      section="explainers"
      head={
        <>
          <ShareMeta {...input} />
          <JsonLdScript data={jsonLd} />
        </>
      }
    >
      <article>
        {explainer.isLatest ? null : (
          <p className="notice">
            You are reading version {explainer.sequence} of this explainer, published{' '}
            <Moment at={explainer.publishedAt} timeZone={timeZone} />. It has changed since:{' '}
            <a href={explainer.url}>read the latest version</a>.
          </p>
        )}
        <header>
          <p className="kicker">Climate claim check</p>
          <h1>{explainer.claim.summary}</h1>
          {explainer.retracted ? (
            <div className="retracted" role="note">
              <strong>Retracted.</strong>{' '}
              {retraction ? (
                <>
                  On <Moment at={retraction.at} timeZone={timeZone} /> we withdrew this explainer:{' '}
                  {retraction.text}
                </>
              ) : (
                'We have withdrawn this explainer.'
              )}{' '}
              The page stays up so that the record is complete.
            </div>
          ) : null}
          <Verdict
            rating={explainer.rating}
            bottomLine={explainer.bottomLine}
            retracted={explainer.retracted}
          />
          <p className="meta">
            Published <Moment at={explainer.firstPublishedAt} timeZone={timeZone} />
            {explainer.modifiedAt ? (
              <>
                ; last updated <Moment at={explainer.modifiedAt} timeZone={timeZone} />
              </>
            ) : null}
            {' · '}
            By the science desk of {site.organisation}
          </p>
        </header>
        {notes.length > 0 ? <UpdateNotes notes={notes} timeZone={timeZone} /> : null}
        <ClaimSection explainer={explainer} />
        <div className="body" dangerouslySetInnerHTML={{ __html: html }} />
        {unplaced.length > 0 ? (
          <section aria-labelledby="workings-title">
            <h2 id="workings-title">The workings behind this explainer</h2>
            {unplaced.map((working) => (
              <WorkingView key={working.id} working={working} id={workingElementId(working.id)} />
            ))}
          </section>
        ) : null}
        {explainer.sources.length > 0 ? (
          <section className="sources" aria-labelledby="sources-title">
            <h2 id="sources-title">Sources</h2>
            <ol>
              {[...explainer.sources]
                .sort((a, b) => a.number - b.number)
                .map((source) => (
                  <Source key={source.id} source={source} />
                ))}
            </ol>
          </section>
        ) : null}
        <PublicationHistory explainer={explainer} timeZone={timeZone} />
        <Subscribe explainer={explainer} subscription={subscription} />
      </article>
    </Page>
  );
}

/**
 * A published explainer as a complete HTML document: the verdict first, then any update
 * notes, the claim with where it appeared, the body with its workings, the sources, the
 * versions and the subscription form. No script runs on it.
 */
export function renderExplainerPage(input: ExplainerPageInput): string {
  return renderDocument(<ExplainerPage {...input} />);
}
