import { documentId, type SearchDocument } from '../../src/search/search-document';

/** A claim as the search index holds it, for engine and indexing tests. */
export function claimDocument(
  id: string,
  fields: Partial<SearchDocument> & Pick<SearchDocument, 'title' | 'text'>,
): SearchDocument {
  return {
    id: documentId('claim', id),
    type: 'claim',
    entityId: id,
    claimant: 'Marrowby Weather Watchers',
    topics: '',
    topicList: [],
    authors: '',
    publisher: '',
    body: '',
    status: 'in_research',
    rating: null,
    date: Date.parse('2026-11-01T00:00:00Z'),
    audience: 'desk',
    ...fields,
    ...(fields.topicList ? { topics: fields.topicList.join(' ') } : {}),
  };
}
