import {
  Body,
  Controller,
  Get,
  Header,
  HttpStatus,
  Inject,
  Param,
  Post,
  Query,
  Res,
  StreamableFile,
} from '@nestjs/common';
import { ApiExcludeController } from '@nestjs/swagger';
import { readerSubscriptionSchema } from '@skyledger/contracts';
import { type Response } from 'express';
import { DataSource } from 'typeorm';
import { InjectDataSource } from '@nestjs/typeorm';
import { storedFileResponse } from '../attachments/stored-file-response';
import { Claim } from '../claims/entities/claim.entity';
import { Public } from '../common/decorators/public.decorator';
import { ApiError } from '../common/errors/api-error';
import { ReaderSubscriptionsService } from '../publishing/reader-subscriptions.service';
import { SearchService } from '../search/search.service';
import { FILE_STORAGE, type FileStorage } from '../storage/file-storage';
import { explainersAtomFeed } from './atom-feed';
import { embedCardPolicy } from './reader-policy';
import { claimReviewJsonLd, shareMeta } from './claim-review';
import {
  readerStylesheet,
  renderCorrectionsPage,
  renderEmbedCard,
  renderExplainerPage,
  renderIndexPage,
  renderMessagePage,
  renderMethodologyPage,
  type SubscriptionResult,
} from './render';
import { ReaderPageCache } from './reader-page-cache';
import { READER_PAGE_SIZE, ReaderService } from './reader.service';

/**
 * Reader pages may be kept, but are checked again on every view: an update note must show
 * at once. The ETag (Express's default) makes that check a cheap 304.
 */
const PAGE_CACHE = 'public, no-cache';
const EMBED_WIDTH = 480;
const EMBED_HEIGHT = 180;

/** One value of a query parameter, however many times it was given. */
const one = (value: unknown): string | undefined =>
  Array.isArray(value)
    ? one(value[0])
    : typeof value === 'string' && value.trim()
      ? value.trim()
      : undefined;

/**
 * The reader side: server-rendered HTML that needs no JavaScript, the Atom feed, oEmbed
 * and the archived captures of published claims. Open to anyone; everything is read from
 * published, due publications only.
 */
@ApiExcludeController()
@Public()
@Controller()
export class ReaderController {
  constructor(
    private readonly reader: ReaderService,
    private readonly search: SearchService,
    private readonly subscriptions: ReaderSubscriptionsService,
    @InjectDataSource() private readonly dataSource: DataSource,
    @Inject(FILE_STORAGE) private readonly storage: FileStorage,
    private readonly pages: ReaderPageCache,
  ) {}

  @Get('explainers')
  @Header('Content-Type', 'text/html; charset=utf-8')
  @Header('Cache-Control', PAGE_CACHE)
  async index(@Query() query: Record<string, unknown>): Promise<string> {
    const q = one(query.q);
    const topic = one(query.topic);
    const rating = one(query.rating);
    const page = Math.max(1, Math.min(500, Number.parseInt(one(query.page) ?? '1', 10) || 1));
    const key = `index ${JSON.stringify([q, topic, rating, page])}`;
    return (await this.pages.page(key, () => this.indexPage(q, topic, rating, page)))!;
  }

  private async indexPage(
    q: string | undefined,
    topic: string | undefined,
    rating: string | undefined,
    page: number,
  ): Promise<string> {
    let listed: Awaited<ReturnType<ReaderService['list']>>;
    if (q) {
      const found = await this.search.reader({ q: q.slice(0, 200), page, topic, rating });
      const { items } = await this.reader.list({ claimIds: found.items.map((hit) => hit.id) });
      listed = { items, total: found.total };
    } else {
      listed = await this.reader.list({ topic, rating, page });
    }
    return renderIndexPage({
      site: this.reader.site(),
      items: listed.items,
      query: { q, topic, rating },
      total: listed.total,
      page,
      pageSize: READER_PAGE_SIZE,
      topics: await this.reader.topics(),
      ratings: await this.reader.ratings(),
    });
  }

  @Get('explainers/:slug')
  latest(@Param('slug') slug: string, @Res({ passthrough: true }) res: Response): Promise<string> {
    return this.explainerPage(res, slug, undefined);
  }

  @Get('explainers/:slug/v/:sequence')
  publication(
    @Param('slug') slug: string,
    @Param('sequence') sequence: string,
    @Res({ passthrough: true }) res: Response,
  ): Promise<string> {
    const number = Number.parseInt(sequence, 10);
    return this.explainerPage(res, slug, Number.isInteger(number) && number > 0 ? number : -1);
  }

