import { type INestApplicationContext } from '@nestjs/common';
import { type UpdateNoteKind } from '@skyledger/contracts';
import { type ExplainerDocument } from '@skyledger/explainer';
import { DataSource } from 'typeorm';
import { ClaimLifeService } from '../claim-life/claim-life.service';
import { ClaimsService } from '../claims/claims.service';
import { Claim } from '../claims/entities/claim.entity';
import { ReaderSubscription } from '../publishing/entities/reader-subscription.entity';
import { ReaderSubscriptionsService } from '../publishing/reader-subscriptions.service';
import { PublishingService } from '../publishing/publishing.service';
import { ClaimSource } from '../sources/entities/claim-source.entity';
import { VerdictVersion } from '../verdicts/entities/verdict-version.entity';
import { VerdictsService } from '../verdicts/verdicts.service';
import { Working } from '../workings/entities/working.entity';
import { seedActor } from './seed-actor';

/**
 * A verdict as the seed writes it. The explainer is a list of blocks: `## ` starts a
 * heading, `> ` a quote, anything else a paragraph; `[[source:<start of a title>]]` cites
 * one of the claim's sources, and a block `[[working:<calculator id>]]` embeds the claim's
 * working of that calculator (`#2` for its second).
 */
export interface SeedVerdict {
  ratingId?: string;
  bottomLine?: string;
  /** The start of the primary source's title. */
  primarySource?: string;
  explainer?: string[];
}

/**
 * One thing done to the verdict after research, in order, by the person named; or a
 * reader subscribing to the published explainer's updates (confirmed, as if from the mail).
 */
export type SeedVerdictStep =
  | { readerSubscribes: string }
  | ({ by: string } & (
      | { draft: SeedVerdict }
      | { submit: true }
      | { sendBack: string }
      | { clear: true }
      | { clearLegalFlag: true }
      | {
          publish: {
            inDays?: number;
            timeZone?: string;
            note?: { kind: UpdateNoteKind; text: string };
          };
        }
      | { reopen: true }
    ));

const marker = /\[\[(source|working):([^\]]+)\]\]/g;

/** Turns the seed's explainer blocks into a Tiptap document with real ids. */
async function explainerDocument(
  context: INestApplicationContext,
  claimId: string,
  blocks: string[],
): Promise<ExplainerDocument> {
  const manager = context.get(DataSource).manager;
  const sources = await manager.find(ClaimSource, {
    where: { claimId },
    relations: { source: true },
  });
  const workings = await manager.find(Working, { where: { claimId }, order: { createdAt: 'ASC' } });
  const sourceId = (title: string) => {
    const found = sources.find((link) => link.source.title.startsWith(title));
    if (!found)
      throw new Error(`The demo explainer cites "${title}", which the claim does not cite`);
    return found.sourceId;
  };
  const workingId = (ref: string) => {
    const [calculatorId, nth = '1'] = ref.split('#');
    const found = workings.filter((w) => w.calculatorId === calculatorId)[Number(nth) - 1];
    if (!found) throw new Error(`The demo explainer embeds a ${ref} working the claim lacks`);
    return found.id;
  };
  const inline = (text: string) => {
    const content: Array<Record<string, unknown>> = [];
    let at = 0;
    for (const found of text.matchAll(marker)) {
      if (found.index > at) content.push({ type: 'text', text: text.slice(at, found.index) });
      content.push({ type: 'sourceCitation', attrs: { sourceId: sourceId(found[2]!) } });
      at = found.index + found[0].length;
    }
    if (at < text.length) content.push({ type: 'text', text: text.slice(at) });
    return content;
  };
  const content = blocks.map((block) => {
    const embed = /^\[\[working:([^\]]+)\]\]$/.exec(block.trim());
    if (embed) return { type: 'workingEmbed', attrs: { workingId: workingId(embed[1]!) } };
    if (block.startsWith('## ')) {
      return { type: 'heading', attrs: { level: 2 }, content: inline(block.slice(3)) };
    }
    if (block.startsWith('> ')) {
      return {
        type: 'blockquote',
        content: [{ type: 'paragraph', content: inline(block.slice(2)) }],
      };
    }
    return { type: 'paragraph', content: inline(block) };
  });
  return { type: 'doc', content } as ExplainerDocument;
}

/** A confirmed reader subscription, as if the reader had opened the link in the mail. */
async function subscribeReader(context: INestApplicationContext, claimId: string, email: string) {
  const manager = context.get(DataSource).manager;
  const claim = await manager.findOneByOrFail(Claim, { id: claimId });
  await context
    .get(ReaderSubscriptionsService, { strict: false })
    .subscribe(claim, claim.summary, email);
  await manager.update(
    ReaderSubscription,
    { claimId, email: email.toLowerCase() },
    { confirmedAt: new Date() },
  );
}

/** Does each step through the API's own services, so every rule of sign-off applies. */
export async function runVerdictSteps(
  context: INestApplicationContext,
  claimId: string,
  steps: SeedVerdictStep[],
): Promise<void> {
  const claims = context.get(ClaimsService, { strict: false });
  const life = context.get(ClaimLifeService, { strict: false });
  const version = async () => (await claims.findOrFail(claimId)).version;
  for (const step of steps) {
    if ('readerSubscribes' in step) {
      await subscribeReader(context, claimId, step.readerSubscribes);
      continue;
    }
    const actor = await seedActor(context, step.by);
    if ('draft' in step) {
      const verdicts = context.get(VerdictsService, { strict: false });
      const draft = await verdicts.createDraft(actor, claimId, {});
      const { explainer, primarySource, ...fields } = step.draft;
      const primarySourceId = primarySource
        ? (
            await context
              .get(DataSource)
              .manager.find(ClaimSource, { where: { claimId }, relations: { source: true } })
          ).find((link) => link.source.title.startsWith(primarySource))?.sourceId
        : undefined;
      await verdicts.updateDraft(actor, claimId, draft.id, {
        ...fields,
        ...(primarySourceId ? { primarySourceId } : {}),
        ...(explainer ? { body: await explainerDocument(context, claimId, explainer) } : {}),
        version: (
          await context.get(DataSource).manager.findOneByOrFail(VerdictVersion, { id: draft.id })
        ).version,
      });
    } else if ('submit' in step) {
      await life.transition(actor, claimId, { to: 'awaiting_signoff', version: await version() });
    } else if ('sendBack' in step) {
      await life.transition(actor, claimId, {
        to: 'sent_back',
        note: step.sendBack,
        version: await version(),
      });
    } else if ('clear' in step) {
      await life.transition(actor, claimId, { to: 'cleared', version: await version() });
    } else if ('reopen' in step) {
      await life.transition(actor, claimId, { to: 'in_research', version: await version() });
    } else if ('clearLegalFlag' in step) {
      await claims.update(actor, claimId, { legalReview: false, version: await version() });
    } else {
      const { inDays, timeZone, note } = step.publish;
      // A scheduled one goes out at the top of the hour, `inDays` days from now.
      const at = inDays
        ? new Date(Math.ceil((Date.now() + inDays * 86_400_000) / 3_600_000) * 3_600_000)
        : undefined;
      await context.get(PublishingService, { strict: false }).publish(actor, claimId, {
        ...(at ? { at: at.toISOString(), timeZone: timeZone ?? 'Europe/London' } : {}),
        ...(note ? { note } : {}),
        version: await version(),
      });
    }
  }
}
