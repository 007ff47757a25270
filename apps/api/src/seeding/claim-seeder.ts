import { type INestApplicationContext } from '@nestjs/common';
import {
  createAppearanceSchema,
  createClaimSchema,
  createCommentSchema,
  createConsultationSchema,
  createReplyAttemptSchema,
  createSourceSchema,
  type CreateAppearanceRequest,
  type CreateClaimantRequest,
  type CreateConsultationRequest,
  type CreateReplyAttemptRequest,
  type CreateSourceRequest,
  type SetAsideReason,
} from '@skyledger/contracts';
import { Readable } from 'node:stream';
import { DataSource } from 'typeorm';
import { appearanceKind } from '../appearances/appearance-kind';
import { AttachmentsService } from '../attachments/attachments.service';
import { stageStream, stagingDirectory } from '../attachments/staged-upload';
import { type AuthenticatedUser } from '../auth/authenticated-user';
import { Claimant } from '../claimants/entities/claimant.entity';
import { ClaimAssignmentService } from '../claims/claim-assignment.service';
import { ClaimLifeService } from '../claim-life/claim-life.service';
import { ClaimPartsService } from '../claims/claim-parts.service';
import { ClaimsService } from '../claims/claims.service';
import { Claim } from '../claims/entities/claim.entity';
import { commentKind } from '../comments/comment-kind';
import { storageConfig, type StorageConfig } from '../config/configuration';
import { consultationKind } from '../consultations/consultation-kind';
import { replyAttemptKind } from '../reply-attempts/reply-attempt-kind';
import { Source } from '../sources/entities/source.entity';
import { SourcesService } from '../sources/sources.service';
import { workingKind } from '../workings/working-kind';
import { Dataset } from '../datasets/entities/dataset.entity';
import { seedActor } from './seed-actor';
import { runVerdictSteps, type SeedVerdictStep } from './verdict-steps';

/** A file the seed uploads as it is: its name and its bytes. */
export interface SeedFile {
  name: string;
  bytes: Buffer;
}

/** Who does a step, by e-mail; they must have been seeded as people first. */
type By = { by: string };

/**
 * One demo claim and everything the desk did to it, in the order it happens: filed with
 * its first appearance, more appearances (each with an optional capture), assignment,
 * sources, right of reply, experts, comments, and last, setting it aside.
 */
export interface SeedClaim {
  /** The natural key: a claim with this summary already there is left alone. */
  summary: string;
  text: string;
  topics: string[];
  legalReview?: boolean;
  /** Reused when a claimant of that name exists. */
  claimant: CreateClaimantRequest;
  /** The reporter (or editor) who files it, by e-mail. */
  filedBy: string;
  /** The first is the one it is filed with (its first known appearance). */
  appearances: Array<CreateAppearanceRequest & { capture?: SeedFile }>;
  /** Who researches it; taken by them when `by` is the same person, else given by a desk chief. */
  assignee?: { email: string } & By;
  /** Reused when a source with that DOI (or, without one, that title) exists. */
  sources?: Array<{ source: CreateSourceRequest } & By>;
  replyAttempts?: Array<CreateReplyAttemptRequest & By>;
  consultations?: Array<CreateConsultationRequest & By>;
  comments?: Array<{ body: string } & By>;
  /**
   * Calculator runs kept on the claim. A series input may name a seeded dataset by its
   * name, `{ dataset: '<name>', column }`: the seeder puts in its id.
   */
  workings?: Array<{ calculatorId: string; inputs: Record<string, unknown>; note?: string } & By>;
  /** The verdict's life after research: drafts, sign-off decisions, publications. */
  verdict?: SeedVerdictStep[];
  setAside?: { reason: SetAsideReason; note?: string } & By;
}

/**
 * Puts a SeedClaim on the desk through the API's own services, so every rule (roles,
 * claim life, audit events, the outbox) applies as if people had done it by hand. Each
 * request shape is checked with the same zod schema the desk's forms use.
 */
export class ClaimSeeder {
  constructor(private readonly context: INestApplicationContext) {}

  private get claims() {
    return this.context.get(ClaimsService);
  }

  private get parts() {
    return this.context.get(ClaimPartsService, { strict: false });
  }