  /** The subscribe form posts here (no JavaScript needed); a confirmation mail follows. */
  @Post('explainers/:slug/subscribe')
  async subscribe(
    @Param('slug') slug: string,
    @Body() body: Record<string, unknown>,
    @Res({ passthrough: true }) res: Response,
  ): Promise<string> {
    const parsed = readerSubscriptionSchema.safeParse({ email: one(body?.email) ?? '' });
    const claim = await this.dataSource.manager.findOne(Claim, { where: { slug } });
    const [shown] = claim ? (await this.reader.list({ claimIds: [claim.id] })).items : [];
    if (!parsed.success || !claim || !shown) {
      return this.explainerPage(res, slug, undefined, {
        status: 'invalid',
        message: 'Enter an e-mail address, such as name@example.org.',
      });
    }
    await this.subscriptions.subscribe(claim, shown.summary, parsed.data.email);
    res.status(HttpStatus.ACCEPTED);
    return this.explainerPage(res, slug, undefined, {
      status: 'sent',
      message: `We have sent a link to ${parsed.data.email}. Nothing more is sent unless you open it.`,
    });
  }

  @Get('explainers/:slug/subscription/confirm')
  @Header('Cache-Control', 'no-store')
  async confirm(@Query('token') token: unknown, @Res({ passthrough: true }) res: Response) {
    const confirmed = typeof token === 'string' && (await this.subscriptions.confirm(token));
    return this.message(
      res,
      confirmed ? HttpStatus.OK : HttpStatus.NOT_FOUND,
      confirmed ? 'Subscription confirmed' : 'This link has been used or has expired',
      confirmed
        ? 'We will e-mail you when this explainer is corrected or updated. Every mail has a link to stop.'
        : 'Nothing was changed. Subscribe again from the explainer if you still want its updates.',
    );
  }

  /** One click (GET from the mail, or POST from a mail client) and the address is deleted. */
  @Get('explainers/:slug/subscription/unsubscribe')
  @Header('Cache-Control', 'no-store')
  unsubscribeByLink(@Query('token') token: unknown, @Res({ passthrough: true }) res: Response) {
    return this.unsubscribe(token, res);
  }

  @Post('explainers/:slug/subscription/unsubscribe')
  unsubscribeByPost(@Query('token') token: unknown, @Res({ passthrough: true }) res: Response) {
    return this.unsubscribe(token, res);
  }

  /** The card other sites embed (through oEmbed): the only reader page that may be framed. */
  @Get('explainers/:slug/card')
  async card(
    @Param('slug') slug: string,
    @Res({ passthrough: true }) res: Response,
  ): Promise<string> {
    const explainer = await this.reader.explainer(slug);
    if (!explainer)
      return this.message(res, HttpStatus.NOT_FOUND, 'Not found', 'No such explainer.');
    const [summary] = (await this.reader.list({ claimIds: [await this.claimIdOf(slug)] })).items;
    res.removeHeader('X-Frame-Options');
    res.setHeader('Content-Security-Policy', embedCardPolicy);
    res.setHeader('Cache-Control', PAGE_CACHE);
    res.type('html');
    return renderEmbedCard({ site: this.reader.site(), item: summary! });
  }

  /** The archived capture of where a published claim appeared; never indexed. */
  @Get('explainers/:slug/captures/:attachmentId')
  async capture(
    @Param('slug') slug: string,
    @Param('attachmentId') attachmentId: string,
    @Res({ passthrough: true }) res: Response,
  ): Promise<StreamableFile> {
    const attachment = /^[0-9a-f-]{36}$/i.test(attachmentId)
      ? await this.reader.publishedCapture(slug, attachmentId)
      : null;
    if (!attachment) throw new ApiError(HttpStatus.NOT_FOUND, 'No such capture');
    res.setHeader('X-Robots-Tag', 'noindex, nofollow');
    res.setHeader('Cache-Control', 'public, max-age=3600');
    return storedFileResponse(res, attachment, await this.storage.open(attachment.storageKey));
  }

  @Get('corrections')
  @Header('Content-Type', 'text/html; charset=utf-8')
  @Header('Cache-Control', PAGE_CACHE)
  async corrections(): Promise<string> {
    return renderCorrectionsPage({
      site: this.reader.site(),
      items: await this.reader.corrections(),
    });
  }

  @Get('methodology')
  @Header('Content-Type', 'text/html; charset=utf-8')
  @Header('Cache-Control', PAGE_CACHE)
  async methodology(): Promise<string> {
    return renderMethodologyPage({
      site: this.reader.site(),
      ratings: await this.reader.ratings(),
    });
  }

