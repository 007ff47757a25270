import { type ReaderExplainerSummary, type ReaderSite } from '@skyledger/contracts';
import { Feed } from 'feed';

/**
 * The Atom feed of published explainers (RFC 4287). An entry's `updated` is its first
 * publication, or its latest update note: it changes only when a note is published.
 */
export function explainersAtomFeed(site: ReaderSite, items: ReaderExplainerSummary[]): string {
  const updatedOf = (item: ReaderExplainerSummary) =>
    new Date(item.modifiedAt ?? item.firstPublishedAt);
  const newest = items.reduce<Date>(
    (latest, item) => (updatedOf(item) > latest ? updatedOf(item) : latest),
    new Date(0),
  );
  const feed = new Feed({
    id: `${site.origin}/explainers`,
    link: `${site.origin}/explainers`,
    title: site.name,
    description: 'Explainers on climate claims: what the evidence shows, and how it was checked.',
    language: 'en',
    updated: newest,
    copyright: `${site.organisation}`,
    feedLinks: { atom: `${site.origin}/feeds/explainers.atom` },
    author: { name: site.organisation, link: site.origin },
  });
  for (const item of items) {
    const verdict = item.retracted ? 'Retracted' : (item.rating?.label ?? 'Checked');
    feed.addItem({
      id: item.url,
      link: item.url,
      title: `${verdict}: ${item.summary}`,
      description: item.bottomLine,
      date: updatedOf(item),
      published: new Date(item.firstPublishedAt),
      author: [{ name: site.organisation }],
      category: item.topics.map((topic) => ({ name: topic })),
    });
  }
  return feed.atom1();
}
