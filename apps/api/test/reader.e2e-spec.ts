import { XMLParser } from 'fast-xml-parser';
import { parse } from 'parse5';
import { OutboxWorker } from '../src/mail/outbox.worker';
import { claimReviewJsonLd } from '../src/reader/claim-review';
import { ReaderService } from '../src/reader/reader.service';
import { DeskFlow } from './support/desk-flow';
import { onePixelPng } from './support/evidence-files';
import { createTestApp, type TestApp } from './support/test-app';

interface HtmlNode {
  nodeName: string;
  attrs?: Array<{ name: string; value: string }>;
  childNodes?: HtmlNode[];
  value?: string;
}

/** Every element of a parsed document, depth first. */
function elements(node: HtmlNode): HtmlNode[] {
  return [node, ...(node.childNodes ?? []).flatMap(elements)];
}
const attr = (node: HtmlNode, name: string) => node.attrs?.find((a) => a.name === name)?.value;
const textOf = (node: HtmlNode): string =>
  node.nodeName === '#text' ? (node.value ?? '') : (node.childNodes ?? []).map(textOf).join('');

describe('the reader side over HTTP: pages, feed, oEmbed, captures and subscriptions', () => {
  let t: TestApp;
  let desk: DeskFlow;
  let slug: string;
  let captureId: string;

  /** A claim published with an archived capture of its first appearance. */
  async function publishedWithCapture(
    summary: string,
    claimant?: Parameters<DeskFlow['clearedClaim']>[1],
  ) {
    const claim = await desk.clearedClaim(summary, claimant);
    const upload = await t
      .http()
      .post(`/api/claims/${claim.id}/attachments`)
      .set(desk.as('editor'))
      .attach('file', onePixelPng, 'phone-in-page.png')
      .expect(201);
    const appearance = (await desk.detail(claim.id)).appearances[0]!;
    await t
      .http()
      .patch(`/api/claims/${claim.id}/appearances/${appearance.id}`)
      .set(desk.as('editor'))
      .send({ captureAttachmentId: upload.body.id, version: appearance.version })
      .expect(200);
    return { claim, captureId: upload.body.id as string, slug: await desk.publishNow(claim.id) };
  }

  beforeAll(async () => {
    t = await createTestApp('reader', {
      PUBLISHER_ENABLED: 'false',
      OUTBOX_WORKER_ENABLED: 'false',
    });
    desk = await DeskFlow.start(t, 'reader.test');
    ({ slug, captureId } = await publishedWithCapture('The core warms the planet, a caller said'));
  });
  afterAll(() => t.close());

  it('serves the explainer as complete HTML, with its ClaimReview matching the page', async () => {
    const response = await t.http().get(`/explainers/${slug}`).expect(200);
    expect(response.headers['content-type']).toBe('text/html; charset=utf-8');
    expect(response.headers['cache-control']).toBe('public, no-cache');
    // Checked again on every view: unchanged, a 304 and no body.
    const again = await t
      .http()
      .get(`/explainers/${slug}`)
      .set('If-None-Match', response.headers['etag']!);
    expect(again.status).toBe(304);
    const document = parse(response.text) as unknown as HtmlNode;
    const all = elements(document);
    const text = textOf(document);
    expect(text).toContain(
      'The core warms the planet, a caller said, said on the Marrowby phone-in.',
    );
    expect(text).toContain('Contradicted by evidence');
    expect(text).toContain('The interior gives off about 47 TW.');
    expect(text).toContain('Heat flow from the Earth’s interior');
    expect(all.filter((n) => n.nodeName === 'script').map((n) => attr(n, 'type'))).toEqual([
      'application/ld+json',
    ]);
    const script = all.find((n) => n.nodeName === 'script')!;
    const explainer = (await t.app.get(ReaderService).explainer(slug))!;
    expect(JSON.parse(textOf(script))).toEqual(
      claimReviewJsonLd(t.app.get(ReaderService).site(), explainer),
    );
    const meta = (property: string) =>
      attr(
        all.find((n) => n.nodeName === 'meta' && attr(n, 'property') === property)!,
        'content',
      );
    expect(meta('og:title')).toBe(
      'Contradicted by evidence: The core warms the planet, a caller said',
    );
    expect(meta('og:description')).toBe(explainer.bottomLine);
    const capture = all.find((n) => n.nodeName === 'a' && attr(n, 'href')?.includes('/captures/'))!;
    expect(attr(capture, 'href')).toBe(
      `http://127.0.0.1:3000/explainers/${slug}/captures/${captureId}`,
    );
    expect(attr(capture, 'rel')).toContain('nofollow');
    const oembed = all.find((n) => attr(n, 'type') === 'application/json+oembed')!;
    expect(attr(oembed, 'href')).toContain('/oembed?url=');
  });

  it('serves the index, a search, corrections, methodology and the stylesheet', async () => {
    const index = await t.http().get('/explainers').expect(200);
    expect(index.text).toContain(`/explainers/${slug}`);
    const search = await t
      .http()
      .get('/explainers')
      .query({ q: 'core warms', utm_source: 'x' })
      .expect(200);
    expect(search.text).toContain(`/explainers/${slug}`);
    const none = await t.http().get('/explainers').query({ q: 'sea ice' }).expect(200);
    expect(none.text).not.toContain(`/explainers/${slug}"`);
    expect((await t.http().get('/corrections').expect(200)).text).toContain('<h1');
    const methodology = await t.http().get('/methodology').expect(200);
    expect(methodology.text).toContain('Contradicted by evidence');
    expect(methodology.text).toContain('very likely');
    const stylesheet = /href="(\/reader\/reader\.[0-9a-f]+\.css)"/.exec(index.text)![1]!;
    const css = await t.http().get(stylesheet).expect(200);
    expect(css.headers['content-type']).toBe('text/css; charset=utf-8');
    expect(css.headers['cache-control']).toContain('immutable');
  });

  it('serves an Atom feed that parses with the required elements', async () => {
    const response = await t.http().get('/feeds/explainers.atom').expect(200);
    expect(response.headers['content-type']).toBe('application/atom+xml; charset=utf-8');
    const parsed = new XMLParser({ ignoreAttributes: false }).parse(response.text) as {
      feed: {
        '@_xmlns': string;
        id: string;
        title: string;
        updated: string;
        entry: Record<string, unknown> | Array<Record<string, unknown>>;
      };
    };
    // RFC 4287 §4.1.1: a feed has id, title and updated; §4.1.2: each entry has id, title, updated.
    expect(parsed.feed['@_xmlns']).toBe('http://www.w3.org/2005/Atom');
    expect(parsed.feed).toMatchObject({
      id: expect.any(String),
      title: expect.any(String),
      updated: expect.any(String),
    });
    const entries = ([] as Array<Record<string, unknown>>).concat(parsed.feed.entry);
    expect(entries[0]).toMatchObject({
      id: `http://127.0.0.1:3000/explainers/${slug}`,
      title: { '#text': expect.stringContaining('Contradicted by evidence') },
      updated: expect.any(String),
    });
  });

  it('answers oEmbed for its own explainers, and frames only the card', async () => {
    const url = `http://127.0.0.1:3000/explainers/${slug}`;
    const response = await t
      .http()
      .get('/oembed')
      .query({ url, format: 'json', maxwidth: 400 })
      .expect(200);
    expect(response.body).toMatchObject({
      version: '1.0',
      type: 'rich',
      width: 400,
      title: expect.stringContaining('Contradicted'),
    });
    expect(response.body.html).toContain(`src="${url}/card"`);
    expect((await t.http().get('/oembed').query({ url: 'https://elsewhere.test/x' })).status).toBe(
      404,
    );
    expect((await t.http().get('/oembed').query({ url, format: 'xml' })).status).toBe(501);
    const card = await t.http().get(`/explainers/${slug}/card`).expect(200);
    expect(card.headers['content-security-policy']).toContain('frame-ancestors *');
    expect(card.headers['x-frame-options']).toBeUndefined();
    const page = await t.http().get(`/explainers/${slug}`);
    expect(page.headers['content-security-policy']).toContain("frame-ancestors 'none'");
  });

  it('serves a published claim’s capture, never indexed, and nothing else', async () => {
    const capture = await t.http().get(`/explainers/${slug}/captures/${captureId}`).expect(200);
    expect(capture.headers['content-type']).toBe('image/png');
    expect(capture.headers['x-robots-tag']).toBe('noindex, nofollow');
    expect(
      (await t.http().get(`/explainers/${slug}/captures/3f1c6f0e-8a4b-4c4e-9d7e-2b1a0c9d8e7f`))
        .status,
    ).toBe(404);
    expect((await t.http().get(`/explainers/${slug}/captures/..%2F..%2Fetc`)).status).toBe(404);
  });

  it('withholds where a private individual was seen, and the capture, unless a desk chief names them', async () => {
    const hidden = await publishedWithCapture('A neighbour blamed the core for the mild winter', {
      name: 'Ottilie Brackwater',
      kind: 'private_individual',
    });
    const page = await t.http().get(`/explainers/${hidden.slug}`).expect(200);
    expect(page.text).toContain('Radio Marrowby phone-in');
    expect(page.text).toContain('We do not give its address or a copy');
    // Neither the name, nor the address where they were seen, nor the capture of it.
    expect(page.text).not.toContain('Brackwater');
    expect(page.text).not.toContain('radio.marrowby.test');
    expect(page.text).not.toContain('/captures/');
    const capture = `/explainers/${hidden.slug}/captures/${hidden.captureId}`;
    expect((await t.http().get(capture)).status).toBe(404);

    const { claimant } = await desk.detail(hidden.claim.id);
    await t
      .http()
      .patch(`/api/claimants/${claimant.id}`)
      .set(desk.as('chief'))
      .send({ nameShownPublicly: true, version: claimant.version })
      .expect(200);
    await t.http().get(capture).expect(200);
    const named = (await t.app.get(ReaderService).explainer(hidden.slug))!;
    expect(named.claimant.displayName).toBe('Ottilie Brackwater');
    expect(named.appearances[0]).toMatchObject({
      url: 'https://radio.marrowby.test/phone-in/2026-11-20',
      captureUrl: expect.stringContaining(`/captures/${hidden.captureId}`),
    });
  });

  it('shows readers the claim as the copy desk cleared it, never edits or parts added since', async () => {
    const cleared = 'Hot springs prove the core is heating up';
    const claim = await desk.clearedClaim(cleared);
    const edit = async (fields: object) => {
      const { version } = await desk.detail(claim.id);
      await t
        .http()
        .patch(`/api/claims/${claim.id}`)
        .set(desk.as('editor'))
        .send({ version, ...fields })
        .expect(200);
    };
    // Edited after the copy desk cleared it: published as cleared all the same.
    await edit({ summary: 'Hot springs show the core heats up fast' });
    const clearedSlug = await desk.publishNow(claim.id);
    expect(clearedSlug).toBe('hot-springs-prove-the-core-is-heating-up');
    // The desk sees what the version keeps, for the copy desk to compare a correction with.
    const verdict = await t
      .http()
      .get(`/api/claims/${claim.id}/verdict`)
      .set(desk.as('copy'))
      .expect(200);
    expect(verdict.body.versions[0].claimAsCleared).toEqual({
      text: `${cleared}, said on the Marrowby phone-in.`,
      summary: cleared,
      claimantName: `Claimant of ${cleared}`,
    });
    const readerText = async (path: string) =>
      textOf(parse((await t.http().get(path).expect(200)).text) as unknown as HtmlNode);
    expect(await readerText(`/explainers/${clearedSlug}`)).toContain(cleared);
    expect(await readerText(`/explainers/${clearedSlug}`)).not.toContain('heats up fast');

    // Reopened for a correction and edited: readers see none of it until it is published.
    await desk.move(claim.id, 'editor', 'in_research');
    const [other] = await t.dataSource.query<Array<{ id: string }>>(
      'SELECT claimant_id AS id FROM claims WHERE slug = ?',
      [slug],
    );
    const corrected = 'Warm springs near Marrowby say nothing about the core';
    await edit({
      summary: corrected,
      text: 'The warm springs near Marrowby show the core is heating up.',
      claimantId: other!.id,
    });
    await t
      .http()
      .post(`/api/claims/${claim.id}/appearances`)
      .set(desk.as('editor'))
      .send({
        url: 'https://post.marrowby.test/letters/2026-11-30',
        outlet: 'Marrowby Evening Post letters page',
        seenAt: '2026-11-30T08:00:00+00:00',
        seenTimeZone: 'Europe/London',
      })
      .expect(201);
    await t
      .http()
      .post(`/api/claims/${claim.id}/sources`)
      .set(desk.as('editor'))
      .send({
        source: {
          title: 'Warm springs of the Marrow valley: where their water comes from',
          publisher: 'Marrowby Geological Society',
          year: 2024,
          kind: 'assessment_report',
          grade: 'adequate',
          gradeReason: 'A local survey with its method stated',
          url: 'https://geology.marrowby.test/warm-springs-2024',
        },
      })
      .expect(201);
    // Read past the page cache, which would keep the page as rendered before the edits.
    const shown = (await t.app.get(ReaderService).explainer(clearedSlug))!;
    expect(shown.claim).toMatchObject({
      summary: cleared,
      text: `${cleared}, said on the Marrowby phone-in.`,
    });
    expect(shown.claimant.displayName).toBe(`Claimant of ${cleared}`);
    expect(shown.appearances.map((appearance) => appearance.outlet)).toEqual([
      'Radio Marrowby phone-in',
    ]);
    expect(shown.sources.map((source) => source.title)).toEqual([
      'Heat flow from the Earth’s interior: analysis of the global data set',
    ]);
    for (const path of ['/explainers', '/feeds/explainers.atom']) {
      const listed = (await t.http().get(path).expect(200)).text;
      expect(listed).toContain(cleared);
      expect(listed).not.toContain(corrected);
    }

    await desk.clearVerdict(claim.id, {
      bottomLine: 'Warm springs are fed by rain, not the core.',
    });
    await desk.publishNow(claim.id, {
      note: { kind: 'correction', text: 'We had the claim’s place and wording wrong.' },
    });
    const correctedPage = await readerText(`/explainers/${clearedSlug}`);
    expect(correctedPage).toContain(corrected);
    expect(correctedPage).toContain('The warm springs near Marrowby show the core is heating up.');
    expect(correctedPage).toContain('Claimant of The core warms the planet, a caller said');
    expect(correctedPage).toContain('Marrowby Evening Post letters page');
    expect(correctedPage).toContain('Warm springs of the Marrow valley');
    expect(await readerText(`/explainers/${clearedSlug}/v/1`)).toContain(cleared);
    expect(await readerText('/corrections')).toContain(corrected);
  });

  it('answers unknown explainers with a 404 page, and leaves the API its JSON', async () => {
    const missing = await t.http().get('/explainers/no-such-thing').expect(404);
    expect(missing.headers['content-type']).toMatch(/^text\/html/);
    expect((await t.http().get(`/explainers/${slug}/v/9`)).status).toBe(404);
    const api = await t.http().get('/api/claims').expect(401);
    expect(api.body).toMatchObject({ statusCode: 401 });
  });

  it('subscribes with double opt-in from the form, and unsubscribes from the real mails', async () => {
    const invalid = await t
      .http()
      .post(`/explainers/${slug}/subscribe`)
      .type('form')
      .send({ email: 'not an address' });
    expect(invalid.status).toBe(400);
    expect(invalid.text).toContain('Enter an e-mail address');
    const sent = await t
      .http()
      .post(`/explainers/${slug}/subscribe`)
      .type('form')
      .send({ email: 'ruth@reader.example' });
    expect(sent.status).toBe(202);
    expect(sent.text).toContain('ruth@reader.example');
    await t.app.get(OutboxWorker).runPass();
    const confirm = await t.mail.waitFor((mail) => mail.to.includes('ruth@reader.example'));
    const confirmPath =
      /http:\/\/127\.0\.0\.1:3000(\/explainers\/\S+\/subscription\/confirm\?token=[\w-]+)/.exec(
        confirm.text,
      )![1]!;
    expect((await t.http().get(confirmPath)).status).toBe(200);
    expect((await t.http().get(confirmPath)).status).toBe(404);

    const claimId = (await t.dataSource.query('SELECT id FROM claims WHERE slug = ?', [slug]))[0]
      .id as string;
    await desk.move(claimId, 'editor', 'in_research');
    await desk.clearVerdict(claimId, {
      bottomLine: 'Updated: about thirty times smaller, with the 2010 survey.',
    });
    await desk.publishNow(claimId, {
      note: { kind: 'update', text: 'We added the 2010 heat-flow survey.' },
    });
    await t.app.get(OutboxWorker).runPass();
    const update = await t.mail.waitFor(
      (mail) => mail.to.includes('ruth@reader.example') && mail.subject.startsWith('Update'),
    );
    const leavePath =
      /http:\/\/127\.0\.0\.1:3000(\/explainers\/\S+\/subscription\/unsubscribe\?token=[\w.-]+)/.exec(
        update.text,
      )![1]!;
    const left = await t.http().get(leavePath);
    expect(left.status).toBe(200);
    expect(left.text).toContain('address has been deleted');
    expect(await t.dataSource.query('SELECT email FROM reader_subscriptions')).toEqual([]);

    const page = await t.http().get(`/explainers/${slug}`).expect(200);
    expect(page.text).toContain('We added the 2010 heat-flow survey.');
    expect((await t.http().get(`/explainers/${slug}/v/1`)).text).not.toContain(
      'We added the 2010 heat-flow survey.',
    );
    expect((await t.http().get('/corrections')).text).toContain(
      'We added the 2010 heat-flow survey.',
    );
  });
});
