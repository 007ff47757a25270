import { HttpStatus, Inject, Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { type AttachmentMediaType, type AttachmentView } from '@skyledger/contracts';
import { type Readable } from 'node:stream';
import { DataSource } from 'typeorm';
import { AuditService } from '../audit/audit.service';
import { type AuthenticatedUser } from '../auth/authenticated-user';
import { ClaimsService } from '../claims/claims.service';
import { ApiError } from '../common/errors/api-error';
import { contentKey, FILE_STORAGE, type FileStorage } from '../storage/file-storage';
import { toAttachmentView } from './attachment-view';
import { Attachment } from './entities/attachment.entity';
import { safeOriginalName, sniffMediaType } from './sniff-media-type';
import { discardStaged, type StagedUpload } from './staged-upload';

export interface AttachmentDownload {
  attachment: Attachment;
  open: () => Promise<Readable>;
}

/** Evidence files on claims: typed from their bytes, stored once per content, audited. */
@Injectable()
export class AttachmentsService {
  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    @Inject(FILE_STORAGE) private readonly storage: FileStorage,
    private readonly claims: ClaimsService,
    private readonly audit: AuditService,
  ) {}

  /** Files a staged upload under a claim, as evidence. */
  add(actor: AuthenticatedUser, claimId: string, upload: StagedUpload): Promise<AttachmentView> {
    return this.store(actor, upload, { claimId, accept: null });
  }

  /** Keeps the CSV file behind a dataset: no claim, and only CSV is accepted. */
  addDatasetFile(actor: AuthenticatedUser, upload: StagedUpload): Promise<AttachmentView> {
    return this.store(actor, upload, { claimId: null, accept: ['text/csv'] });
  }

  /**
   * Types and stores a staged upload. The staged copy is removed whatever happens; the
   * stored bytes are written once per SHA-256, before the row that points at them.
   */
  private async store(
    actor: AuthenticatedUser,
    upload: StagedUpload,
    target: { claimId: string | null; accept: readonly AttachmentMediaType[] | null },
  ): Promise<AttachmentView> {
    const { claimId, accept } = target;
    try {
      if (claimId) await this.claims.findOrFail(claimId);
      const sniffed = await sniffMediaType(upload.path, upload.originalName);
      if (!sniffed.accepted) {
        throw new ApiError(HttpStatus.UNSUPPORTED_MEDIA_TYPE, sniffed.message, {
          file: sniffed.reason,
        });
      }
      if (accept && !accept.includes(sniffed.mediaType)) {
        throw new ApiError(
          HttpStatus.UNSUPPORTED_MEDIA_TYPE,
          `This needs a CSV file (a header row, then rows of the same width); the file is ${sniffed.mediaType}`,
          { file: 'unsupportedType' },
        );
      }
      const storageKey = contentKey(upload.sha256);
      const alreadyStored = await this.storage.has(storageKey);
      if (!alreadyStored) await this.storage.putFile(storageKey, upload.path, sniffed.mediaType);

      const id = await this.dataSource.transaction(async (manager) => {
        if (claimId) await this.claims.lockForContribution(manager, claimId, actor);
        const attachment = await manager.save(
          manager.create(Attachment, {
            claimId,
            originalName: safeOriginalName(upload.originalName, sniffed.mediaType),
            mediaType: sniffed.mediaType,
            size: upload.size,
            sha256: upload.sha256,
            storageKey,
            uploadedById: actor.id,
          }),
        );
        await this.audit.record(manager, {
          actorId: actor.id,
          action: 'attachment.uploaded',
          entityType: 'attachment',
          entityId: attachment.id,
          claimId,
          summary: {
            originalName: attachment.originalName,
            mediaType: attachment.mediaType,
            size: attachment.size,
            sha256: attachment.sha256,
            bytes: alreadyStored ? 'already stored' : 'stored',
          },
        });
        return attachment.id;
      });
      return toAttachmentView(await this.findOrFail(id));
    } finally {
      await discardStaged(upload);
    }
  }

  /** The whole stored file, for the server's own reading (a dataset's CSV). */
  async readAll(id: string): Promise<{ attachment: Attachment; bytes: Buffer }> {
    const attachment = await this.findOrFail(id);
    const chunks: Buffer[] = [];
    for await (const chunk of await this.storage.open(attachment.storageKey)) {
      chunks.push(chunk as Buffer);
    }
    return { attachment, bytes: Buffer.concat(chunks) };
  }

  async download(id: string): Promise<AttachmentDownload> {
    const attachment = await this.findOrFail(id);
    return { attachment, open: () => this.storage.open(attachment.storageKey) };
  }

  private async findOrFail(id: string): Promise<Attachment> {
    const attachment = await this.dataSource.manager.findOne(Attachment, {
      where: { id },
      relations: { uploadedBy: true },
    });
    if (!attachment) throw new ApiError(HttpStatus.NOT_FOUND, 'No such file on the desk');
    return attachment;
  }
}
