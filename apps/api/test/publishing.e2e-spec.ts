import { type PublicationView, type SearchResponse } from '@skyledger/contracts';
import { XMLParser } from 'fast-xml-parser';
import { Claim } from '../src/claims/entities/claim.entity';
import { OutboxWorker } from '../src/mail/outbox.worker';
import { PublishingService } from '../src/publishing/publishing.service';
import { ReaderSubscriptionsService } from '../src/publishing/reader-subscriptions.service';
import { explainersAtomFeed } from '../src/reader/atom-feed';
import { claimReviewJsonLd, shareMeta } from '../src/reader/claim-review';
import { ReaderService } from '../src/reader/reader.service';
import { SearchService } from '../src/search/search.service';
import { DeskFlow } from './support/desk-flow';
import { createTestApp, type TestApp } from './support/test-app';

describe('publishing: now or embargoed, corrections in the open, reader subscriptions', () => {
  let t: TestApp;
  let desk: DeskFlow;
  const reader = () => t.app.get(ReaderService);
  const detail = (claimId: string) => desk.detail(claimId);
  const move = (...args: Parameters<DeskFlow['move']>) => desk.move(...args);
  const publish = (...args: Parameters<DeskFlow['publish']>) => desk.publish(...args);
  const clearVerdict = (...args: Parameters<DeskFlow['clearVerdict']>) =>
    desk.clearVerdict(...args);
  const clearedClaim = (...args: Parameters<DeskFlow['clearedClaim']>) =>
    desk.clearedClaim(...args);

  beforeAll(async () => {
    t = await createTestApp('publishing', {
      PUBLISHER_ENABLED: 'false',
      OUTBOX_WORKER_ENABLED: 'false',
    });
    desk = await DeskFlow.start(t, 'publishing.test');
  });
  afterAll(() => t.close());

  it('publishes a cleared claim now, at a stable slug, with everything the page needs', async () => {
    const claim = await clearedClaim('The core heats the planet, said a caller');
    expect((await publish(claim.id, 'editor')).status).toBe(403);
    const published = await publish(claim.id, 'copy');
    expect(published.status).toBe(201);
    const [publication] = published.body as PublicationView[];
    expect(publication).toMatchObject({
      sequence: 1,
      state: 'published',
      note: null,
      versionNumber: 1,
    });
    const after = await detail(claim.id);
    expect(after.status).toBe('published');

    const slug = 'the-core-heats-the-planet-said-a-caller';
    const explainer = (await reader().explainer(slug))!;
    expect(explainer).toMatchObject({
      slug,
      url: `http://127.0.0.1:3000/explainers/${slug}`,
      sequence: 1,
      isLatest: true,
      claim: { text: claim.text, summary: claim.summary },
      claimant: { displayName: claim.claimant.name },
      rating: {
        id: 'contradicted',
        number: 1,
        label: 'Contradicted by evidence',
        bestRating: 5,
        worstRating: 1,
      },
      modifiedAt: null,
      updateNotes: [],
      retracted: false,
    });
    expect(explainer.bodyHtml).toContain('The interior gives off about 47 TW.');
    expect(explainer.sources[0]).toMatchObject({
      number: 1,
      doi: '10.1029/93RG01249',
      gradeLabel: 'Strong',
    });
    expect(explainer.workings[0]).toMatchObject({ calculatorId: 'heat-flux-compare' });
    expect(
      explainer.workings[0]!.inputs.find((input) => input.name === 'globalPower'),
    ).toMatchObject({
      value: '47 TW',
      source: expect.stringContaining('Davies'),
    });
    expect(explainer.appearances).toEqual([
      expect.objectContaining({
        outlet: 'Radio Marrowby phone-in',
        isFirstKnown: true,
        captureUrl: null,
      }),
    ]);

    const jsonLd = claimReviewJsonLd(reader().site(), explainer);
    expect(jsonLd).toMatchObject({
      '@context': 'https://schema.org',
      '@type': 'ClaimReview',
      url: explainer.url,
      claimReviewed: claim.text,
      datePublished: explainer.firstPublishedAt,
      author: { '@type': 'Organization' },
      reviewRating: {
        '@type': 'Rating',
        ratingValue: 1,
        bestRating: 5,
        worstRating: 1,
        alternateName: 'Contradicted by evidence',
      },
      itemReviewed: {
        '@type': 'Claim',
        author: { '@type': 'Person', name: claim.claimant.name },
        datePublished: '2026-11-20T18:30:00.000Z',
        firstAppearance: {
          '@type': 'CreativeWork',
          url: 'https://radio.marrowby.test/phone-in/2026-11-20',
        },
        appearance: [
          expect.objectContaining({ url: 'https://radio.marrowby.test/phone-in/2026-11-20' }),
        ],
      },
    });
    expect(jsonLd).not.toHaveProperty('dateModified');
    expect(shareMeta(explainer).title).toBe(
      'Contradicted by evidence: The core heats the planet, said a caller',
    );

    const list = await reader().list({});
    expect(list.items.map((item) => item.slug)).toContain(slug);
    const search = await t.app.get(SearchService).reader({ q: 'core heats planet' });
    expect(search.items.map((hit: SearchResponse['items'][number]) => hit.id)).toEqual([claim.id]);
  });

  it('keeps an embargoed explainer out of pages, lists, feeds and search until its instant', async () => {
    const claim = await clearedClaim('Undersea volcanoes warm the oceans');
    const soon = await publish(claim.id, 'chief', {
      at: new Date(Date.now() + 5_000).toISOString(),
      timeZone: 'Europe/London',
    });
    expect(soon.status).toBe(422);
    expect(soon.body.fields).toEqual({ at: 'notInFuture' });
    const noZone = await publish(claim.id, 'chief', {
      at: new Date(Date.now() + 3_600_000).toISOString(),
    });
    expect(noZone.body.fields).toEqual({ timeZone: 'required' });

    const at = new Date(Date.now() + 3_600_000);
    const scheduled = await publish(claim.id, 'chief', {
      at: at.toISOString(),
      timeZone: 'Europe/London',
    });
    expect(scheduled.status).toBe(201);
    expect(scheduled.body[0]).toMatchObject({
      state: 'scheduled',
      scheduledFor: at.toISOString(),
      scheduledTimeZone: 'Europe/London',
      publishedAt: null,
    });
    expect((await detail(claim.id)).status).toBe('cleared');
    const again = await publish(claim.id, 'chief');
    expect(again.status).toBe(409);

    const publishing = t.app.get(PublishingService);
    expect(await publishing.publishDue(new Date())).toBe(0);
    const slug = 'undersea-volcanoes-warm-the-oceans';
    expect(await reader().explainer(slug)).toBeNull();
    expect((await reader().list({})).items.map((item) => item.slug)).not.toContain(slug);
    expect((await t.app.get(SearchService).reader({ q: 'undersea volcanoes' })).items).toEqual([]);

    // The embargo lifts: the scheduler's pass a second before the instant leaves it, the
    // pass right after publishes it.
    expect(await publishing.publishDue(new Date(at.getTime() - 1000))).toBe(0);
    expect(await reader().explainer(slug)).toBeNull();
    expect(await publishing.publishDue(new Date(at.getTime() + 1000))).toBe(1);
    expect((await detail(claim.id)).status).toBe('published');
    expect(await reader().explainer(slug)).not.toBeNull();
    expect((await reader().list({})).items.map((item) => item.slug)).toContain(slug);
    expect(
      (await t.app.get(SearchService).reader({ q: 'undersea volcanoes' })).items.map(
        (hit) => hit.id,
      ),
    ).toEqual([claim.id]);
    expect(await publishing.publishDue(new Date(at.getTime() + 2000))).toBe(0);
  });

  it('corrects in the open: a new version through sign-off, a dated note, dateModified, the feed and earlier versions kept', async () => {
    const claim = await clearedClaim('The planet’s core is heating the seas');
    const published = await publish(claim.id, 'copy');
    expect(published.status).toBe(201);
    // Typographic apostrophes drop out of the slug.
    const slug = 'the-planets-core-is-heating-the-seas';
    expect((published.body as PublicationView[])[0]!.url).toBe(
      `http://127.0.0.1:3000/explainers/${slug}/v/1`,
    );
    const first = (await reader().explainer(slug))!;

    // A reader subscribes and confirms from the mail.
    const subscriptions = t.app.get(ReaderSubscriptionsService);
    await subscriptions.subscribe(
      await t.dataSource.getRepository(Claim).findOneByOrFail({ id: claim.id }),
      first.claim.summary,
      'Reader@Example.test',
    );
    await t.app.get(OutboxWorker).runPass();
    const confirmMail = await t.mail.waitFor((mail) => mail.to.includes('reader@example.test'));
    const confirmToken = /token=([\w-]+)/.exec(confirmMail.text)![1]!;
    expect(await subscriptions.confirm('not-a-token')).toBe(false);
    expect(await subscriptions.confirm(confirmToken)).toBe(true);
    expect(await subscriptions.confirm(confirmToken)).toBe(false);

    await move(claim.id, 'editor', 'in_research');
    expect((await reader().explainer(slug))!.sequence).toBe(1);
    await clearVerdict(claim.id, {
      bottomLine:
        'Heat from the interior is about thirty times smaller than the greenhouse forcing; the figure for 1993 is corrected.',
    });
    const withoutNote = await publish(claim.id, 'copy');
    expect(withoutNote.status).toBe(422);
    expect(withoutNote.body.fields).toEqual({ note: 'required' });
    const corrected = await publish(claim.id, 'copy', {
      note: { kind: 'correction', text: 'We gave the wrong year for the heat-flow survey.' },
    });
    expect(corrected.status).toBe(201);

    const latest = (await reader().explainer(slug))!;
    expect(latest).toMatchObject({
      sequence: 2,
      isLatest: true,
      firstPublishedAt: first.firstPublishedAt,
    });
    expect(latest.updateNotes).toEqual([
      expect.objectContaining({
        kind: 'correction',
        kindLabel: 'Correction',
        text: 'We gave the wrong year for the heat-flow survey.',
        sequence: 2,
      }),
    ]);
    expect(latest.modifiedAt).toBe(latest.updateNotes[0]!.at);
    const jsonLd = claimReviewJsonLd(reader().site(), latest);
    expect(jsonLd).toMatchObject({
      dateModified: latest.modifiedAt,
      correction: [
        {
          '@type': 'CorrectionComment',
          text: 'Correction: We gave the wrong year for the heat-flow survey.',
          datePublished: latest.modifiedAt,
        },
      ],
    });
    const earlier = (await reader().explainer(slug, 1))!;
    expect(earlier).toMatchObject({ sequence: 1, isLatest: false, updateNotes: [] });
    expect(earlier.bottomLine).toBe(first.bottomLine);
    expect(latest.publications.map((p) => p.sequence)).toEqual([1, 2]);

    const corrections = await reader().corrections();
    expect(corrections[0]).toMatchObject({ slug, note: { kind: 'correction' } });

    const feed = new XMLParser({ ignoreAttributes: false }).parse(
      explainersAtomFeed(reader().site(), (await reader().list({})).items),
    ) as {
      feed: { entry: Array<Record<string, unknown>>; updated: string; id: string; title: string };
    };
    const entry = feed.feed.entry.find((e) => String(e.id).endsWith(slug))!;
    expect(entry).toMatchObject({ updated: latest.modifiedAt, published: first.firstPublishedAt });
    expect(feed.feed.updated).toBe(latest.modifiedAt);

    // The subscriber hears of the correction, and can leave with one click.
    await t.app.get(OutboxWorker).runPass();
    const update = await t.mail.waitFor(
      (mail) => mail.to.includes('reader@example.test') && mail.subject.startsWith('Correction'),
    );
    expect(update.text).toContain('We gave the wrong year for the heat-flow survey.');
    const unsubscribe = /subscription\/unsubscribe\?token=([\w.-]+)/.exec(update.text)![1]!;
    expect(await subscriptions.unsubscribe(`${unsubscribe}x`)).toBe(false);
    expect(await subscriptions.unsubscribe(unsubscribe)).toBe(true);
    expect(await t.dataSource.query('SELECT * FROM reader_subscriptions')).toEqual([]);
  });

  it('keeps a retracted explainer’s page, marked as retracted', async () => {
    const claim = await clearedClaim('Geothermal vents explain the warm winters');
    await publish(claim.id, 'copy').then((response) => expect(response.status).toBe(201));
    await move(claim.id, 'editor', 'in_research');
    await clearVerdict(claim.id, { ratingId: 'not-checkable' });
    await publish(claim.id, 'chief', {
      note: { kind: 'retraction', text: 'The claim was misquoted; we withdraw this check.' },
    }).then((r) => expect(r.status).toBe(201));
    const explainer = (await reader().explainer('geothermal-vents-explain-the-warm-winters'))!;
    expect(explainer).toMatchObject({
      retracted: true,
      rating: { id: 'not-checkable', number: null },
    });
    expect(shareMeta(explainer).title).toBe('Retracted: Geothermal vents explain the warm winters');
    expect(claimReviewJsonLd(reader().site(), explainer)).toMatchObject({
      reviewRating: { alternateName: 'Not checkable' },
    });
  });

  it('never names a private individual to readers unless a desk chief allowed it', async () => {
    const claim = await clearedClaim('A neighbour says the heat comes from the ground', {
      name: 'Edna Plumtree',
      kind: 'private_individual',
    });
    await publish(claim.id, 'copy').then((response) => expect(response.status).toBe(201));
    const explainer = (await reader().explainer(
      'a-neighbour-says-the-heat-comes-from-the-ground',
    ))!;
    expect(explainer.claimant).toEqual({
      name: null,
      displayName: 'A private individual',
      kind: 'private_individual',
      affiliation: null,
    });
    expect(JSON.stringify(claimReviewJsonLd(reader().site(), explainer))).not.toContain('Plumtree');
    expect(JSON.stringify((await reader().list({})).items)).not.toContain('Plumtree');
  });
});
