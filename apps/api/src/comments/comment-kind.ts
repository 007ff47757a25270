import { type CommentView } from '@skyledger/contracts';
import { type ClaimPartKind } from '../claims/claim-part-kind';
import { claimRoles, forbidden } from '../claims/claim-policy';
import { toCommentView } from './comment-view';
import { Comment } from './entities/comment.entity';

export const commentKind: ClaimPartKind<Comment, CommentView> = {
  entity: Comment,
  name: 'comment',
  addRoles: claimRoles.comment,
  toView: toCommentView,
  summarise: (comment) => ({ body: comment.body.slice(0, 200) }),
  assertMayChange(actor, comment) {
    if (comment.createdById !== actor.id) throw forbidden('Only its author may edit a comment');
  },
  assertMayRemove(actor, comment) {
    if (comment.createdById !== actor.id && actor.role !== 'desk_chief') {
      throw forbidden('Only its author or a desk chief may remove a comment');
    }
  },
  beforeSave(_manager, _claim, comment) {
    if (comment.id) comment.editedAt = new Date();
    return Promise.resolve();
  },
};
