import { Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { type ClaimDetail } from '@skyledger/contracts';
import { DataSource } from 'typeorm';
import { toAppearanceView } from '../appearances/appearance-view';
import { Appearance } from '../appearances/entities/appearance.entity';
import { toAttachmentView } from '../attachments/attachment-view';
import { Attachment } from '../attachments/entities/attachment.entity';
import { toClaimantView } from '../claimants/claimant-view';
import { toCommentView } from '../comments/comment-view';
import { Comment } from '../comments/entities/comment.entity';
import { toConsultationView } from '../consultations/consultation-view';
import { ExpertConsultation } from '../consultations/entities/expert-consultation.entity';
import { ReplyAttempt } from '../reply-attempts/entities/reply-attempt.entity';
import { toReplyAttemptView } from '../reply-attempts/reply-attempt-view';
import { ClaimSource } from '../sources/entities/claim-source.entity';
import { toClaimSourceView } from '../sources/source-view';
import { claimNotFound } from './claim-not-found';
import { toClaimListItem } from './claim-views';
import { Claim } from './entities/claim.entity';

/** A claim with all its parts, as the claim page shows it: one query per part. */
@Injectable()
export class ClaimDetailsReader {
  constructor(@InjectDataSource() private readonly dataSource: DataSource) {}

  async read(id: string): Promise<ClaimDetail> {
    const manager = this.dataSource.manager;
    // find, not findOne: with a limit and its topics joined, TypeORM first selects the
    // distinct ids in a query of their own, a round trip the primary key makes useless.
    const [claim] = await manager.find(Claim, {
      where: { id },
      relations: { claimant: true, assignee: true, filedBy: true, topics: true },
    });
    if (!claim) throw claimNotFound();
    const byClaim = { where: { claimId: id }, relations: { createdBy: true } } as const;
    const [appearances, sources, attachments, replyAttempts, consultations, comments] =
      await Promise.all([
        manager.find(Appearance, { ...byClaim, order: { seenAt: 'ASC', id: 'ASC' } }),
        manager.find(ClaimSource, {
          where: { claimId: id },
          relations: { source: { createdBy: true }, linkedBy: true },
          order: { linkedAt: 'ASC', sourceId: 'ASC' },
        }),
        manager.find(Attachment, {
          where: { claimId: id },
          relations: { uploadedBy: true },
          order: { uploadedAt: 'ASC', id: 'ASC' },
        }),
        manager.find(ReplyAttempt, { ...byClaim, order: { contactedAt: 'ASC', id: 'ASC' } }),
        manager.find(ExpertConsultation, {
          ...byClaim,
          order: { consultedOn: 'ASC', id: 'ASC' },
        }),
        manager.find(Comment, { ...byClaim, order: { createdAt: 'ASC', id: 'ASC' } }),
      ]);
    return {
      ...toClaimListItem(claim),
      text: claim.text,
      claimant: toClaimantView(claim.claimant),
      setAsideReason: claim.setAsideReason,
      setAsideNote: claim.setAsideNote,
      appearances: appearances.map(toAppearanceView),
      sources: sources.map(toClaimSourceView),
      attachments: attachments.map(toAttachmentView),
      replyAttempts: replyAttempts.map(toReplyAttemptView),
      consultations: consultations.map(toConsultationView),
      comments: comments.map(toCommentView),
      version: claim.version,
    };
  }
}