  @Get('feeds/explainers.atom')
  @Header('Content-Type', 'application/atom+xml; charset=utf-8')
  @Header('Cache-Control', PAGE_CACHE)
  async feed(): Promise<string> {
    const feed = await this.pages.page('feed', async () => {
      const { items } = await this.reader.list({ page: 1, pageSize: 100 });
      return explainersAtomFeed(this.reader.site(), items);
    });
    return feed!;
  }

  /** oEmbed 1.0 (https://oembed.com): a rich card for an explainer's address, JSON only. */
  @Get('oembed')
  @Header('Cache-Control', PAGE_CACHE)
  async oembed(@Query() query: Record<string, unknown>) {
    const format = one(query.format) ?? 'json';
    if (format !== 'json') {
      throw new ApiError(HttpStatus.NOT_IMPLEMENTED, 'Only format=json is offered', {
        format: 'json',
      });
    }
    const url = one(query.url) ?? '';
    const site = this.reader.site();
    const match = url.startsWith(`${site.origin}/explainers/`)
      ? /^\/explainers\/([a-z0-9-]+)(?:\/v\/\d+)?\/?$/.exec(url.slice(site.origin.length))
      : null;
    const explainer = match ? await this.reader.explainer(match[1]!) : null;
    if (!explainer)
      throw new ApiError(HttpStatus.NOT_FOUND, 'No explainer at that address', { url: 'unknown' });
    const width = Math.min(
      EMBED_WIDTH,
      Number.parseInt(one(query.maxwidth) ?? '', 10) || EMBED_WIDTH,
    );
    const height = Math.min(
      EMBED_HEIGHT,
      Number.parseInt(one(query.maxheight) ?? '', 10) || EMBED_HEIGHT,
    );
    const title = shareMeta(explainer).title;
    const escaped = title.replace(/[&<>"']/g, (c) => `&#${c.charCodeAt(0)};`);
    return {
      version: '1.0',
      type: 'rich',
      provider_name: site.name,
      provider_url: site.origin,
      title,
      width,
      height,
      html: `<iframe src="${explainer.url}/card" width="${width}" height="${height}" title="${escaped}" style="border:0" loading="lazy"></iframe>`,
    };
  }

  @Get(readerStylesheet.path.slice(1))
  @Header('Content-Type', 'text/css; charset=utf-8')
  @Header('Cache-Control', 'public, max-age=31536000, immutable')
  stylesheet(): string {
    return readerStylesheet.css;
  }

  private async explainerPage(
    res: Response,
    slug: string,
    sequence: number | undefined,
    subscription?: SubscriptionResult,
  ): Promise<string> {
    const render = async () => {
      const explainer = await this.reader.explainer(slug, sequence);
      if (!explainer) return null;
      const site = this.reader.site();
      return renderExplainerPage({
        site,
        explainer,
        jsonLd: claimReviewJsonLd(site, explainer),
        share: shareMeta(explainer),
        ...(subscription ? { subscription } : {}),
      });
    };
    // A page that answers a reader's subscription is that reader's alone: never kept.
    const html = subscription
      ? await render()
      : await this.pages.page(`explainer ${slug} ${sequence ?? 'latest'}`, render);
    if (html === null) {
      return this.message(
        res,
        HttpStatus.NOT_FOUND,
        'No such explainer',
        'There is no published explainer at this address.',
      );
    }
    res.type('html');
    if (!subscription) res.setHeader('Cache-Control', PAGE_CACHE);
    if (subscription?.status === 'invalid') res.status(HttpStatus.BAD_REQUEST);
    return html;
  }

  private async unsubscribe(token: unknown, res: Response): Promise<string> {
    const done = typeof token === 'string' && (await this.subscriptions.unsubscribe(token));
    return this.message(
      res,
      done ? HttpStatus.OK : HttpStatus.NOT_FOUND,
      done ? 'Unsubscribed' : 'This link is not valid',
      done
        ? 'You will get no more mail about this explainer, and your address has been deleted.'
        : 'Nothing was changed. Use the link from one of our mails.',
    );
  }

  private message(res: Response, status: number, title: string, message: string): string {
    res.status(status).type('html');
    return renderMessagePage({ site: this.reader.site(), title, message, status });
  }

  private async claimIdOf(slug: string): Promise<string> {
    return (await this.dataSource.manager.findOneByOrFail(Claim, { slug })).id;
  }
}
