import type { SimilarClaim } from '@skyledger/contracts';
import { QueryClient } from '@tanstack/react-query';
import { act, render, screen, waitFor, within } from '@testing-library/react';
import { MemoryRouter } from 'react-router-dom';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { AppProvider } from '@/app/provider';
import { SimilarClaimsPanel } from '@/features/search/components/similar-claims-panel';
import { queryConfig } from '@/lib/query-client';
import { mockApi, type MockReply, type RecordedRequest } from './api-mock';
import { ratingLevels } from './verdict-fixtures';

// The invented Marrowby Gazette desk has met this claim twice already.
const similar: SimilarClaim[] = [
  {
    id: '3b0d6c52-4f3e-4d7a-9a51-2c0000000001',
    summary: 'Global warming stopped in 2016',
    status: 'in_research',
    claimantName: 'The Long Weather podcast',
    filedAt: '2026-11-19T09:12:00.000Z',
    rating: null,
    explainerUrl: null,
    score: 11.4,
  },
  {
    id: '3b0d6c52-4f3e-4d7a-9a51-2c0000000002',
    summary: 'Warming has paused since 2016, says a reshared podcast clip',
    status: 'set_aside',
    claimantName: 'The Long Weather podcast',
    filedAt: '2026-11-21T19:02:00.000Z',
    rating: null,
    explainerUrl: null,
    score: 8.9,
  },
];

function renderPanel(text: string) {
  const queryClient = new QueryClient({
    defaultOptions: { queries: { ...queryConfig.queries, retry: false } },
  });
  const panel = (typed: string) => (
    <AppProvider queryClient={queryClient}>
      <MemoryRouter>
        <SimilarClaimsPanel text={typed} />
      </MemoryRouter>
    </AppProvider>
  );
  const view = render(panel(text));
  return { type: (typed: string) => view.rerender(panel(typed)) };
}

/** Lets the fake clock run, and React and TanStack Query catch up with it. */
const wait = (ms: number) => act(() => vi.advanceTimersByTimeAsync(ms));

/**
 * Past the pause that matters, the clock runs freely so the fake API's reply can arrive;
 * what was already due on the fake clock (TanStack Query's batched updates) runs first.
 */
async function realTime() {
  await act(() => vi.runOnlyPendingTimersAsync());
  vi.useRealTimers();
}

/** A reply that waits until the test sends it, and fails as fetch does when aborted. */
function heldReply() {
  let send: (reply: MockReply) => void = () => {};
  const handler = (request: RecordedRequest) =>
    new Promise<MockReply>((resolve, reject) => {
      send = resolve;
      request.signal?.addEventListener('abort', () =>
        reject(new DOMException('The request was aborted', 'AbortError')),
      );
    });
  return { handler, send: (reply: MockReply) => send(reply) };
}

