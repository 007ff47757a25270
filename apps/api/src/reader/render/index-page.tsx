import {
  type ReaderExplainerSummary,
  type ReaderRating,
  type ReaderSite,
} from '@skyledger/contracts';
import { ratingPosition, siteTimeZone } from './format.js';
import { Page, pathWithQuery, readerPaths, renderDocument } from './page.js';
import { Moment } from './rating.js';

export interface IndexQuery {
  q?: string;
  topic?: string;
  /** A rating level's id. */
  rating?: string;
}

export interface IndexPageInput {
  site: ReaderSite;
  /** This page of the published explainers, newest first. */
  items: readonly ReaderExplainerSummary[];
  query: IndexQuery;
  /** How many explainers match in all. */
  total: number;
  /** 1-based. */
  page: number;
  pageSize: number;
  /** Topics to filter by. */
  topics: readonly string[];
  /** Rating levels to filter by, in scale order. */
  ratings: readonly ReaderRating[];
}

function Item({ item, timeZone }: { item: ReaderExplainerSummary; timeZone: string }) {
  const position = item.rating ? ratingPosition(item.rating) : null;
  return (
    <li>
      <h2>
        <a href={item.url}>{item.summary}</a>
      </h2>
      <p className="rating">
        <strong>{item.rating ? item.rating.label : 'Not rated'}</strong>
        {item.rating ? (
          <>
            {' · '}
            <span className="nowrap">{position ?? 'not a rating'}</span>
          </>
        ) : null}
        {item.retracted ? (
          <>
            {' '}
            <span className="tag tag-alert">Retracted</span>
          </>
        ) : null}
        {item.modifiedAt ? (
          <>
            {' '}
            <span className="tag">Updated</span>
          </>
        ) : null}
      </p>
      <p>{item.bottomLine}</p>
      <p className="meta">
        Claim by {item.claimantDisplayName} · Published{' '}
        <Moment at={item.firstPublishedAt} timeZone={timeZone} day />
        {item.modifiedAt ? (
          <>
            {' '}
            · updated <Moment at={item.modifiedAt} timeZone={timeZone} day />
          </>
        ) : null}
      </p>
    </li>
  );
}

/** A filter of the index: "any" first, then each value, the one in the query selected. */
function FilterSelect({
  name,
  label,
  value,
  anyLabel,
  options,
}: {
  name: string;
  label: string;
  value: string | undefined;
  anyLabel: string;
  options: Array<{ value: string; label: string }>;
}) {
  return (
    <div className="field">
      <label htmlFor={`filter-${name}`}>{label}</label>
      <select id={`filter-${name}`} name={name} defaultValue={value ?? ''}>
        <option value="">{anyLabel}</option>
        {options.map((option) => (
          <option key={option.value} value={option.value}>
            {option.label}
          </option>
        ))}
      </select>
    </div>
  );
}

function Filters({ query, topics, ratings }: Pick<IndexPageInput, 'query' | 'topics' | 'ratings'>) {
  return (
    <form
      className="filters"
      method="get"
      action={readerPaths.explainers}
      role="search"
      aria-label="Explainers"
    >
      <div className="field field-wide">
        <label htmlFor="filter-q">Search the explainers</label>
        <input id="filter-q" name="q" type="search" defaultValue={query.q ?? ''} maxLength={200} />
      </div>
      <FilterSelect
        name="topic"
        label="Topic"
        value={query.topic}
        anyLabel="All topics"
        options={topics.map((topic) => ({ value: topic, label: topic }))}
      />
      <FilterSelect
        name="rating"
        label="Rating"
        value={query.rating}
        anyLabel="Any rating"
        options={ratings.map((rating) => ({
          value: rating.id,
          label: rating.number === null ? rating.label : `${rating.number}: ${rating.label}`,
        }))}
      />
      <button type="submit">Search</button>
    </form>
  );
}

function Paging({ query, page, pages }: { query: IndexQuery; page: number; pages: number }) {
  if (pages <= 1) return null;
  const href = (target: number) =>
    pathWithQuery(readerPaths.explainers, { ...query, page: target === 1 ? undefined : target });
  return (
    <nav className="pages" aria-label="Pages of explainers">
      {page > 1 ? (
        <a href={href(page - 1)} rel="prev">
          Newer explainers
        </a>
      ) : null}
      <span>
        Page {page} of {pages}
      </span>
      {page < pages ? (
        <a href={href(page + 1)} rel="next">
          Older explainers
        </a>
      ) : null}
    </nav>
  );
}

function IndexPage({ site, items, query, total, page, pageSize, topics, ratings }: IndexPageInput) {
  const pages = Math.max(1, Math.ceil(total / pageSize));
  const first = (page - 1) * pageSize + 1;
  const filtered = Boolean(query.q || query.topic || query.rating);
  const ratingLabel = ratings.find((rating) => rating.id === query.rating)?.label;
  const scale = ratings.find((rating) => rating.isRating);
  const describe = [
    query.q ? `matching “${query.q}”` : null,
    query.topic ? `on ${query.topic}` : null,
    ratingLabel ? `rated ${ratingLabel}` : null,
  ]
    .filter(Boolean)
    .join(', ');
  return (
    <Page
      site={site}
      title={filtered ? 'Search the explainers' : 'Explainers'}
      description={`Climate claims checked by the science desk of ${site.organisation}, newest first.`}
      section="explainers"
    >
      <h1>Climate claims we have checked</h1>
      <p>
        Newest first. Each explainer gives our rating, the evidence behind it and the working that
        tests the claim
        {scale
          ? `; ratings run from ${scale.bestRating}, the evidence supports the claim, to ${scale.worstRating}, the evidence contradicts it`
          : ''}
        . <a href={readerPaths.methodology}>How we check claims</a>.
      </p>
      <Filters query={query} topics={topics} ratings={ratings} />
      <p className="meta">
        {total === 0
          ? `No explainers${describe ? ` ${describe}` : ''}.`
          : `${first}–${first + items.length - 1} of ${total} explainers${describe ? ` ${describe}` : ''}, newest first.`}
        {filtered ? (
          <>
            {' '}
            <a href={readerPaths.explainers}>Clear the search and filters</a>
          </>
        ) : null}
      </p>
      {items.length > 0 ? (
        <ol className="items">
          {items.map((item) => (
            <Item key={item.slug} item={item} timeZone={siteTimeZone(site)} />
          ))}
        </ol>
      ) : (
        <p>Try other words or fewer filters.</p>
      )}
      <Paging query={query} page={page} pages={pages} />
    </Page>
  );
}

/** The index of published explainers: search and filters as a GET form, pages as links. */
export function renderIndexPage(input: IndexPageInput): string {
  return renderDocument(<IndexPage {...input} />);
}
