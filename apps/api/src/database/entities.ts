import { Appearance } from '../appearances/entities/appearance.entity';
import { Attachment } from '../attachments/entities/attachment.entity';
import { AuditEvent } from '../audit/entities/audit-event.entity';
import { RefreshToken } from '../auth/entities/refresh-token.entity';
import { Claimant } from '../claimants/entities/claimant.entity';
import { ClaimTopic } from '../claims/entities/claim-topic.entity';
import { Claim } from '../claims/entities/claim.entity';
import { Comment } from '../comments/entities/comment.entity';
import { ExpertConsultation } from '../consultations/entities/expert-consultation.entity';
import { OutboxMessage } from '../mail/entities/outbox-message.entity';
import { ReplyAttempt } from '../reply-attempts/entities/reply-attempt.entity';
import { Dataset } from '../datasets/entities/dataset.entity';
import { ClaimSource } from '../sources/entities/claim-source.entity';
import { Source } from '../sources/entities/source.entity';
import { OneTimeToken } from '../users/entities/one-time-token.entity';
import { User } from '../users/entities/user.entity';
import { Working } from '../workings/entities/working.entity';
import { Publication } from '../publishing/entities/publication.entity';
import { ReaderSubscription } from '../publishing/entities/reader-subscription.entity';
import { RatingLevel } from '../ratings/entities/rating-level.entity';
import { SignoffDecisionRecord } from '../verdicts/entities/signoff-decision.entity';
import { VerdictConflict } from '../verdicts/entities/verdict-conflict.entity';
import { VerdictVersion } from '../verdicts/entities/verdict-version.entity';

/** Every entity, listed once for the app and the migration CLI. */
export const entities = [
  User,
  OneTimeToken,
  RefreshToken,
  OutboxMessage,
  AuditEvent,
  Claimant,
  Claim,
  ClaimTopic,
  Appearance,
  Attachment,
  Source,
  ClaimSource,
  ReplyAttempt,
  ExpertConsultation,
  Comment,
  Dataset,
  Working,
  RatingLevel,
  VerdictVersion,
  SignoffDecisionRecord,
  VerdictConflict,
  Publication,
  ReaderSubscription,
];
