import { type ReaderCorrection, type ReaderSite } from '@skyledger/contracts';
import { siteTimeZone } from './format.js';
import { Page, readerPaths, renderDocument } from './page.js';
import { Moment } from './rating.js';

export interface CorrectionsPageInput {
  site: ReaderSite;
  items: readonly ReaderCorrection[];
}

function CorrectionsPage({ site, items }: CorrectionsPageInput) {
  const timeZone = siteTimeZone(site);
  const sorted = [...items].sort((a, b) => Date.parse(b.note.at) - Date.parse(a.note.at));
  return (
    <Page
      site={site}
      title="Corrections and updates"
      description={`Every correction, clarification, update, rating change and retraction of ${site.name}'s explainers, newest first.`}
      section="corrections"
    >
      <h1>Corrections and updates</h1>
      <p>
        Every change we make to a published explainer is listed here, newest first, and shown at the
        top of the explainer itself. Nothing we publish is deleted: each earlier version stays
        readable. <a href={`${readerPaths.methodology}#corrections`}>Our corrections policy</a>.
      </p>
      {sorted.length === 0 ? (
        <p>We have not changed any published explainer yet.</p>
      ) : (
        <ol className="items">
          {sorted.map((item, index) => (
            <li key={index}>
              <p>
                <strong>{item.note.kindLabel}</strong>,{' '}
                <Moment at={item.note.at} timeZone={timeZone} />
                {' · '}
                <a href={item.url}>{item.summary}</a>
              </p>
              <p>{item.note.text}</p>
              <p className="meta">
                <a href={item.note.url}>
                  Version {item.note.sequence}, as published with this note
                </a>
              </p>
            </li>
          ))}
        </ol>
      )}
    </Page>
  );
}

/** Every update note across the explainers, newest first, each linked to its explainer. */
export function renderCorrectionsPage(input: CorrectionsPageInput): string {
  return renderDocument(<CorrectionsPage {...input} />);
}