  async seed(spec: SeedClaim): Promise<{ id: string; created: boolean }> {
    const manager = this.context.get(DataSource).manager;
    const existing = await manager.findOne(Claim, { where: { summary: spec.summary } });
    if (existing) return { id: existing.id, created: false };

    const [first, ...later] = spec.appearances;
    const claimant = await manager.findOne(Claimant, { where: { name: spec.claimant.name } });
    const request = createClaimSchema.parse({
      text: spec.text,
      summary: spec.summary,
      topics: spec.topics,
      legalReview: spec.legalReview,
      ...(claimant ? { claimantId: claimant.id } : { claimant: spec.claimant }),
      firstAppearance: first && stripCapture(first),
    });
    const filer = await this.actor(spec.filedBy);
    const filed = await this.claims.file(filer, request);
    const id = filed.id;

    const firstAppearance = filed.appearances[0];
    if (first?.capture && firstAppearance) {
      const captureAttachmentId = await this.upload(filer, id, first.capture);
      await this.parts.update(
        appearanceKind,
        filer,
        id,
        firstAppearance.id,
        { captureAttachmentId },
        firstAppearance.version,
      );
    }
    for (const appearance of later) {
      const fields = createAppearanceSchema.parse(stripCapture(appearance));
      const captureAttachmentId = appearance.capture
        ? await this.upload(filer, id, appearance.capture)
        : null;
      await this.parts.add(appearanceKind, filer, id, {
        ...fields,
        seenAt: new Date(fields.seenAt),
        captureAttachmentId,
      });
    }

    if (spec.assignee) {
      const assignee = await this.actor(spec.assignee.email);
      await this.context
        .get(ClaimAssignmentService, { strict: false })
        .assign(await this.actor(spec.assignee.by), id, {
          assigneeId: assignee.id,
          version: (await this.claims.findOrFail(id)).version,
        });
    }
    for (const { source, by } of spec.sources ?? []) await this.cite(by, id, source);
    for (const { by, ...attempt } of spec.replyAttempts ?? []) {
      const fields = createReplyAttemptSchema.parse(attempt);
      await this.parts.add(replyAttemptKind, await this.actor(by), id, {
        ...fields,
        contactedAt: new Date(fields.contactedAt),
        deadline: fields.deadline ? new Date(fields.deadline) : null,
        reply: fields.reply ?? null,
      });
    }
    for (const { by, ...consultation } of spec.consultations ?? []) {
      const fields = createConsultationSchema.parse(consultation);
      await this.parts.add(consultationKind, await this.actor(by), id, fields);
    }
    for (const { by, calculatorId, inputs, note } of spec.workings ?? []) {
      await this.parts.add(workingKind, await this.actor(by), id, {
        calculatorId,
        inputs: await this.withDatasetIds(inputs),
        note: note ?? null,
      });
    }
    for (const { by, ...comment } of spec.comments ?? []) {
      await this.parts.add(
        commentKind,
        await this.actor(by),
        id,
        createCommentSchema.parse(comment),
      );
    }
    if (spec.verdict) await runVerdictSteps(this.context, id, spec.verdict);
    if (spec.setAside) {
      const { by, reason, note } = spec.setAside;
      await this.context
        .get(ClaimLifeService, { strict: false })
        .transition(await this.actor(by), id, {
          to: 'set_aside',
          reason,
          note,
          version: (await this.claims.findOrFail(id)).version,
        });
    }
    return { id, created: true };
  }

  /** Replaces dataset names in `{ dataset, column }` series inputs with the datasets' ids. */
  private async withDatasetIds(inputs: Record<string, unknown>): Promise<Record<string, unknown>> {
    const manager = this.context.get(DataSource).manager;
    const resolve = async (value: unknown): Promise<unknown> => {
      if (Array.isArray(value)) return Promise.all(value.map(resolve));
      if (typeof value !== 'object' || value === null || !('dataset' in value)) return value;
      const name = String((value as { dataset: unknown }).dataset);
      const dataset = await manager.findOne(Dataset, { where: { name } });
      if (!dataset) throw new Error(`Seed the dataset "${name}" before the workings that read it`);
      return { ...value, dataset: dataset.id };
    };
    return Object.fromEntries(
      await Promise.all(
        Object.entries(inputs).map(async ([key, value]) => [key, await resolve(value)]),
      ),
    );
  }

  /** Cites a source, reusing one already on the desk (by DOI, or by title without one). */
  private async cite(by: string, claimId: string, spec: CreateSourceRequest): Promise<void> {
    const source = createSourceSchema.parse(spec);
    const existing = await this.context.get(DataSource).manager.findOne(Source, {
      where: source.doi ? { doi: source.doi } : { title: source.title },
    });
    const sources = this.context.get(SourcesService, { strict: false });
    await sources.link(
      await this.actor(by),
      claimId,
      existing ? { sourceId: existing.id } : { source },
    );
  }

  /** Uploads the bytes the way the desk does: staged, typed from the bytes, stored once. */
  private async upload(actor: AuthenticatedUser, claimId: string, file: SeedFile): Promise<string> {
    const staged = await stageStream(Readable.from([file.bytes]), {
      directory: stagingDirectory(this.context.get<StorageConfig>(storageConfig.KEY)),
      maxBytes: Number.MAX_SAFE_INTEGER,
      originalName: file.name,
    });
    const attachment = await this.context
      .get(AttachmentsService, { strict: false })
      .add(actor, claimId, staged);
    return attachment.id;
  }

  private actor(email: string): Promise<AuthenticatedUser> {
    return seedActor(this.context, email);
  }
}

function stripCapture<T extends { capture?: SeedFile }>({ capture: _capture, ...rest }: T) {
  return rest;
}
