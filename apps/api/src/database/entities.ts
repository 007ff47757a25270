import { AuditEvent } from '../audit/entities/audit-event.entity';
import { RefreshToken } from '../auth/entities/refresh-token.entity';
import { OutboxMessage } from '../mail/entities/outbox-message.entity';
import { OneTimeToken } from '../users/entities/one-time-token.entity';
import { User } from '../users/entities/user.entity';

/** Every entity, listed once for the app and the migration CLI. */
export const entities = [User, OneTimeToken, RefreshToken, OutboxMessage, AuditEvent];
