import { type CommentView } from '@skyledger/contracts';
import { toPersonRef } from '../common/views/person-ref';
import { type Comment } from './entities/comment.entity';

/** Needs `createdBy` loaded. */
export function toCommentView(comment: Comment): CommentView {
  return {
    id: comment.id,
    body: comment.body,
    author: toPersonRef(comment.createdBy),
    createdAt: comment.createdAt.toISOString(),
    editedAt: comment.editedAt ? comment.editedAt.toISOString() : null,
    version: comment.version,
  };
}
