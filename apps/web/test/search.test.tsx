import type { Highlight, SearchHit, SearchResponse } from '@skyledger/contracts';
import { screen, waitFor, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { apiError, mockApi, type MockReply, type RecordedRequest } from './api-mock';
import { sessionFor } from './fixtures';
import { renderApp } from './render-app';

const signedInAs = (role: 'desk_chief' | 'reporter') => ({
  'POST /api/auth/refresh': { status: 200, body: sessionFor(role) },
});

/** `'Global |warming| stopped'`: every other piece between bars is a matched word. */
function runs(marked: string): Highlight {
  return marked
    .split('|')
    .map((text, index) => ({ text, match: index % 2 === 1 }))
    .filter((run) => run.text !== '');
}

// The invented Marrowby Gazette desk: two phrasings of one recurring claim and a source.
const hits: SearchHit[] = [
  {
    type: 'claim',
    id: '3b0d6c52-4f3e-4d7a-9a51-2c0000000001',
    title: runs('Global |warming| stopped in |2016|'),
    snippet: runs('|Warming| stopped in |2016|. Nine years, no new record worth the name.'),
    status: 'in_research',
    topics: ['temperature-record', 'trends'],
    rating: null,
    date: '2026-11-19T09:12:00.000Z',
    score: 9.2,
  },
  {
    type: 'claim',
    id: '3b0d6c52-4f3e-4d7a-9a51-2c0000000002',
    title: runs('|Warming| has paused since |2016|, says a reshared podcast clip'),
    snippet: null,
    status: 'set_aside',
    topics: ['temperature-record', 'trends'],
    rating: null,
    date: '2026-11-21T19:02:00.000Z',
    score: 7.5,
  },
  {
    type: 'source',
    id: '3b0d6c52-4f3e-4d7a-9a51-2c00000000a1',
    title: runs('Marrowby station record: |warming| through |2016| and after'),
    snippet: runs('Marrowby Weather Society'),
    status: null,
    topics: [],
    rating: null,
    date: '2026-11-20T10:00:00.000Z',
    score: 4.1,
  },
];

function count(values: (string | null)[]): Record<string, number> {
  const counts: Record<string, number> = {};
  for (const value of values) if (value) counts[value] = (counts[value] ?? 0) + 1;
  return counts;
}

/** A fake of the search endpoint that applies the type and status filters as the API does. */
function searchReply(request: RecordedRequest, items = hits): MockReply {
  const type = request.search.get('type');
  const status = request.search.get('status');
  const found = items.filter(
    (hit) => (!type || hit.type === type) && (!status || hit.status === status),
  );
  const body: SearchResponse = {
    items: found,
    total: found.length,
    page: Number(request.search.get('page') ?? 1),
    pageSize: 20,
    facets: {
      type: count(found.map((hit) => hit.type)),
      status: count(found.map((hit) => hit.status)),
      topics: count(found.flatMap((hit) => hit.topics)),
    },
  };
  return { status: 200, body };
}

function resultList() {
  return screen.getByRole('list', { name: /^Results for/ });
}

describe('search page', () => {
  it("sends the URL's filters to the API, and a chosen facet changes the URL and the request", async () => {
    const fake = mockApi({ ...signedInAs('reporter'), 'GET /api/search': searchReply });
    const { user, location } = renderApp(
      '/search?q=warming+2016&type=claim&from=2026-11-01&to=2026-11-30',
    );

    await screen.findByText('2 results for “warming 2016”');
    expect(fake.calls('GET /api/search')[0]?.search.toString()).toBe(
      'q=warming+2016&type=claim&from=2026-11-01&to=2026-11-30',
    );
    expect(screen.getByLabelText('Search for')).toHaveValue('warming 2016');
    expect(screen.getByLabelText('From')).toHaveValue('2026-11-01');
    expect(screen.getByLabelText('To')).toHaveValue('2026-11-30');
    expect(screen.getByRole('button', { name: /^Claims 2/ })).toHaveAttribute(
      'aria-pressed',
      'true',
    );
    expect(within(resultList()).getAllByRole('listitem')).toHaveLength(2);

    await user.click(screen.getByRole('button', { name: /^Set aside 1/ }));

    await screen.findByText('1 result for “warming 2016”');
    expect(location()).toBe(
      '/search?q=warming+2016&type=claim&status=set_aside&from=2026-11-01&to=2026-11-30',
    );
    expect(fake.calls('GET /api/search').at(-1)?.search.get('status')).toBe('set_aside');
    const [only] = within(resultList()).getAllByRole('listitem');
    expect(only).toHaveTextContent('Warming has paused since 2016');
    expect(only).toHaveTextContent('Set aside');

    // Pressing the chosen facet again lets it go.
    await user.click(screen.getByRole('button', { name: /^Set aside 1/, pressed: true }));
    await screen.findByText('2 results for “warming 2016”');
    expect(location()).toBe('/search?q=warming+2016&type=claim&from=2026-11-01&to=2026-11-30');
  });

  it('marks the matched words with <mark>, as text and never as HTML', async () => {
    const withMarkup: SearchHit = {
      ...hits[0]!,
      id: '3b0d6c52-4f3e-4d7a-9a51-2c0000000009',
      title: runs('A |<b>warming</b>| trick'),
      snippet: null,
    };
    mockApi({
      ...signedInAs('reporter'),
      'GET /api/search': (request) => searchReply(request, [...hits, withMarkup]),
    });
    renderApp('/search?q=warming+2016');

    const link = await screen.findByRole('link', { name: 'Global warming stopped in 2016' });
    expect(link).toHaveAttribute('href', '/claims/3b0d6c52-4f3e-4d7a-9a51-2c0000000001');
    expect([...link.querySelectorAll('mark')].map((mark) => mark.textContent)).toEqual([
      'warming',
      '2016',
    ]);
    const item = link.closest('li')!;
    expect([...item.querySelectorAll('p mark')].map((mark) => mark.textContent)).toEqual([
      'Warming',
      '2016',
    ]);

    const markup = screen.getByRole('link', { name: 'A <b>warming</b> trick' });
    expect(markup.querySelector('b')).toBeNull();
    expect(markup.querySelector('mark')?.textContent).toBe('<b>warming</b>');
  });

  it('shows sources by title and kind, without a link', async () => {
    mockApi({ ...signedInAs('reporter'), 'GET /api/search': searchReply });
    renderApp('/search?q=warming+2016&type=source');

    const heading = await screen.findByRole('heading', {
      level: 3,
      name: 'Marrowby station record: warming through 2016 and after',
    });
    expect(within(heading).queryByRole('link')).toBeNull();
    const item = within(heading.closest('li')!);
    expect(item.getByText('Source')).toBeInTheDocument();
    expect(item.getByText(/^Added/)).toHaveTextContent('Added 20 Nov 2026');
  });

  it('keeps the facets when new words are searched, and starts again from page 1', async () => {
    const fake = mockApi({ ...signedInAs('reporter'), 'GET /api/search': searchReply });
    const { user, location } = renderApp('/search?q=warming&status=in_research&page=2');

    await screen.findByText('1 result for “warming”');
    const box = screen.getByLabelText('Search for');
    await user.clear(box);
    await user.type(box, 'warming 2016{Enter}');

    await waitFor(() => expect(location()).toBe('/search?q=warming+2016&status=in_research'));
    expect(fake.calls('GET /api/search').at(-1)?.search.toString()).toBe(
      'q=warming+2016&status=in_research',
    );
  });

  it('pages through many results', async () => {
    const many = Array.from({ length: 45 }, (_, index) => ({
      ...hits[0]!,
      id: `3b0d6c52-4f3e-4d7a-9a51-2c00000001${String(index).padStart(2, '0')}`,
    }));
    const fake = mockApi({
      ...signedInAs('reporter'),
      'GET /api/search': (request) => {
        const reply = searchReply(request, many);
        const body = reply.body as SearchResponse;
        const page = body.page;
        return { status: 200, body: { ...body, items: many.slice((page - 1) * 20, page * 20) } };
      },
    });
    const { user, location } = renderApp('/search?q=warming');

    const pages = await screen.findByRole('navigation', { name: 'Pages of the results' });
    expect(pages).toHaveTextContent('Results 1–20 of 45, page 1 of 3');
    expect(within(pages).getByRole('button', { name: 'Previous page' })).toBeDisabled();

    await user.click(within(pages).getByRole('button', { name: 'Next page' }));

    await waitFor(() => expect(pages).toHaveTextContent('Results 21–40 of 45, page 2 of 3'));
    expect(location()).toBe('/search?q=warming&page=2');
    expect(fake.calls('GET /api/search').at(-1)?.search.get('page')).toBe('2');
    expect(screen.getByRole('heading', { level: 2, name: 'Results' })).toHaveFocus();
  });

  it('says when nothing is found, and offers to clear the filters', async () => {
    const fake = mockApi({ ...signedInAs('reporter'), 'GET /api/search': searchReply });
    const { user, location } = renderApp('/search?q=warming&type=explainer');

    expect(
      await screen.findByRole('heading', { name: 'Nothing found for “warming”' }),
    ).toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Clear the filters' }));

    await screen.findByText('3 results for “warming”');
    expect(location()).toBe('/search?q=warming');
    expect(fake.calls('GET /api/search').at(-1)?.search.toString()).toBe('q=warming');
  });

  it('says when the search failed, and tries again', async () => {
    const fake = mockApi({
      ...signedInAs('reporter'),
      'GET /api/search': { status: 500, body: { statusCode: 500, error: 'x', message: 'x' } },
    });
    const { user } = renderApp('/search?q=warming');

    expect(await screen.findByText('The search failed.')).toBeInTheDocument();
    expect(
      screen.getByText('The desk server ran into a problem. Try again in a moment.'),
    ).toBeInTheDocument();
    fake.use({ 'GET /api/search': searchReply });
    await user.click(screen.getByRole('button', { name: 'Try again' }));

    expect(await screen.findByText('3 results for “warming”')).toBeInTheDocument();
  });

  it('checks the dates and the words before searching', async () => {
    const fake = mockApi({ ...signedInAs('reporter'), 'GET /api/search': searchReply });
    const { user, location } = renderApp('/search');

    expect(await screen.findByRole('heading', { level: 1, name: 'Search' })).toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Search' }));
    expect(await screen.findByText('Type something to search for')).toBeInTheDocument();

    await user.type(screen.getByLabelText('Search for'), 'warming');
    await user.type(screen.getByLabelText('From'), '2026-11-20');
    await user.type(screen.getByLabelText('To'), '2026-11-01');
    await user.click(screen.getByRole('button', { name: 'Search' }));
    expect(screen.getByLabelText('To')).toHaveAccessibleDescription(
      /The end of the range must not be before its start/,
    );
    expect(fake.calls('GET /api/search')).toHaveLength(0);
    expect(location()).toBe('/search');
  });

  it('offers a reporter no index rebuild', async () => {
    mockApi({ ...signedInAs('reporter'), 'GET /api/search': searchReply });
    renderApp('/search?q=warming');

    await screen.findByText('3 results for “warming”');
    expect(screen.queryByRole('button', { name: 'Rebuild the index' })).toBeNull();
  });

  it('lets a desk chief rebuild the index, busy until it is done, then says what it did', async () => {
    let finish: (reply: MockReply) => void = () => {};
    const fake = mockApi({
      ...signedInAs('desk_chief'),
      'GET /api/search': searchReply,
      'POST /api/search/reindex': () => new Promise<MockReply>((resolve) => (finish = resolve)),
    });
    const { user } = renderApp('/search?q=warming');
    await screen.findByText('3 results for “warming”');
    const searches = fake.calls('GET /api/search').length;

    await user.click(screen.getByRole('button', { name: 'Rebuild the index' }));
    await waitFor(() =>
      expect(screen.getByRole('button', { name: 'Rebuild the index' })).toBeDisabled(),
    );
    finish({ status: 200, body: { documents: 12483, milliseconds: 1840 } });

    expect(
      await screen.findByText('The index is rebuilt: 12,483 documents in 1.8 s.'),
    ).toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Rebuild the index' })).toBeEnabled();
    expect(fake.calls('POST /api/search/reindex')).toHaveLength(1);
    // The results on screen are asked again from the rebuilt index.
    await waitFor(() => expect(fake.calls('GET /api/search').length).toBe(searches + 1));
  });

  it('says why a rebuild failed', async () => {
    mockApi({
      ...signedInAs('desk_chief'),
      'POST /api/search/reindex': apiError(403, 'Only a desk chief may do this'),
    });
    const { user } = renderApp('/search');

    await user.click(await screen.findByRole('button', { name: 'Rebuild the index' }));
    expect(await screen.findByText("You don't have access to this.")).toBeInTheDocument();
  });
});