describe('similar claims panel', () => {
  beforeEach(() => {
    vi.useFakeTimers({ toFake: ['setTimeout', 'clearTimeout', 'Date'] });
  });
  afterEach(() => {
    vi.useRealTimers();
  });

  it('asks nothing below 12 characters', async () => {
    const fake = mockApi({ 'GET /api/claims/similar': { status: 200, body: similar } });
    const { type } = renderPanel('Warming');
    type('Warming sto');
    type('   Warming sto   ');
    await wait(1000);

    expect(fake.calls('GET /api/claims/similar')).toHaveLength(0);
    expect(screen.getByRole('status')).toHaveTextContent(/^$/);
  });

  it('waits for a 300 ms pause in typing, then asks once for the text as it stands', async () => {
    const fake = mockApi({ 'GET /api/claims/similar': { status: 200, body: similar } });
    const { type } = renderPanel('');
    type('Warming stop');
    await wait(200);
    type('Warming stopp');
    await wait(200);
    type('Warming stopped');
    await wait(299);
    expect(fake.calls('GET /api/claims/similar')).toHaveLength(0);

    await wait(1);
    const calls = fake.calls('GET /api/claims/similar');
    expect(calls.map((call) => call.search.get('text'))).toEqual(['Warming stopped']);
  });

  it('cancels the request for text that has moved on, and lists what the last one found', async () => {
    const first = heldReply();
    const second = heldReply();
    const fake = mockApi({ 'GET /api/claims/similar': first.handler });
    const { type } = renderPanel('');
    type('Warming stopped');
    await wait(300);
    const [stale] = fake.calls('GET /api/claims/similar');
    expect(stale?.signal?.aborted).toBe(false);
    expect(screen.getByRole('status')).toHaveTextContent('Looking for similar claims…');

    fake.use({ 'GET /api/claims/similar': second.handler });
    type('Warming stopped in 2016');
    await wait(300);

    const calls = fake.calls('GET /api/claims/similar');
    expect(calls.map((call) => call.search.get('text'))).toEqual([
      'Warming stopped',
      'Warming stopped in 2016',
    ]);
    expect(stale?.signal?.aborted).toBe(true);
    expect(calls[1]?.signal?.aborted).toBe(false);

    second.send({ status: 200, body: similar });
    await realTime();

    await waitFor(() =>
      expect(screen.getByRole('status')).toHaveTextContent('2 similar claims on the desk.'),
    );
    const region = screen.getByRole('region', { name: 'Already on the desk?' });
    const items = within(region).getAllByRole('listitem');
    expect(items).toHaveLength(2);
    const link = within(items[1]!).getByRole('link', {
      name: 'Warming has paused since 2016, says a reshared podcast clip (opens in a new tab)',
    });
    expect(link).toHaveAttribute('href', '/claims/3b0d6c52-4f3e-4d7a-9a51-2c0000000002');
    expect(link).toHaveAttribute('target', '_blank');
    expect(items[1]).toHaveTextContent('Set aside');
    expect(items[1]).toHaveTextContent('The Long Weather podcast · filed 21 Nov 2026');
  });

  it('hides the list at once when the text is cut below 12 characters', async () => {
    mockApi({ 'GET /api/claims/similar': { status: 200, body: similar } });
    const { type } = renderPanel('');
    type('Warming stopped in 2016');
    await wait(300);
    await realTime();
    expect(await screen.findAllByRole('listitem')).toHaveLength(2);

    type('Warming');

    expect(screen.queryByRole('listitem')).toBeNull();
    expect(screen.getByRole('status')).toHaveTextContent(/^$/);
  });

  it('gives a published claim its rating in words and a link to its explainer', async () => {
    const published: SimilarClaim = {
      ...similar[0]!,
      status: 'published',
      rating: 'contradicted',
      explainerUrl: 'https://gazette.marrowby.test/explainers/global-warming-stopped-in-2016',
    };
    mockApi({
      'GET /api/claims/similar': { status: 200, body: [published, similar[1]!] },
      'GET /api/rating-levels': { status: 200, body: ratingLevels },
    });
    const { type } = renderPanel('');
    type('Warming stopped in 2016');
    await wait(300);
    await realTime();

    const [first, second] = await screen.findAllByRole('listitem');
    await waitFor(() => expect(first).toHaveTextContent('Rated 5 · Contradicted by evidence'));
    const explainer = within(first!).getByRole('link', {
      name: 'Read the explainer (opens in a new tab)',
    });
    expect(explainer).toHaveAttribute('href', published.explainerUrl);
    expect(explainer).toHaveAttribute('target', '_blank');
    expect(second).not.toHaveTextContent('Rated');
    expect(within(second!).queryByRole('link', { name: /Read the explainer/ })).toBeNull();
  });

  it('says when nothing similar is on the desk', async () => {
    mockApi({ 'GET /api/claims/similar': { status: 200, body: [] } });
    const { type } = renderPanel('');
    type('Sea ice in the Marrow estuary never froze before 1990');
    await wait(300);
    await realTime();

    expect(await screen.findByText('No similar claims on the desk.')).toHaveRole('status');
    expect(screen.queryByRole('region', { name: 'Already on the desk?' })).toBeNull();
  });
});
